import { zodResolver } from '@hookform/resolvers/zod';
import { useQuery } from '@tanstack/react-query';
import { useMemo } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import type { z } from 'zod';
import { drawBodySchema, type BinForYou, type DrawBody } from '@shared/schemas/bins';
import { SelectField, TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/errors';
import { useDraw } from '../api/bin-actions';
import { myAssembliesQueryOptions } from '../api/get-my-assemblies';
import { formatAssembly } from '@/lib/format';
import { confirmDone, type ActionDone } from '@/lib/action-done';
import { formatCents, formatCount, formatQuantity, formatUnitCost } from '../utils/format';
import { valueAtCost } from '../utils/value';
import { ActionForm, Preview, QuantityInput } from './action-form';

/**
 * A member takes stock for their work; it goes on their tab at today's unit cost. Naming one of
 * their open assemblies is optional; it puts the draw beside that assembly's estimate.
 */
export function DrawForm({ bin, onDone }: { bin: BinForYou; onDone?: ActionDone }) {
  const draw = useDraw();
  // Said while typing and again on Draw, so a quantity the bin cannot give is never sent.
  const tooMany =
    bin.onHand === 0
      ? `${bin.code} is empty: there is nothing to draw. Ask the quartermaster.`
      : `Only ${formatQuantity(bin.onHand, bin.unit)} on hand in ${bin.code}: draw ${formatCount(bin.onHand)} or fewer, or ask the quartermaster.`;
  const schema = useMemo(() => drawBodySchema.extend({ quantity: drawBodySchema.shape.quantity.max(bin.onHand, { error: tooMany }) }), [bin.onHand, tooMany]);
  const form = useForm<z.input<typeof schema>, unknown, DrawBody>({ resolver: zodResolver(schema), defaultValues: { note: '' } });
  const quantity = useWatch({ control: form.control, name: 'quantity' });
  const wanted = Number.isInteger(quantity) && quantity > 0 ? quantity : undefined;
  const overOnHand = wanted !== undefined && wanted > bin.onHand;
  const openAssemblies = useQuery(myAssembliesQueryOptions()).data?.filter((a) => a.status !== 'done') ?? [];

  const submit = form.handleSubmit(async (body) => {
    try {
      const entry = await draw.mutateAsync({ code: bin.code, body });
      const said = `You drew ${formatQuantity(-entry.quantity, bin.unit)} from ${bin.code}: ${formatCents(-entry.valueCents)} on your tab.`;
      form.reset({ note: '', assemblyId: body.assemblyId });
      confirmDone(said, onDone);
    } catch (err) {
      form.setError('root', { message: applyServerErrors(err, form.setError, ['quantity', 'note']) });
    }
  });

  return (
    <ActionForm label="Draw" onSubmit={submit} problem={form.formState.errors.root?.message} submitLabel={`Draw from ${bin.code}`} busy={draw.isPending}>
      <QuantityInput control={form.control} name="quantity" label="Quantity to draw" max={bin.onHand} hint={`${formatQuantity(bin.onHand, bin.unit)} on hand.`} />
      {overOnHand && <Notice tone="warn">{tooMany}</Notice>}
      {wanted !== undefined && !overOnHand && (
        <Preview>
          Goes on your tab: <strong>{formatCents(valueAtCost(wanted, bin.unitCost))}</strong> ({formatQuantity(wanted, bin.unit)} at {formatUnitCost(bin.unitCost)})
        </Preview>
      )}
      {openAssemblies.length > 0 && (
        <SelectField
          label="For which assembly (optional)"
          options={[{ value: '', label: 'Not for an assembly' }, ...openAssemblies.map((a) => ({ value: String(a.id), label: formatAssembly(a) }))]}
          error={form.formState.errors.assemblyId?.message}
          {...form.register('assemblyId', { setValueAs: (v: unknown) => (v === '' || v === null || v === undefined ? undefined : Number(v)) })}
        />
      )}
      <TextField
        label="Note (optional)"
        hint="Which part it is for, like “left flap skin”."
        error={form.formState.errors.note?.message}
        {...form.register('note')}
      />
    </ActionForm>
  );
}
