import { z } from 'zod';
import { RULE_VALUES } from '../estimate/line-rules';
import { FLUSH_PREPS } from '../estimate/flush-prep';
import { ESTIMATE_DIAMETERS, ESTIMATE_RIVET_KINDS, ROW_PATTERNS } from '../estimate/rivet-rules';
import { isSolidRivetHead, RIVET_HEADS, SOLID_RIVET_HEAD_WORDS } from '../stock/kinds';

const positiveLength = (what: string) =>
  z.number({ error: `Enter the ${what} as a number.` }).positive({ error: `The ${what} must be more than 0.` }).max(100_000, { error: `That ${what} is too large.` });

export const rivetSpecSchema = z.strictObject({
  kind: z.enum(ESTIMATE_RIVET_KINDS, { error: 'The rivet kind is blind-structural, blind-general or solid.' }),
  head: z.enum(RIVET_HEADS, { error: 'The head is dome, countersunk or flange.' }),
  diameter32: z
    .number({ error: 'Enter the rivet diameter in 32nds of an inch, like 4 for 1/8 in.' })
    .int({ error: 'The diameter is a whole number of 32nds.' })
    .refine((d) => (ESTIMATE_DIAMETERS as readonly number[]).includes(d), { error: 'Use a diameter of 3, 4, 5, 6 or 8 (32nds: 3/32 to 1/4 in).' }),
  material: z.string().trim().min(1).max(40).optional(),
}).refine((r) => r.kind !== 'solid' || isSolidRivetHead(r.head), { error: SOLID_RIVET_HEAD_WORDS, path: ['head'] });

export const rivetLineSchema = z
  .strictObject({
    length: positiveLength('line length'),
    rows: z.number().int({ error: 'Rows are a whole number.' }).min(1, { error: 'A line has at least 1 row.' }).max(20, { error: 'At most 20 rows in one line.' }).optional(),
    /** Inline when absent; staggered rows sit half a pitch along, one hole fewer in every second row. */
    rowPattern: z.enum(ROW_PATTERNS, { error: 'The row pattern is inline or staggered.' }).optional(),
    /** The spacing between rows, in the line's unit; when absent, 75 % of the actual pitch and at least 2.5D. */
    rowSpacing: positiveLength('row spacing').optional(),
    pitch: positiveLength('pitch').optional(),
    holesPerRow: z.number().int({ error: 'Holes per row are a whole number.' }).min(2, { error: 'A row has at least 2 holes.' }).max(10_000).optional(),
    edgeDistance: positiveLength('edge distance').optional(),
    stack: z
      .array(positiveLength('sheet thickness'), { error: 'Give the sheet stack as a list of thicknesses.' })
      .min(1, { error: 'Give at least one sheet thickness.' })
      .max(10, { error: 'At most 10 sheets in a stack.' }),
    structural: z.boolean().optional(),
    /** Flush heads only: the plans' choice for the top sheet; when absent, the minimum-gage rule decides. */
    flushPrep: z.enum(FLUSH_PREPS, { error: 'The flush preparation is countersink or dimple.' }).optional(),
    /** The line replaces drilled-out rivets: it is worked with the next standard diameter up. */
    repair: z.boolean({ error: 'repair is true or false.' }).optional(),
    rivet: rivetSpecSchema,
  })
  .refine((l) => l.pitch !== undefined || l.holesPerRow !== undefined, { error: 'Give a target pitch or the holes per row.', path: ['pitch'] })
  .refine((l) => l.flushPrep === undefined || l.rivet.head === 'countersunk', { error: 'A flush preparation (countersink or dimple) is only for countersunk heads.', path: ['flushPrep'] });
export type RivetLine = z.infer<typeof rivetLineSchema>;

export const estimateBodySchema = z.strictObject({
  unit: z.enum(['in', 'mm'], { error: 'unit is "in" or "mm".' }),
  wastePercent: z.number({ error: 'The waste allowance is a percentage, like 5.' }).min(0, { error: 'Waste cannot be below 0 %.' }).max(100, { error: 'Waste is at most 100 %.' }).optional(),
  lines: z.array(rivetLineSchema, { error: 'Send the rivet lines as a list.' }).min(1, { error: 'Send at least one rivet line.' }).max(20_000, { error: 'At most 20,000 lines at a time.' }),
});
export type EstimateBody = z.infer<typeof estimateBodySchema>;

const notice = z.object({ code: z.string(), message: z.string() });
const counts = z.record(z.string(), z.number());

/** Why a number is what it is: the value it explains, the rule, and where the rule is published. */
export const lineRuleSchema = z.object({ value: z.enum(RULE_VALUES), rule: z.string(), source: z.string() });
const rules = z.array(lineRuleSchema).readonly();

export const lineEstimateSchema = z.object({
  holesPerRow: z.number(),
  holes: z.number(),
  pitch: z.number(),
  edgeDistance: z.number(),
  /** Only on lines of more than one row. */
  transversePitch: z.number().optional(),
  grip: z.number().nullable(),
  drillSequence: z.array(z.string()).readonly(),
  tempFasteners: counts,
  warnings: z.array(notice).readonly(),
  /** The rule and source of every computed value on the line. */
  rules,
  /** Flush heads: how the top sheet takes the head; null on protruding heads. */
  flushPrep: z.enum(FLUSH_PREPS).nullable(),
  /** Solid rivets: the shop head (about 1.5D wide, 0.5D high) in the line's unit; null on blind rivets. */
  shopHead: z.object({ width: z.number(), height: z.number() }).readonly().nullable(),
  /** Solid rivets: the half-length dash below the length when it fits (an offer, suppliers vary); else null. */
  halfLength: z.number().nullable(),
  /** Repair lines only: the diameter used, in 32nds, one standard size up. */
  diameter32: z.number().optional(),
});

export const estimateTotalsSchema = z.object({ rivets: z.number(), rivetsWithWaste: z.number(), drillHoles: counts, tempFasteners: counts, rules });

export const estimateResponseSchema = z.object({
  lines: z.array(lineEstimateSchema),
  totals: estimateTotalsSchema,
  warnings: z.array(notice),
  /** The plans and approved data govern; drilling; soft blind rivets when a line has them. */
  cautions: z.array(z.string()).readonly(),
});
export type EstimateResponse = z.infer<typeof estimateResponseSchema>;
