import { useMemo, useState } from 'react';
import { FormProvider, useFieldArray, useForm, useWatch, type Path, type Resolver } from 'react-hook-form';
import { estimate, isEstimateErrors } from '@shared/estimate/estimate';
import { cautionsFor } from '@shared/safety/estimate-cautions';
import { ASSEMBLY_STATUS_LABELS, ASSEMBLY_STATUSES, type Assembly, type CreateAssemblyInput, type LengthUnit } from '@shared/schemas/builds';
import { Button } from '@/components/ui/button';
import { SelectField, TextAreaField, TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { Card } from '@/components/ui/page';
import { ApiError } from '@/lib/api-client';
import { formatCount } from '@/lib/format';
import { convertLine, emptyLine, errorAt, formDefaults, formPath, schemaErrors, type AssemblyFormValues } from '../utils/form-values';
import { liveEstimate } from '../utils/live-estimate';
import { useDebounced } from '../utils/use-debounced';
import { lengthText, plural, UNIT_WORDS } from '../utils/words';
import { EstimateTotalsView } from './estimate-totals';
import { ExtraItemsFields } from './extra-items-fields';
import { FastenerNeeds } from './fastener-needs';
import { PlanningCaution } from './planning-caution';
import { RivetLineFields } from './rivet-line-fields';

const resolver: Resolver<AssemblyFormValues, unknown, CreateAssemblyInput> = (values) => {
  const r = schemaErrors(values);
  return r.errors ? { values: {}, errors: r.errors } : { values: r.values, errors: {} };
};

const STATUS_OPTIONS = ASSEMBLY_STATUSES.map((s) => ({ value: s, label: ASSEMBLY_STATUS_LABELS[s] }));
const UNIT_CHOICE = 'flex min-h-12 flex-1 cursor-pointer items-center gap-3 rounded-lg border-2 border-edge bg-card px-3 font-semibold has-[:checked]:border-ink has-[:checked]:bg-paper';

export interface AssemblyFormProps {
  assembly?: Assembly;
  build: { name: string; edgeFloorIn: number | null };
  /** The unit a new assembly starts in: the person's preferred one, else inches. */
  defaultUnit: LengthUnit;
  /** Offered when the chosen unit is not the person's usual one. */
  onPreferUnit?: (unit: LengthUnit) => Promise<unknown>;
  preferredUnit?: LengthUnit;
  /** The chapter's planning settings: waste allowance in percent, widest pitch in rivet diameters. */
  settings: { wastePercent: number; maxPitchDiameters?: number };
  submitLabel: string;
  onSubmit: (body: CreateAssemblyInput) => Promise<unknown>;
}

/**
 * The assembly editor: its name, dates and unit, its rivet lines and extra items, and beside them the
 * estimate worked out by the same shared code the server uses, as the member types.
 */
export function AssemblyForm({ assembly, build, defaultUnit, onPreferUnit, preferredUnit, settings, submitLabel, onSubmit }: AssemblyFormProps) {
  const [initial] = useState(() => formDefaults(assembly, defaultUnit));
  const form = useForm<AssemblyFormValues, unknown, CreateAssemblyInput>({ resolver, defaultValues: initial });
  const { control, register, formState } = form;
  const lines = useFieldArray({ control, name: 'lines' });
  const [unit, lineValues] = useWatch({ control, name: ['unit', 'lines'] });
  const watched = useMemo(() => ({ unit, lines: lineValues }), [unit, lineValues]);
  const settled = useDebounced(watched, 150);
  const { wastePercent, maxPitchDiameters } = settings;
  const live = useMemo(
    () => liveEstimate(settled.unit, settled.lines, { edgeFloorIn: build.edgeFloorIn, wastePercent, maxPitchDiameters }),
    [settled, build.edgeFloorIn, wastePercent, maxPitchDiameters],
  );
  const cautions = cautionsFor(lineValues.some((l) => l.kind === 'blind-general'));
  const [unitSaved, setUnitSaved] = useState<LengthUnit | undefined>();
  const blocked = live.errors > 0;

  const changeUnit = (next: LengthUnit) => {
    if (next === form.getValues('unit')) return;
    lines.replace(form.getValues('lines').map((l) => convertLine(l, next)));
    form.setValue('unit', next, { shouldDirty: true });
  };

  const submit = form.handleSubmit(async (body) => {
    // The live estimate trails typing by a moment: check the lines as saved, too.
    const check = estimate({ unit: body.unit, lines: body.lines }, { edgeFloorIn: build.edgeFloorIn, maxPitchDiameters, defaultWastePercent: wastePercent });
    if (isEstimateErrors(check)) {
      form.setError('root', { message: check.errors.map((e) => e.message).join(' ') });
      return;
    }
    try {
      await onSubmit(body);
    } catch (err) {
      if (err instanceof ApiError) for (const issue of err.issues) form.setError(formPath(issue.path.split('.')) as Path<AssemblyFormValues>, { message: issue.message });
      form.setError('root', { message: err instanceof Error ? err.message : 'Something went wrong. Try again.' });
    }
  });

  const usual = preferredUnit ?? 'in';
  const rootError = formState.errors.root?.message;

  return (
    <FormProvider {...form}>
      <form aria-label="Assembly" onSubmit={submit} noValidate className="flex flex-col gap-5">
        <PlanningCaution cautions={cautions} />
        <Card title="The assembly">
          <div className="flex flex-col gap-4">
            <TextField label="Assembly name" placeholder="Rudder" autoComplete="off" error={formState.errors.name?.message} {...register('name')} />
            <div className="grid gap-4 sm:grid-cols-3">
              <SelectField label="Status" options={STATUS_OPTIONS} error={formState.errors.status?.message} {...register('status')} />
              <TextField label="Planned start" type="date" error={formState.errors.plannedStart?.message} {...register('plannedStart')} />
              <TextField label="Planned finish" type="date" error={formState.errors.plannedFinish?.message} {...register('plannedFinish')} />
            </div>
            <fieldset className="flex flex-col gap-2">
              <legend className="mb-1 text-sm font-semibold">Lengths in</legend>
              <div className="flex gap-2">
                {(['in', 'mm'] as const).map((u) => (
                  <label key={u} className={UNIT_CHOICE}>
                    <input type="radio" name="unit" value={u} checked={unit === u} onChange={() => changeUnit(u)} className="size-5" />
                    {UNIT_WORDS[u].replace(/^./, (c) => c.toUpperCase())} ({u})
                  </label>
                ))}
              </div>
              <p className="text-sm text-steel">Changing the unit converts the lengths already entered. Rivet diameters stay in 32nds of an inch.</p>
              {onPreferUnit && unit !== usual && unitSaved !== unit && (
                <Button
                  variant="quiet"
                  className="self-start px-0"
                  onClick={() => void onPreferUnit(unit).then(() => setUnitSaved(unit), () => form.setError('root', { message: 'Your usual unit could not be saved. Try again.' }))}
                >
                  Make {UNIT_WORDS[unit]} my usual unit
                </Button>
              )}
              {unitSaved === unit && <p role="status" className="text-sm">New assemblies will start in {UNIT_WORDS[unit]}.</p>}
            </fieldset>
            {build.edgeFloorIn !== null && (
              <p className="text-sm">
                {build.name} sets an edge distance floor of <strong>{lengthText(unit === 'mm' ? build.edgeFloorIn * 25.4 : build.edgeFloorIn, unit)}</strong>: a line without its own edge distance uses at least this.
              </p>
            )}
            <TextAreaField label="Notes" {...register('notes')} />
          </div>
        </Card>

        <section aria-labelledby="rivet-lines-heading" className="flex flex-col gap-4">
          <h2 id="rivet-lines-heading" className="text-lg font-semibold">
            Rivet lines
          </h2>
          {lines.fields.length === 0 && <p className="text-steel">No rivet lines yet.</p>}
          {lines.fields.map((field, i) => (
            <RivetLineFields key={field.id} index={i} unit={unit} live={live.lines[i]} onRemove={() => lines.remove(i)} />
          ))}
          <Button variant="secondary" className="self-start" onClick={() => lines.append(emptyLine())}>
            Add a rivet line
          </Button>
        </section>

        <ExtraItemsFields />

        <Card title="Estimate for the whole assembly">
          <div aria-live="polite">
            {live.result ? (
              <EstimateTotalsView totals={live.result.totals} wastePercent={live.result.wastePercent}>
                <FastenerNeeds result={live.result} />
                {live.incomplete > 0 && <p className="text-sm text-steel">{plural(live.incomplete, 'line')} not complete yet and not counted.</p>}
              </EstimateTotalsView>
            ) : blocked ? (
              <p>{plural(live.errors, 'line')} cannot be riveted as entered; each says why.</p>
            ) : (
              <p className="text-steel">Complete a rivet line to see the totals.</p>
            )}
          </div>
        </Card>

        {rootError && <Notice tone="bad">{rootError}</Notice>}
        {errorAt(formState.errors, 'lines.root') && <Notice tone="bad">{errorAt(formState.errors, 'lines.root')}</Notice>}

        <div
          role="region"
          aria-label="Totals and save"
          className="sticky bottom-14 z-10 -mx-4 flex flex-wrap items-center justify-between gap-3 border-t-2 border-ink bg-card px-4 py-3 shadow-[0_-4px_12px_rgba(0,0,0,0.08)] sm:bottom-0 sm:mx-0 sm:rounded-t-xl"
        >
          <p data-testid="live-totals" aria-live="polite" id="live-totals" className="text-base">
            {blocked ? (
              <strong className="text-bad">Fix {plural(live.errors, 'line')} before saving.</strong>
            ) : live.result ? (
              <>
                <strong className="font-mono">{formatCount(live.result.totals.rivets)}</strong> rivets · <strong className="font-mono">{formatCount(live.result.totals.rivetsWithWaste)}</strong> with {live.result.wastePercent} % waste
              </>
            ) : (
              <span className="text-steel">No complete rivet line yet.</span>
            )}
          </p>
          <Button type="submit" busy={formState.isSubmitting} disabled={blocked} aria-describedby="live-totals" className="max-sm:w-full">
            {submitLabel}
          </Button>
        </div>
      </form>
    </FormProvider>
  );
}
