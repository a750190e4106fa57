import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import type { z } from 'zod';
import { refundFormSchema, type PaymentListItem } from '@shared/schemas/payments';
import { TextField } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { applyServerErrors } from '@/lib/errors';
import { formatCents, formatDay } from '@/lib/format';
import { useRefundPayment } from '../api/refund-payment';

type Input = z.input<typeof refundFormSchema>;
type Output = z.output<typeof refundFormSchema>;

/**
 * The lead's confirm step for refunding an online payment through the provider: the amount,
 * the whole remainder unless changed, in dollars and cents.
 */
export function RefundForm({ payment, onClose }: { payment: PaymentListItem; onClose: () => void }) {
  const refund = useRefundPayment(payment.id);
  const form = useForm<Input, unknown, Output>({ resolver: zodResolver(refundFormSchema), defaultValues: { amount: (payment.refundableCents / 100).toFixed(2) } });
  const { errors } = form.formState;

  const submit = form.handleSubmit(async ({ amount }) => {
    try {
      const made = await refund.mutateAsync({ amountCents: amount });
      toast.success(`Refunded ${formatCents(made.amountCents)} to ${payment.member.name}.`);
      onClose();
    } catch (err) {
      // The server names the amount in cents; the form asks for it in dollars.
      const amountIssue = err instanceof ApiError ? err.issues.find((i) => i.path === 'amountCents') : undefined;
      if (amountIssue) form.setError('amount', { message: amountIssue.message });
      else form.setError('root', { message: applyServerErrors(err, form.setError, []) });
    }
  });

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-3" aria-label={`Refund ${payment.member.name}’s payment`}>
      <p>
        {payment.member.name} paid {formatCents(payment.amountCents)} online on {formatDay(payment.at)}
        {payment.refundedCents > 0 && `, of which ${formatCents(payment.refundedCents)} is refunded already`}. The refund goes back to
        their card through the payment provider, and their tab goes up by it.
      </p>
      {errors.root?.message && <Notice tone="bad">{errors.root.message}</Notice>}
      <div className="max-w-56">
        <TextField
          label="Amount to refund"
          inputMode="decimal"
          autoComplete="off"
          autoFocus
          hint={`Up to ${formatCents(payment.refundableCents)}.`}
          error={errors.amount?.message}
          {...form.register('amount')}
        />
      </div>
      <FormFooter submit="Refund" variant="danger" busy={refund.isPending} onCancel={onClose} cancelVariant="secondary" />
    </form>
  );
}
