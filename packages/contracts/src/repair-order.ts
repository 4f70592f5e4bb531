// The repair order a diagnosed case's findings become: the advisor's review (versioned edits,
// chosen photos, approval), the export of an approved revision (Heatpath's own versioned JSON
// format, documented in docs/repair-order-export.md), and sending it by e-mail.
import { z } from 'zod';
import { personRefSchema } from './person';
import {
  findingsPhotoLimit,
  labourLineSchema,
  partLineSchema,
  readingLineSchema,
} from './findings';
import { mailRecipientSchema, outboxStatuses } from './mail';

export const repairOrderLimits = { photos: findingsPhotoLimit, note: 2000 } as const;

// ---------------------------------------------------------------------------------------------
// Export format: heatpath.repair-order, version 1. Change it only by adding a new version.

export const REPAIR_ORDER_FORMAT = 'heatpath.repair-order';
export const REPAIR_ORDER_FORMAT_VERSION = 1;

const isoDateTime = z.iso.datetime({ offset: true });

export const repairOrderExportSchema = z
  .object({
    format: z.literal(REPAIR_ORDER_FORMAT).describe('Always "heatpath.repair-order".'),
    version: z.literal(REPAIR_ORDER_FORMAT_VERSION).describe('The format version: 1.'),
    generatedAt: isoDateTime.describe('When this file was produced.'),
    workshop: z.object({ name: z.string() }),
    case: z.object({
      id: z.uuid(),
      reference: z.string().describe('The workshop’s case reference, e.g. C-00012.'),
      complaint: z.string().describe('The complaint in the customer’s words, as taken in.'),
      openedAt: isoDateTime,
      diagnosedAt: isoDateTime.nullable(),
      technician: z.object({ name: z.string() }).nullable(),
    }),
    vehicle: z.object({
      plate: z.string().nullable(),
      vin: z.string().nullable(),
      make: z.string(),
      model: z.string(),
      year: z.number().int().nullable(),
      engine: z.string().nullable(),
      mileageAtIntake: z
        .object({ value: z.number().int().min(0), unit: z.enum(['km', 'mi']) })
        .nullable(),
    }),
    customer: z
      .object({ name: z.string(), phone: z.string().nullable(), email: z.string().nullable() })
      .nullable(),
    findings: z.object({
      revision: z.number().int().min(1).describe('The approved revision this file was made from.'),
      approvedAt: isoDateTime,
      approvedBy: z.object({ name: z.string() }),
      outcome: z.object({ nodeId: z.string(), title: z.string() }),
      concern: z.string(),
      cause: z.string(),
      correction: z.string(),
    }),
    parts: z.array(
      z.object({
        line: z.number().int().min(1),
        description: z.string(),
        quantity: z.number().positive(),
        partNumber: z.string().nullable(),
      }),
    ),
    labour: z.array(
      z.object({
        line: z.number().int().min(1),
        operation: z.string(),
        hours: z.number().min(0),
      }),
    ),
    followUps: z
      .array(z.string())
      .describe('Follow-up actions in order, each with its own caution where it has one.'),
    readings: z.array(
      z.object({
        label: z.string(),
        value: z.number(),
        unit: z
          .string()
          .describe('Unit code as stored: degC, bar, kPa, L, %, min, s, h, rpm, mm, V or A.'),
        display: z.string().describe('The value with its unit as a person reads it: "110 °C".'),
      }),
    ),
    photos: z.array(
      z.object({
        id: z.uuid(),
        name: z.string(),
        mediaType: z.string(),
        width: z.number().int().nullable(),
        height: z.number().int().nullable(),
      }),
    ),
    tree: z.object({ id: z.uuid(), title: z.string(), version: z.number().int().min(1) }),
  })
  .strict();
export type RepairOrderExport = z.infer<typeof repairOrderExportSchema>;

export const repairOrderFormats = ['pdf', 'csv', 'json'] as const;
export type RepairOrderFormat = (typeof repairOrderFormats)[number];

/** The CSV's columns, in order: one row per parts or labour line. */
export const repairOrderCsvColumns = [
  'case_reference',
  'revision',
  'line_type',
  'line',
  'description',
  'quantity',
  'part_number',
  'hours',
] as const;

// ---------------------------------------------------------------------------------------------
// Review: what the repair-order screen shows and the requests it sends.

export const approveFindingsRequestSchema = z.object({
  revision: z.number({ error: 'Say which revision to approve.' }).int().min(1),
});
export type ApproveFindingsRequest = z.infer<typeof approveFindingsRequestSchema>;

export const sendRepairOrderRequestSchema = z.object({
  revision: z.number({ error: 'Say which approved revision to send.' }).int().min(1),
  to: mailRecipientSchema,
  audience: z.enum(['customer', 'advisor', 'other']),
  note: z
    .string()
    .trim()
    .max(repairOrderLimits.note, `Keep the note under ${repairOrderLimits.note} characters.`)
    .optional(),
});
export type SendRepairOrderRequest = z.infer<typeof sendRepairOrderRequestSchema>;

export const exportQuerySchema = z.object({
  revision: z.coerce.number().int().min(1).optional(),
});

const findingsRevisionContentSchema = z.object({
  outcomeNodeId: z.string(),
  concern: z.string(),
  cause: z.string(),
  correction: z.string(),
  parts: z.array(partLineSchema),
  labour: z.array(labourLineSchema),
  followUps: z.array(z.string()),
  readings: z.array(readingLineSchema.extend({ display: z.string() })),
  photoIds: z.array(z.uuid()),
});

export const findingsRevisionSchema = findingsRevisionContentSchema.extend({
  revision: z.number().int(),
  savedAt: z.string(),
  savedBy: personRefSchema.nullable(),
  /** What this save changed against the revision before it, in words. */
  changes: z.array(z.string()),
  approvedAt: z.string().nullable(),
  approvedBy: personRefSchema.nullable(),
});
export type FindingsRevision = z.infer<typeof findingsRevisionSchema>;

export const repairOrderSendSchema = z.object({
  id: z.uuid(),
  revision: z.number().int().nullable(),
  to: z.array(mailRecipientSchema),
  status: z.enum(outboxStatuses),
  attempts: z.number().int(),
  lastError: z.string().nullable(),
  createdAt: z.string(),
  sentAt: z.string().nullable(),
  sentBy: personRefSchema.nullable(),
});
export type RepairOrderSend = z.infer<typeof repairOrderSendSchema>;

export const repairOrderPhotoSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  url: z.string(),
  thumbnailUrl: z.string().nullable(),
  width: z.number().nullable(),
  height: z.number().nullable(),
  stepTitle: z.string().nullable(),
});
export type RepairOrderPhoto = z.infer<typeof repairOrderPhotoSchema>;

export const repairOrderReviewSchema = z.object({
  caseId: z.uuid(),
  reference: z.string(),
  status: z.enum(['open', 'in_diagnosis', 'diagnosed', 'closed']),
  complaint: z.string(),
  diagnosedAt: z.string().nullable(),
  workshopName: z.string(),
  vehicle: z.object({
    plate: z.string().nullable(),
    vin: z.string().nullable(),
    make: z.string(),
    model: z.string(),
    year: z.number().nullable(),
  }),
  customer: z
    .object({ name: z.string(), email: z.string().nullable(), phone: z.string().nullable() })
    .nullable(),
  technician: personRefSchema.nullable(),
  tree: z.object({ title: z.string(), version: z.number() }),
  outcomeTitle: z.string(),
  /** The latest revision: what an edit starts from. */
  current: findingsRevisionSchema,
  /** Every revision, newest first. */
  revisions: z.array(findingsRevisionSchema),
  /** The newest approved revision: what exports and e-mails carry. */
  approvedRevision: z.number().int().nullable(),
  photos: z.array(repairOrderPhotoSchema),
  sends: z.array(repairOrderSendSchema),
  can: z.object({ edit: z.boolean(), approve: z.boolean(), send: z.boolean() }),
});
export type RepairOrderReview = z.infer<typeof repairOrderReviewSchema>;
