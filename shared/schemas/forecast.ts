import { z } from 'zod';
import { BIN_KINDS } from '../stock/kinds';
import { binCodeField } from './bins';
import { idParam } from './fields';

export const ALERT_STATES = ['open', 'ordered', 'closed', 'dismissed'] as const;
export type AlertState = (typeof ALERT_STATES)[number];
export const ALERT_STATE_LABELS: Record<AlertState, string> = { open: 'To order', ordered: 'Ordered', closed: 'Closed', dismissed: 'Dismissed' };

export const alertIdParams = z.object({ id: idParam });

const binBrief = z.object({
  code: z.string(),
  designation: z.string(),
  kind: z.enum(BIN_KINDS),
  supplier: z.string(),
  supplierPart: z.string(),
  packSize: z.number(),
  unit: z.string(),
  unitCost: z.number(),
  onHand: z.number(),
  leadTimeDays: z.number(),
});

/** One bin's next 26 weeks: demand, projected on hand, and the levels it is judged against. */
export const binForecastSchema = z.object({
  bin: binBrief,
  /** Monday of each week (YYYY-MM-DD), 26 of them. */
  weeks: z.array(z.string()),
  weeklyDemand: z.array(z.number()),
  demandSource: z.enum(['planned', 'history']),
  projected: z.array(z.number()),
  expectedReceipts: z.array(z.object({ week: z.number(), quantity: z.number() })),
  sigmaWeekly: z.number(),
  z: z.number(),
  leadTimeWeeks: z.number(),
  leadTimeDemand: z.number(),
  safetyStock: z.number(),
  reorderPoint: z.number(),
  eoq: z.number(),
  suggestedOrder: z.number(),
  needsAlert: z.boolean(),
  reason: z.string(),
});
export type BinForecastDto = z.infer<typeof binForecastSchema>;
export const forecastListSchema = z.object({
  data: z.array(binForecastSchema),
  meta: z.object({ generatedAt: z.string(), serviceLevel: z.number(), horizonWeeks: z.number() }),
});
export type ForecastList = z.infer<typeof forecastListSchema>;

/** GET /api/forecast?bins=B-0001,B-0002: only these bins (all when absent). */
export const forecastQuerySchema = z.object({
  bins: z
    .string()
    .max(7000, { error: 'List at most 1,000 bin codes.' })
    .optional()
    .transform((v) => (v ? v.split(',').filter((c) => c.trim() !== '') : undefined))
    .pipe(z.array(binCodeField).max(1000, { error: 'List at most 1,000 bin codes.' }).optional()),
});

export const alertSchema = z.object({
  id: z.number(),
  state: z.enum(ALERT_STATES),
  bin: binBrief,
  raisedAt: z.string(),
  reason: z.string(),
  onHandAtRaise: z.number(),
  reorderPoint: z.number(),
  safetyStock: z.number(),
  /** What the alert asked for when it was raised. */
  suggestedQty: z.number(),
  /** What the one reorder rule orders now (the Restock list's and the purchase list's quantity); 0 once closed or dismissed. */
  toOrder: z.number(),
  orderedAt: z.string().nullable(),
  orderedBy: z.object({ id: z.number(), name: z.string() }).nullable(),
  orderedQty: z.number().nullable(),
  /** Received against the order so far. */
  receivedQty: z.number(),
  /** Ordered and not yet received (0 unless ordered). */
  onOrder: z.number(),
  expectedAt: z.string().nullable(),
  closedAt: z.string().nullable(),
  dismissedAt: z.string().nullable(),
  dismissReason: z.string().nullable(),
});
export type Alert = z.infer<typeof alertSchema>;
export const alertListSchema = z.object({ data: z.array(alertSchema) });

export const alertListQuerySchema = z.object({
  state: z.enum([...ALERT_STATES, 'active', 'all'], { error: 'state is open, ordered, closed, dismissed, active or all.' }).default('active'),
});

const isoDay = z.iso.date({ error: 'Use a date like 2027-01-15.' });
export const markOrderedBodySchema = z
  .object({
    quantity: z.number({ error: 'Enter how many were ordered.' }).int({ error: 'Enter a whole number.' }).min(1, { error: 'Order at least 1.' }).max(10_000_000),
    expectedAt: isoDay,
    note: z.string().trim().max(500).optional(),
  })
  .strict();
export type MarkOrderedBody = z.infer<typeof markOrderedBodySchema>;

export const dismissBodySchema = z
  .object({ reason: z.string({ error: 'Say why the alert is dismissed.' }).trim().min(1, { error: 'Say why the alert is dismissed.' }).max(500) })
  .strict();

/** The purchase list: what the one reorder rule orders now, by supplier; each line names the bin's active alert (null until a refresh raises one) and what is already on order. */
export const purchaseListSchema = z.object({
  data: z.array(
    z.object({
      supplier: z.string(),
      lines: z.array(z.object({ alertId: z.number().nullable(), bin: binBrief, quantity: z.number(), packs: z.number(), costCents: z.number(), onOrder: z.number() })),
      totalCents: z.number(),
    }),
  ),
});
export type PurchaseList = z.infer<typeof purchaseListSchema>;

export const planningSettingsSchema = z.object({
  wastePercent: z.number(),
  maxPitchDiameters: z.number(),
  serviceLevel: z.number(),
  orderCost: z.number(),
  holdingRate: z.number(),
});
export type PlanningSettingsDto = z.infer<typeof planningSettingsSchema>;
export const updatePlanningSettingsBodySchema = z
  .object({
    wastePercent: z.number().min(0, { error: 'Waste is at least 0 %.' }).max(50, { error: 'Waste is at most 50 %.' }),
    maxPitchDiameters: z.number().min(4, { error: 'The maximum pitch is at least 4D.' }).max(16, { error: 'The maximum pitch is at most 16D.' }),
    serviceLevel: z.number().min(0.5, { error: 'The service level is at least 50 %.' }).max(0.999, { error: 'The service level is below 100 %, like 0.95.' }),
    orderCost: z.number().min(0, { error: 'The cost per order cannot be negative.' }).max(10_000),
    holdingRate: z.number().min(0.01, { error: 'The holding rate is at least 1 % a year.' }).max(2, { error: 'The holding rate is at most 200 % a year.' }),
  })
  .partial()
  .strict()
  .refine((b) => Object.keys(b).length > 0, { error: 'Send at least one setting to change.' });

/** Waste measured on finished assemblies: drawn − estimated, per member and for the chapter. */
export const actualWasteSchema = z.object({
  chapter: z.object({ estimated: z.number(), drawn: z.number(), wastePercent: z.number().nullable() }),
  members: z.array(z.object({ member: z.object({ id: z.number(), name: z.string() }), estimated: z.number(), drawn: z.number(), wastePercent: z.number().nullable() })),
  currentAllowance: z.number(),
});
export type ActualWaste = z.infer<typeof actualWasteSchema>;
