import type { Role } from '@shared/roles';
import { ROLE_LABELS } from '@shared/roles';
import { centsWords } from '@shared/stock/money';
import { countWords } from '@shared/stock/quantity-words';
import { dayInWords, daysLateWords, momentInWords } from '@shared/time/chapter-time';
import type { OutgoingMail } from './mailer';

/** The chapter's calendar a message is written in: its time zone and the moment it is written. */
export interface MailCalendar {
  zone: string;
  now: Date;
}

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

export function holdOfferedMail(
  to: string,
  name: string,
  tool: { code: string; name: string; location: string },
  until: Date,
  link: string,
  calendar: MailCalendar,
): OutgoingMail {
  return {
    to,
    subject: `${tool.code} ${tool.name} is back and held for you`,
    text: [
      `Hello ${name},`,
      ``,
      `${tool.name} (${tool.code}) has come back to the crib and is held for you until`,
      `${momentInWords(until, calendar.zone)}. After that it goes to the next person waiting.`,
      tool.location ? `It lives at: ${tool.location}.` : '',
      ``,
      `Scan its label or open it here to check it out:`,
      link,
    ]
      .filter((line, i, all) => line !== '' || all[i - 1] !== '')
      .join('\n'),
  };
}

/** A hold that ended because the tool went out of use; `stillQueued` when the person keeps their place. */
export function holdEndedMail(to: string, name: string, tool: { code: string; name: string }, why: string, stillQueued: boolean, link: string): OutgoingMail {
  return {
    to,
    subject: stillQueued ? `${tool.code} ${tool.name} is not ready for you after all` : `Your hold on ${tool.code} ${tool.name} has ended`,
    text: [
      `Hello ${name},`,
      ``,
      `${tool.name} (${tool.code}) ${why}.`,
      stillQueued
        ? `You keep your place in the queue: Gripline writes again when it is back for you.`
        : `Your hold has ended, as the tool will not come back to the crib. Ask the quartermaster about another one.`,
      ``,
      link,
    ].join('\n'),
  };
}

export interface OverdueMailLine {
  tool: { code: string; name: string; location: string; replacementValueCents: number };
  holder: { name: string; email: string; phone: string | null };
  dueAt: Date;
  daysLate: number;
}

const dayWords = (d: Date, calendar: MailCalendar) => dayInWords(d, calendar.zone, calendar.now);
/** An amount in cents as the mails write it: $12.50. */
export const valueWords = centsWords;
/** A count with its noun: 1 pack, 3 packs, 1,206 packs. */
export const plural = (n: number, one: string, many: string) => `${countWords(n)} ${n === 1 ? one : many}`;
const toolLink = (publicUrl: string, code: string) => `${publicUrl.replace(/\/$/, '')}/tools/${code}`;

export function overdueReminderMail(line: OverdueMailLine, publicUrl: string, calendar: MailCalendar): OutgoingMail {
  const { tool, holder } = line;
  return {
    to: holder.email,
    subject: `Reminder: ${tool.code} ${tool.name} was due back on ${dayWords(line.dueAt, calendar)}`,
    text: [
      `Hello ${holder.name},`,
      ``,
      `A friendly reminder from the chapter's tool crib: you have ${tool.name} (${tool.code}) on loan.`,
      `It was due back on ${dayWords(line.dueAt, calendar)} and is now ${daysLateWords(line.daysLate)}.`,
      tool.location ? `It lives at: ${tool.location}.` : `Please bring it back to the tool crib.`,
      ``,
      `Others may be waiting for it. If you still need it, please talk to the quartermaster.`,
      `Scan its label or open it here to return it:`,
      toolLink(publicUrl, tool.code),
      ``,
      `Thank you.`,
    ].join('\n'),
  };
}

export function overdueDigestMail(to: string, name: string, lines: OverdueMailLine[], publicUrl: string, calendar: MailCalendar): OutgoingMail {
  const total = lines.reduce((sum, l) => sum + l.tool.replacementValueCents, 0);
  return {
    to,
    subject: `Overdue tools: ${lines.length} ${lines.length === 1 ? 'tool is' : 'tools are'} late back`,
    text: [
      `Hello ${name},`,
      ``,
      `These tools are overdue at the tool crib, the latest first (replacement value ${valueWords(total)} in all):`,
      ``,
      ...lines.map(
        (l) =>
          `- ${l.tool.code} ${l.tool.name}: ${l.holder.name} (${l.holder.email}${l.holder.phone ? `, ${l.holder.phone}` : ''}), ` +
          `due ${dayWords(l.dueAt, calendar)}, ${daysLateWords(l.daysLate)}, value ${valueWords(l.tool.replacementValueCents)}\n  ${toolLink(publicUrl, l.tool.code)}`,
      ),
      ``,
      `Each holder gets at most one reminder a day. The full list is on the Overdue page:`,
      `${publicUrl.replace(/\/$/, '')}/overdue`,
    ].join('\n'),
  };
}

/** The lead's answer to a member's sign-off request: granted, or declined with the lead's reason. */
export function signoffAnswerMail(
  answer: { to: string; name: string; signoff: string; tool: { code: string; name: string }; lead: string; declineReason: string | null },
  publicUrl: string,
): OutgoingMail {
  const granted = answer.declineReason === null;
  return {
    to: answer.to,
    subject: granted ? `You are signed off for "${answer.signoff}"` : `Your request for the "${answer.signoff}" sign-off was declined`,
    text: [
      `Hello ${answer.name},`,
      ``,
      granted
        ? `${answer.lead} has signed you off for "${answer.signoff}", as you asked from ${answer.tool.name} (${answer.tool.code}). You may now check it out.`
        : `${answer.lead} has declined your request for the "${answer.signoff}" sign-off, asked from ${answer.tool.name} (${answer.tool.code}).`,
      ...(granted ? [] : [`The reason: ${answer.declineReason}`, `Talk to ${answer.lead} about what to do first; you can ask again from the tool's page.`]),
      ``,
      toolLink(publicUrl, answer.tool.code),
    ].join('\n'),
  };
}

/** The receipt for a tab payment made online; `balanceCents` is what is still owed after it. */
export function paymentReceiptMail(to: string, name: string, amountCents: number, balanceCents: number, link: string): OutgoingMail {
  return {
    to,
    subject: `Payment received: ${centsWords(amountCents)} on your tab`,
    text: [
      `Hello ${name},`,
      ``,
      `The chapter received your online payment of ${centsWords(amountCents)} for your consumables tab.`,
      balanceCents > 0 ? `You still owe ${centsWords(balanceCents)}.` : `Your tab is settled.`,
      ``,
      `See your tab:`,
      link,
    ].join('\n'),
  };
}

/** Tells a member that an online payment was refunded; `balanceCents` is what they owe after it. */
export function paymentRefundMail(to: string, name: string, amountCents: number, balanceCents: number, link: string): OutgoingMail {
  return {
    to,
    subject: `Refund: ${centsWords(amountCents)} back to your card`,
    text: [
      `Hello ${name},`,
      ``,
      `The chapter refunded ${centsWords(amountCents)} of your online tab payment. It goes back to the card you paid with; the provider may take a few days to show it.`,
      balanceCents > 0 ? `Your tab now shows ${centsWords(balanceCents)} owed.` : `Your tab is settled.`,
      ``,
      `See your tab:`,
      link,
    ].join('\n'),
  };
}

/** What a refused online checkout asked, and what the provider reported instead. */
export interface RefusedCheckoutMailLine {
  memberName: string;
  askedCents: number;
  currency: string;
  receivedCents: number | null;
  receivedCurrency: string | null;
}

/** Tells a lead that a completion was refused: the provider may hold money that is on no tab. */
export function refusedPaymentMail(to: string, name: string, line: RefusedCheckoutMailLine, link: string): OutgoingMail {
  const received =
    line.receivedCents === null ? 'the provider reported no amount' : `the provider reported ${centsWords(line.receivedCents, line.receivedCurrency ?? line.currency)}`;
  return {
    to,
    subject: `An online payment from ${line.memberName} was refused`,
    text: [
      `Hello ${name},`,
      ``,
      `Gripline asked ${line.memberName} for ${centsWords(line.askedCents, line.currency)} at the online checkout, but ${received}.`,
      `Because the two differ, nothing was recorded on ${line.memberName}’s tab.`,
      ``,
      `Settle it with ${line.memberName}: refund it in the provider’s dashboard or record the payment by hand on their tab.`,
      ``,
      `See refused checkouts on the Payments page:`,
      link,
    ].join('\n'),
  };
}
