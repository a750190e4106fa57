import { z } from 'zod';
import { ROLES } from '../roles';
import { BIN_KINDS } from '../stock/kinds';
import { TOOL_CATEGORIES, TOOL_STATUSES } from '../tools/categories';

/**
 * The offline scan queue's contract. A phone keeps a copy of the catalogue (what it needs to
 * recognise a scanned label) and queues check out, return, draw and return unused while the
 * network is away; on reconnect it replays them with these headers.
 */

/** A client-made key: the same key again answers the first result and changes nothing. */
export const IDEMPOTENCY_KEY_HEADER = 'Idempotency-Key';
/** When the member did it on the phone (ISO 8601). The server never records a future time. */
export const PERFORMED_AT_HEADER = 'X-Performed-At';
/** When the catalogue copy the action was made from was taken (ISO 8601): a floor for performed-at. */
export const CATALOGUE_AT_HEADER = 'X-Catalogue-At';

export const IDEMPOTENCY_KEY_PATTERN = /^[A-Za-z0-9_-]{8,100}$/;
export const idempotencyKeyField = z
  .string()
  .regex(IDEMPOTENCY_KEY_PATTERN, { error: 'An Idempotency-Key is 8 to 100 letters, digits, "-" or "_".' });

/** Keys (and the answers they replay) are kept at least this long. */
export const IDEMPOTENCY_KEEP_DAYS = 7;

/** Set to "true" on an answer given again for a key already used (nothing was done the second time). */
export const IDEMPOTENT_REPLAYED_HEADER = 'Idempotent-Replayed';
/**
 * The oldest performed-at the server records, in days before the request arrived: an older one is
 * recorded as that floor (a queued action that old could also outlive its key).
 */
export const OLDEST_PERFORMED_AT_DAYS = IDEMPOTENCY_KEEP_DAYS;

const isoHeader = (name: string) =>
  z.iso.datetime({ offset: true, error: `${name} is a date and time in ISO 8601, like 2026-12-03T09:15:00.000Z.` }).optional();

/** The headers a queued action carries; each is optional (an online scan sends none). */
export const queuedActionHeadersSchema = z.object({
  [IDEMPOTENCY_KEY_HEADER]: idempotencyKeyField.optional(),
  [PERFORMED_AT_HEADER]: isoHeader(PERFORMED_AT_HEADER),
  [CATALOGUE_AT_HEADER]: isoHeader(CATALOGUE_AT_HEADER),
});
export type QueuedActionHeaders = z.infer<typeof queuedActionHeadersSchema>;

const person = z.object({ id: z.number(), name: z.string() });

export const catalogueToolSchema = z.object({
  code: z.string(),
  name: z.string(),
  category: z.enum(TOOL_CATEGORIES),
  location: z.string(),
  status: z.enum(TOOL_STATUSES),
  accessories: z.array(z.string()),
  loanDays: z.number(),
  /** The sign-off a member needs before checking it out (powered tools), if any. */
  requiredSignoffId: z.number().nullable(),
  requiredSignoffName: z.string().nullable(),
  /** Who has it and until when, when it is on loan. */
  holder: person.nullable(),
  dueAt: z.string().nullable(),
  /** What went out with the loan, to tick back at return (null: not recorded). */
  accessoriesOut: z.array(z.string()).nullable(),
  /** Whom it is set aside for, when held. */
  heldFor: person.nullable(),
  traySize: z.string().nullable(),
  trayCapacity: z.number().nullable(),
});
export type CatalogueTool = z.infer<typeof catalogueToolSchema>;

export const catalogueBinSchema = z.object({
  code: z.string(),
  kind: z.enum(BIN_KINDS),
  designation: z.string(),
  location: z.string(),
  unit: z.string(),
  onHand: z.number(),
  /** What the signed-in member has drawn from it and not returned (the most they may return unused). */
  drawnByYou: z.number(),
});
export type CatalogueBin = z.infer<typeof catalogueBinSchema>;

/** A tool a person has out now, and when it is due back (ISO 8601). */
export const offlineLoanSchema = z.object({ code: z.string(), dueAt: z.string() });
export type OfflineLoan = z.infer<typeof offlineLoanSchema>;
/** An assembly a person may draw for: their own, not done. */
export const offlineAssemblySchema = z.object({ id: z.number(), name: z.string(), buildName: z.string() });

/** GET /api/offline/catalogue: everything a scan needs, for the signed-in member. */
export const catalogueSchema = z.object({
  /** When the server took this copy (ISO 8601). */
  takenAt: z.string(),
  you: person.extend({ role: z.enum(ROLES) }),
  tools: z.array(catalogueToolSchema),
  bins: z.array(catalogueBinSchema),
  /** Codes of the tools the member has out now. */
  yourLoans: z.array(offlineLoanSchema),
  /** Sign-off ids the member holds now. */
  yourSignoffs: z.array(z.number()),
  /** Assemblies the member may draw for (their own, not done). */
  yourAssemblies: z.array(offlineAssemblySchema),
});
export type Catalogue = z.infer<typeof catalogueSchema>;

export const QUEUED_ACTION_KINDS = ['check_out', 'return', 'draw', 'return_unused'] as const;
export type QueuedActionKind = (typeof QUEUED_ACTION_KINDS)[number];
