import type { Role } from '@shared/roles';
import { ROLE_LABELS } from '@shared/roles';
import type { OutgoingMail } from './mailer';

export function invitationMail(to: string, role: Role, invitedBy: string, link: string): OutgoingMail {
  return {
    to,
    subject: `${invitedBy} invited you to the chapter's tool crib on Gripline`,
    text: [
      `Hello,`,
      ``,
      `${invitedBy} has invited you to Gripline, the chapter's tool crib and fastener stock,`,
      `as ${ROLE_LABELS[role].toLowerCase()}.`,
      ``,
      `Open this link to choose your name and password (it works once, for 7 days):`,
      link,
      ``,
      `If you were not expecting this, ignore this message.`,
    ].join('\n'),
  };
}

export function passwordResetMail(to: string, name: string, link: string): OutgoingMail {
  return {
    to,
    subject: 'Reset your Gripline password',
    text: [
      `Hello ${name},`,
      ``,
      `Someone asked to reset the password of your Gripline account.`,
      `Open this link to choose a new one (it works once, for 1 hour):`,
      link,
      ``,
      `If it was not you, ignore this message; your password stays as it is.`,
    ].join('\n'),
  };
}
