// The training casebook: finished cases the lead marks for teaching, courses of them, and the
// apprentice's replays and scored prediction attempts. Nothing here carries a customer's name,
// contact, plate or VIN: apprentices' shapes are built from an allowlist in the API.
import { z } from 'zod';
import { cautionSchema, hazardKinds, nodeKinds } from '@heatpath/fault-tree';
import { personRefSchema, timestampSchema } from './person';
import { distanceUnits } from './vehicles';

export const trainingDifficulties = ['starter', 'practised', 'advanced'] as const;
export type TrainingDifficulty = (typeof trainingDifficulties)[number];
export const trainingDifficultyLabels: Record<TrainingDifficulty, string> = {
  starter: 'Starter',
  practised: 'Practised',
  advanced: 'Advanced',
};

const teachingNoteSchema = z
  .string({ error: 'Write a short teaching note for the apprentice.' })
  .trim()
  .min(3, 'Write a short teaching note for the apprentice.')
  .max(2000, 'Keep the teaching note under 2000 characters.');
const difficultySchema = z.enum(trainingDifficulties, {
  error: 'Choose how hard the case is: starter, practised or advanced.',
});
const hiddenAttachmentIdsSchema = z
  .array(z.uuid({ error: 'That is not a photo of this case.' }))
  .max(60);

/** POST /api/training/cases — mark a finished case for training. */
export const markTrainingCaseRequestSchema = z.object({
  caseId: z.uuid({ error: 'Choose the finished case to teach from.' }),
  teachingNote: teachingNoteSchema,
  difficulty: difficultySchema,
  hideNotes: z.boolean().default(false),
  hiddenAttachmentIds: hiddenAttachmentIdsSchema.default([]),
});
export type MarkTrainingCaseRequest = z.infer<typeof markTrainingCaseRequestSchema>;

/** PATCH /api/training/cases/:trainingCaseId — change the note, difficulty, hiding, or withdraw. */
export const updateTrainingCaseRequestSchema = z
  .object({
    teachingNote: teachingNoteSchema.optional(),
    difficulty: difficultySchema.optional(),
    hideNotes: z.boolean().optional(),
    hiddenAttachmentIds: hiddenAttachmentIdsSchema.optional(),
    withdrawn: z.boolean().optional(),
  })
  .refine((v) => Object.values(v).some((value) => value !== undefined), {
    message: 'Send at least one change.',
  });
export type UpdateTrainingCaseRequest = z.infer<typeof updateTrainingCaseRequestSchema>;

const courseFields = {
  title: z
    .string({ error: 'Give the course a title.' })
    .trim()
    .min(3, 'Give the course a title of at least 3 characters.')
    .max(160, 'Keep the title under 160 characters.'),
  description: z.string().trim().max(2000, 'Keep the description under 2000 characters.').nullish(),
  /** One apprentice, or null for every apprentice of the workshop. */
  apprenticeId: z.uuid({ error: 'Choose an apprentice, or everyone.' }).nullable(),
  trainingCaseIds: z
    .array(z.uuid({ error: 'That is not a training case.' }))
    .min(1, 'Put at least one training case in the course.')
    .max(100, 'A course holds at most 100 cases.')
    .refine((ids) => new Set(ids).size === ids.length, 'A case appears only once in a course.'),
};

/** POST /api/training/courses and PUT /api/training/courses/:courseId. */
export const courseRequestSchema = z.object(courseFields);
export type CourseRequest = z.infer<typeof courseRequestSchema>;

/** POST /api/training/courses/:courseId/sign-offs */
export const signOffRequestSchema = z.object({
  apprenticeId: z.uuid({ error: 'Choose the apprentice to sign off.' }),
  note: z.string().trim().max(1000, 'Keep the note under 1000 characters.').nullish(),
});
export type SignOffRequest = z.infer<typeof signOffRequestSchema>;

/** POST /api/training/attempts/:attemptId/predictions */
export const predictionRequestSchema = z.object({
  /** The step being predicted; must be the attempt's current one. */
  index: z.number({ error: 'Say which step this prediction is for.' }).int().min(0).max(500),
  optionId: z
    .string({ error: 'Choose one of the options.' })
    .trim()
    .min(1, 'Choose one of the options.')
    .max(120),
});
export type PredictionRequest = z.infer<typeof predictionRequestSchema>;

// ---- Responses ------------------------------------------------------------------------------

/** The vehicle as a learner sees it: no plate, no VIN, no owner. */
export const trainingVehicleSchema = z.object({
  make: z.string(),
  model: z.string(),
  year: z.number().int().nullable(),
  engine: z.string().nullable(),
  fuel: z.string().nullable(),
  mileageAtIntake: z.number().nullable(),
  mileageUnit: z.enum(distanceUnits),
});
export type TrainingVehicle = z.infer<typeof trainingVehicleSchema>;

export const trainingPhotoSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  nodeId: z.string().nullable(),
  url: z.string(),
  thumbnailUrl: z.string().nullable(),
});
export type TrainingPhoto = z.infer<typeof trainingPhotoSchema>;

export const trainingValueSchema = z.object({ label: z.string(), display: z.string() });
export type TrainingValue = z.infer<typeof trainingValueSchema>;

export const trainingAnswerSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('choice'), label: z.string() }),
  z.object({ kind: z.literal('measurement'), readings: z.array(trainingValueSchema) }),
  z.object({ kind: z.literal('procedure'), label: z.string() }),
]);
export type TrainingAnswer = z.infer<typeof trainingAnswerSchema>;

const nodeKindSchema = z.enum(nodeKinds);

/** One step of a finished case as it happened. */
export const trainingStepSchema = z.object({
  index: z.number().int(),
  nodeId: z.string(),
  kind: nodeKindSchema,
  title: z.string(),
  /** The question asked, the measurement asked for, or the procedure's instruction. */
  prompt: z.string(),
  hazards: z.array(z.enum(hazardKinds)),
  cautions: z.array(cautionSchema),
  /** What the technician answered, measured or reported. */
  answer: trainingAnswerSchema,
  /** Values computed from the readings, as they stood after this step. */
  computed: z.array(trainingValueSchema),
  photos: z.array(trainingPhotoSchema),
  /** The technician's notes on this step (left out when the lead hides notes). */
  notes: z.array(z.string()),
  /** Filled once revealed: the choice, branch or result that led on, and where to. */
  routeLabel: z.string().nullable(),
  next: z.object({ nodeId: z.string(), kind: nodeKindSchema, title: z.string() }).nullable(),
  /** The tree's own explanation of the step, once revealed (null when the tree gives none). */
  why: z.string().nullable(),
});
export type TrainingStep = z.infer<typeof trainingStepSchema>;

const trainingLinesFields = {
  parts: z.array(z.object({ description: z.string(), quantity: z.number() })),
  labour: z.array(z.object({ operation: z.string(), hours: z.number() })),
  followUps: z.array(z.string()),
};

export const trainingOutcomeSchema = z.object({
  nodeId: z.string(),
  title: z.string(),
  rootCause: z.string(),
  correction: z.string(),
  ...trainingLinesFields,
});
export type TrainingOutcome = z.infer<typeof trainingOutcomeSchema>;

export const trainingFindingsSchema = z.object({
  concern: z.string(),
  cause: z.string(),
  correction: z.string(),
  ...trainingLinesFields,
});
export type TrainingFindings = z.infer<typeof trainingFindingsSchema>;

export const trainingScoreSchema = z.object({ score: z.number(), maxScore: z.number() });
export type TrainingScore = z.infer<typeof trainingScoreSchema>;

/** A training case as the casebook lists it: the symptom and difficulty, never the answer. */
export const casebookEntrySchema = z.object({
  id: z.uuid(),
  symptom: z.string(),
  complaint: z.string(),
  treeTitle: z.string(),
  difficulty: z.enum(trainingDifficulties),
  vehicle: trainingVehicleSchema,
  stepCount: z.number().int(),
  /** The caller's own attempts only. */
  attempts: z.number().int(),
  bestScore: trainingScoreSchema.nullable(),
});
export type CasebookEntry = z.infer<typeof casebookEntrySchema>;

/** POST /api/training/courses/:courseId/sign-offs, and a signed-off course wherever it is shown. */
export const signOffResponseSchema = z.object({
  signedAt: timestampSchema,
  signedBy: personRefSchema,
  note: z.string().nullable(),
});
export type SignOffResponse = z.infer<typeof signOffResponseSchema>;

export const casebookCourseSchema = z.object({
  id: z.uuid(),
  title: z.string(),
  description: z.string().nullable(),
  forEveryone: z.boolean(),
  trainingCaseIds: z.array(z.uuid()),
  signOff: signOffResponseSchema.nullable(),
});
export type CasebookCourse = z.infer<typeof casebookCourseSchema>;

/** GET /api/training/casebook */
export const casebookSchema = z.object({
  courses: z.array(casebookCourseSchema),
  cases: z.array(casebookEntrySchema),
});
export type Casebook = z.infer<typeof casebookSchema>;

/** GET /api/training/cases/:trainingCaseId/replay — every step revealed. */
export const trainingReplaySchema = z.object({
  trainingCase: casebookEntrySchema,
  teachingNote: z.string(),
  steps: z.array(trainingStepSchema),
  outcome: trainingOutcomeSchema,
  findings: trainingFindingsSchema.nullable(),
});
export type TrainingReplay = z.infer<typeof trainingReplaySchema>;

export const predictionKinds = ['next', 'meaning', 'cause'] as const;
export type PredictionKind = (typeof predictionKinds)[number];

export const predictionOptionSchema = z.object({ id: z.string(), label: z.string() });
export type PredictionOption = z.infer<typeof predictionOptionSchema>;

export const predictionAskSchema = z.object({
  kind: z.enum(predictionKinds),
  /** "What should the technician check next?", "What do these readings mean?", "What is the root cause?" */
  question: z.string(),
  options: z.array(predictionOptionSchema),
  maxPoints: z.number(),
});
export type PredictionAsk = z.infer<typeof predictionAskSchema>;

export const predictionResultSchema = predictionAskSchema.extend({
  chosenId: z.string(),
  correctId: z.string(),
  correct: z.boolean(),
  points: z.number(),
});
export type PredictionResult = z.infer<typeof predictionResultSchema>;

export const attemptStepSchema = z.object({
  step: trainingStepSchema,
  /** Null when the tree left only one way on, so there was nothing to predict. */
  prediction: predictionResultSchema.nullable(),
});
export type AttemptStep = z.infer<typeof attemptStepSchema>;

const attemptStatusSchema = z.enum(['in_progress', 'finished']);

/** GET /api/training/attempts/:attemptId and the answer to each prediction. */
export const trainingAttemptSchema = z.object({
  id: z.uuid(),
  trainingCaseId: z.uuid(),
  status: attemptStatusSchema,
  startedAt: timestampSchema,
  finishedAt: timestampSchema.nullable(),
  /** Points so far; maxScore is the case's total. */
  score: z.number(),
  maxScore: z.number(),
  steps: z.array(attemptStepSchema),
  /** The step waiting for a prediction: shown without where it led. */
  current: z.object({ step: trainingStepSchema, ask: predictionAskSchema }).nullable(),
  trainingCase: casebookEntrySchema,
  /** After the last prediction only. */
  teachingNote: z.string().nullable(),
  outcome: trainingOutcomeSchema.nullable(),
  findings: trainingFindingsSchema.nullable(),
});
export type TrainingAttempt = z.infer<typeof trainingAttemptSchema>;

export const attemptSummarySchema = z.object({
  id: z.uuid(),
  trainingCaseId: z.uuid(),
  symptom: z.string(),
  status: attemptStatusSchema,
  score: z.number(),
  maxScore: z.number(),
  startedAt: timestampSchema,
  finishedAt: timestampSchema.nullable(),
});
export type AttemptSummary = z.infer<typeof attemptSummarySchema>;

export const weakSpotSchema = z.object({
  title: z.string(),
  wrong: z.number().int(),
  asked: z.number().int(),
});
export type WeakSpot = z.infer<typeof weakSpotSchema>;

export const courseProgressSchema = z.object({
  id: z.uuid(),
  title: z.string(),
  completedCases: z.number().int(),
  totalCases: z.number().int(),
  signOff: signOffResponseSchema.nullable(),
});
export type CourseProgress = z.infer<typeof courseProgressSchema>;

/** One apprentice's progress, as GET /api/training/progress lists it. */
export const apprenticeProgressSchema = z.object({
  apprentice: personRefSchema,
  casesReviewed: z.number().int(),
  attempts: z.number().int(),
  /** Mean over reviewed cases of the best finished attempt, in per cent. */
  averageScorePercent: z.number().nullable(),
  weakSpots: z.array(weakSpotSchema),
  courses: z.array(courseProgressSchema),
});
export type ApprenticeProgress = z.infer<typeof apprenticeProgressSchema>;

/** GET /api/training/progress (lead) */
export const progressListResponseSchema = z.object({
  apprentices: z.array(apprenticeProgressSchema),
});
export type ProgressListResponse = z.infer<typeof progressListResponseSchema>;

/** GET /api/training/progress/:apprenticeId (lead), GET /api/training/me/progress (the apprentice's own). */
export const apprenticeProgressDetailSchema = apprenticeProgressSchema.extend({
  history: z.array(attemptSummarySchema),
});
export type ApprenticeProgressDetail = z.infer<typeof apprenticeProgressDetailSchema>;

// ---- For the lead ---------------------------------------------------------------------------

/** A finished case not yet marked, with what could be hidden. */
export const trainingCandidateSchema = z.object({
  caseId: z.uuid(),
  reference: z.string(),
  symptom: z.string(),
  treeTitle: z.string(),
  complaint: z.string(),
  vehicle: z.string(),
  outcomeTitle: z.string(),
  diagnosedAt: timestampSchema.nullable(),
  notes: z.array(z.object({ id: z.uuid(), text: z.string() })),
  photos: z.array(
    z.object({ id: z.uuid(), name: z.string(), thumbnailUrl: z.string().nullable() }),
  ),
});
export type TrainingCandidate = z.infer<typeof trainingCandidateSchema>;

/** GET /api/training/candidates */
export const candidatesResponseSchema = z.object({ cases: z.array(trainingCandidateSchema) });
export type CandidatesResponse = z.infer<typeof candidatesResponseSchema>;

/** A marked training case; POST and PATCH /api/training/cases answer with one. */
export const trainingCaseSummarySchema = z.object({
  id: z.uuid(),
  caseId: z.uuid(),
  caseReference: z.string(),
  symptom: z.string(),
  treeTitle: z.string(),
  outcomeTitle: z.string(),
  difficulty: z.enum(trainingDifficulties),
  teachingNote: z.string(),
  hideNotes: z.boolean(),
  hiddenAttachmentIds: z.array(z.uuid()),
  withdrawn: z.boolean(),
  markedBy: personRefSchema,
  createdAt: timestampSchema,
  attempts: z.number().int(),
});
export type TrainingCaseSummary = z.infer<typeof trainingCaseSummarySchema>;

/** GET /api/training/cases (lead) */
export const trainingCasesResponseSchema = z.object({
  trainingCases: z.array(trainingCaseSummarySchema),
});
export type TrainingCasesResponse = z.infer<typeof trainingCasesResponseSchema>;

/** A course; POST and PUT /api/training/courses answer with one. */
export const trainingCourseSchema = z.object({
  id: z.uuid(),
  title: z.string(),
  description: z.string().nullable(),
  apprentice: personRefSchema.nullable(),
  items: z.array(
    z.object({
      trainingCaseId: z.uuid(),
      symptom: z.string(),
      difficulty: z.enum(trainingDifficulties),
    }),
  ),
  createdAt: timestampSchema,
  updatedAt: timestampSchema,
});
export type TrainingCourse = z.infer<typeof trainingCourseSchema>;

/** GET /api/training/courses */
export const trainingCoursesResponseSchema = z.object({ courses: z.array(trainingCourseSchema) });
export type TrainingCoursesResponse = z.infer<typeof trainingCoursesResponseSchema>;
