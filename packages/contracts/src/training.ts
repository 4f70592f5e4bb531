// The training casebook: finished cases the lead marks for teaching, courses of them, and the
// apprentice's replays and scored prediction attempts. Nothing here carries a customer's name,
// contact, plate or VIN: apprentices' shapes are built from an allowlist in the API.
import { z } from 'zod';
import type { Caution, HazardKind, NodeKind } from '@heatpath/fault-tree';
import type { PersonRef } from './case-detail';

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
export interface TrainingVehicle {
  make: string;
  model: string;
  year: number | null;
  engine: string | null;
  fuel: string | null;
  mileageAtIntake: number | null;
  mileageUnit: 'km' | 'mi';
}

export interface TrainingPhoto {
  id: string;
  name: string;
  nodeId: string | null;
  url: string;
  thumbnailUrl: string | null;
}

export interface TrainingValue {
  label: string;
  display: string;
}

export type TrainingAnswer =
  | { kind: 'choice'; label: string }
  | { kind: 'measurement'; readings: TrainingValue[] }
  | { kind: 'procedure'; label: string };

/** One step of a finished case as it happened. */
export interface TrainingStep {
  index: number;
  nodeId: string;
  kind: NodeKind;
  title: string;
  /** The question asked, the measurement asked for, or the procedure's instruction. */
  prompt: string;
  hazards: HazardKind[];
  cautions: Caution[];
  /** What the technician answered, measured or reported. */
  answer: TrainingAnswer;
  /** Values computed from the readings, as they stood after this step. */
  computed: TrainingValue[];
  photos: TrainingPhoto[];
  /** The technician's notes on this step (left out when the lead hides notes). */
  notes: string[];
  /** Filled once revealed: the choice, branch or result that led on, and where to. */
  routeLabel: string | null;
  next: { nodeId: string; kind: NodeKind; title: string } | null;
  /** The tree's own explanation of the step, once revealed (null when the tree gives none). */
  why: string | null;
}

export interface TrainingOutcome {
  nodeId: string;
  title: string;
  rootCause: string;
  correction: string;
  parts: { description: string; quantity: number }[];
  labour: { operation: string; hours: number }[];
  followUps: string[];
}

export interface TrainingFindings {
  concern: string;
  cause: string;
  correction: string;
  parts: { description: string; quantity: number }[];
  labour: { operation: string; hours: number }[];
  followUps: string[];
}

export interface TrainingScore {
  score: number;
  maxScore: number;
}

/** A training case as the casebook lists it: the symptom and difficulty, never the answer. */
export interface CasebookEntry {
  id: string;
  symptom: string;
  complaint: string;
  treeTitle: string;
  difficulty: TrainingDifficulty;
  vehicle: TrainingVehicle;
  stepCount: number;
  /** The caller's own attempts only. */
  attempts: number;
  bestScore: TrainingScore | null;
}

export interface CasebookCourse {
  id: string;
  title: string;
  description: string | null;
  forEveryone: boolean;
  trainingCaseIds: string[];
  signOff: { signedAt: string; signedBy: PersonRef; note: string | null } | null;
}

/** GET /api/training/casebook */
export interface Casebook {
  courses: CasebookCourse[];
  cases: CasebookEntry[];
}

/** GET /api/training/cases/:trainingCaseId/replay — every step revealed. */
export interface TrainingReplay {
  trainingCase: CasebookEntry;
  teachingNote: string;
  steps: TrainingStep[];
  outcome: TrainingOutcome;
  findings: TrainingFindings | null;
}

export type PredictionKind = 'next' | 'meaning' | 'cause';

export interface PredictionOption {
  id: string;
  label: string;
}

export interface PredictionAsk {
  kind: PredictionKind;
  /** "What should the technician check next?", "What do these readings mean?", "What is the root cause?" */
  question: string;
  options: PredictionOption[];
  maxPoints: number;
}

export interface PredictionResult extends PredictionAsk {
  chosenId: string;
  correctId: string;
  correct: boolean;
  points: number;
}

export interface AttemptStep {
  step: TrainingStep;
  /** Null when the tree left only one way on, so there was nothing to predict. */
  prediction: PredictionResult | null;
}

/** GET /api/training/attempts/:attemptId and the answer to each prediction. */
export interface TrainingAttempt {
  id: string;
  trainingCaseId: string;
  status: 'in_progress' | 'finished';
  startedAt: string;
  finishedAt: string | null;
  /** Points so far; maxScore is the case's total. */
  score: number;
  maxScore: number;
  steps: AttemptStep[];
  /** The step waiting for a prediction: shown without where it led. */
  current: { step: TrainingStep; ask: PredictionAsk } | null;
  trainingCase: CasebookEntry;
  /** After the last prediction only. */
  teachingNote: string | null;
  outcome: TrainingOutcome | null;
  findings: TrainingFindings | null;
}

export interface AttemptSummary {
  id: string;
  trainingCaseId: string;
  symptom: string;
  status: 'in_progress' | 'finished';
  score: number;
  maxScore: number;
  startedAt: string;
  finishedAt: string | null;
}

export interface WeakSpot {
  title: string;
  wrong: number;
  asked: number;
}

export interface CourseProgress {
  id: string;
  title: string;
  completedCases: number;
  totalCases: number;
  signOff: { signedAt: string; signedBy: PersonRef; note: string | null } | null;
}

/** GET /api/training/progress (lead), GET /api/training/me/progress (the apprentice's own). */
export interface ApprenticeProgress {
  apprentice: PersonRef;
  casesReviewed: number;
  attempts: number;
  /** Mean over reviewed cases of the best finished attempt, in per cent. */
  averageScorePercent: number | null;
  weakSpots: WeakSpot[];
  courses: CourseProgress[];
}

export interface ApprenticeProgressDetail extends ApprenticeProgress {
  history: AttemptSummary[];
}

// ---- For the lead ---------------------------------------------------------------------------

/** GET /api/training/candidates — finished cases not yet marked, with what could be hidden. */
export interface TrainingCandidate {
  caseId: string;
  reference: string;
  symptom: string;
  treeTitle: string;
  complaint: string;
  vehicle: string;
  outcomeTitle: string;
  diagnosedAt: string | null;
  notes: { id: string; text: string }[];
  photos: { id: string; name: string; thumbnailUrl: string | null }[];
}

/** GET /api/training/cases (lead) */
export interface TrainingCaseSummary {
  id: string;
  caseId: string;
  caseReference: string;
  symptom: string;
  treeTitle: string;
  outcomeTitle: string;
  difficulty: TrainingDifficulty;
  teachingNote: string;
  hideNotes: boolean;
  hiddenAttachmentIds: string[];
  withdrawn: boolean;
  markedBy: PersonRef;
  createdAt: string;
  attempts: number;
}

export interface TrainingCourse {
  id: string;
  title: string;
  description: string | null;
  apprentice: PersonRef | null;
  items: { trainingCaseId: string; symptom: string; difficulty: TrainingDifficulty }[];
  createdAt: string;
  updatedAt: string;
}
