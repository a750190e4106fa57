import { z } from 'zod';
import { findDrill } from '../drills/drill-sizes';
import { ESTIMATE_DIAMETERS } from '../estimate/rivet-rules';
import { CATEGORY_LABELS, isRivetSized, TEMPORARY_FASTENER_SIZES, TOOL_CATEGORIES, TOOL_STATUSES } from '../tools/categories';
import { changeBody } from './fields';

export const TOOL_CODE_PATTERN = /^T-\d{4,6}$/;

export const toolCodeField = z
  .string({ error: 'Enter the code on the label, like T-0042.' })
  .trim()
  .toUpperCase()
  .regex(TOOL_CODE_PATTERN, { error: 'A tool code looks like T-0042: T, a dash and four to six digits.' });

const drillSizeField = z
  .string()
  .trim()
  .refine((s) => findDrill(s) !== undefined, { error: 'Use a drill size from the table: #1 to #80, A to Z, or a fraction like 1/8.' })
  .transform((s) => findDrill(s)!.name);

const RIVET_SIZE_WORDS = 'Choose the rivet size: 3/32, 1/8, 5/32, 3/16 or 1/4 in (3, 4, 5, 6 or 8 in 32nds).';
const rivetDiameter32Field = z
  .number({ error: RIVET_SIZE_WORDS })
  .int({ error: RIVET_SIZE_WORDS })
  .refine((d) => (ESTIMATE_DIAMETERS as readonly number[]).includes(d), { error: RIVET_SIZE_WORDS });

const isoDate = z.iso.datetime({ offset: true, error: 'Use a date and time like 2026-12-24T17:00:00Z.' });

/** The fields a quartermaster or lead types about a tool, without defaults (edits send only what changes). */
const toolFields = {
  name: z.string({ error: 'Enter a name.' }).trim().min(1, { error: 'Enter a name.' }).max(120, { error: 'Keep the name under 120 characters.' }),
  category: z.enum(TOOL_CATEGORIES, { error: 'Choose a category from the list.' }),
  location: z.string().trim().max(80, { error: 'Keep the location under 80 characters.' }),
  replacementValueCents: z.number({ error: 'Enter the replacement value in cents.' }).int().min(0).max(100_000_000),
  loanDays: z.number().int().min(1, { error: 'A loan lasts at least 1 day.' }).max(365, { error: 'A loan lasts at most 365 days.' }).nullable(),
  requiredSignoffId: z.number().int().positive().nullable(),
  serviceIntervalDays: z.number().int().min(1).max(3650).nullable(),
  lastServiceAt: isoDate.nullable(),
  drillSize: drillSizeField.nullable(),
  /** Countersink cutters and dimple dies only: the rivet diameter they are made for, in 32nds of an inch. */
  rivetDiameter32: rivetDiameter32Field.nullable(),
  traySize: z.enum(TEMPORARY_FASTENER_SIZES, { error: 'Choose a temporary fastener size: 1/16, 3/32, 1/8, 5/32, 3/16, 1/4 or 3/8.' }).nullable(),
  trayCapacity: z.number().int().min(1, { error: 'A full tray holds at least 1.' }).max(10_000).nullable(),
  accessories: z.array(z.string().trim().min(1).max(80)).max(30),
  notes: z.string().max(2000),
};

/** A new tool: what is not given takes its default. */
const toolFieldsSchema = z.strictObject({
  ...toolFields,
  location: toolFields.location.default(''),
  replacementValueCents: toolFields.replacementValueCents.default(0),
  loanDays: toolFields.loanDays.default(null),
  requiredSignoffId: toolFields.requiredSignoffId.default(null),
  serviceIntervalDays: toolFields.serviceIntervalDays.default(null),
  lastServiceAt: toolFields.lastServiceAt.default(null),
  drillSize: toolFields.drillSize.default(null),
  rivetDiameter32: toolFields.rivetDiameter32.default(null),
  traySize: toolFields.traySize.default(null),
  trayCapacity: toolFields.trayCapacity.default(null),
  accessories: toolFields.accessories.default([]),
  notes: toolFields.notes.default(''),
});

type ToolFields = z.infer<typeof toolFieldsSchema>;

function kindRules(t: Partial<ToolFields>, ctx: z.RefinementCtx) {
  if (t.category === 'drill_bit' && !t.drillSize) {
    ctx.addIssue({ code: 'custom', path: ['drillSize'], message: 'A drill bit needs its size, like #40 or 1/8.' });
  }
  if (t.category === 'countersink_cutter' && !t.drillSize) {
    ctx.addIssue({ code: 'custom', path: ['drillSize'], message: 'A countersink cutter needs the drill size of its pilot, like #30.' });
  }
  if (isRivetSized(t.category) && t.rivetDiameter32 == null) {
    const what = t.category === 'countersink_cutter' ? 'A countersink cutter needs the rivet size it cuts for' : 'Dimple dies need the rivet size they are for';
    ctx.addIssue({ code: 'custom', path: ['rivetDiameter32'], message: `${what}, like 1/8 in.` });
  }
  if (t.category && !isRivetSized(t.category) && t.rivetDiameter32 != null) {
    ctx.addIssue({ code: 'custom', path: ['rivetDiameter32'], message: `Only countersink cutters and dimple dies record a rivet size; leave it empty for a ${CATEGORY_LABELS[t.category].toLowerCase()}.` });
  }
  if (t.category === 'temporary_fastener_tray') {
    if (!t.traySize) ctx.addIssue({ code: 'custom', path: ['traySize'], message: 'A temporary fastener tray needs the fastener size.' });
    if (!t.trayCapacity) ctx.addIssue({ code: 'custom', path: ['trayCapacity'], message: 'Say how many fasteners a full tray holds.' });
  }
}

export const createToolBodySchema = toolFieldsSchema.extend({ code: toolCodeField.optional() }).superRefine(kindRules);
export type CreateToolBody = z.input<typeof createToolBodySchema>;
export type CreateToolInput = z.output<typeof createToolBodySchema>;

export const updateToolBodySchema = changeBody(toolFields);
export type UpdateToolBody = z.infer<typeof updateToolBodySchema>;

export const toolListQuerySchema = z.object({
  status: z.enum(TOOL_STATUSES, { error: `status is one of ${TOOL_STATUSES.join(', ')}.` }).optional(),
  category: z.enum(TOOL_CATEGORIES, { error: 'category is not one of the tool categories.' }).optional(),
  location: z.string().trim().max(80).optional(),
  q: z.string().trim().max(80).optional(),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(500).default(100),
});
export type ToolListQuery = z.infer<typeof toolListQuerySchema>;

export const toolCodeParams = z.object({ code: toolCodeField });

const accessoryName = z.string({ error: 'Name each accessory as the tool lists it.' }).trim().min(1).max(80);

export const checkoutBodySchema = z
  .object({
    dueAt: isoDate.optional(),
    /** The tool's accessories that go out with it (ticked on the checklist); left out, nothing is recorded. */
    accessories: z.array(accessoryName).max(30).optional(),
  })
  .strict();
export type CheckoutBody = z.infer<typeof checkoutBodySchema>;

export const returnBodySchema = z
  .object({
    condition: z.enum(['ok', 'needs_attention'], { error: 'Say whether the tool came back ok or needs attention.' }),
    note: z.string().trim().max(1000).optional(),
    returnedCount: z.number({ error: 'Count the temporary fasteners that came back.' }).int().min(0).optional(),
    photoId: z.number({ error: 'A photo id is a whole number.' }).int({ error: 'A photo id is a whole number.' }).positive({ error: 'A photo id is a whole number.' }).optional(),
    /** Of the accessories that went out with the loan, those that came back (ticked); the rest are recorded missing. */
    accessoriesBack: z.array(accessoryName).max(30).optional(),
  })
  .strict()
  .refine((b) => b.condition === 'ok' || (b.note ?? '').length > 0, {
    path: ['note'],
    error: 'Say what needs attention, so the quartermaster knows what to look at.',
  });
export type ReturnBody = z.infer<typeof returnBodySchema>;

/** The quartermaster closes a missing accessory: it turned up, or a new one took its place. */
export const resolveAccessoryBodySchema = z.strictObject({
  accessory: accessoryName,
  resolution: z.enum(['found', 'replaced'], { error: 'Say whether it was found or replaced.' }),
});
export type ResolveAccessoryBody = z.infer<typeof resolveAccessoryBodySchema>;

export const missingAccessorySchema = z.object({
  accessory: z.string(),
  reportedAt: z.string(),
  /** Who had the loan it did not come back from. */
  lastHolder: z.object({ id: z.number(), name: z.string() }),
});
export type MissingAccessory = z.infer<typeof missingAccessorySchema>;

export const statusChangeBodySchema = z.strictObject({
  note: z.string({ error: 'Give the reason.' }).trim().min(1, { error: 'Give the reason.' }).max(500),
});
export type StatusChangeBody = z.infer<typeof statusChangeBodySchema>;

export const TOOL_ACTIONS = ['check_out', 'return', 'place_hold', 'cancel_hold'] as const;
export type ToolAction = (typeof TOOL_ACTIONS)[number];

const person = z.object({ id: z.number(), name: z.string() });

export const toolSchema = z.object({
  id: z.number(),
  code: z.string(),
  name: z.string(),
  category: z.enum(TOOL_CATEGORIES),
  location: z.string(),
  replacementValueCents: z.number(),
  /** The loan period that applies: the tool's own or its category's default. */
  loanDays: z.number(),
  loanDaysOverride: z.number().nullable(),
  requiredSignoff: z.object({ id: z.number(), name: z.string() }).nullable(),
  serviceIntervalDays: z.number().nullable(),
  lastServiceAt: z.string().nullable(),
  serviceDueAt: z.string().nullable(),
  status: z.enum(TOOL_STATUSES),
  statusNote: z.string().nullable(),
  drillSize: z.object({ name: z.string(), inch: z.number(), mm: z.number() }).nullable(),
  /** Countersink cutters and dimple dies: the rivet diameter they are for, in 32nds (a cutter's pilot is its drillSize). */
  rivetDiameter32: z.number().nullable(),
  traySize: z.enum(TEMPORARY_FASTENER_SIZES).nullable(),
  trayCapacity: z.number().nullable(),
  accessories: z.array(z.string()),
  notes: z.string(),
  /** `accessoriesOut`: what went out with the loan; null when the checkout did not say. */
  loan: z.object({ id: z.number(), holder: person, checkedOutAt: z.string(), dueAt: z.string(), accessoriesOut: z.array(z.string()).nullable() }).nullable(),
  /** Accessories that did not come back, until the quartermaster marks them found or replaced. */
  missingAccessories: z.array(missingAccessorySchema),
  holds: z.object({ waiting: z.number(), offeredTo: person.nullable(), offerExpiresAt: z.string().nullable() }),
  photoIds: z.array(z.number()),
});
export type Tool = z.infer<typeof toolSchema>;

/** The tool as the signed-in person sees it: what they may do now, or why not. */
export const toolForYouSchema = toolSchema.extend({
  forYou: z.object({
    actions: z.array(z.enum(TOOL_ACTIONS)),
    reason: z.string().nullable(),
    defaultDueAt: z.string(),
    /** `startsAt`: a hold placed ahead (a kit for an assembly starting later) begins then; null once begun. */
    yourHold: z.object({ status: z.enum(['waiting', 'offered']), position: z.number(), offerExpiresAt: z.string().nullable(), startsAt: z.string().nullable() }).nullable(),
  }),
});
export type ToolForYou = z.infer<typeof toolForYouSchema>;

export const toolListSchema = z.object({
  data: z.array(toolSchema),
  meta: z.object({ total: z.number(), page: z.number(), pageSize: z.number() }),
});
export type ToolList = z.infer<typeof toolListSchema>;

export const loanSchema = z.object({
  id: z.number(),
  tool: z.object({ id: z.number(), code: z.string(), name: z.string(), category: z.enum(TOOL_CATEGORIES), accessories: z.array(z.string()) }),
  holder: person,
  checkedOutAt: z.string(),
  dueAt: z.string(),
  returnedAt: z.string().nullable(),
  returnCondition: z.enum(['ok', 'needs_attention']).nullable(),
  returnNote: z.string().nullable(),
  returnedCount: z.number().nullable(),
  shortfall: z.number().nullable(),
  returnPhotoId: z.number().nullable(),
  /** What went out with the loan (null: not recorded at checkout), and what did not come back. */
  accessoriesOut: z.array(z.string()).nullable(),
  accessoriesMissing: z.array(z.string()),
  /**
   * When the checkout and the return reached the server: later than checkedOutAt / returnedAt
   * when they were queued offline; null when not kept (older loans, or not returned yet).
   */
  checkoutRecordedAt: z.string().nullable().optional(),
  returnRecordedAt: z.string().nullable().optional(),
});
export type Loan = z.infer<typeof loanSchema>;

export const toolEventSchema = z.object({
  id: z.number(),
  at: z.string(),
  actor: person.nullable(),
  action: z.string(),
  fromStatus: z.string().nullable(),
  toStatus: z.string().nullable(),
  detail: z.string(),
  /** The crib station it was done at ("at Crib door"), or null. */
  station: z.string().nullable(),
});
export type ToolEvent = z.infer<typeof toolEventSchema>;

export const drillReferenceSchema = z.array(z.object({ name: z.string(), inch: z.number(), mm: z.number() }));
