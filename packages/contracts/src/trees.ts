// Tree authoring as the API takes and returns it: the library, versions, drafts with optimistic
// concurrency, publish with regression confirmation, diff and regression replay. The tree
// definition, its problems and the diff belong to the fault-tree package; their schemas here are
// typed with that package's own types, so the compiler holds the two together.
import { z } from 'zod';
import { problemCodes, type TreeDiff, type TreeProblem } from '@heatpath/fault-tree';
import { personRefSchema, timestampSchema } from './person';

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

/** A problem validation found in a definition: the fault-tree package's `TreeProblem`. */
export const treeProblemSchema: z.ZodType<TreeProblem> = z.object({
  code: z.enum(problemCodes),
  message: z.string(),
  nodeId: z.string().optional(),
  path: z.array(z.union([z.string(), z.number()])).optional(),
});

export const treeVersionInfoSchema = z.object({
  id: z.uuid(),
  version: z.number().int(),
  status: z.enum(treeVersionStatuses),
  changeNote: z.string().nullable(),
  publishedAt: timestampSchema.nullable(),
  publishedBy: personRefSchema.nullable(),
  retiredAt: timestampSchema.nullable(),
  revision: z.number().int(),
  updatedAt: timestampSchema,
  caseCount: z.number().int(),
  basedOnVersion: z.number().int().nullable(),
  publishConfirmation: z
    .object({
      confirmedBy: z.string(),
      confirmedAt: z.string(),
      changedCases: z.array(
        z.object({
          caseId: z.uuid(),
          reference: z.string(),
          from: z.string().nullable(),
          to: z.string().nullable(),
        }),
      ),
    })
    .nullable(),
});
export type TreeVersionInfo = z.infer<typeof treeVersionInfoSchema>;

export const treeLibraryEntrySchema = z.object({
  id: z.uuid(),
  key: z.string(),
  title: z.string(),
  symptom: z.string(),
  latestPublished: treeVersionInfoSchema.nullable(),
  draft: treeVersionInfoSchema.nullable(),
  versions: z.array(treeVersionInfoSchema),
});
export type TreeLibraryEntry = z.infer<typeof treeLibraryEntrySchema>;

/** GET /api/trees (the lead's library) */
export const treeLibraryResponseSchema = z.object({ trees: z.array(treeLibraryEntrySchema) });
export type TreeLibraryResponse = z.infer<typeof treeLibraryResponseSchema>;

/** GET /api/trees/:treeId — the library entry with the cases that guard it. */
export const treeEntryResponseSchema = treeLibraryEntrySchema.extend({
  regressionCaseIds: z.array(z.uuid()),
});
export type TreeEntryResponse = z.infer<typeof treeEntryResponseSchema>;

/** A version with its definition (as stored) and the problems validation finds in it. */
export const treeVersionDetailSchema = treeVersionInfoSchema.extend({
  treeId: z.uuid(),
  definition: z.unknown(),
  problems: z.array(treeProblemSchema),
});
export type TreeVersionDetail = z.infer<typeof treeVersionDetailSchema>;

/** POST /api/trees */
export const createTreeResponseSchema = z.object({
  treeId: z.uuid(),
  draft: treeVersionDetailSchema,
});
export type CreateTreeResponse = z.infer<typeof createTreeResponseSchema>;

export const draftSaveResultSchema = z.object({ draft: treeVersionDetailSchema });
export type DraftSaveResult = z.infer<typeof draftSaveResultSchema>;

const fieldChangeSchema = z.object({
  field: z.string(),
  before: z.string().nullable(),
  after: z.string().nullable(),
});
const nodeRefSchema = z.object({ nodeId: z.string(), title: z.string(), kind: z.string() });

/** Two versions told apart: the fault-tree package's `TreeDiff`. */
export const treeDiffSchema: z.ZodType<TreeDiff> = z.object({
  tree: z.array(fieldChangeSchema),
  added: z.array(nodeRefSchema),
  removed: z.array(nodeRefSchema),
  changed: z.array(nodeRefSchema.extend({ changes: z.array(fieldChangeSchema) })),
  unchangedCount: z.number().int(),
});

const diffSideSchema = z.object({
  id: z.uuid(),
  version: z.number().int(),
  status: z.enum(treeVersionStatuses),
});

/** GET /api/trees/:treeId/diff?from=&to= */
export const treeDiffResponseSchema = z.object({
  from: diffSideSchema,
  to: diffSideSchema,
  diff: treeDiffSchema,
});
export type TreeDiffResponse = z.infer<typeof treeDiffResponseSchema>;

export const regressionVerdicts = [
  'same-outcome',
  'different-outcome',
  'diverged',
  'no-outcome',
] as const;
export type RegressionVerdict = (typeof regressionVerdicts)[number];

export const regressionResultSchema = z.object({
  caseId: z.uuid(),
  reference: z.string(),
  fromVersion: z.number().int(),
  inRegressionSet: z.boolean(),
  expectedOutcome: z.string().nullable(),
  expectedOutcomeTitle: z.string().nullable(),
  verdict: z.enum(regressionVerdicts),
  newOutcome: z.string().nullable(),
  newOutcomeTitle: z.string().nullable(),
  /** Where and why the replay stops: the answer that no longer fits, or (no-outcome) the step the case never answered. */
  divergence: z
    .object({
      step: z.number().int(),
      nodeId: z.string(),
      nodeTitle: z.string().nullable(),
      reason: z.string(),
    })
    .nullable(),
});
export type RegressionResult = z.infer<typeof regressionResultSchema>;

/** POST /api/trees/:treeId/draft/regression */
export const regressionReportSchema = z.object({
  draftRevision: z.number().int(),
  results: z.array(regressionResultSchema),
  summary: z.record(z.enum(regressionVerdicts), z.number().int()),
});
export type RegressionReport = z.infer<typeof regressionReportSchema>;

/** PUT /api/trees/:treeId/regression-set */
export const regressionSetResponseSchema = z.object({ caseIds: z.array(z.uuid()) });
export type RegressionSetResponse = z.infer<typeof regressionSetResponseSchema>;
