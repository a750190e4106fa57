import { z } from 'zod';
import { PUBLISHED_PITCH_MAXIMA_WORDS } from '@shared/estimate/line-rules';
import type { PlanningSettingsDto } from '@shared/schemas/forecast';

/**
 * The settings as the form shows them: service level and holding rate in percent, where the API
 * speaks fractions (0.95, 0.25). The ranges are the API's own (updatePlanningSettingsBodySchema).
 */
const num = (missing: string) => z.number({ error: missing });
export const planningFormSchema = z
  .object({
    wastePercent: num('Enter the waste allowance in percent.').min(0, { error: 'Waste is at least 0 %.' }).max(50, { error: 'Waste is at most 50 %.' }),
    maxPitchDiameters: num('Enter the maximum pitch in rivet diameters.')
      .min(4, { error: 'The maximum pitch is at least 4D.' })
      .max(16, { error: 'The maximum pitch is at most 16D.' }),
    serviceLevel: num('Enter the service level in percent.')
      .min(50, { error: 'The service level is at least 50 %.' })
      .max(99.9, { error: 'The service level is at most 99.9 %.' }),
    orderCost: num('Enter the cost of one order in dollars.').min(0, { error: 'The cost per order cannot be negative.' }).max(10_000, { error: 'The cost per order is at most $10,000.' }),
    holdingRate: num('Enter the holding rate in percent a year.')
      .min(1, { error: 'The holding rate is at least 1 % a year.' })
      .max(200, { error: 'The holding rate is at most 200 % a year.' }),
  })
  .transform((f): PlanningSettingsDto => ({ ...f, serviceLevel: fromPercent(f.serviceLevel), holdingRate: fromPercent(f.holdingRate) }));
export type PlanningFormInput = z.input<typeof planningFormSchema>;

/** 99.9 → 0.999 without floating-point dust (99.9 / 100 is 0.9990000000000001). */
const fromPercent = (p: number) => Number((p / 100).toFixed(6));
/** 0.29 → 29 without dust (0.29 × 100 is 28.999999999999996). */
export const toPercent = (fraction: number) => Number((fraction * 100).toFixed(4));

export const planningFormValues = (s: PlanningSettingsDto): PlanningFormInput => ({
  ...s,
  serviceLevel: toPercent(s.serviceLevel),
  holdingRate: toPercent(s.holdingRate),
});

/** Measured waste as an allowance the settings accept: a tenth of a percent, between 0 and 50 %. */
export const wasteAllowanceFrom = (measuredPercent: number): number => Math.min(50, Math.max(0, Math.round(measuredPercent * 10) / 10));

/** What each setting does, in a sentence; shown beside the field and on the read-only view. */
export const SETTING_HELP: Record<keyof PlanningSettingsDto, { label: string; help: string }> = {
  wastePercent: {
    label: 'Waste allowance (%)',
    help: 'Extra fasteners added to each need in an estimate, rounded up, for rivets drilled out, dropped or set crooked.',
  },
  maxPitchDiameters: {
    label: 'Maximum pitch (rivet diameters)',
    help: `An estimate warns when rivets on a line would sit farther apart than this many diameters. Published maxima differ: ${PUBLISHED_PITCH_MAXIMA_WORDS}; the kit’s plans set the real spacing.`,
  },
  serviceLevel: {
    label: 'Service level (%)',
    help: 'How often a bin should last until an order arrives; a higher level keeps more safety stock (95 % runs short about one lead time in twenty).',
  },
  orderCost: {
    label: 'Cost per order ($)',
    help: 'What placing one order costs the chapter in shipping, fees and someone’s time; a higher cost suggests fewer, larger orders.',
  },
  holdingRate: {
    label: 'Holding rate (% of unit cost per year)',
    help: 'What keeping stock on the shelf costs a year as a share of its price (money tied up, space, shelf life); a higher rate suggests smaller orders.',
  },
};
