// Request shapes for /api/cases.
import { z } from 'zod';
import { idempotencyKeySchema, repairOrderFormats } from '@heatpath/contracts';

export {
  addNoteRequestSchema,
  approveFindingsRequestSchema,
  exportQuerySchema,
  sendRepairOrderRequestSchema,
  caseListQuerySchema,
  createCaseRequestSchema,
  updateFindingsRequestSchema,
  walkEventRequestSchema,
} from '@heatpath/contracts';

export const caseParamsSchema = z.object({
  caseId: z.uuid({ error: 'That is not a valid case id.' }),
});

export const attachmentParamsSchema = caseParamsSchema.extend({
  attachmentId: z.uuid({ error: 'That is not a valid attachment id.' }),
});

export const attachmentFieldsSchema = z.object({
  nodeId: z.string().max(80).optional(),
  photoOnly: z.enum(['true', 'false']).optional(),
  /** Optional: the same key again with the same file returns the stored attachment. */
  idempotencyKey: idempotencyKeySchema.optional(),
});

export const exportParamsSchema = caseParamsSchema.extend({
  format: z.enum(repairOrderFormats, { error: 'Export as pdf, csv or json.' }),
});
