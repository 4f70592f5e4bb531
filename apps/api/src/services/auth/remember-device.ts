// Marks a browser as one this person has signed in from, so it keeps its own sign-in allowance.
import { SignInDevice } from '../../db/models/index';
import type { User } from '../../db/models/index';

export async function rememberDevice(options: {
  deviceId: string;
  user: User;
  now: Date;
}): Promise<void> {
  const { deviceId, user, now } = options;
  await SignInDevice.upsert({
    deviceId,
    userId: user.id,
    workshopId: user.workshopId,
    createdAt: now,
    lastSignInAt: now,
  });
}
