// The one way every answer names a person: who is assigned, who wrote, who signed. Never more than
// the id and the name.
import { z } from 'zod';

export const personRefSchema = z.object({ id: z.uuid(), name: z.string() });
export type PersonRef = z.infer<typeof personRefSchema>;

/** A moment the server recorded, as JSON carries it: `Date.prototype.toISOString()`. */
export const timestampSchema = z.iso.datetime({ offset: true });
