// The reference a person reads and says for a case: C-00042.
export const caseReference = (number: number) => `C-${String(number).padStart(5, '0')}`;
