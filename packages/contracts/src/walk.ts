// The walk as the API sends it (a case's page, the answer to each walk event). Its shape is the
// fault-tree package's own (`WalkSummary`); this describes it for parsing, built from that
// package's node and event schemas, and the compiler holds the two together.
import {
  measurementNodeSchema,
  nodeKinds,
  outcomeNodeSchema,
  procedureNodeSchema,
  procedureResults,
  quantities,
  questionNodeSchema,
  readingSchema,
  rejectionCodes,
  unitCodes,
  walkEventSchema,
  type WalkSummary,
} from '@heatpath/fault-tree';
import { z } from 'zod';

const withId = { id: z.string() };

const nodeViewSchema = z.discriminatedUnion('kind', [
  questionNodeSchema.extend(withId),
  measurementNodeSchema.extend(withId),
  procedureNodeSchema.extend(withId),
  outcomeNodeSchema.extend(withId),
]);

const readingViewSchema = z.object({
  name: z.string(),
  label: z.string(),
  quantity: z.enum(quantities),
  nodeId: z.string(),
  entered: readingSchema,
  canonical: z.object({ value: z.number(), unit: z.enum(unitCodes) }),
  display: z.string(),
});

const computedViewSchema = z.object({
  name: z.string(),
  label: z.string(),
  quantity: z.enum(quantities),
  unit: z.enum(unitCodes),
  value: z.number().nullable(),
  display: z.string().nullable(),
});

const answerSummarySchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('choice'), choiceId: z.string(), label: z.string() }),
  z.object({ kind: z.literal('measurement'), readings: z.array(readingViewSchema) }),
  z.object({ kind: z.literal('procedure'), result: z.enum(procedureResults), label: z.string() }),
]);

const routeKeySchema = z.union([
  z.templateLiteral(['choice:', z.string()]),
  z.templateLiteral(['branch:', z.number()]),
  z.enum(['fallback', 'done', 'could-not-do']),
]);

const pathEntryViewSchema = z.object({
  nodeId: z.string(),
  kind: z.enum(nodeKinds),
  title: z.string(),
  answer: answerSummarySchema,
  route: routeKeySchema,
  routeLabel: z.string(),
  to: z.string(),
});

export const walkSummarySchema: z.ZodType<WalkSummary> = z.object({
  treeId: z.string(),
  treeFingerprint: z.string(),
  currentNodeId: z.string(),
  currentNode: nodeViewSchema,
  status: z.enum(['in-progress', 'reached-outcome']),
  outcome: outcomeNodeSchema.extend(withId).nullable(),
  path: z.array(pathEntryViewSchema),
  readings: z.array(readingViewSchema),
  computed: z.array(computedViewSchema),
  values: z.record(z.string(), z.number()),
  history: z.array(walkEventSchema),
  position: z.number().int().min(0),
  canGoBack: z.boolean(),
  divergence: z
    .object({
      divergedAt: z.number().int(),
      nodeId: z.string(),
      code: z.enum(rejectionCodes),
      reason: z.string(),
    })
    .nullable(),
  applied: z.number().int(),
});
