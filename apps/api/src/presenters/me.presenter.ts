// The signed-in person as GET /api/me returns them.
import type { Me } from '@heatpath/contracts';
import type { User } from '../db/models/index';

export function presentMe(user: User): Me {
  if (!user.workshop) throw new Error('presentMe needs the workshop loaded.');
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    role: user.role,
    workshop: { id: user.workshop.id, name: user.workshop.name },
    preferences: { units: user.preferences.units },
  };
}
