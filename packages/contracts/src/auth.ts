// Shapes of sign-in, the signed-in person and the workshop's staff, shared by API and web.
import { z } from 'zod';

export const roles = ['lead', 'technician', 'apprentice', 'advisor'] as const;
export const roleSchema = z.enum(roles);
export type Role = z.infer<typeof roleSchema>;

export const roleLabels: Record<Role, string> = {
  lead: 'Workshop lead',
  technician: 'Technician',
  apprentice: 'Apprentice',
  advisor: 'Service advisor',
};

const email = z
  .string({ error: 'Enter an e-mail address.' })
  .trim()
  .toLowerCase()
  .max(254, 'That e-mail address is too long.')
  .pipe(z.email({ error: 'Enter a valid e-mail address, like name@example.test.' }));

export const signInRequestSchema = z.object({
  email,
  password: z
    .string({ error: 'Enter your password.' })
    .min(1, 'Enter your password.')
    .max(200, 'That password is too long.'),
});
export type SignInRequest = z.infer<typeof signInRequestSchema>;

export const unitPreferencesSchema = z.object({
  temperature: z.enum(['C', 'F']),
  pressure: z.enum(['bar', 'psi']),
  volume: z.enum(['L', 'qt']),
});
export type UnitPreferences = z.infer<typeof unitPreferencesSchema>;
export const defaultUnitPreferences: UnitPreferences = {
  temperature: 'C',
  pressure: 'bar',
  volume: 'L',
};

export const meSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  name: z.string(),
  role: roleSchema,
  workshop: z.object({ id: z.uuid(), name: z.string() }),
  preferences: z.object({ units: unitPreferencesSchema }),
});
export type Me = z.infer<typeof meSchema>;

export const passwordSchema = z
  .string({ error: 'Enter a password.' })
  .min(10, 'A password needs at least 10 characters.')
  .max(200, 'A password can have at most 200 characters.');

export const staffMemberSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  name: z.string(),
  role: roleSchema,
  active: z.boolean(),
  /** Invited by e-mail and has not set a password yet. */
  invitationPending: z.boolean(),
  createdAt: z.string(),
});
export type StaffMember = z.infer<typeof staffMemberSchema>;

export const staffListSchema = z.object({ staff: z.array(staffMemberSchema) });
export type StaffList = z.infer<typeof staffListSchema>;

export const createStaffRequestSchema = z.object({
  email,
  name: z
    .string({ error: 'Enter a name.' })
    .trim()
    .min(1, 'Enter a name.')
    .max(120, 'A name can have at most 120 characters.'),
  role: roleSchema,
  password: passwordSchema,
});
export type CreateStaffRequest = z.infer<typeof createStaffRequestSchema>;

export const updateStaffRequestSchema = z
  .object({
    role: roleSchema.optional(),
    active: z.boolean().optional(),
    name: z.string().trim().min(1, 'Enter a name.').max(120).optional(),
  })
  .refine((v) => Object.keys(v).length > 0, {
    message: 'Say what to change: role, active or name.',
  });
export type UpdateStaffRequest = z.infer<typeof updateStaffRequestSchema>;

export const updatePreferencesRequestSchema = z.object({
  units: unitPreferencesSchema.partial(),
});
export type UpdatePreferencesRequest = z.infer<typeof updatePreferencesRequestSchema>;

export const signInResponseSchema = z.object({ me: meSchema });
