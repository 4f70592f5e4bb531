// Heatpath's decision-tree definition: a JSON-serialisable document with metadata, a start node,
// declared computed values and nodes keyed by stable id. Objects are strict so a mistyped field in
// an imported file is reported rather than silently dropped. The graph, formula and safety rules
// that zod cannot express live in ../validation.
import { z } from 'zod';
import { quantities, unitCodes } from '../units/quantities.js';
import { choiceIdSchema, nodeIdSchema, nodeRefSchema, valueNameSchema } from './identifiers.js';

const text = (max: number) => z.string().trim().min(1).max(max);

export const FORMULA_MAX_LENGTH = 500;
export const formulaSchema = z.string().trim().min(1).max(FORMULA_MAX_LENGTH);

export const hazardKinds = [
  'hot-pressurised-coolant',
  'hot-surface',
  'fan',
  'glycol',
  'lifting',
  'belt-drive',
  'road-test',
] as const;
export const hazardKindSchema = z.enum(hazardKinds);
export type HazardKind = z.infer<typeof hazardKindSchema>;

export const cautionSchema = z.strictObject({
  hazard: hazardKindSchema,
  text: text(1000),
});
export type Caution = z.infer<typeof cautionSchema>;

export const evidenceKinds = ['photo', 'log'] as const;
export const evidenceRequestSchema = z.strictObject({
  kind: z.enum(evidenceKinds),
  label: text(200),
  required: z.boolean().default(false),
});
export type EvidenceRequest = z.infer<typeof evidenceRequestSchema>;

export const quantitySchema = z.enum(quantities);
export const unitCodeSchema = z.enum(unitCodes);

export const rangeSchema = z.strictObject({ min: z.number(), max: z.number() });
export type ValueRange = z.infer<typeof rangeSchema>;

export const measurementInputSchema = z.strictObject({
  name: valueNameSchema,
  label: text(160),
  quantity: quantitySchema,
  /** The canonical unit of the quantity, written out so the range below reads unambiguously. */
  unit: unitCodeSchema,
  /** The physically possible (or procedurally allowed) range, in the canonical unit. */
  range: rangeSchema,
  hint: text(500).optional(),
});
export type MeasurementInput = z.infer<typeof measurementInputSchema>;

export const computedValueSchema = z.strictObject({
  name: valueNameSchema,
  label: text(160),
  formula: formulaSchema,
  quantity: quantitySchema,
  unit: unitCodeSchema,
  hint: text(500).optional(),
});
export type ComputedValue = z.infer<typeof computedValueSchema>;

// Fields every step (every node but an outcome) carries.
const stepFields = {
  title: text(120),
  notes: text(4000).optional(),
  hazards: z.array(hazardKindSchema).default([]),
  cautions: z.array(cautionSchema).default([]),
  evidence: z.array(evidenceRequestSchema).default([]),
  tools: z.array(text(200)).default([]),
  estimatedMinutes: z.number().min(0).max(1440).optional(),
};

export const choiceSchema = z.strictObject({
  id: choiceIdSchema,
  label: text(200),
  to: nodeRefSchema,
  hint: text(500).optional(),
});
export type Choice = z.infer<typeof choiceSchema>;

export const questionNodeSchema = z.strictObject({
  kind: z.literal('question'),
  ...stepFields,
  prompt: text(2000),
  choices: z.array(choiceSchema).default([]),
});
export type QuestionNode = z.infer<typeof questionNodeSchema>;

export const branchSchema = z.strictObject({
  when: formulaSchema,
  to: nodeRefSchema,
  label: text(200).optional(),
});
export type Branch = z.infer<typeof branchSchema>;

export const fallbackSchema = z.strictObject({
  to: nodeRefSchema,
  label: text(200).optional(),
});
export type Fallback = z.infer<typeof fallbackSchema>;

export const measurementNodeSchema = z.strictObject({
  kind: z.literal('measurement'),
  ...stepFields,
  prompt: text(2000),
  inputs: z.array(measurementInputSchema).default([]),
  branches: z.array(branchSchema).default([]),
  fallback: fallbackSchema.optional(),
});
export type MeasurementNode = z.infer<typeof measurementNodeSchema>;

export const procedureNodeSchema = z.strictObject({
  kind: z.literal('procedure'),
  ...stepFields,
  instruction: text(4000),
  estimatedMinutes: z.number().min(0).max(1440),
  done: nodeRefSchema.optional(),
  couldNotDo: nodeRefSchema.optional(),
});
export type ProcedureNode = z.infer<typeof procedureNodeSchema>;

export const partLineSchema = z.strictObject({
  description: text(300),
  quantity: z.number().positive().max(1000),
});
export type PartLine = z.infer<typeof partLineSchema>;

export const labourLineSchema = z.strictObject({
  operation: text(300),
  hours: z.number().min(0).max(100),
});
export type LabourLine = z.infer<typeof labourLineSchema>;

export const outcomeNodeSchema = z.strictObject({
  kind: z.literal('outcome'),
  title: text(120),
  rootCause: text(2000),
  correction: text(4000),
  parts: z.array(partLineSchema).default([]),
  labour: z.array(labourLineSchema).default([]),
  followUps: z.array(text(1000)).default([]),
  notes: text(4000).optional(),
  hazards: z.array(hazardKindSchema).default([]),
  cautions: z.array(cautionSchema).default([]),
});
export type OutcomeNode = z.infer<typeof outcomeNodeSchema>;

export const nodeKinds = ['question', 'measurement', 'procedure', 'outcome'] as const;
export type NodeKind = (typeof nodeKinds)[number];

export const treeNodeSchema = z.discriminatedUnion('kind', [
  questionNodeSchema,
  measurementNodeSchema,
  procedureNodeSchema,
  outcomeNodeSchema,
]);
export type TreeNode = z.infer<typeof treeNodeSchema>;
export type StepNode = QuestionNode | MeasurementNode | ProcedureNode;

export const TREE_FORMAT = 'heatpath.tree';
export const TREE_FORMAT_VERSION = 1;

// Everything but the nodes; parsed on its own so one broken node does not hide the others' problems.
export const treeEnvelopeSchema = z.strictObject({
  format: z.literal(TREE_FORMAT),
  formatVersion: z.literal(TREE_FORMAT_VERSION),
  id: nodeIdSchema,
  title: text(160),
  symptom: text(500),
  summary: text(2000).optional(),
  applicability: z.array(text(1000)).default([]),
  start: nodeRefSchema,
  computed: z.array(computedValueSchema).default([]),
  nodes: z.record(z.string(), z.unknown()),
});

export const treeDefinitionSchema = treeEnvelopeSchema.extend({
  nodes: z.record(nodeIdSchema, treeNodeSchema),
});

/** A tree definition after parsing (defaults filled in). */
export type TreeDefinition = z.infer<typeof treeDefinitionSchema>;
/** A tree definition as written in JSON (optional lists may be left out). */
export type TreeDefinitionInput = z.input<typeof treeDefinitionSchema>;
