// The one error body every failed API request returns.
import { z } from 'zod';

export const errorCodes = [
  'bad_request',
  'validation_failed',
  'unauthenticated',
  'forbidden',
  'not_found',
  'conflict',
  'payload_too_large',
  'unsupported_media_type',
  'rate_limited',
  'unavailable',
  'internal',
] as const;
export type ErrorCode = (typeof errorCodes)[number];

export const errorBodySchema = z.object({
  error: z.object({
    code: z.enum(errorCodes),
    message: z.string(),
    fields: z.record(z.string(), z.string()).optional(),
    /** Set where one code covers several situations a screen tells apart (e.g. why a publish was refused). */
    reason: z.string().optional(),
  }),
});
export type ErrorBody = z.infer<typeof errorBodySchema>;

export const healthSchema = z.object({
  status: z.enum(['ok', 'degraded']),
  db: z.enum(['ok', 'down']),
});
export type Health = z.infer<typeof healthSchema>;
