// A person's own display units, kept on the server so every device shows the same.
import type { UpdatePreferencesRequest } from '@heatpath/contracts';
import { User } from '../../db/models/index';
import { notFound } from '../../errors';
import { assertCan } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';

export async function updatePreferences(options: {
  actor: Actor;
  input: UpdatePreferencesRequest;
}): Promise<User> {
  assertCan(options.actor, 'preferences.update');
  const user = await User.findOne({
    where: { id: options.actor.userId, workshopId: options.actor.workshopId },
  });
  if (!user) throw notFound('Your account');
  return user.update({
    preferences: {
      ...user.preferences,
      units: { ...user.preferences.units, ...options.input.units },
    },
  });
}
