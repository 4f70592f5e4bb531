// E-mail as Heatpath takes and shows it: recipients (checked so no header can be injected), the
// development outbox the lead reads, staff invitations and password resets.
import { z } from 'zod';
import { passwordSchema, roleSchema } from './auth';
import { personRefSchema } from './person';

/** Control characters (CR and LF above all) never reach a mail header. */
const controlCharacters = /\p{Cc}/u;

export const headerTextSchema = (max: number, what: string) =>
  z
    .string()
    .max(max, `${what} can have at most ${max} characters.`)
    .refine((value) => !controlCharacters.test(value), {
      message: `${what} cannot contain line breaks or control characters.`,
    });

export const mailAddressSchema = z
  .string({ error: 'Enter an e-mail address.' })
  .trim()
  .toLowerCase()
  .max(254, 'That e-mail address is too long.')
  .refine((value) => !controlCharacters.test(value), {
    message: 'An e-mail address cannot contain line breaks.',
  })
  .pipe(z.email({ error: 'Enter a valid e-mail address, like name@example.test.' }));

export const mailRecipientSchema = z.object({
  name: headerTextSchema(120, 'A name')
    .transform((value) => value.trim())
    .optional(),
  address: mailAddressSchema,
});
export type MailRecipient = z.infer<typeof mailRecipientSchema>;

export const outboxStatuses = ['queued', 'sending', 'sent', 'failed'] as const;
export type OutboxStatus = (typeof outboxStatuses)[number];
export const outboxStatusLabels: Record<OutboxStatus, string> = {
  queued: 'Waiting to send',
  sending: 'Sending',
  sent: 'Delivered to the mail server',
  failed: 'Gave up',
};

export const outboxKinds = [
  'repair-order',
  'invitation',
  'password-reset',
  'sign-in-unlock',
] as const;
export type OutboxKind = (typeof outboxKinds)[number];
export const outboxKindLabels: Record<OutboxKind, string> = {
  'repair-order': 'Repair order',
  invitation: 'Staff invitation',
  'password-reset': 'Password reset',
  'sign-in-unlock': 'Sign-in unlock',
};

export const outboxMessageSchema = z.object({
  id: z.uuid(),
  kind: z.enum(outboxKinds),
  to: z.array(mailRecipientSchema),
  subject: z.string(),
  /** The plain-text body; a sign-in link is shown as a placeholder, never in full. */
  body: z.string(),
  attachments: z.array(
    z.object({
      id: z.uuid(),
      filename: z.string(),
      mediaType: z.string(),
      byteSize: z.number().int(),
      url: z.string(),
    }),
  ),
  status: z.enum(outboxStatuses),
  attempts: z.number().int(),
  lastError: z.string().nullable(),
  lastAttemptAt: z.string().nullable(),
  nextAttemptAt: z.string().nullable(),
  sentAt: z.string().nullable(),
  createdAt: z.string(),
  createdBy: personRefSchema.nullable(),
  caseId: z.uuid().nullable(),
});
export type OutboxMessage = z.infer<typeof outboxMessageSchema>;

export const outboxListSchema = z.object({
  messages: z.array(outboxMessageSchema),
  nextCursor: z.string().nullable(),
});
export type OutboxList = z.infer<typeof outboxListSchema>;

export const outboxListQuerySchema = z.object({
  cursor: z.string().max(200).optional(),
  limit: z.coerce.number().int().min(1).max(100).default(25),
});

// ---------------------------------------------------------------------------------------------
// Invitations and password resets.

export const inviteStaffRequestSchema = z.object({
  email: mailAddressSchema,
  name: headerTextSchema(120, 'A name')
    .transform((value) => value.trim())
    .pipe(z.string().min(1, 'Enter a name.')),
  role: roleSchema,
});
export type InviteStaffRequest = z.infer<typeof inviteStaffRequestSchema>;

export const passwordResetRequestSchema = z.object({ email: mailAddressSchema });
export type PasswordResetRequest = z.infer<typeof passwordResetRequestSchema>;

export const passwordResetResponseSchema = z.object({ message: z.string() });

const tokenSchema = z
  .string({ error: 'The link is incomplete: open it again from the e-mail.' })
  .regex(/^[A-Za-z0-9_-]{32,100}$/, 'The link is incomplete: open it again from the e-mail.');

export const accountTokenCheckRequestSchema = z.object({ token: tokenSchema });

export const accountTokenInfoSchema = z.object({
  purpose: z.enum(['invitation', 'password-reset']),
  name: z.string(),
  email: z.string(),
  workshopName: z.string(),
  expiresAt: z.string(),
});
export type AccountTokenInfo = z.infer<typeof accountTokenInfoSchema>;

export const setPasswordRequestSchema = z.object({ token: tokenSchema, password: passwordSchema });
export type SetPasswordRequest = z.infer<typeof setPasswordRequestSchema>;

/** The link from a "sign-in was paused" e-mail. */
export const unlockSignInRequestSchema = z.object({ token: tokenSchema });
export type UnlockSignInRequest = z.infer<typeof unlockSignInRequestSchema>;
export const unlockSignInResponseSchema = z.object({ message: z.string() });
