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
