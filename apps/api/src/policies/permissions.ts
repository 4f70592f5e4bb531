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
  'findings.edit': ['lead', 'technician'],
  'trees.read': ['lead', 'technician', 'advisor'],
  'trees.edit': ['lead'],
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
