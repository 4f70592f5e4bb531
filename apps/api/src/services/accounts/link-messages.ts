// The words of the two sign-in link e-mails. Plain text; the link goes where linkPlaceholder is.
import { roleLabels } from '@heatpath/contracts';
import type { Role } from '@heatpath/contracts';
import { linkPlaceholder } from '../../lib/mail/mail-context';
import { headerSafe } from '../mail/enqueue-mail';

const hours = (minutes: number) =>
  minutes % 60 === 0 && minutes >= 120 ? `${minutes / 60} hours` : `${minutes} minutes`;

export function invitationMessage(options: {
  name: string;
  role: Role;
  workshopName: string;
  invitedBy: string;
  ttlMinutes: number;
}) {
  return {
    subject: headerSafe(`You are invited to ${options.workshopName} on Heatpath`),
    text: [
      `Hello ${options.name},`,
      '',
      `${options.invitedBy} has added you to ${options.workshopName} on Heatpath as ${roleLabels[options.role].toLowerCase()}.`,
      'Open this link to choose your password and sign in:',
      '',
      linkPlaceholder,
      '',
      `The link works once and for ${hours(options.ttlMinutes)}. If it has run out, ask ${options.invitedBy} to send a new one.`,
      'If you did not expect this e-mail, you can ignore it.',
      '',
      `Heatpath for ${options.workshopName}`,
    ].join('\n'),
  };
}

export function passwordResetMessage(options: {
  name: string;
  workshopName: string;
  ttlMinutes: number;
}) {
  return {
    subject: headerSafe('Set a new Heatpath password'),
    text: [
      `Hello ${options.name},`,
      '',
      'Someone asked to set a new password for your Heatpath account. If it was you, open this link:',
      '',
      linkPlaceholder,
      '',
      `The link works once and for ${hours(options.ttlMinutes)}. Your current password keeps working until you choose a new one.`,
      'If you did not ask for this, ignore this e-mail; nothing changes.',
      '',
      `Heatpath for ${options.workshopName}`,
    ].join('\n'),
  };
}

export function signInUnlockMessage(options: {
  name: string;
  workshopName: string;
  ttlMinutes: number;
}) {
  return {
    subject: headerSafe('Sign-in to your Heatpath account was paused'),
    text: [
      `Hello ${options.name},`,
      '',
      'Someone typed wrong passwords for your Heatpath account several times, from a browser you have not signed in on before, so Heatpath has paused sign-in to your account from new browsers for a while.',
      'Browsers you have signed in on before are not affected.',
      '',
      'If it was you, open this link to lift the pause now:',
      '',
      linkPlaceholder,
      '',
      `The link works once and for ${hours(options.ttlMinutes)}.`,
      'If it was not you, your password was not accepted and nothing else has changed. If you think someone knows your password, choose a new one with "Forgot your password?" on the sign-in page.',
      '',
      `Heatpath for ${options.workshopName}`,
    ].join('\n'),
  };
}
