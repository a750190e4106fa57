import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import type { z } from 'zod';
import { paymentFormSchema } from '@shared/schemas/stock-money';
import { SelectField, TextField } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { applyServerErrors } from '@/lib/errors';
import { useRecordPayment } from '../api/record-payment';
import { dollars } from './format';

type Input = z.input<typeof paymentFormSchema>;
type Output = z.output<typeof paymentFormSchema>;
export interface Payer {
  id: number;
  name: string;
}

/** The lead or quartermaster records money a member handed over; it comes off their balance. */
export function RecordPaymentForm({ payers }: { payers: Payer[] }) {
  const record = useRecordPayment();
  const form = useForm<Input, unknown, Output>({ resolver: zodResolver(paymentFormSchema), defaultValues: { amount: '', note: '' } });
  const { errors } = form.formState;

  const submit = form.handleSubmit(async ({ userId, amount, note }) => {
    try {
      const paid = await record.mutateAsync({ userId, amountCents: amount, note });
      toast.success(`Recorded ${dollars(paid.amountCents)} from ${payers.find((p) => p.id === userId)?.name ?? 'the member'}.`);
      form.reset();
    } catch (err) {
      // The server names the amount in cents; the form asks for it in dollars.
      const amountIssue = err instanceof ApiError ? err.issues.find((i) => i.path === 'amountCents') : undefined;
      if (amountIssue) form.setError('amount', { message: amountIssue.message });
      form.setError('root', { message: applyServerErrors(err, form.setError, ['userId', 'note']) });
    }
  });

  const options = [{ value: '', label: 'Choose a person' }, ...payers.map((p) => ({ value: String(p.id), label: p.name }))];
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-3" aria-label="Record payment">
      {errors.root?.message && <Notice tone="bad">{errors.root.message}</Notice>}
      <div className="grid gap-3 sm:grid-cols-2">
        <SelectField
          label="Who paid"
          options={options}
          defaultValue=""
          error={errors.userId?.message}
          {...form.register('userId', { setValueAs: (v: string) => (v === '' ? undefined : Number(v)) })}
        />
        <TextField label="Amount" inputMode="decimal" autoComplete="off" placeholder="12.50" hint="In dollars and cents, up to $10,000.00." error={errors.amount?.message} {...form.register('amount')} />
      </div>
      <TextField label="Note (optional)" placeholder="Cash at the bench, cheque 1042…" error={errors.note?.message} {...form.register('note')} />
      <FormFooter submit="Record payment" busy={record.isPending} />
    </form>
  );
}
