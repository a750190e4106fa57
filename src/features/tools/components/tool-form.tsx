import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch } from 'react-hook-form';
import { z } from 'zod';
import { ALL_DRILLS } from '@shared/drills/drill-sizes';
import { diameterWords } from '@shared/estimate/length-words';
import { ESTIMATE_DIAMETERS } from '@shared/estimate/rivet-rules';
import type { CreateToolBody, Tool } from '@shared/schemas/tools';
import { chapterDay, startOfDayNamed } from '@shared/time/chapter-time';
import { HOUR_MS } from '@shared/time/durations';
import { CATEGORY_LABELS, DEFAULT_LOAN_DAYS, isRivetSized, TEMPORARY_FASTENER_SIZES, TOOL_CATEGORIES, type ToolCategory } from '@shared/tools/categories';
import { SelectField, TextField } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { Notice } from '@/components/ui/notice';
import { chapterTimeZone } from '@/lib/chapter-zone';
import { applyServerErrors } from '@/lib/errors';

const optionalWhole = (label: string) =>
  z
    .string()
    .trim()
    .refine((s) => s === '' || /^\d+$/.test(s), { error: `${label} is a whole number, or leave it empty.` });

/** The form's own shape (text fields as typed); turned into the shared create/update body on submit. */
const formSchema = z.object({
  name: z.string().trim().min(1, { error: 'Enter a name.' }).max(120),
  category: z.enum(TOOL_CATEGORIES),
  location: z.string().trim().max(80),
  replacementValue: z
    .string()
    .trim()
    .refine((s) => s === '' || /^\d+(\.\d{1,2})?$/.test(s), { error: 'Enter an amount like 129.50, or leave it empty.' }),
  loanDays: optionalWhole('The loan period'),
  requiredSignoffId: z.string(),
  serviceIntervalDays: optionalWhole('The service interval'),
  lastServiceAt: z.string(),
  drillSize: z.string().trim(),
  rivetDiameter32: z.string(),
  traySize: z.string(),
  trayCapacity: optionalWhole('The tray capacity'),
  accessories: z.string(),
  notes: z.string().max(2000),
});
type FormValues = z.infer<typeof formSchema>;

const toNumber = (s: string) => (s.trim() === '' ? null : Number(s));
/** Drill bits record their size; a countersink cutter records its pilot in the same field. */
const hasDrillSize = (c: ToolCategory) => c === 'drill_bit' || c === 'countersink_cutter';
const RIVET_SIZE_OPTIONS = [{ value: '', label: 'Choose the rivet size' }, ...ESTIMATE_DIAMETERS.map((d) => ({ value: String(d), label: diameterWords(d) }))];

function toBody(v: FormValues): CreateToolBody {
  return {
    name: v.name,
    category: v.category,
    location: v.location,
    replacementValueCents: v.replacementValue ? Math.round(Number(v.replacementValue) * 100) : 0,
    loanDays: toNumber(v.loanDays),
    requiredSignoffId: v.requiredSignoffId ? Number(v.requiredSignoffId) : null,
    serviceIntervalDays: toNumber(v.serviceIntervalDays),
    lastServiceAt: v.lastServiceAt ? new Date(startOfDayNamed(v.lastServiceAt, chapterTimeZone()).getTime() + 12 * HOUR_MS).toISOString() : null,
    drillSize: hasDrillSize(v.category) && v.drillSize ? v.drillSize : null,
    rivetDiameter32: isRivetSized(v.category) ? toNumber(v.rivetDiameter32) : null,
    traySize: v.category === 'temporary_fastener_tray' && v.traySize ? (v.traySize as CreateToolBody['traySize']) : null,
    trayCapacity: v.category === 'temporary_fastener_tray' ? toNumber(v.trayCapacity) : null,
    accessories: v.accessories
      .split('\n')
      .map((a) => a.trim())
      .filter(Boolean),
    notes: v.notes,
  };
}

function toForm(tool?: Tool): FormValues {
  return {
    name: tool?.name ?? '',
    category: tool?.category ?? 'hand_rivet_puller',
    location: tool?.location ?? '',
    replacementValue: tool ? (tool.replacementValueCents / 100).toFixed(2) : '',
    loanDays: tool?.loanDaysOverride?.toString() ?? '',
    requiredSignoffId: tool?.requiredSignoff?.id.toString() ?? '',
    serviceIntervalDays: tool?.serviceIntervalDays?.toString() ?? '',
    lastServiceAt: tool?.lastServiceAt ? chapterDay(new Date(tool.lastServiceAt), chapterTimeZone()) : '',
    drillSize: tool?.drillSize?.name ?? '',
    rivetDiameter32: tool?.rivetDiameter32?.toString() ?? '',
    traySize: tool?.traySize ?? '',
    trayCapacity: tool?.trayCapacity?.toString() ?? '',
    accessories: tool?.accessories.join('\n') ?? '',
    notes: tool?.notes ?? '',
  };
}

const FIELD_OF: Record<string, keyof FormValues> = { replacementValueCents: 'replacementValue' };

export function ToolForm({
  tool,
  signoffs,
  submitLabel,
  onSubmit,
}: {
  tool?: Tool;
  signoffs: { id: number; name: string }[];
  submitLabel: string;
  onSubmit: (body: CreateToolBody) => Promise<unknown>;
}) {
  const form = useForm<FormValues>({ resolver: zodResolver(formSchema), defaultValues: toForm(tool) });
  const { errors, isSubmitting } = form.formState;
  const category = useWatch({ control: form.control, name: 'category' });

  const submit = form.handleSubmit(async (values) => {
    try {
      await onSubmit(toBody(values));
    } catch (err) {
      const fields = Object.keys(toForm());
      const message = applyServerErrors(
        err,
        (path, error) => form.setError(FIELD_OF[path] ?? (path as keyof FormValues), error),
        fields.concat(Object.keys(FIELD_OF)),
      );
      form.setError('root', { message });
    }
  });

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4">
      {errors.root?.message && <Notice tone="bad">{errors.root.message}</Notice>}
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="Name" error={errors.name?.message} {...form.register('name')} />
        <SelectField label="Kind" options={TOOL_CATEGORIES.map((c) => ({ value: c, label: CATEGORY_LABELS[c] }))} {...form.register('category')} />
        <TextField label="Lives at (cabinet, shelf)" error={errors.location?.message} {...form.register('location')} />
        <TextField label="Replacement value" inputMode="decimal" hint="In dollars, for the lead's overdue list." error={errors.replacementValue?.message} {...form.register('replacementValue')} />
        <TextField
          label="Loan period in days"
          inputMode="numeric"
          hint={`Empty: the kind's default, ${DEFAULT_LOAN_DAYS[category]} days.`}
          error={errors.loanDays?.message}
          {...form.register('loanDays')}
        />
        <SelectField
          label="Sign-off needed to borrow it"
          options={[{ value: '', label: 'None' }, ...signoffs.map((s) => ({ value: String(s.id), label: s.name }))]}
          {...form.register('requiredSignoffId')}
        />
        <TextField label="Service or calibration every (days)" inputMode="numeric" error={errors.serviceIntervalDays?.message} {...form.register('serviceIntervalDays')} />
        <TextField label="Last serviced on" type="date" {...form.register('lastServiceAt')} />
        {isRivetSized(category) && (
          <SelectField label="For rivet size" options={RIVET_SIZE_OPTIONS} error={errors.rivetDiameter32?.message} {...form.register('rivetDiameter32')} />
        )}
        {hasDrillSize(category) && (
          <>
            <TextField
              label={category === 'drill_bit' ? 'Drill size' : 'Pilot'}
              list="drill-sizes"
              placeholder={category === 'drill_bit' ? '#40' : '#30'}
              hint={category === 'drill_bit' ? 'Number (#1–#80), letter (A–Z) or fraction (1/8).' : 'The drill size the pilot fits, like #30 for 1/8 in rivets.'}
              error={errors.drillSize?.message}
              {...form.register('drillSize')}
            />
            <datalist id="drill-sizes">
              {ALL_DRILLS.map((d) => (
                <option key={d.name} value={d.name}>{`${d.inch.toFixed(4)} in`}</option>
              ))}
            </datalist>
          </>
        )}
        {category === 'temporary_fastener_tray' && (
          <>
            <SelectField
              label="Temporary fastener size"
              options={[{ value: '', label: 'Choose a size' }, ...TEMPORARY_FASTENER_SIZES.map((s) => ({ value: s, label: `${s} in` }))]}
              error={errors.traySize?.message}
              {...form.register('traySize')}
            />
            <TextField label="A full tray holds" inputMode="numeric" error={errors.trayCapacity?.message} {...form.register('trayCapacity')} />
          </>
        )}
      </div>
      <label className="flex flex-col gap-1.5">
        <span className="text-sm font-semibold">Travels with it (one per line)</span>
        <textarea rows={3} className="rounded-lg border-2 border-edge bg-card p-3" placeholder={'Nosepiece 1/8\nNosepiece 5/32'} {...form.register('accessories')} />
      </label>
      <label className="flex flex-col gap-1.5">
        <span className="text-sm font-semibold">Notes</span>
        <textarea rows={3} className="rounded-lg border-2 border-edge bg-card p-3" {...form.register('notes')} />
      </label>
      <FormFooter submit={submitLabel} busy={isSubmitting} />
    </form>
  );
}
