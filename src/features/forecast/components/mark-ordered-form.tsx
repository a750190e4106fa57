import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch } from 'react-hook-form';
import { toast } from 'sonner';
import type { z } from 'zod';
import { markOrderedBodySchema, type Alert } from '@shared/schemas/forecast';
import { TextField } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/errors';
import { useMarkOrdered } from '../api/alert-actions';
import { dayAfter, formatQuantity, leadTimeWords, packWords } from '../utils/format';

type Input = z.input<typeof markOrderedBodySchema>;
type Output = z.output<typeof markOrderedBodySchema>;

/** Records an order placed with the supplier: the quantity starts at what the reorder rule orders now, the date at today plus the bin's lead time. */
export function MarkOrderedForm({ alert, onDone }: { alert: Alert; onDone: () => void }) {
  const { bin } = alert;
  const markOrdered = useMarkOrdered();
  const form = useForm<Input, unknown, Output>({
    resolver: zodResolver(markOrderedBodySchema),
    defaultValues: { quantity: alert.toOrder || alert.suggestedQty, expectedAt: dayAfter(new Date(), bin.leadTimeDays), note: '' },
  });
  const { errors } = form.formState;
  const quantity = useWatch({ control: form.control, name: 'quantity' });
  const packs = Number.isFinite(quantity) && quantity > 0 ? packWords(quantity, bin.packSize) : '';

  const submit = form.handleSubmit(async (body) => {
    try {
      await markOrdered.mutateAsync({ id: alert.id, body });
      toast.success(`${bin.code}: ${formatQuantity(body.quantity, bin.unit)} on order.`);
      onDone();
    } catch (err) {
      form.setError('root', { message: applyServerErrors(err, form.setError, ['quantity', 'expectedAt', 'note']) });
    }
  });

  return (
    <form onSubmit={submit} noValidate aria-label={`Mark ${bin.code} ordered`} className="flex flex-col gap-3 rounded-lg border-2 border-ink-soft bg-paper p-3">
      {errors.root?.message && <Notice tone="bad">{errors.root.message}</Notice>}
      <div className="grid gap-3 sm:grid-cols-2">
        <TextField
          label={`Quantity ordered (${bin.unit})`}
          type="number"
          inputMode="numeric"
          min={1}
          step={1}
          hint={packs ? `That is ${packs}.` : undefined}
          error={errors.quantity?.message}
          {...form.register('quantity', { valueAsNumber: true })}
        />
        <TextField
          label="Expected by"
          type="date"
          hint={`Today plus the ${leadTimeWords(bin.leadTimeDays)} lead time; change it to the supplier's date.`}
          error={errors.expectedAt?.message}
          {...form.register('expectedAt')}
        />
      </div>
      <TextField label="Note (optional)" placeholder="Order number, who placed it…" error={errors.note?.message} {...form.register('note')} />
      <FormFooter submit="Save order" busy={markOrdered.isPending} onCancel={onDone} />
    </form>
  );
}
