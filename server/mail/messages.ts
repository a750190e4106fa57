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

export function holdOfferedMail(to: string, name: string, tool: { code: string; name: string; location: string }, until: Date, link: string): OutgoingMail {
  return {
    to,
    subject: `${tool.code} ${tool.name} is back and held for you`,
    text: [
      `Hello ${name},`,
      ``,
      `${tool.name} (${tool.code}) has come back to the crib and is held for you until`,
      `${until.toISOString().slice(0, 16).replace('T', ' ')} UTC. After that it goes to the next person waiting.`,
      tool.location ? `It lives at: ${tool.location}.` : '',
      ``,
      `Scan its label or open it here to check it out:`,
      link,
    ]
      .filter((line, i, all) => line !== '' || all[i - 1] !== '')
      .join('\n'),
  };
}
