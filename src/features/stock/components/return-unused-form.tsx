import { zodResolver } from '@hookform/resolvers/zod';
import { useMemo } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { returnUnusedBodySchema, type BinForYou, type ReturnUnusedBody } from '@shared/schemas/bins';
import { TextField } from '@/components/ui/field';
import { applyServerErrors } from '@/lib/errors';
import { confirmDone, type ActionDone } from '@/lib/action-done';
import { useReturnUnused } from '../api/bin-actions';
import { formatCents, formatQuantity } from '../utils/format';
import { ActionForm, QuantityInput } from './action-form';

/** Unused stock goes back in the bin and off the member's tab: at most what they drew and kept. */
export function ReturnUnusedForm({ bin, onDone }: { bin: BinForYou; onDone?: ActionDone }) {
  const returnUnused = useReturnUnused();
  const most = bin.forYou.yourNetDrawn;
  const schema = useMemo(
    () =>
      returnUnusedBodySchema.extend({
        quantity: returnUnusedBodySchema.shape.quantity.max(most, { error: `You can return at most ${formatQuantity(most, bin.unit)}: what you drew from ${bin.code} and kept.` }),
      }),
    [most, bin.unit, bin.code],
  );
  const form = useForm<z.input<typeof schema>, unknown, ReturnUnusedBody>({ resolver: zodResolver(schema), defaultValues: { note: '' } });

  const submit = form.handleSubmit(async (body) => {
    try {
      const entry = await returnUnused.mutateAsync({ code: bin.code, body });
      const said = `${formatQuantity(entry.quantity, bin.unit)} back in ${bin.code}: ${formatCents(entry.valueCents)} off your tab.`;
      form.reset({ note: '' });
      confirmDone(said, onDone);
    } catch (err) {
      form.setError('root', { message: applyServerErrors(err, form.setError, ['quantity', 'note']) });
    }
  });

  return (
    <ActionForm label="Return unused" onSubmit={submit} problem={form.formState.errors.root?.message} submitLabel={`Return to ${bin.code}`} busy={returnUnused.isPending}>
      <QuantityInput
        control={form.control}
        name="quantity"
        label="Quantity to return"
        max={most}
        hint={`You drew ${formatQuantity(most, bin.unit)} from this bin and have not returned them.`}
      />
      <TextField label="Note (optional)" error={form.formState.errors.note?.message} {...form.register('note')} />
    </ActionForm>
  );
}
