import type { PlanningSettingsDto } from '@shared/schemas/forecast';
import { formatUnitCost, formatTenth } from '../utils/format';
import { SETTING_HELP, toPercent } from '../utils/planning-form';

const VALUE: { [K in keyof PlanningSettingsDto]: (v: number) => string } = {
  wastePercent: (v) => `${formatTenth(v)} %`,
  maxPitchDiameters: (v) => `${formatTenth(v)} D`,
  serviceLevel: (v) => `${formatTenth(toPercent(v))} %`,
  orderCost: (v) => formatUnitCost(v),
  holdingRate: (v) => `${formatTenth(toPercent(v))} % a year`,
};

/** The settings as read by everyone who may not change them. */
export function PlanningSettingsView({ settings }: { settings: PlanningSettingsDto }) {
  const keys = Object.keys(VALUE) as (keyof PlanningSettingsDto)[];
  return (
    <dl className="flex flex-col divide-y divide-rule">
      {keys.map((k) => (
        <div key={k} className="grid gap-1 py-3 sm:grid-cols-[16rem_1fr]">
          <dt className="font-semibold">{SETTING_HELP[k].label.replace(/ \(.*\)$/, '')}</dt>
          <dd className="flex flex-col gap-1">
            <span className="font-mono font-medium">{VALUE[k](settings[k])}</span>
            <span className="text-sm text-steel">{SETTING_HELP[k].help}</span>
          </dd>
        </div>
      ))}
    </dl>
  );
}
