import { zodResolver } from '@hookform/resolvers/zod';
import { useQuery } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { MIN_ONLINE_PAYMENT_CENTS, payPartFormSchema, type PaymentCurrency } from '@shared/schemas/payments';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { Card } from '@/components/ui/page';
import { messageOf } from '@/lib/errors';
import { formatCents } from '@/lib/format';
import { paymentSettingsQueryOptions } from '../api/get-payment-settings';
import { useStartCheckout } from '../api/start-checkout';
import { leaveFor } from '../utils/leave-for';

/**
 * Paying the tab online, on My tab: the whole balance in one press, or a part of it. The member goes
 * to the provider's hosted page; nothing shows while the chapter's settings are unknown or nothing is owed.
 */
export function PayOnlineCard({ balanceCents }: { balanceCents: number }) {
  const { data: settings } = useQuery(paymentSettingsQueryOptions());
  if (!settings || balanceCents <= 0) return null;
  if (!settings.offered) return <p className="text-steel">The chapter takes payments in cash: pay your tab to the quartermaster.</p>;
  const { currency, minimumCents } = settings;
  return (
    <Card title="Pay online">
      {balanceCents < minimumCents ? (
        <p>
          Your tab of {formatCents(balanceCents, currency)} is under the {formatCents(minimumCents, currency)} online minimum: pay it in cash to the quartermaster.
        </p>
      ) : (
        <PayOnline balanceCents={balanceCents} currency={currency} />
      )}
    </Card>
  );
}

function PayOnline({ balanceCents, currency }: { balanceCents: number; currency: PaymentCurrency }) {
  const start = useStartCheckout();
  const [problem, setProblem] = useState<string>();
  const pay = async (amountCents?: number) => {
    setProblem(undefined);
    try {
      const { url } = await start.mutateAsync(amountCents === undefined ? {} : { amountCents });
      leaveFor(url);
    } catch (err) {
      setProblem(messageOf(err));
    }
  };

  return (
    <div className="flex flex-col gap-4">
      <p className="text-sm text-steel">You pay on the payment provider’s page and come back here: card numbers never reach Gripline.</p>
      {problem && <Notice tone="bad">{problem}</Notice>}
      <Button type="button" busy={start.isPending} className="self-start" onClick={() => void pay()}>
        Pay {formatCents(balanceCents, currency)}
      </Button>
      <PayPartForm balanceCents={balanceCents} currency={currency} busy={start.isPending} onPay={pay} />
    </div>
  );
}

function PayPartForm({ balanceCents, currency, busy, onPay }: { balanceCents: number; currency: PaymentCurrency; busy: boolean; onPay: (amountCents: number) => Promise<void> }) {
  const schema = useMemo(() => payPartFormSchema(balanceCents, currency), [balanceCents, currency]);
  const form = useForm<z.input<typeof schema>, unknown, z.output<typeof schema>>({ resolver: zodResolver(schema), defaultValues: { amount: '' } });
  const { errors } = form.formState;
  const submit = form.handleSubmit(({ amount }) => onPay(amount));
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-3 border-t border-rule pt-4" aria-label="Pay part of your tab">
      <div className="flex flex-col gap-3 sm:flex-row sm:items-end">
        <div className="sm:w-56">
          <TextField
            label="Or pay part of it"
            inputMode="decimal"
            autoComplete="off"
            placeholder="5.00"
            hint={`In dollars and cents, from ${formatCents(MIN_ONLINE_PAYMENT_CENTS, currency)} to ${formatCents(balanceCents, currency)}.`}
            error={errors.amount?.message}
            {...form.register('amount')}
          />
        </div>
        <Button type="submit" variant="secondary" busy={busy}>
          Pay this amount
        </Button>
      </div>
    </form>
  );
}
