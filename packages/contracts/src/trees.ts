// Tree authoring as the API takes and returns it: the library, versions, drafts with optimistic
// concurrency, publish with regression confirmation, diff and regression replay. The tree
// definition and its problems belong to the fault-tree package and are referenced, not re-typed.
import { z } from 'zod';
import type { TreeProblem } from '@heatpath/fault-tree';

export const treeVersionStatuses = ['draft', 'published', 'retired'] as const;
export type TreeVersionStatus = (typeof treeVersionStatuses)[number];

export const createTreeRequestSchema = z.union([
  z.object({
    mode: z.literal('blank'),
    title: z.string().trim().min(3, 'Give the tree a title.').max(160),
    symptom: z.string().trim().min(3, 'Say which symptom the tree starts from.').max(500),
  }),
  z.object({
    mode: z.literal('copy'),
    fromTreeId: z.uuid(),
    title: z.string().trim().min(3).max(160),
  }),
  z.object({ mode: z.literal('import'), definition: z.unknown() }),
]);
export type CreateTreeRequest = z.infer<typeof createTreeRequestSchema>;

export const saveDraftRequestSchema = z.object({
  revision: z.number().int().min(1),
  definition: z.unknown(),
});
export type SaveDraftRequest = z.infer<typeof saveDraftRequestSchema>;

export const publishDraftRequestSchema = z.object({
  revision: z.number().int().min(1),
  changeNote: z.string().trim().min(3, 'Say in a few words what changed.').max(2000),
  confirmChangedOutcomes: z.boolean().default(false),
});
export type PublishDraftRequest = z.infer<typeof publishDraftRequestSchema>;

export const regressionSetRequestSchema = z.object({
  caseIds: z.array(z.uuid()).max(500),
});

export const diffQuerySchema = z.object({ from: z.uuid(), to: z.uuid() });

export interface PersonName {
  id: string;
  name: string;
}

export interface TreeVersionInfo {
  id: string;
  version: number;
  status: TreeVersionStatus;
  changeNote: string | null;
  publishedAt: string | null;
  publishedBy: PersonName | null;
  retiredAt: string | null;
  revision: number;
  updatedAt: string;
  caseCount: number;
  basedOnVersion: number | null;
  publishConfirmation: {
    confirmedBy: string;
    confirmedAt: string;
    changedCases: { caseId: string; reference: string; from: string | null; to: string | null }[];
  } | null;
}

export interface TreeLibraryEntry {
  id: string;
  key: string;
  title: string;
  symptom: string;
  latestPublished: TreeVersionInfo | null;
  draft: TreeVersionInfo | null;
  versions: TreeVersionInfo[];
}

export interface TreeVersionDetail extends TreeVersionInfo {
  treeId: string;
  definition: unknown;
  problems: TreeProblem[];
}

export interface DraftSaveResult {
  draft: TreeVersionDetail;
}

export type RegressionVerdict = 'same-outcome' | 'different-outcome' | 'diverged' | 'no-outcome';

export interface RegressionResult {
  caseId: string;
  reference: string;
  fromVersion: number;
  inRegressionSet: boolean;
  expectedOutcome: string | null;
  expectedOutcomeTitle: string | null;
  verdict: RegressionVerdict;
  newOutcome: string | null;
  newOutcomeTitle: string | null;
  /** Where and why the replay stops: the answer that no longer fits, or (no-outcome) the step the case never answered. */
  divergence: { step: number; nodeId: string; nodeTitle: string | null; reason: string } | null;
}

export interface RegressionReport {
  draftRevision: number;
  results: RegressionResult[];
  summary: Record<RegressionVerdict, number>;
}
