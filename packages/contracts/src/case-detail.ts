// A case as its page shows it, and the walk requests. The walk's own shape belongs to the
// fault-tree package (the browser runs the same code); walk.ts describes it for parsing.
import { z } from 'zod';
import { walkEventSchema } from '@heatpath/fault-tree';
import { caseStatuses } from './cases';
import { findingsSchema } from './findings';
import { personRefSchema, timestampSchema } from './person';
import { customerSchema, distanceUnits, vehicleSchema } from './vehicles';
import { walkSummarySchema } from './walk';

export const idempotencyKeySchema = z
  .string({ error: 'Send an idempotency key with every answer.' })
  .min(8, 'An idempotency key has at least 8 characters.')
  .max(100);

/** POST /api/cases/:caseId/walk — the event in the fault-tree package's own form. */
export const walkEventRequestSchema = z.object({
  idempotencyKey: idempotencyKeySchema,
  event: walkEventSchema,
});
export type WalkEventRequest = z.infer<typeof walkEventRequestSchema>;

export const addNoteRequestSchema = z.object({
  idempotencyKey: idempotencyKeySchema,
  nodeId: z.string().max(80).nullish(),
  text: z
    .string()
    .trim()
    .min(1, 'Write the note first.')
    .max(4000, 'Keep a note under 4000 characters.'),
});
export type AddNoteRequest = z.infer<typeof addNoteRequestSchema>;

export const caseNoteSchema = z.object({
  id: z.uuid(),
  nodeId: z.string().nullable(),
  text: z.string(),
  author: personRefSchema,
  createdAt: timestampSchema,
});
export type CaseNote = z.infer<typeof caseNoteSchema>;

export const caseAttachmentSchema = z.object({
  id: z.uuid(),
  nodeId: z.string().nullable(),
  kind: z.enum(['photo', 'file', 'log']),
  name: z.string(),
  mediaType: z.string(),
  byteSize: z.number().int(),
  width: z.number().int().nullable(),
  height: z.number().int().nullable(),
  url: z.string(),
  thumbnailUrl: z.string().nullable(),
  uploadedBy: personRefSchema,
  createdAt: timestampSchema,
});
export type CaseAttachment = z.infer<typeof caseAttachmentSchema>;

export const caseAuditEntrySchema = z.object({
  seq: z.number().int(),
  kind: z.string(),
  nodeId: z.string().nullable(),
  summary: z.string(),
  actor: personRefSchema,
  createdAt: timestampSchema,
});
export type CaseAuditEntry = z.infer<typeof caseAuditEntrySchema>;

/** GET /api/cases/:caseId/events */
export const caseEventsResponseSchema = z.object({ events: z.array(caseAuditEntrySchema) });
export type CaseEventsResponse = z.infer<typeof caseEventsResponseSchema>;

/** GET /api/cases/:caseId, and the answer to every change of the case. */
export const caseDetailSchema = z.object({
  id: z.uuid(),
  number: z.number().int(),
  reference: z.string(),
  status: z.enum(caseStatuses),
  complaint: z.string(),
  symptom: z.string(),
  mileageAtIntake: z.number().nullable(),
  mileageUnit: z.enum(distanceUnits),
  vehicle: vehicleSchema,
  customer: customerSchema.nullable(),
  assignee: personRefSchema.nullable(),
  createdAt: timestampSchema,
  updatedAt: timestampSchema,
  diagnosedAt: timestampSchema.nullable(),
  tree: z.object({
    treeId: z.uuid(),
    versionId: z.uuid(),
    version: z.number().int(),
    title: z.string(),
    /** The version's definition as stored; the browser compiles it with the fault-tree package. */
    definition: z.unknown(),
  }),
  walk: walkSummarySchema,
  notes: z.array(caseNoteSchema),
  attachments: z.array(caseAttachmentSchema),
  findings: findingsSchema.nullable(),
  /** What the signed-in person may do with this case. */
  can: z.object({ walk: z.boolean(), editFindings: z.boolean(), markDiagnosed: z.boolean() }),
});
export type CaseDetail = z.infer<typeof caseDetailSchema>;

/** What an answer may change on the case besides its walk, as GET /api/cases/:caseId shows it. */
export const caseChangesSchema = caseDetailSchema.pick({
  status: true,
  updatedAt: true,
  diagnosedAt: true,
  can: true,
  findings: true,
});
export type CaseChanges = z.infer<typeof caseChangesSchema>;

/** POST /api/cases/:caseId/walk: the walk and the case as they stand after the answer. */
export const walkEventResponseSchema = z.object({
  walk: walkSummarySchema,
  /** True when the idempotency key had been stored before: nothing new was applied. */
  repeated: z.boolean(),
  case: caseChangesSchema,
});
export type WalkEventResponse = z.infer<typeof walkEventResponseSchema>;
