import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import type { ActualWaste, PlanningSettingsDto } from '@shared/schemas/forecast';
import { TextField } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/errors';
import { useUpdatePlanningSettings } from '../api/planning-settings';
import { planningFormSchema, planningFormValues, SETTING_HELP, type PlanningFormInput } from '../utils/planning-form';
import { MeasuredWaste } from './measured-waste';

const FIELDS = ['wastePercent', 'maxPitchDiameters', 'serviceLevel', 'orderCost', 'holdingRate'] as const;
const STEP: Record<(typeof FIELDS)[number], string> = { wastePercent: '0.1', maxPitchDiameters: '0.5', serviceLevel: '0.1', orderCost: '0.01', holdingRate: '1' };

/** The chapter lead's planning settings, each with what it does; measured waste sits beside the waste allowance. */
export function PlanningSettingsForm({ settings, waste }: { settings: PlanningSettingsDto; waste: ActualWaste }) {
  const update = useUpdatePlanningSettings();
  const form = useForm<PlanningFormInput, unknown, PlanningSettingsDto>({ resolver: zodResolver(planningFormSchema), defaultValues: planningFormValues(settings) });
  const { errors } = form.formState;

  const submit = form.handleSubmit(async (body) => {
    try {
      const saved = await update.mutateAsync(body);
      form.reset(planningFormValues(saved));
      toast.success('Planning settings saved.');
    } catch (err) {
      form.setError('root', { message: applyServerErrors(err, form.setError, FIELDS) });
    }
  });

  const field = (name: (typeof FIELDS)[number]) => (
    <TextField
      label={SETTING_HELP[name].label}
      type="number"
      inputMode="decimal"
      step={STEP[name]}
      hint={SETTING_HELP[name].help}
      error={errors[name]?.message}
      {...form.register(name, { valueAsNumber: true })}
    />
  );

  return (
    <form onSubmit={submit} noValidate aria-label="Planning settings" className="flex flex-col gap-5">
      {errors.root?.message && <Notice tone="bad">{errors.root.message}</Notice>}
      <div className="grid gap-3 sm:grid-cols-2 sm:items-start">
        {field('wastePercent')}
        <MeasuredWaste waste={waste} onApplied={(v) => form.resetField('wastePercent', { defaultValue: v })} />
      </div>
      {field('maxPitchDiameters')}
      {field('serviceLevel')}
      <div className="grid gap-5 sm:grid-cols-2">
        {field('orderCost')}
        {field('holdingRate')}
      </div>
      <FormFooter submit="Save settings" busy={update.isPending} />
    </form>
  );
}
