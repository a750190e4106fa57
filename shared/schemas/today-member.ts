import { z } from 'zod';

/** One tool named as every list names it: its label code and name. */
const toolRef = z.strictObject({ code: z.string(), name: z.string() });

/** A list shortened for home: the first few items and how many there are in all. */
const shortList = <T extends z.ZodType>(item: T) => z.strictObject({ total: z.number(), items: z.array(item) });

/** A loan out with the member: due day and due state in the words of the My loans screen. */
export const memberTodayLoanSchema = z.strictObject({
  loanId: z.number(),
  tool: toolRef,
  dueAt: z.string(),
  /** "Tuesday, December 8". */
  dueDay: z.string(),
  /** "due tomorrow", "3 days late". */
  dueWords: z.string(),
  overdue: z.boolean(),
  soon: z.boolean(),
});

/** A tool set aside for the member (collect it by `until`), or a place in a tool's queue. */
export const memberTodayHoldSchema = z.strictObject({
  tool: toolRef,
  status: z.enum(['offered', 'waiting']),
  /** 1 for the first in line. */
  position: z.number(),
  /** Set aside until (offered); null while waiting. */
  until: z.string().nullable(),
  /** "Set aside for you until Dec 3, 2026, 6:05 PM", "2nd in line", "2nd in line from Tuesday, December 8". */
  words: z.string(),
});

/** What an assembly in progress still lacks: crib tools not free for the member, bins short for its bill. */
export const memberTodayAssemblySchema = z.strictObject({
  id: z.number(),
  name: z.string(),
  buildName: z.string(),
  tools: z.array(z.strictObject({ need: z.string(), tool: toolRef.nullable(), words: z.string() })),
  bins: z.array(z.strictObject({ description: z.string(), binCode: z.string().nullable(), words: z.string() })),
});

/** A return the member flagged "needs attention", with the tool still out of service. */
export const memberTodayAttentionSchema = z.strictObject({
  loanId: z.number(),
  tool: toolRef,
  returnedAt: z.string(),
  note: z.string().nullable(),
});

export const memberTodaySchema = z.strictObject({
  /** The server's clock when it answered: the words above are as of then. */
  asOf: z.string(),
  loans: shortList(memberTodayLoanSchema),
  setAside: shortList(memberTodayHoldSchema),
  queue: shortList(memberTodayHoldSchema),
  assemblies: shortList(memberTodayAssemblySchema),
  /** What the member owes on their tab (negative when paid ahead), from the tab screen's own sum. */
  tab: z.strictObject({ balanceCents: z.number() }),
  attention: shortList(memberTodayAttentionSchema),
});
export type MemberToday = z.infer<typeof memberTodaySchema>;
export type MemberTodayLoan = z.infer<typeof memberTodayLoanSchema>;
export type MemberTodayHold = z.infer<typeof memberTodayHoldSchema>;
export type MemberTodayAssembly = z.infer<typeof memberTodayAssemblySchema>;
export type MemberTodayAttention = z.infer<typeof memberTodayAttentionSchema>;

/** Home shows at most this many items per list, with a link to all of them. */
export const HOME_LIST_LENGTH = 5;
