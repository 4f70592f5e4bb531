// Query keys of the training casebook. The lead's lists and the learner's casebook share the one
// root, so marking, editing or a finished attempt refreshes every screen that shows them.
export const trainingKeys = {
  all: ['training'] as const,
  candidates: () => [...trainingKeys.all, 'candidates'] as const,
  cases: () => [...trainingKeys.all, 'cases'] as const,
  courses: () => [...trainingKeys.all, 'courses'] as const,
  progress: () => [...trainingKeys.all, 'progress'] as const,
  progressOf: (apprenticeId: string) => [...trainingKeys.progress(), apprenticeId] as const,
  myProgress: () => [...trainingKeys.all, 'me', 'progress'] as const,
  casebook: () => [...trainingKeys.all, 'casebook'] as const,
  replay: (trainingCaseId: string) => [...trainingKeys.all, 'replay', trainingCaseId] as const,
  attempt: (attemptId: string) => [...trainingKeys.all, 'attempt', attemptId] as const,
};
