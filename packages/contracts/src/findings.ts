// Findings of a diagnosed case: what goes into the repair order.
import { z } from 'zod';
import { personRefSchema, timestampSchema } from './person';

/** How many photos a repair order carries at most. */
export const findingsPhotoLimit = 6;

export const partLineSchema = z.object({
  description: z.string().trim().min(1, 'Describe the part.').max(200),
  quantity: z
    .number({ error: 'Enter a quantity.' })
    .positive('A quantity must be more than zero.')
    .max(1000),
  partNumber: z.string().trim().max(60).nullish(),
});
export const labourLineSchema = z.object({
  operation: z.string().trim().min(1, 'Describe the labour operation.').max(200),
  hours: z.number({ error: 'Enter the hours.' }).min(0, 'Hours cannot be negative.').max(200),
});
export const readingLineSchema = z.object({
  nodeId: z.string().max(80).nullable(),
  label: z.string().max(200),
  value: z.number(),
  unit: z.string().max(20),
});

export const findingsLinesSchema = z.object({
  parts: z.array(partLineSchema).max(100),
  labour: z.array(labourLineSchema).max(100),
  followUps: z.array(z.string().trim().min(1).max(500)).max(50),
  readings: z.array(readingLineSchema).max(200),
});
export type FindingsLines = z.infer<typeof findingsLinesSchema>;

export const findingsSchema = findingsLinesSchema.extend({
  outcomeNodeId: z.string(),
  concern: z.string(),
  cause: z.string(),
  correction: z.string(),
  revision: z.number(),
  updatedAt: timestampSchema,
  updatedBy: personRefSchema.nullable(),
});
export type Findings = z.infer<typeof findingsSchema>;

export const updateFindingsRequestSchema = z.object({
  revision: z.number().int().min(1),
  concern: z.string().trim().min(1, 'Write the concern.').max(4000),
  cause: z.string().trim().min(1, 'Write the cause.').max(4000),
  correction: z.string().trim().min(1, 'Write the correction.').max(4000),
  parts: z.array(partLineSchema).max(100),
  labour: z.array(labourLineSchema).max(100),
  followUps: z.array(z.string().trim().min(1).max(500)).max(50),
  /** Photos of the case chosen for the repair order; left out, the choice stays as it was. */
  photoIds: z
    .array(z.uuid({ error: 'That is not a photo of this case.' }))
    .max(findingsPhotoLimit, `Choose at most ${findingsPhotoLimit} photos for the repair order.`)
    .optional(),
});
export type UpdateFindingsRequest = z.infer<typeof updateFindingsRequestSchema>;
