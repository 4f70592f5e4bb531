// Shapes the training API returns that the contracts package declares as TypeScript interfaces
// only. The web app must not re-type them, so these check only what the screens cannot work
// without and otherwise trust the interface; a broken answer still becomes the client's "not
// understood" error.
import type {
  ApprenticeProgress,
  ApprenticeProgressDetail,
  Casebook,
  PersonRef,
  TrainingAttempt,
  TrainingCandidate,
  TrainingCaseSummary,
  TrainingCourse,
  TrainingReplay,
} from '@heatpath/contracts';
import { z } from 'zod';

function hasFields(value: unknown, fields: readonly string[]): boolean {
  return (
    typeof value === 'object' &&
    value !== null &&
    fields.every((field) => Object.hasOwn(value, field))
  );
}

function hasList(value: unknown, field: string): boolean {
  return hasFields(value, [field]) && Array.isArray((value as Record<string, unknown>)[field]);
}

export const candidatesSchema = z.custom<{ cases: TrainingCandidate[] }>((value) =>
  hasList(value, 'cases'),
);

export const trainingCaseSummarySchema = z.custom<TrainingCaseSummary>((value) =>
  hasFields(value, ['id', 'caseId', 'symptom', 'difficulty', 'withdrawn', 'hiddenAttachmentIds']),
);

export const trainingCasesSchema = z.custom<{ trainingCases: TrainingCaseSummary[] }>((value) =>
  hasList(value, 'trainingCases'),
);

export const trainingCourseSchema = z.custom<TrainingCourse>(
  (value) => hasFields(value, ['id', 'title', 'apprentice']) && hasList(value, 'items'),
);

export const trainingCoursesSchema = z.custom<{ courses: TrainingCourse[] }>((value) =>
  hasList(value, 'courses'),
);

export interface SignOffResponse {
  signedAt: string;
  signedBy: PersonRef;
  note: string | null;
}

export const signOffSchema = z.custom<SignOffResponse>((value) =>
  hasFields(value, ['signedAt', 'signedBy']),
);

export const progressListSchema = z.custom<{ apprentices: ApprenticeProgress[] }>((value) =>
  hasList(value, 'apprentices'),
);

export const progressDetailSchema = z.custom<ApprenticeProgressDetail>(
  (value) => hasFields(value, ['apprentice', 'casesReviewed']) && hasList(value, 'history'),
);

export const casebookSchema = z.custom<Casebook>(
  (value) => hasList(value, 'courses') && hasList(value, 'cases'),
);

export const replaySchema = z.custom<TrainingReplay>(
  (value) => hasFields(value, ['trainingCase', 'outcome']) && hasList(value, 'steps'),
);

export const attemptSchema = z.custom<TrainingAttempt>(
  (value) =>
    hasFields(value, ['id', 'status', 'current', 'score', 'maxScore', 'trainingCase']) &&
    hasList(value, 'steps'),
);
