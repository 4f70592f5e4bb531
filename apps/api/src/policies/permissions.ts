// Who may do what, in one place. Services call `assertCan` before they touch data; routes may
// also use `requirePermission` so a wrong role is refused before any work is done.
import type { Role } from '@heatpath/contracts';
import { forbidden } from '../errors';

export const permissions = {
  'staff.manage': ['lead'],
  'preferences.update': ['lead', 'technician', 'apprentice', 'advisor'],
  // Live work: apprentices learn from the training casebook, never from live cases.
  'vehicles.read': ['lead', 'technician', 'advisor'],
  'vehicles.write': ['lead', 'technician', 'advisor'],
  'cases.read': ['lead', 'technician', 'advisor'],
  'cases.create': ['lead', 'technician', 'advisor'],
  'cases.walk': ['lead', 'technician'],
  'cases.assign': ['lead'],
  // Temperature logs on a case: the people who walk it upload them; the advisor reads them.
  'logs.read': ['lead', 'technician', 'advisor'],
  'logs.upload': ['lead', 'technician'],
  // Findings: the technician (or lead) edits them until the case is diagnosed; then the advisor
  // (or lead) reviews, edits, approves, exports and sends them. 'findings.save' lets the request
  // in; the service decides by the case's status which of the two applies.
  'findings.edit': ['lead', 'technician'],
  'findings.review': ['lead', 'advisor'],
  'findings.save': ['lead', 'technician', 'advisor'],
  // The outbox holds every e-mail Heatpath writes; the lead sees it and can retry a failed one.
  'outbox.read': ['lead'],
  'outbox.manage': ['lead'],
  'trees.read': ['lead', 'technician', 'advisor'],
  'trees.edit': ['lead'],
  // Only a tree that was never published: no case can have used it.
  'trees.delete': ['lead'],
  // The training casebook: the lead marks finished cases, builds courses, reads progress and
  // signs off; apprentices (and the lead, to preview) replay and predict. Apprentices see only
  // training cases, stripped of customer details, and only their own scores.
  'training.manage': ['lead'],
  'training.learn': ['lead', 'apprentice'],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof permissions;

export interface Actor {
  userId: string;
  workshopId: string;
  role: Role;
}

export function can(actor: Actor, permission: Permission): boolean {
  return (permissions[permission] as readonly Role[]).includes(actor.role);
}

export function assertCan(actor: Actor, permission: Permission): void {
  if (!can(actor, permission)) throw forbidden();
}
