import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { moveBodySchema, type BinForYou, type MoveBody } from '@shared/schemas/bins';
import { SelectField, TextField } from '@/components/ui/field';
import { applyServerErrors } from '@/lib/errors';
import { confirmDone, type ActionDone } from '@/lib/action-done';
import { useMove } from '../api/bin-actions';
import { formatCount, formatQuantity } from '../utils/format';
import { ActionForm, QuantityInput } from './action-form';

/** Moves stock to another bin of the same spec (the server offers only those). */
export function MoveForm({ bin, onDone }: { bin: BinForYou; onDone?: ActionDone }) {
  const move = useMove();
  const targets = bin.forYou.sameSpecBins;
  const form = useForm<z.input<typeof moveBodySchema>, unknown, MoveBody>({
    resolver: zodResolver(moveBodySchema),
    defaultValues: { to: targets[0]?.code ?? '', note: '' },
  });

  const submit = form.handleSubmit(async (body) => {
    try {
      await move.mutateAsync({ code: bin.code, body });
      const said = `Moved ${formatQuantity(body.quantity, bin.unit)} from ${bin.code} to ${body.to}.`;
      form.reset({ to: body.to, note: '' });
      confirmDone(said, onDone);
    } catch (err) {
      form.setError('root', { message: applyServerErrors(err, form.setError, ['to', 'quantity', 'note']) });
    }
  });

  return (
    <ActionForm label="Move" onSubmit={submit} problem={form.formState.errors.root?.message} submitLabel="Move the stock" busy={move.isPending}>
      <SelectField
        label="Move to bin"
        options={targets.map((t) => ({ value: t.code, label: `${t.code} · ${t.location || 'no location'} · ${formatCount(t.onHand)} on hand` }))}
        error={form.formState.errors.to?.message}
        {...form.register('to')}
      />
      <QuantityInput control={form.control} name="quantity" label="Quantity to move" max={bin.onHand} hint={`${formatQuantity(bin.onHand, bin.unit)} in ${bin.code}.`} />
      <TextField label="Note (optional)" error={form.formState.errors.note?.message} {...form.register('note')} />
    </ActionForm>
  );
}
