import { useFormContext, useWatch } from 'react-hook-form';
import { ESTIMATE_DIAMETERS, ESTIMATE_RIVET_KINDS } from '@shared/estimate/rivet-rules';
import type { LengthUnit } from '@shared/schemas/builds';
import { RIVET_MATERIALS, rivetHeadChoices } from '@shared/stock/kinds';
import { SelectField, TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { errorAt, hasManyRows, type AssemblyFormValues } from '../utils/form-values';
import type { LiveLine } from '../utils/live-estimate';
import { diameterText, RIVET_KIND_LABELS } from '../utils/words';
import { LineEstimateView } from './line-estimate';
import { SheetStackField } from './sheet-stack-field';

const KIND_OPTIONS = ESTIMATE_RIVET_KINDS.map((k) => ({ value: k, label: RIVET_KIND_LABELS[k] }));
const MATERIAL_OPTIONS = [{ value: '', label: 'Not stated' }, ...RIVET_MATERIALS.map((m) => ({ value: m, label: m }))];
const FLUSH_PREP_OPTIONS = [
  { value: '', label: 'As the rule says' },
  { value: 'countersink', label: 'Countersink' },
  { value: 'dimple', label: 'Dimple' },
];
const DIAMETER_OPTIONS = ESTIMATE_DIAMETERS.map((d) => ({ value: String(d), label: `${diameterText(d)} (−${d})` }));

const RADIO = 'flex min-h-12 flex-1 cursor-pointer items-center gap-3 rounded-lg border-2 border-edge bg-card px-3 font-semibold has-[:checked]:border-ink has-[:checked]:bg-paper';

/** One rivet line: where it runs, how it is spaced, what it fastens, with the rivet; its estimate beneath. */
export function RivetLineFields({ index, unit, live, onRemove }: { index: number; unit: LengthUnit; live: LiveLine | undefined; onRemove: () => void }) {
  const { control, register, formState } = useFormContext<AssemblyFormValues>();
  const [spacing, kind, rows, head] = useWatch({ control, name: [`lines.${index}.spacing`, `lines.${index}.kind`, `lines.${index}.rows`, `lines.${index}.head`] });
  const err = (field: string) => errorAt(formState.errors, `lines.${index}.${field}`);
  const n = index + 1;

  return (
    <fieldset className="flex flex-col gap-4 rounded-xl border border-rule bg-card p-4 shadow-sm">
      <legend className="sr-only">Rivet line {n}</legend>
      <div className="flex items-center justify-between gap-2">
        <h3 className="text-lg font-semibold">
          Rivet line {n}
        </h3>
        <button type="button" className="min-h-12 rounded-lg px-3 font-semibold text-bad underline underline-offset-4" aria-label={`Remove line ${n}`} onClick={onRemove}>
          Remove line
        </button>
      </div>

      <TextField label="Label (optional)" placeholder="Spar to skin, top" error={err('label')} {...register(`lines.${index}.label`)} />
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label={`Length (${unit})`} inputMode="decimal" autoComplete="off" error={err('length')} {...register(`lines.${index}.length`)} />
        <TextField label="Rows" inputMode="numeric" autoComplete="off" error={err('rows')} {...register(`lines.${index}.rows`)} />
      </div>
      {hasManyRows(rows) && (
        <div className="grid gap-4 sm:grid-cols-2">
          <fieldset className="flex flex-col gap-2">
            <legend className="mb-1 text-sm font-semibold">Row pattern</legend>
            <div className="flex flex-col gap-2 sm:flex-row">
              <label className={RADIO}>
                <input type="radio" value="inline" className="size-5" {...register(`lines.${index}.rowPattern`)} />
                Inline
              </label>
              <label className={RADIO}>
                <input type="radio" value="staggered" className="size-5" {...register(`lines.${index}.rowPattern`)} />
                Staggered
              </label>
            </div>
          </fieldset>
          <TextField
            label={`Row spacing (${unit}, optional)`}
            inputMode="decimal"
            autoComplete="off"
            hint="Leave empty for 75 % of the pitch, never less than 2.5D. Staggered rows sit half a pitch along, one hole fewer in every second row."
            error={err('rowSpacing')}
            {...register(`lines.${index}.rowSpacing`)}
          />
        </div>
      )}

      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 text-sm font-semibold">Spacing</legend>
        <div className="flex flex-col gap-2 sm:flex-row">
          <label className={RADIO}>
            <input type="radio" value="pitch" className="size-5" {...register(`lines.${index}.spacing`)} />
            By target pitch
          </label>
          <label className={RADIO}>
            <input type="radio" value="holes" className="size-5" {...register(`lines.${index}.spacing`)} />
            By holes per row
          </label>
        </div>
      </fieldset>
      <div className="grid gap-4 sm:grid-cols-2">
        {spacing === 'holes' ? (
          <TextField label="Holes per row" inputMode="numeric" autoComplete="off" hint="End holes at the edge distance, the rest evenly between." error={err('holesPerRow')} {...register(`lines.${index}.holesPerRow`)} />
        ) : (
          <TextField
            label={`Target pitch (${unit})`}
            inputMode="decimal"
            autoComplete="off"
            hint="The widest spacing you want; holes are spread evenly no wider than this."
            error={err('pitch')}
            {...register(`lines.${index}.pitch`)}
          />
        )}
        <TextField
          label={`Edge distance (${unit}, optional)`}
          inputMode="decimal"
          autoComplete="off"
          hint="Leave empty for the published minimum (2D, 2.5D countersunk) or the build’s floor, whichever is larger."
          error={err('edgeDistance')}
          {...register(`lines.${index}.edgeDistance`)}
        />
      </div>

      <SheetStackField line={index} unit={unit} />

      <label className="flex min-h-12 cursor-pointer items-center gap-3 font-semibold">
        <input type="checkbox" className="size-6" {...register(`lines.${index}.structural`)} />
        Structural line (carries load)
      </label>

      <div className="grid gap-4 sm:grid-cols-2">
        <SelectField label="Rivet kind" options={KIND_OPTIONS} error={err('kind')} {...register(`lines.${index}.kind`)} />
        <SelectField label="Head" options={rivetHeadChoices(kind === 'solid', head)} error={err('head')} {...register(`lines.${index}.head`)} />
        <SelectField label="Diameter" hint="The dash is in 32nds of an inch." options={DIAMETER_OPTIONS} error={err('diameter32')} {...register(`lines.${index}.diameter32`)} />
        <SelectField label="Material (optional)" options={MATERIAL_OPTIONS} error={err('material')} {...register(`lines.${index}.material`)} />
      </div>
      {head === 'countersunk' && (
        <SelectField
          label="Flush preparation"
          hint="How the top sheet takes the head. The rule: countersink a sheet at or above the minimum gage for the rivet, dimple a thinner one."
          options={FLUSH_PREP_OPTIONS}
          error={err('flushPrep')}
          {...register(`lines.${index}.flushPrep`)}
        />
      )}
      <label className="flex min-h-12 cursor-pointer items-center gap-3 font-semibold">
        <input type="checkbox" className="size-6" {...register(`lines.${index}.repair`)} />
        Repair of drilled-out rivets (one size up)
      </label>

      <section aria-label={`Estimate for rivet line ${n}`} aria-live="polite" className="rounded-lg border border-rule bg-paper p-3">
        <h4 className="mb-2 text-sm font-semibold tracking-wide text-steel uppercase">Estimate for this line</h4>
        {!live || live.state === 'incomplete' ? (
          <p className="text-steel">Enter the length, the spacing and each sheet’s thickness to see this line worked out.</p>
        ) : live.state === 'error' ? (
          <Notice tone="bad" title="This line cannot be saved as it stands">
            <p>{live.message}</p>
          </Notice>
        ) : (
          <LineEstimateView line={live.estimate} unit={unit} kind={kind} layout={live.line} />
        )}
      </section>
    </fieldset>
  );
}
