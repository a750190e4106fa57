import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import type { z } from 'zod';
import { dismissBodySchema, type Alert } from '@shared/schemas/forecast';
import { TextField } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/errors';
import { useDismissAlert } from '../api/alert-actions';

type Input = z.input<typeof dismissBodySchema>;
type Output = z.output<typeof dismissBodySchema>;

/** Sets an alert aside; the reason is kept with it so the next person knows why nobody ordered. */
export function DismissForm({ alert, onDone }: { alert: Alert; onDone: () => void }) {
  const dismiss = useDismissAlert();
  const form = useForm<Input, unknown, Output>({ resolver: zodResolver(dismissBodySchema), defaultValues: { reason: '' } });
  const { errors } = form.formState;

  const submit = form.handleSubmit(async ({ reason }) => {
    try {
      await dismiss.mutateAsync({ id: alert.id, reason });
      toast.success(`${alert.bin.code}: alert dismissed.`);
      onDone();
    } catch (err) {
      form.setError('root', { message: applyServerErrors(err, form.setError, ['reason']) });
    }
  });

  return (
    <form onSubmit={submit} noValidate aria-label={`Dismiss the alert for ${alert.bin.code}`} className="flex flex-col gap-3 rounded-lg border-2 border-ink-soft bg-paper p-3">
      {errors.root?.message && <Notice tone="bad">{errors.root.message}</Notice>}
      <TextField
        label="Why dismiss it?"
        placeholder="Bin being retired, stock found in the hangar…"
        hint="Kept with the alert for whoever looks next."
        error={errors.reason?.message}
        {...form.register('reason')}
      />
      <FormFooter submit="Dismiss alert" variant="danger" busy={dismiss.isPending} onCancel={onDone} />
    </form>
  );
}
