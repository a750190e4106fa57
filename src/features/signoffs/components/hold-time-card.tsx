import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import type { z } from 'zod';
import { HOLD_HOURS_MAX, HOLD_HOURS_MIN, updateCribSettingsBodySchema } from '@shared/schemas/signoffs';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { Card } from '@/components/ui/page';
import { applyServerErrors } from '@/lib/errors';
import { useUpdateCribSettings } from '../api/update-crib-settings';

type Input = z.input<typeof updateCribSettingsBodySchema>;
type Output = z.output<typeof updateCribSettingsBodySchema>;

const hoursWords = (h: number) => (h % 24 === 0 ? `${h} hours (${h / 24} day${h === 24 ? '' : 's'})` : `${h} hour${h === 1 ? '' : 's'}`);

/**
 * The chapter's hold time: how long a returned tool waits for the next person in its queue. Only a
 * chapter lead may change it (the server says so too); others read it.
 */
export function HoldTimeCard({ holdHours, canChange }: { holdHours: number; canChange: boolean }) {
  return (
    <Card title="Hold time">
      <p className="mb-3">
        A returned tool waits <strong>{hoursWords(holdHours)}</strong> for the first person in its queue, then goes to the next.
      </p>
      {canChange ? <HoldTimeForm holdHours={holdHours} /> : <p className="text-sm text-steel">Only the chapter lead changes the hold time.</p>}
    </Card>
  );
}

function HoldTimeForm({ holdHours }: { holdHours: number }) {
  const update = useUpdateCribSettings();
  const form = useForm<Input, unknown, Output>({ resolver: zodResolver(updateCribSettingsBodySchema), values: { holdHours } });
  const { errors } = form.formState;

  const submit = form.handleSubmit(async (body) => {
    try {
      const saved = await update.mutateAsync(body);
      toast.success(`Returned tools now wait ${hoursWords(saved.holdHours)} for the next person.`);
    } catch (err) {
      form.setError('root', { message: applyServerErrors(err, form.setError, ['holdHours']) });
    }
  });

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-3" aria-label="Hold time">
      {errors.root?.message && <Notice tone="bad">{errors.root.message}</Notice>}
      <div className="flex flex-col gap-3 sm:flex-row sm:items-end">
        <div className="sm:w-56">
          <TextField
            label="Hours a returned tool waits"
            type="number"
            inputMode="numeric"
            min={HOLD_HOURS_MIN}
            max={HOLD_HOURS_MAX}
            step={1}
            error={errors.holdHours?.message}
            {...form.register('holdHours', { valueAsNumber: true })}
          />
        </div>
        <Button type="submit" variant="secondary" busy={update.isPending}>
          Save hold time
        </Button>
      </div>
      <p className="text-sm text-steel">
        {HOLD_HOURS_MIN} to {HOLD_HOURS_MAX} hours (two weeks). A new time applies to the next tool returned; a tool already held keeps
        its time.
      </p>
    </form>
  );
}
