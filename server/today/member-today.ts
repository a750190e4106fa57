import { HOME_LIST_LENGTH, type MemberToday, type MemberTodayHold } from '@shared/schemas/today-member';
import { ordinalWords } from '@shared/stock/quantity-words';
import { dayInWords, dueState, momentInWords } from '@shared/time/chapter-time';
import type { ServiceContext } from '../context';
import type { UserRow } from '../db/schema/users';
import { listAssemblies } from '../features/planning/assemblies.repo';
import { estimateAssembly } from '../features/planning/assembly-estimate.service';
import { readTab } from '../features/stock/money.service';
import { openAttentionReturns } from '../features/tools/attention-returns';
import { listLoans } from '../features/tools/loan-history.repo';
import { activeHoldsOf, type HoldOfPerson } from '../features/tools/member-holds';
import { readChapterTimeZone } from '../settings/chapter-time-zone';
import { kitLacks } from './member-kit';

const short = <T>(all: T[]) => ({ total: all.length, items: all.slice(0, HOME_LIST_LENGTH) });

function holdWords(h: HoldOfPerson, now: Date, zone: string): string {
  if (h.status === 'offered') return h.offerExpiresAt ? `Set aside for you until ${momentInWords(h.offerExpiresAt, zone)}` : 'Set aside for you until you collect it';
  const from = h.startsAt && h.startsAt > now ? ` from ${dayInWords(h.startsAt, zone, now)}` : '';
  return `${ordinalWords(h.position)} in line${from}`;
}

const holdDto = (h: HoldOfPerson, now: Date, zone: string): MemberTodayHold => ({
  tool: h.tool,
  status: h.status,
  position: h.position,
  until: h.offerExpiresAt?.toISOString() ?? null,
  words: holdWords(h, now, zone),
});

/** What needs the signed-in person today, each part from the function its own screen uses. */
export function memberToday(ctx: ServiceContext, me: UserRow): MemberToday {
  const now = ctx.now();
  const zone = readChapterTimeZone(ctx.db);

  // Soonest due first, which puts the overdue ones first, as on My loans.
  const open = listLoans(ctx.db, { userId: me.id, open: true });
  const loans = open.map((l) => {
    const dueAt = new Date(l.dueAt);
    const due = dueState(dueAt, now, zone);
    return { loanId: l.id, tool: { code: l.tool.code, name: l.tool.name }, dueAt: l.dueAt, dueDay: dayInWords(dueAt, zone, now), dueWords: due.words, overdue: due.overdue, soon: due.soon };
  });

  const holds = activeHoldsOf(ctx.db, me.id);
  const onLoan = new Set(open.map((l) => l.tool.code));
  const assemblies = listAssemblies(ctx.db, { ownerId: me.id, status: 'in_progress' }).map((found) => ({
    id: found.assembly.id,
    name: found.assembly.name,
    buildName: found.build.name,
    ...kitLacks(estimateAssembly(ctx.db, found), onLoan),
  }));

  return {
    asOf: now.toISOString(),
    loans: short(loans),
    setAside: short(holds.filter((h) => h.status === 'offered').map((h) => holdDto(h, now, zone))),
    queue: short(holds.filter((h) => h.status === 'waiting').map((h) => holdDto(h, now, zone))),
    assemblies: short(assemblies),
    tab: { balanceCents: readTab(ctx, me, me.id).balanceCents },
    attention: short(openAttentionReturns(ctx.db, { flaggedById: me.id }).map((r) => ({ loanId: r.loanId, tool: r.tool, note: r.note, returnedAt: r.returnedAt.toISOString() }))),
  };
}
