// Why an event was not accepted. `stale` marks events meant for another moment of the walk (the
// API answers those with 409); the others are wrong answers to the current step (400).

export const rejectionCodes = [
  'malformed-event',
  'not-current-step',
  'out-of-sequence',
  'wrong-answer-kind',
  'unknown-choice',
  'missing-reading',
  'unexpected-reading',
  'unit-not-accepted',
  'not-a-number',
  'out-of-range',
  'no-branch-fits',
  'no-way-on',
  'walk-finished',
  'nothing-to-go-back-to',
] as const;
export type RejectionCode = (typeof rejectionCodes)[number];

export interface AnswerRejection {
  readonly code: RejectionCode;
  readonly message: string;
  readonly stale: boolean;
  /** The walk's current node when the event arrived. */
  readonly nodeId: string;
  /** Per input name, what is wrong with that reading (measurement answers only). */
  readonly fields?: Readonly<Record<string, string>>;
}

const staleCodes = new Set<RejectionCode>(['not-current-step', 'out-of-sequence']);

export function rejection(
  code: RejectionCode,
  nodeId: string,
  message: string,
  fields?: Readonly<Record<string, string>>,
): AnswerRejection {
  return {
    code,
    message,
    stale: staleCodes.has(code),
    nodeId,
    ...(fields === undefined ? {} : { fields }),
  };
}
