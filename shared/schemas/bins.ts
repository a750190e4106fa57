import { z } from 'zod';
import { findDrill } from '../drills/drill-sizes';
import { binGripRange, blindGripRange, gripRangeWords, toThousandth } from '../stock/fasteners';
import {
  BIN_CODE_PATTERN,
  BIN_KINDS,
  isBlindKind,
  isRivetKind,
  MOVEMENT_KINDS,
  RIVET_HEADS,
  isSolidRivetHead,
  RIVET_MATERIALS,
  SOLID_RIVET_HEAD_WORDS,
  STEM_MATERIALS,
  type BinKind,
} from '../stock/kinds';
import { changeBody, idParam } from './fields';

export const binCodeField = z
  .string({ error: 'Enter the code on the bin label, like B-0107.' })
  .trim()
  .toUpperCase()
  .regex(BIN_CODE_PATTERN, { error: 'A bin code looks like B-0107: B, a dash and four to six digits.' });

export const binCodeParams = z.object({ code: binCodeField });
export const movementParams = z.object({ code: binCodeField, id: idParam });

/** Money per unit in dollars, to a hundredth of a cent (rivets cost fractions of a cent). */
export const unitCostField = z
  .number({ error: 'Enter the unit cost in dollars, like 0.085.' })
  .min(0, { error: 'A unit cost cannot be negative.' })
  .max(100_000, { error: 'That unit cost is too large.' })
  .refine((v) => Math.abs(Math.round(v * 10_000) - v * 10_000) < 1e-6, { error: 'Give the unit cost to at most 4 decimals (a hundredth of a cent).' });

const quantityField = (what: string) =>
  z
    .number({ error: `Enter how many to ${what}.` })
    .int({ error: `Enter a whole number to ${what}.` })
    .positive({ error: `Enter how many to ${what}: at least 1.` })
    .max(1_000_000, { error: 'That is more than a bin can hold.' });

const noteField = z.string().trim().max(500, { error: 'Keep the note under 500 characters.' });
const requiredNote = (why: string) => z.string({ error: why }).trim().min(1, { error: why }).max(500, { error: 'Keep the note under 500 characters.' });

const drillSizeField = z
  .string()
  .trim()
  .refine((s) => findDrill(s) !== undefined, { error: 'Use a drill size from the table: #1 to #80, A to Z, or a fraction like 1/8.' })
  .transform((s) => findDrill(s)!.name);

/** The grip range a blind rivet box gives, in inches; kept to the 0.001 in of the grip table. */
export const GRIP_LIMITS = { min: 0.01, max: 1 } as const;
const outsideLimits = `A grip range lies between ${gripRangeWords(GRIP_LIMITS).replace('–', ' and ')}.`;
const gripLimitField = (end: 'smallest' | 'largest') =>
  z
    .number({ error: `Enter the ${end} grip from the box in inches, like ${end === 'smallest' ? '0.063' : '0.125'}.` })
    .min(GRIP_LIMITS.min, { error: outsideLimits })
    .max(GRIP_LIMITS.max, { error: outsideLimits })
    .transform(toThousandth)
    .nullable();

const binFields = {
  kind: z.enum(BIN_KINDS, { error: 'Choose what the bin holds from the list.' }),
  name: z.string().trim().max(120, { error: 'Keep the name under 120 characters.' }),
  unit: z.string().trim().min(1, { error: 'Say what one unit is, like "each" or "tube".' }).max(20),
  packSize: z.number({ error: 'Enter the pack size.' }).int({ error: 'A pack holds a whole number of units.' }).min(1, { error: 'A pack holds at least 1.' }).max(1_000_000),
  unitCost: unitCostField,
  supplier: z.string().trim().max(80),
  supplierPart: z.string().trim().max(60),
  leadTimeDays: z.number({ error: 'Enter the lead time in days.' }).int({ error: 'Enter the lead time in whole days.' }).min(0).max(365, { error: 'A lead time is at most 365 days.' }),
  reorderPoint: z.number({ error: 'Enter the reorder point.' }).int({ error: 'The reorder point is a whole number.' }).min(0, { error: 'The reorder point cannot be negative.' }).max(1_000_000),
  reorderQty: z.number({ error: 'Enter the reorder quantity.' }).int({ error: 'The reorder quantity is a whole number.' }).min(0, { error: 'The reorder quantity cannot be negative.' }).max(1_000_000),
  location: z.string().trim().max(80, { error: 'Keep the location under 80 characters.' }),
  notes: z.string().max(2000),
  head: z.enum(RIVET_HEADS, { error: 'Choose the head: dome, countersunk or flange.' }).nullable(),
  material: z.enum(RIVET_MATERIALS, { error: `Choose the material: ${RIVET_MATERIALS.join(', ')}.` }).nullable(),
  stemMaterial: z.enum(STEM_MATERIALS, { error: `Choose the stem: ${STEM_MATERIALS.join(', ')}.` }).nullable(),
  diameter32: z.number({ error: 'Enter the diameter in 32nds of an inch, like 4 for 1/8 in.' }).int({ error: 'The diameter dash is a whole number of 32nds.' }).min(1).max(16, { error: 'The diameter dash is at most 16 (1/2 in).' }).nullable(),
  grip16: z.number({ error: 'Enter the grip dash, like 2.' }).int({ error: 'The grip dash is a whole number.' }).refine((d) => blindGripRange(d) !== undefined, { error: 'Use a grip dash from the table: 1 to 6, or 8.' }).nullable(),
  gripMin: gripLimitField('smallest'),
  gripMax: gripLimitField('largest'),
  length16: z
    .number({ error: 'Enter the length in 16ths of an inch, like 6 for 3/8 in.' })
    .min(1, { error: 'A rivet is at least 1/16 in long.' })
    .max(64)
    .refine((v) => Number.isInteger(v * 2), { error: 'The length dash is in 16ths; half lengths are written 3.5.' })
    .nullable(),
  drillSize: drillSizeField.nullable(),
  /** Blind rivets: the hole drill when the maker's differs from the usual one. */
  holeDrill: drillSizeField.nullable(),
};

const binDefaults = z.object({
  ...binFields,
  name: binFields.name.default(''),
  unit: binFields.unit.default('each'),
  packSize: binFields.packSize.default(1),
  unitCost: binFields.unitCost.default(0),
  supplier: binFields.supplier.default(''),
  supplierPart: binFields.supplierPart.default(''),
  leadTimeDays: binFields.leadTimeDays.default(14),
  reorderPoint: binFields.reorderPoint.default(0),
  reorderQty: binFields.reorderQty.default(0),
  location: binFields.location.default(''),
  notes: binFields.notes.default(''),
  head: binFields.head.default(null),
  material: binFields.material.default(null),
  stemMaterial: binFields.stemMaterial.default(null),
  diameter32: binFields.diameter32.default(null),
  grip16: binFields.grip16.default(null),
  gripMin: binFields.gripMin.default(null),
  gripMax: binFields.gripMax.default(null),
  length16: binFields.length16.default(null),
  drillSize: binFields.drillSize.default(null),
  holeDrill: binFields.holeDrill.default(null),
});
type BinFieldValues = z.output<typeof binDefaults>;

/** What each kind of bin needs: rivets their spec, drill bits their size, everything else a name. */
export function binKindRules(b: Partial<BinFieldValues> & { kind?: BinKind }, ctx: z.RefinementCtx): void {
  const issue = (path: string, message: string) => ctx.addIssue({ code: 'custom', path: [path], message });
  if (!b.kind) return;
  if (isRivetKind(b.kind)) {
    if (!b.head) issue('head', 'A rivet bin needs its head: dome, countersunk or flange.');
    if (!b.material) issue('material', 'A rivet bin needs its body material, like 5056 or 2117-T4.');
    if (!b.diameter32) issue('diameter32', 'A rivet bin needs its diameter in 32nds of an inch, like 4 for 1/8 in.');
    if (isBlindKind(b.kind)) {
      if (!b.grip16) issue('grip16', 'A blind rivet bin needs its grip dash, like 2 for 0.063–0.125 in.');
      if (b.length16 !== null && b.length16 !== undefined) issue('length16', 'Blind rivets are sized by grip, not length: leave the length empty.');
      gripRangeRules(b.kind, b, issue);
    } else {
      if (!b.length16) issue('length16', 'A solid rivet bin needs its length in 16ths of an inch, like 6 for 3/8 in.');
      if (b.grip16 !== null && b.grip16 !== undefined) issue('grip16', 'Solid rivets are sized by length, not grip dash: leave the grip empty.');
      if (b.stemMaterial) issue('stemMaterial', 'Solid rivets have no stem.');
      if (b.head && !isSolidRivetHead(b.head)) issue('head', SOLID_RIVET_HEAD_WORDS);
      for (const field of ['gripMin', 'gripMax'] as const) {
        if (typeof b[field] === 'number') issue(field, 'Solid rivets are sized by length: only blind rivet bins carry a grip range. Leave it empty.');
      }
    }
  } else {
    if (!b.name) issue('name', 'Give the bin a name, like "Screw #8-32 × 1/2 pan head".');
    for (const field of ['head', 'material', 'stemMaterial', 'diameter32', 'grip16', 'gripMin', 'gripMax', 'length16'] as const) {
      if (b[field] !== null && b[field] !== undefined) issue(field, 'Only rivet bins carry a fastener spec; leave it empty or choose a rivet kind.');
    }
  }
  if (b.kind === 'drill_bit' && !b.drillSize) issue('drillSize', 'A drill bit bin needs its size, like #40.');
}

const inches = (x: number) => `${x.toFixed(3)} in`;

/**
 * A blind bin's grip range (from the box, else the table's band for its dash) must run from a
 * smaller grip to a larger one and share some of the dash's band: makers' ranges differ from the
 * table by a few thousandths, but one wholly outside the band is another dash or a slip of the pen.
 */
function gripRangeRules(kind: BinKind, b: Partial<BinFieldValues>, issue: (path: string, message: string) => void): void {
  const band = b.grip16 ? blindGripRange(b.grip16) : undefined;
  if (!band) return;
  const range = binGripRange({ kind, grip16: b.grip16!, gripMin: b.gripMin, gripMax: b.gripMax })!;
  if (range.min >= range.max) {
    issue(typeof b.gripMax === 'number' ? 'gripMax' : 'gripMin', `The smallest grip (${inches(range.min)}) must be below the largest (${inches(range.max)}).`);
  } else if (range.max < band.min || range.min > band.max) {
    const field = range.min > band.max ? 'gripMin' : 'gripMax';
    issue(field, `The grip range ${gripRangeWords(range)} is outside the −${b.grip16} band (${gripRangeWords(band)}): check the grip dash and the figures on the box.`);
  }
}

interface GripRanged {
  kind: BinKind;
  grip16: number | null;
  gripMin: number | null;
  gripMax: number | null;
}

/** A blind bin keeps its grip range whole: what the box gives, the table's band for the dash where it gives nothing. */
export function withGripRange<T extends GripRanged>(b: T): T {
  const range = binGripRange(b);
  return { ...b, gripMin: range?.min ?? null, gripMax: range?.max ?? null };
}

/**
 * What an edit leaves of a bin's grip range, before `withGripRange` fills it: the ends it sends
 * (null: the table's), else the bin's own; a new kind or grip dash sent without a range starts
 * again from the table's band, so a range never outlives the dash it was given for.
 */
export function gripRangeAfterEdit(before: GripRanged, change: Partial<GripRanged>): Pick<GripRanged, 'gripMin' | 'gripMax'> {
  const restart = (change.kind !== undefined && change.kind !== before.kind) || (change.grip16 !== undefined && change.grip16 !== before.grip16);
  const end = (field: 'gripMin' | 'gripMax') => (change[field] !== undefined ? change[field] : restart ? null : before[field]);
  return { gripMin: end('gripMin'), gripMax: end('gripMax') };
}

export const createBinBodySchema = binDefaults
  .extend({
    code: binCodeField.optional(),
    /** Opening stock, written to the ledger as the bin's first receipt. */
    initialQuantity: z
      .number({ error: 'Enter the opening stock, or 0 for an empty bin.' })
      .int({ error: 'The opening stock is a whole number.' })
      .min(0, { error: 'The opening stock cannot be negative.' })
      .max(1_000_000, { error: 'That is more than a bin can hold.' })
      .default(0),
  })
  .strict()
  .superRefine(binKindRules)
  .transform(withGripRange);
export type CreateBinBody = z.input<typeof createBinBodySchema>;
export type CreateBinInput = z.output<typeof createBinBodySchema>;

export const updateBinBodySchema = changeBody(binFields);
export type UpdateBinBody = z.infer<typeof updateBinBodySchema>;

const booleanQuery = z
  .enum(['true', 'false', '1', '0'], { error: 'low is true or false.' })
  .transform((v) => v === 'true' || v === '1');

export const binListQuerySchema = z.object({
  q: z.string().trim().max(80).optional(),
  kind: z.enum(BIN_KINDS, { error: `kind is one of ${BIN_KINDS.join(', ')}.` }).optional(),
  low: booleanQuery.optional(),
  diameter32: z.coerce.number().int().min(1).max(16).optional(),
  grip16: z.coerce.number().int().min(1).max(16).optional(),
  material: z.string().trim().max(40).optional(),
  location: z.string().trim().max(80).optional(),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(500).default(200),
});
export type BinListQuery = z.infer<typeof binListQuerySchema>;

// ---- Movements (requests) ----

export const drawBodySchema = z
  .object({
    quantity: quantityField('draw'),
    assemblyId: z.number().int().positive().nullable().optional(),
    note: noteField.optional(),
  })
  .strict();
export type DrawBody = z.infer<typeof drawBodySchema>;

export const returnUnusedBodySchema = drawBodySchema.extend({ quantity: quantityField('return') });
export type ReturnUnusedBody = z.infer<typeof returnUnusedBodySchema>;

export const receiveBodySchema = z
  .object({
    quantity: quantityField('receive'),
    unitCost: unitCostField.optional(),
    note: noteField.optional(),
    /** A packing slip uploaded first to POST /api/bins/slips. */
    slipId: z.number().int().positive().optional(),
  })
  .strict();
export type ReceiveBody = z.infer<typeof receiveBodySchema>;

export const countBodySchema = z
  .object({
    counted: z
      .number({ error: 'Enter how many you counted.' })
      .int({ error: 'Enter a whole number counted.' })
      .min(0, { error: 'A count cannot be below 0.' })
      .max(10_000_000),
    note: noteField.optional(),
  })
  .strict();
export type CountBody = z.infer<typeof countBodySchema>;

export const moveBodySchema = z
  .object({ to: binCodeField, quantity: quantityField('move'), note: noteField.optional() })
  .strict();
export type MoveBody = z.infer<typeof moveBodySchema>;

export const writeOffBodySchema = z
  .object({ quantity: quantityField('write off'), note: requiredNote('Say why the stock is written off (damaged, lost, out of date).') })
  .strict();
export type WriteOffBody = z.infer<typeof writeOffBodySchema>;

export const reverseBodySchema = z.object({ note: requiredNote('Say why this entry is reversed.') }).strict();
export type ReverseBody = z.infer<typeof reverseBodySchema>;

const isoDay = z.iso.date({ error: 'Use a date like 2026-11-30.' });
export const ledgerQuerySchema = z.object({
  from: isoDay.optional(),
  to: isoDay.optional(),
  limit: z.coerce.number().int().min(1).max(5000).default(500),
});
export type LedgerQuery = z.infer<typeof ledgerQuerySchema>;

// ---- Responses ----

const person = z.object({ id: z.number(), name: z.string() });

export const BIN_ACTIONS = ['draw', 'return_unused', 'receive', 'count', 'move', 'write_off'] as const;
export type BinAction = (typeof BIN_ACTIONS)[number];

/** What a bin's own row says, as the API shows it. */
export const binFieldsSchema = z.object({
  id: z.number(),
  code: z.string(),
  kind: z.enum(BIN_KINDS),
  /** The name as typed; rivet bins may leave it empty. */
  name: z.string(),
  /** The open-standard number or our readable form for rivets; the name for everything else. */
  designation: z.string(),
  /** For a blind rivet: the grip range it is stocked for, in inches (from the box, else the table's band for the dash). */
  gripRange: z.object({ min: z.number(), max: z.number() }).nullable(),
  head: z.enum(RIVET_HEADS).nullable(),
  material: z.string().nullable(),
  stemMaterial: z.string().nullable(),
  diameter32: z.number().nullable(),
  grip16: z.number().nullable(),
  /** The same range as gripRange, as the fields the form and the CSV edit; null on other bins. */
  gripMin: z.number().nullable(),
  gripMax: z.number().nullable(),
  length16: z.number().nullable(),
  drillSize: z.string().nullable(),
  holeDrill: z.string().nullable(),
  unit: z.string(),
  packSize: z.number(),
  unitCost: z.number(),
  supplier: z.string(),
  supplierPart: z.string(),
  leadTimeDays: z.number(),
  reorderPoint: z.number(),
  reorderQty: z.number(),
  location: z.string(),
  notes: z.string(),
  onHand: z.number(),
  stockValueCents: z.number(),
  lastCountedAt: z.string().nullable(),
});
export type BinFields = z.infer<typeof binFieldsSchema>;

/**
 * A bin's part of the one reorder computation (shared/forecast/reorder.ts, fed by the planning
 * feature): on every bin in lists and on Restock, and for one bin at GET /api/bins/:code/reorder.
 */
export const binReorderSchema = z.object({
  /** The rule calls for an order: on hand and on order at or below the reorder point in force, or projected below safety stock. */
  low: z.boolean(),
  /** What to order now, in whole packs; 0 when nothing (or when the quartermaster dismissed the bin's alert). */
  toOrder: z.number(),
  /** Ordered and not yet received. */
  onOrder: z.number(),
  /** The reorder point in force: the forecast's, never below the one typed on the bin (`reorderPoint`). */
  reorderAt: z.number(),
  /** toOrder at the bin's unit cost. */
  orderCostCents: z.number(),
});
export type BinReorder = z.infer<typeof binReorderSchema>;

export const binSchema = binFieldsSchema.extend(binReorderSchema.shape);
export type Bin = z.infer<typeof binSchema>;

export const binListSchema = z.object({
  data: z.array(binSchema),
  meta: z.object({ total: z.number(), page: z.number(), pageSize: z.number() }),
});
export type BinList = z.infer<typeof binListSchema>;

/**
 * A bin as the signed-in person sees it when they scan it: what they may do, and bins it may move
 * to. The scan answer stays fast, so it leaves the reorder computation out: the bin page reads that
 * from GET /api/bins/:code/reorder.
 */
export const binForYouSchema = binFieldsSchema.extend({
  forYou: z.object({
    actions: z.array(z.enum(BIN_ACTIONS)),
    /** What this person has drawn from the bin, less what they returned: the most they may return. */
    yourNetDrawn: z.number(),
    sameSpecBins: z.array(z.object({ code: z.string(), location: z.string(), onHand: z.number() })),
  }),
});
export type BinForYou = z.infer<typeof binForYouSchema>;

export const movementSchema = z.object({
  id: z.number(),
  binCode: z.string(),
  /** When it happened (a draw or return queued offline: when the member did it). */
  at: z.string(),
  /** When it reached the server; later than `at` for an entry queued offline. Entries before this was kept give `at`. */
  arrivedAt: z.string().optional(),
  kind: z.enum(MOVEMENT_KINDS),
  /** Signed: receipts add, draws take away. */
  quantity: z.number(),
  balanceAfter: z.number(),
  unitCost: z.number(),
  valueCents: z.number(),
  actor: person,
  /** The crib station it was done at ("at Crib door"), or null. */
  station: z.string().nullable(),
  /** Draws and returns: whose tab it goes on. */
  member: person.nullable(),
  assemblyId: z.number().nullable(),
  note: z.string(),
  reversesId: z.number().nullable(),
  reversedById: z.number().nullable(),
  /** Transfers: the bin on the other side. */
  otherBinCode: z.string().nullable(),
  slipId: z.number().nullable(),
});
export type Movement = z.infer<typeof movementSchema>;

/** An assembly named for people: its own name and its build's ("Left wing", "Two-seat kit"). */
export const assemblyNameSchema = z.strictObject({ name: z.string(), buildName: z.string() });
export type AssemblyName = z.infer<typeof assemblyNameSchema>;

/**
 * A bin's ledger entry as listed: the movement with its assembly named (null when it names none).
 * A member sees their own entries in full; another person's entry is `masked`: kind, quantity,
 * balance, times and links stay, while who (actor, member), what it cost (unitCost, valueCents),
 * the assembly and the note are null or empty, so no one's tab can be rebuilt from a bin.
 * Quartermasters and leads see every entry in full.
 */
export const ledgerEntrySchema = movementSchema.extend({
  assembly: assemblyNameSchema.nullable(),
  masked: z.boolean(),
  actor: person.nullable(),
  unitCost: z.number().nullable(),
  valueCents: z.number().nullable(),
});
export type LedgerEntry = z.infer<typeof ledgerEntrySchema>;

export const ledgerSchema = z.object({ data: z.array(ledgerEntrySchema) });

export const countResultSchema = movementSchema.extend({
  counted: z.number(),
  onHandBefore: z.number(),
  /** counted − on hand before: the adjustment made. */
  variance: z.number(),
  varianceValueCents: z.number(),
});
export type CountResult = z.infer<typeof countResultSchema>;

/** Packing slip upload limits, shared so the client can refuse a too-large file before sending it. */
export const SLIP_MAX_BYTES = 10 * 1024 * 1024;
/** The multipart form field that carries the packing slip. */
export const SLIP_FIELD = 'slip';

export const slipSchema = z.object({ id: z.number(), contentType: z.string(), filename: z.string(), size: z.number() });
export type Slip = z.infer<typeof slipSchema>;

export const restockItemSchema = binSchema.extend({ packsToOrder: z.number() });
export const restockListSchema = z.object({ data: z.array(restockItemSchema) });
export type RestockItem = z.infer<typeof restockItemSchema>;
