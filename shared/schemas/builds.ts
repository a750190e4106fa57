import { z } from 'zod';
import { BIN_KINDS } from '../stock/kinds';
import { TOOL_CATEGORIES } from '../tools/categories';
import { binCodeField } from './bins';
import { estimateTotalsSchema, lineEstimateSchema, rivetLineSchema } from './estimate';
import { changeBody, idParam } from './fields';

export const ASSEMBLY_STATUSES = ['planned', 'in_progress', 'done'] as const;
export type AssemblyStatus = (typeof ASSEMBLY_STATUSES)[number];
export const ASSEMBLY_STATUS_LABELS: Record<AssemblyStatus, string> = { planned: 'Planned', in_progress: 'In progress', done: 'Done' };

export const LENGTH_UNITS = ['in', 'mm'] as const;
export type LengthUnit = (typeof LENGTH_UNITS)[number];

export const buildIdParams = z.object({ id: idParam });
export const assemblyIdParams = z.object({ id: idParam });

const isoDay = z.iso.date({ error: 'Use a date like 2027-01-15.' });
const nameField = (what: string) =>
  z.string({ error: `Name the ${what}.` }).trim().min(1, { error: `Name the ${what}.` }).max(120, { error: 'Keep the name under 120 characters.' });

export const createBuildBodySchema = z
  .object({
    name: nameField('build'),
    description: z.string().trim().max(1000).default(''),
    /** The build's own minimum edge distance, in inches (kit standards often set one near 3/8 in). */
    edgeFloorIn: z.number().positive({ error: 'The edge distance floor must be more than 0.' }).max(2, { error: 'An edge distance floor above 2 in is not likely.' }).nullable().default(null),
  })
  .strict();
export type CreateBuildBody = z.input<typeof createBuildBodySchema>;
export const updateBuildBodySchema = changeBody({ name: nameField('build'), description: z.string().trim().max(1000), edgeFloorIn: z.number().positive().max(2).nullable() });

/** Something an assembly takes from a bin besides its rivet lines: 24 screws from B-0210. */
export const extraItemSchema = z.strictObject({
  binCode: binCodeField,
  quantity: z.number({ error: 'Enter how many.' }).int({ error: 'Enter a whole number.' }).min(1, { error: 'At least 1.' }).max(1_000_000),
});
export type ExtraItem = z.infer<typeof extraItemSchema>;

/** A rivet line as an assembly stores it: the estimate's line plus a label for people. */
export const assemblyLineSchema = rivetLineSchema.safeExtend({ label: z.string().trim().max(80).optional() });
export type AssemblyLine = z.infer<typeof assemblyLineSchema>;

const assemblyFields = {
  name: nameField('assembly'),
  status: z.enum(ASSEMBLY_STATUSES, { error: 'The status is planned, in_progress or done.' }),
  plannedStart: isoDay.nullable(),
  plannedFinish: isoDay.nullable(),
  unit: z.enum(LENGTH_UNITS, { error: 'unit is "in" or "mm".' }),
  lines: z.array(assemblyLineSchema).max(500, { error: 'At most 500 rivet lines in one assembly.' }),
  extraItems: z.array(extraItemSchema).max(100),
  notes: z.string().trim().max(2000),
};
const datesInOrder = (a: { plannedStart?: string | null; plannedFinish?: string | null }) =>
  !a.plannedStart || !a.plannedFinish || a.plannedFinish >= a.plannedStart;
const datesMessage = { error: 'The planned finish cannot be before the planned start.', path: ['plannedFinish'] };

export const createAssemblyBodySchema = z
  .object({
    ...assemblyFields,
    status: assemblyFields.status.default('planned'),
    plannedStart: assemblyFields.plannedStart.default(null),
    plannedFinish: assemblyFields.plannedFinish.default(null),
    lines: assemblyFields.lines.default([]),
    extraItems: assemblyFields.extraItems.default([]),
    notes: assemblyFields.notes.default(''),
  })
  .strict()
  .refine(datesInOrder, datesMessage);
export type CreateAssemblyBody = z.input<typeof createAssemblyBodySchema>;
export type CreateAssemblyInput = z.output<typeof createAssemblyBodySchema>;
export const updateAssemblyBodySchema = changeBody(assemblyFields).refine(datesInOrder, datesMessage);
export type UpdateAssemblyBody = z.infer<typeof updateAssemblyBodySchema>;

const person = z.object({ id: z.number(), name: z.string() });

export const assemblySchema = z.object({
  id: z.number(),
  buildId: z.number(),
  buildName: z.string(),
  owner: person,
  name: z.string(),
  status: z.enum(ASSEMBLY_STATUSES),
  plannedStart: z.string().nullable(),
  plannedFinish: z.string().nullable(),
  unit: z.enum(LENGTH_UNITS),
  lines: z.array(assemblyLineSchema),
  extraItems: z.array(extraItemSchema),
  notes: z.string(),
  updatedAt: z.string(),
});
export type Assembly = z.infer<typeof assemblySchema>;

export const buildSchema = z.object({
  id: z.number(),
  owner: person,
  name: z.string(),
  description: z.string(),
  edgeFloorIn: z.number().nullable(),
  assemblies: z.array(assemblySchema.pick({ id: true, name: true, status: true, plannedStart: true, plannedFinish: true })),
});
export type Build = z.infer<typeof buildSchema>;
export const buildListSchema = z.object({ data: z.array(buildSchema) });
export const assemblyListSchema = z.object({ data: z.array(assemblySchema) });

const flag = z.enum(['true', 'false'], { error: 'Use true or false.' }).transform((v) => v === 'true');
/** GET /api/builds: your own builds; `all=true` (quartermaster or lead) lists everyone's. */
export const buildListQuerySchema = z.object({ all: flag.default(false) });
/** GET /api/assemblies: a member sees their own; a quartermaster or lead sees all unless `mine=true`. */
export const assemblyListQuerySchema = z.object({ status: z.enum(ASSEMBLY_STATUSES, { error: 'The status is planned, in_progress or done.' }).optional(), mine: flag.default(false) });

const binRef = z.object({ code: z.string(), designation: z.string(), onHand: z.number(), location: z.string() });

/** One fastener or item the assembly needs, with the bin that stocks it (or none), and what was drawn for it. */
export const billLineSchema = z.object({
  /** What is needed, in words: the designation, or our readable spec when no bin stocks it. */
  description: z.string(),
  kind: z.enum(BIN_KINDS),
  diameter32: z.number().nullable(),
  grip: z.number().nullable(),
  lines: z.array(z.number()),
  estimated: z.number(),
  withWaste: z.number(),
  bin: binRef.nullable(),
  /** Plainly, when no bin stocks it: "No bin stocks a 1/8 in dome 5056 blind rivet, grip −3." */
  unstocked: z.string().nullable(),
  /** What the bin lacks for what is still to draw (`toDraw` less on hand). */
  shortBy: z.number(),
  drawn: z.number(),
  /** Still to draw for the assembly: the need with waste less what was drawn for it, never below 0. */
  toDraw: z.number(),
});
export type BillLine = z.infer<typeof billLineSchema>;

export const KIT_ROLES = ['puller', 'rivet_gun', 'nosepiece', 'rivet_set', 'bucking_bar', 'drill_bit', 'countersink_cutter', 'dimple_dies', 'temporary_fastener_tray', 'deburring_tool'] as const;
export type KitRole = (typeof KIT_ROLES)[number];
/** A crib tool the assembly needs, and whether one is free now. */
export const kitItemSchema = z.object({
  role: z.enum(KIT_ROLES),
  need: z.string(),
  /** Temporary fasteners and drill holes: how many the assembly needs of this size. */
  count: z.number().nullable(),
  /** The crib's pick; its category says which tool cautions the kit shows. */
  tool: z.object({ code: z.string(), name: z.string(), status: z.string(), category: z.enum(TOOL_CATEGORIES) }).nullable(),
  note: z.string().nullable(),
});
export type KitItem = z.infer<typeof kitItemSchema>;

export const assemblyEstimateSchema = z.object({
  assemblyId: z.number(),
  unit: z.enum(LENGTH_UNITS),
  wastePercent: z.number(),
  lines: z.array(lineEstimateSchema.extend({ label: z.string().nullable() })),
  totals: estimateTotalsSchema,
  warnings: z.array(z.object({ code: z.string(), message: z.string() })),
  errors: z.array(z.object({ code: z.string(), message: z.string(), line: z.number() })),
  bill: z.array(billLineSchema),
  kit: z.array(kitItemSchema),
  caution: z.string(),
  /** The estimate's cautions, shown once: plans and approved data, drilling, soft blind rivets when used. */
  cautions: z.array(z.string()).readonly(),
});
export type AssemblyEstimate = z.infer<typeof assemblyEstimateSchema>;

export const kitHoldsResultSchema = z.object({
  placed: z.array(z.object({ code: z.string(), name: z.string() })),
  skipped: z.array(z.object({ code: z.string(), reason: z.string() })),
  /**
   * The assembly's planned start ("2027-01-05") when it is after today: the holds wait in the queue
   * and the tools are set aside from that morning, not now. Null: set aside at once.
   */
  holdsFrom: z.string().nullable(),
});
export type KitHoldsResult = z.infer<typeof kitHoldsResultSchema>;

export const preferredUnitBodySchema = z.object({ preferredUnit: z.enum(LENGTH_UNITS, { error: 'Choose in or mm.' }) }).strict();
