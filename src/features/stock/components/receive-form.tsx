import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { z } from 'zod';
import { receiveBodySchema, unitCostField, type BinForYou, type Slip } from '@shared/schemas/bins';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors, messageOf } from '@/lib/errors';
import { confirmDone, type ActionDone } from '@/lib/action-done';
import { useReceive } from '../api/bin-actions';
import { useUploadSlip } from '../api/upload-slip';
import { formatCents, formatCount, formatQuantity } from '../utils/format';
import { valueAtCost } from '../utils/value';
import { ActionForm, Preview, QuantityInput } from './action-form';

/** Received stock is counted either in units or in whole packs as they come off the shelf. */
const receiveFormSchema = z.object({
  countIn: z.enum(['units', 'packs']),
  amount: receiveBodySchema.shape.quantity,
  unitCost: unitCostField,
  note: receiveBodySchema.shape.note,
});
type ReceiveInput = z.input<typeof receiveFormSchema>;
type ReceiveValues = z.output<typeof receiveFormSchema>;

/** Books an order in: quantity (or packs), the unit cost it came at, a note and the packing slip. */
export function ReceiveForm({ bin, onDone }: { bin: BinForYou; onDone?: ActionDone }) {
  const receive = useReceive();
  const upload = useUploadSlip();
  const [slip, setSlip] = useState<Slip>();
  const [slipProblem, setSlipProblem] = useState<string>();
  const form = useForm<ReceiveInput, unknown, ReceiveValues>({
    resolver: zodResolver(receiveFormSchema),
    defaultValues: { countIn: 'units', unitCost: bin.unitCost, note: '' },
  });
  const [countIn, amount, unitCost] = useWatch({ control: form.control, name: ['countIn', 'amount', 'unitCost'] });
  const inPacks = countIn === 'packs' && bin.packSize > 1;
  const units = Number.isInteger(amount) && amount > 0 ? (inPacks ? amount * bin.packSize : amount) : undefined;

  const attach = (file: File | undefined) => {
    setSlipProblem(undefined);
    if (!file) return;
    upload.mutate(file, { onSuccess: setSlip, onError: (err) => setSlipProblem(messageOf(err)) });
  };

  const submit = form.handleSubmit(async (v) => {
    const quantity = inPacks ? v.amount * bin.packSize : v.amount;
    try {
      await receive.mutateAsync({ code: bin.code, body: { quantity, unitCost: v.unitCost, note: v.note, ...(slip && { slipId: slip.id }) } });
      const said = `${formatQuantity(quantity, bin.unit)} received into ${bin.code}.`;
      form.reset({ countIn: v.countIn, unitCost: v.unitCost, note: '' });
      setSlip(undefined);
      confirmDone(said, onDone);
    } catch (err) {
      form.setError('root', { message: applyServerErrors(err, form.setError, ['unitCost', 'note']) });
    }
  });

  return (
    <ActionForm label="Receive" onSubmit={submit} problem={form.formState.errors.root?.message} submitLabel={`Receive into ${bin.code}`} busy={receive.isPending || upload.isPending}>
      {bin.packSize > 1 && (
        <fieldset className="flex flex-col gap-1">
          <legend className="text-sm font-semibold">Count what came in</legend>
          <div className="grid grid-cols-2 gap-2">
            <label className="flex min-h-12 items-center gap-3 rounded-lg border-2 border-rule px-3 has-checked:border-ink">
              <input type="radio" value="units" className="size-6 accent-ink" {...form.register('countIn')} />
              In units ({bin.unit})
            </label>
            <label className="flex min-h-12 items-center gap-3 rounded-lg border-2 border-rule px-3 has-checked:border-ink">
              <input type="radio" value="packs" className="size-6 accent-ink" {...form.register('countIn')} />
              In packs of {formatCount(bin.packSize)}
            </label>
          </div>
        </fieldset>
      )}
      <QuantityInput control={form.control} name="amount" label={inPacks ? 'Packs received' : 'Quantity received'} hint={inPacks && units !== undefined ? `That is ${formatQuantity(units, bin.unit)}.` : undefined} />
      <TextField
        label="Unit cost (dollars)"
        type="number"
        inputMode="decimal"
        step="0.0001"
        min={0}
        hint="What one unit cost on this order. A new cost becomes the bin’s cost from now on."
        error={form.formState.errors.unitCost?.message}
        {...form.register('unitCost', { valueAsNumber: true })}
      />
      {units !== undefined && Number.isFinite(unitCost) && (
        <Preview>
          Adds <strong>{formatQuantity(units, bin.unit)}</strong> worth {formatCents(valueAtCost(units, unitCost))}: on hand becomes {formatCount(bin.onHand + units)}.
        </Preview>
      )}
      <TextField label="Note (optional)" hint="The order or invoice number, say." error={form.formState.errors.note?.message} {...form.register('note')} />
      <div className="flex flex-col gap-2">
        {slip ? (
          <div className="flex flex-wrap items-center gap-3">
            <p className="font-medium">Packing slip attached: {slip.filename}</p>
            <Button variant="quiet" onClick={() => setSlip(undefined)}>
              Leave the slip out
            </Button>
          </div>
        ) : (
          <TextField
            label="Packing slip (optional)"
            type="file"
            accept="application/pdf,image/*"
            disabled={upload.isPending}
            hint={upload.isPending ? 'Uploading the slip…' : 'A PDF or a photo of the slip.'}
            onChange={(e) => {
              attach(e.target.files?.[0]);
              e.target.value = '';
            }}
            className="py-2"
          />
        )}
        {slipProblem && <Notice tone="bad">{slipProblem}</Notice>}
      </div>
    </ActionForm>
  );
}
