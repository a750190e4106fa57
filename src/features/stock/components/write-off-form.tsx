import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch } from 'react-hook-form';
import type { z } from 'zod';
import { writeOffBodySchema, type BinForYou, type WriteOffBody } from '@shared/schemas/bins';
import { TextField } from '@/components/ui/field';
import { applyServerErrors } from '@/lib/errors';
import { confirmDone, type ActionDone } from '@/lib/action-done';
import { useWriteOff } from '../api/bin-actions';
import { formatCents, formatQuantity } from '../utils/format';
import { valueAtCost } from '../utils/value';
import { ActionForm, Preview, QuantityInput } from './action-form';

/** Damaged, dropped, out of date: stock leaves the bin with a reason on the ledger. */
export function WriteOffForm({ bin, onDone }: { bin: BinForYou; onDone?: ActionDone }) {
  const writeOff = useWriteOff();
  const form = useForm<z.input<typeof writeOffBodySchema>, unknown, WriteOffBody>({ resolver: zodResolver(writeOffBodySchema), defaultValues: { note: '' } });
  const quantity = useWatch({ control: form.control, name: 'quantity' });
  const lost = Number.isInteger(quantity) && quantity > 0 ? quantity : undefined;

  const submit = form.handleSubmit(async (body) => {
    try {
      const entry = await writeOff.mutateAsync({ code: bin.code, body });
      const said = `${formatQuantity(-entry.quantity, bin.unit)} written off from ${bin.code}.`;
      form.reset({ note: '' });
      confirmDone(said, onDone);
    } catch (err) {
      form.setError('root', { message: applyServerErrors(err, form.setError, ['quantity', 'note']) });
    }
  });

  return (
    <ActionForm label="Write off" onSubmit={submit} problem={form.formState.errors.root?.message} submitLabel="Write off the stock" busy={writeOff.isPending}>
      <QuantityInput control={form.control} name="quantity" label="Quantity to write off" max={bin.onHand} hint={`${formatQuantity(bin.onHand, bin.unit)} on hand.`} />
      {lost !== undefined && (
        <Preview>
          Value written off: <strong>{formatCents(valueAtCost(lost, bin.unitCost))}</strong>
        </Preview>
      )}
      <TextField label="Reason" hint="Damaged, dropped, out of date…" error={form.formState.errors.note?.message} {...form.register('note')} />
    </ActionForm>
  );
}
