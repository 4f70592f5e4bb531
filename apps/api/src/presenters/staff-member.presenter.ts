// A staff member as the lead's staff screen sees them (never the password hash).
import type { StaffMember } from '@heatpath/contracts';
import type { User } from '../db/models/index';

export function presentStaffMember(user: User): StaffMember {
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    role: user.role,
    active: user.active,
    invitationPending: user.passwordHash === null,
    createdAt: user.createdAt.toISOString(),
  };
}
