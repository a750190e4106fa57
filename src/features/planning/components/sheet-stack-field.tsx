import { useFieldArray, useFormContext, useWatch } from 'react-hook-form';
import type { LengthUnit } from '@shared/schemas/builds';
import { TextField } from '@/components/ui/field';
import { errorAt, type AssemblyFormValues } from '../utils/form-values';
import { lengthText } from '../utils/words';

/** Sheet thicknesses a kit commonly uses, in inches (common practice), offered as one-tap picks. */
export const SHEET_GAUGES_IN = ['0.016', '0.020', '0.025', '0.032', '0.040', '0.050', '0.063'] as const;
const MAX_SHEETS = 10;

const CHIP = 'inline-flex min-h-12 min-w-16 items-center justify-center rounded-lg border-2 border-ink bg-card px-3 font-mono hover:bg-paper disabled:border-rule disabled:text-steel';

/** The sheets a line's rivets pass through, each with its thickness; the grip follows their sum. */
export function SheetStackField({ line, unit }: { line: number; unit: LengthUnit }) {
  const { control, register, setValue, getValues, formState } = useFormContext<AssemblyFormValues>();
  const { fields, append, remove } = useFieldArray({ control, name: `lines.${line}.stack` });
  const sheets = useWatch({ control, name: `lines.${line}.stack` });
  const total = sheets.reduce((sum, s) => sum + Number(s.thickness.replace(',', '.')), 0);
  const arrayError = errorAt(formState.errors, `lines.${line}.stack.root`);

  const pick = (gauge: string) => {
    const empty = getValues(`lines.${line}.stack`).findIndex((s) => s.thickness.trim() === '');
    if (empty >= 0) setValue(`lines.${line}.stack.${empty}.thickness`, gauge, { shouldDirty: true, shouldValidate: formState.isSubmitted });
    else append({ thickness: gauge });
  };

  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="mb-1 text-base font-semibold">Sheet stack</legend>
      {fields.map((field, k) => (
        <div key={field.id} className="flex items-end gap-2">
          <div className="flex-1">
            <TextField
              label={`Sheet ${k + 1} thickness (${unit})`}
              inputMode="decimal"
              autoComplete="off"
              error={errorAt(formState.errors, `lines.${line}.stack.${k}.thickness`)}
              {...register(`lines.${line}.stack.${k}.thickness`)}
            />
          </div>
          {fields.length > 1 && (
            <button type="button" className="mb-0 min-h-12 rounded-lg px-3 font-semibold text-bad underline underline-offset-4" aria-label={`Remove sheet ${k + 1}`} onClick={() => remove(k)}>
              Remove
            </button>
          )}
        </div>
      ))}
      {arrayError && (
        <p role="alert" className="text-sm font-medium text-bad">
          {arrayError}
        </p>
      )}
      {unit === 'in' && (
        <div role="group" aria-label="Common sheet thicknesses (in)" className="flex flex-wrap gap-2">
          {SHEET_GAUGES_IN.map((gauge) => (
            <button key={gauge} type="button" className={CHIP} aria-label={`Add a ${gauge} in sheet`} disabled={fields.length >= MAX_SHEETS && !sheets.some((s) => s.thickness.trim() === '')} onClick={() => pick(gauge)}>
              {gauge}
            </button>
          ))}
        </div>
      )}
      <div className="flex flex-wrap items-center justify-between gap-2">
        <button
          type="button"
          className="min-h-12 rounded-lg border-2 border-ink px-4 font-semibold disabled:border-rule disabled:text-steel"
          disabled={fields.length >= MAX_SHEETS}
          onClick={() => append({ thickness: '' })}
        >
          Add a sheet
        </button>
        {Number.isFinite(total) && total > 0 && <span className="font-mono text-sm">Stack {lengthText(total, unit)}</span>}
      </div>
    </fieldset>
  );
}
