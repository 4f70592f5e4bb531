// Checks an e-mail and password with OWASP's device-cookie pattern. A browser the person has
// signed in from before uses its own allowance, so guesses from elsewhere never lock them out
// of it. Every other browser shares one allowance per account: once that is used up, sign-in
// from unknown browsers is paused (a 429 whatever the password) and the account is e-mailed a
// link that lifts the pause. Failures from unknown browsers also count per address; successes
// count nowhere. One generic failure message whatever was wrong.
import { randomUUID } from 'node:crypto';
import { SignInDevice, User, Workshop } from '../../db/models/index';
import { AppError } from '../../errors';
import type { MailContext } from '../../lib/mail/mail-context';
import { verifyPassword } from '../../lib/passwords';
import { sendSignInUnlock } from '../accounts/send-sign-in-unlock';
import { rememberDevice } from './remember-device';
import { allowanceKeys, giveBack, recordFailure, takeAttempt } from './sign-in-allowance';
import type { AllowanceRule, TakenAttempt } from './sign-in-allowance';

export const signInFailedMessage = 'That e-mail and password do not match an active account.';

export interface SignInLimits {
  perAccount: number;
  perDevice: number;
  perAddress: number;
  windowMinutes: number;
}

/** A 429 that says until when, for the Retry-After header. */
export class SignInPaused extends AppError {
  constructor(
    message: string,
    readonly until: Date,
  ) {
    super('rate_limited', message);
  }
}

const minutesUntil = (until: Date, now: Date) =>
  Math.max(1, Math.ceil((until.getTime() - now.getTime()) / 60_000));
const minutes = (n: number) => (n === 1 ? '1 minute' : `${n} minutes`);

// The same words whether or not the address has an account, so a pause reveals nothing.
export const accountPausedMessage = (wait: number) =>
  `Too many wrong passwords for this account from browsers it has not signed in on before, so ` +
  `those are paused for ${minutes(wait)}. If the address has an account, we have e-mailed it a ` +
  `link that lifts the pause. A browser you have signed in on before still works.`;
export const addressPausedMessage = (wait: number) =>
  `Too many failed sign-ins from this network. Try again in ${minutes(wait)}, or use a browser ` +
  `you have signed in on before.`;

export async function signInUser(options: {
  email: string;
  password: string;
  /** From a valid device cookie, or null. */
  deviceId: string | null;
  /** The caller's address, as the per-address limit counts it. */
  address: string;
  limits: SignInLimits;
  now: Date;
  mail: MailContext;
  unlockTtlMinutes: number;
}): Promise<{ user: User; deviceId: string }> {
  const { limits, now } = options;
  const email = options.email.trim().toLowerCase();
  const windowMs = limits.windowMinutes * 60_000;
  const rule = (limit: number): AllowanceRule => ({ limit, windowMs });

  const user = await User.findOne({
    where: { email },
    include: [{ model: Workshop, as: 'workshop' }],
  });
  const known =
    options.deviceId && user
      ? await SignInDevice.findOne({ where: { deviceId: options.deviceId, userId: user.id } })
      : null;

  // A known browser first tries its own allowance; a paused one is treated as unknown.
  const taken: {
    attempt: TakenAttempt;
    rule: AllowanceRule;
    kind: 'device' | 'account' | 'address';
  }[] = [];
  if (known && user) {
    const r = rule(limits.perDevice);
    const device = await takeAttempt(allowanceKeys.device(known.deviceId, user.id), r, now);
    if (device.taken) taken.push({ attempt: device.attempt, rule: r, kind: 'device' });
  }
  if (taken.length === 0) {
    const addressRule = rule(limits.perAddress);
    const address = await takeAttempt(allowanceKeys.address(options.address), addressRule, now);
    if (!address.taken)
      throw new SignInPaused(addressPausedMessage(minutesUntil(address.until, now)), address.until);
    const accountRule = rule(limits.perAccount);
    const account = await takeAttempt(allowanceKeys.account(email), accountRule, now);
    if (!account.taken) {
      await giveBack(address.attempt);
      throw new SignInPaused(accountPausedMessage(minutesUntil(account.until, now)), account.until);
    }
    taken.push({ attempt: address.attempt, rule: addressRule, kind: 'address' });
    taken.push({ attempt: account.attempt, rule: accountRule, kind: 'account' });
  }

  const matches = await verifyPassword(options.password, user?.passwordHash ?? null);
  if (!user || !matches || !user.active) {
    for (const t of taken) {
      const { pauseStarted } = await recordFailure(t.attempt, t.rule, now);
      if (pauseStarted && t.kind === 'account' && user?.active && user.workshop)
        await sendSignInUnlock({ user, ttlMinutes: options.unlockTtlMinutes, mail: options.mail });
    }
    throw new AppError('unauthenticated', signInFailedMessage);
  }
  for (const t of taken) await giveBack(t.attempt);
  const deviceId = options.deviceId ?? randomUUID();
  await rememberDevice({ deviceId, user, now });
  await user.update({ lastSignInAt: now });
  return { user, deviceId };
}
