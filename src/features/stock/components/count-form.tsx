import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch } from 'react-hook-form';
import type { z } from 'zod';
import { countBodySchema, type BinForYou, type CountBody } from '@shared/schemas/bins';
import { TextField } from '@/components/ui/field';
import { applyServerErrors } from '@/lib/errors';
import { confirmDone, type ActionDone } from '@/lib/action-done';
import { useCount } from '../api/bin-actions';
import { formatCount, formatQuantity, formatSigned, formatUnitCost } from '../utils/format';
import { formatSignedCents, valueAtCost } from '../utils/value';
import { ActionForm, Preview, QuantityInput } from './action-form';

/** "Adjustment −5 (−$0.65)": the change a count writes to the ledger, and its value. */
export const adjustmentWords = (variance: number, valueCents: number) => `Adjustment ${formatSigned(variance)} (${formatSignedCents(valueCents)})`;

/**
 * A count sets the bin to what is really on the shelf. The adjustment and its value are shown
 * before saving, so a miscount is caught before it reaches the ledger.
 */
export function CountForm({ bin, onDone }: { bin: BinForYou; onDone?: ActionDone }) {
  const count = useCount();
  const form = useForm<z.input<typeof countBodySchema>, unknown, CountBody>({ resolver: zodResolver(countBodySchema), defaultValues: { note: '' } });
  const counted = useWatch({ control: form.control, name: 'counted' });
  const variance = Number.isInteger(counted) && counted >= 0 ? counted - bin.onHand : undefined;

  const submit = form.handleSubmit(async (body) => {
    try {
      const result = await count.mutateAsync({ code: bin.code, body });
      const said =
        result.variance === 0
          ? `Count saved: ${bin.code} matches its ledger.`
          : `Count saved: ${adjustmentWords(result.variance, result.varianceValueCents).toLowerCase()}.`;
      form.reset({ note: '' });
      confirmDone(said, onDone);
    } catch (err) {
      form.setError('root', { message: applyServerErrors(err, form.setError, ['counted', 'note']) });
    }
  });

  return (
    <ActionForm label="Count" onSubmit={submit} problem={form.formState.errors.root?.message} submitLabel="Save count" busy={count.isPending}>
      <QuantityInput control={form.control} name="counted" min={0} label="Counted quantity" hint={`The ledger says ${formatQuantity(bin.onHand, bin.unit)}.`} />
      {variance !== undefined && (
        <Preview>
          <strong>{adjustmentWords(variance, valueAtCost(variance, bin.unitCost))}</strong>
          <span className="block text-sm text-steel">
            {variance === 0
              ? 'The shelf matches the ledger; saving records the count.'
              : `On hand goes from ${formatCount(bin.onHand)} to ${formatCount(counted)}, valued at ${formatUnitCost(bin.unitCost)} each.`}
          </span>
        </Preview>
      )}
      <TextField label="Note (optional)" hint="Why it differs, if you know." error={form.formState.errors.note?.message} {...form.register('note')} />
    </ActionForm>
  );
}
