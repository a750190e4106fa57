import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import { CURRENCY_NAMES, PAYMENT_CURRENCIES, updatePaymentSettingsBodySchema, type PaymentSettingsView, type UpdatePaymentSettingsBody } from '@shared/schemas/payments';
import { Button } from '@/components/ui/button';
import { SelectField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { Card } from '@/components/ui/page';
import { applyServerErrors } from '@/lib/errors';
import { formatCents } from '@/lib/format';
import { useUpdatePaymentSettings } from '../api/update-payment-settings';

const currencyOptions = PAYMENT_CURRENCIES.map((c) => ({ value: c, label: `${CURRENCY_NAMES[c]} (${c.toUpperCase()})` }));

function offerWords({ offered, currency, minimumCents }: PaymentSettingsView): string {
  return offered
    ? `Members may pay their tab online, in ${CURRENCY_NAMES[currency]}, from ${formatCents(minimumCents, currency)} up.`
    : 'Online payment is off: members pay their tab in cash to the quartermaster.';
}

/** Which provider answers; the keys themselves stay on the server and are never shown. */
const providerWords = (provider: PaymentSettingsView['provider']) =>
  provider === 'connected'
    ? 'Gripline is connected to the payment provider with the chapter’s own account.'
    : 'Gripline uses its local stand-in for the payment provider: nothing is charged and nothing leaves this computer. The server’s PAYMENTS_SECRET_KEY connects a real account.';

/**
 * Online payment of members' tabs: whether it is offered, and in which currency. Only a chapter lead
 * may change it (the server says so too); others read it.
 */
export function PaymentSettingsCard({ settings, canChange }: { settings: PaymentSettingsView; canChange: boolean }) {
  return (
    <Card title="Online payment">
      <p className="mb-2">
        <strong>{offerWords(settings)}</strong>
      </p>
      <p className="mb-3 text-sm text-steel">{providerWords(settings.provider)}</p>
      {canChange ? <PaymentSettingsForm settings={settings} /> : <p className="text-sm text-steel">Only the chapter lead changes online payment.</p>}
    </Card>
  );
}

function PaymentSettingsForm({ settings }: { settings: PaymentSettingsView }) {
  const update = useUpdatePaymentSettings();
  const form = useForm<UpdatePaymentSettingsBody>({ resolver: zodResolver(updatePaymentSettingsBodySchema), values: { offered: settings.offered, currency: settings.currency } });
  const { errors } = form.formState;

  const submit = form.handleSubmit(async (body) => {
    try {
      const saved = await update.mutateAsync(body);
      toast.success(offerWords(saved));
    } catch (err) {
      form.setError('root', { message: applyServerErrors(err, form.setError, ['offered', 'currency']) });
    }
  });

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-3" aria-label="Online payment">
      {errors.root?.message && <Notice tone="bad">{errors.root.message}</Notice>}
      <label className="flex min-h-12 items-center gap-3">
        <input type="checkbox" className="size-5 accent-ink" {...form.register('offered')} />
        Offer online payment to members
      </label>
      <div className="flex flex-col gap-3 sm:flex-row sm:items-end">
        <div className="sm:w-72">
          <SelectField label="Currency of online payments" options={currencyOptions} error={errors.currency?.message} {...form.register('currency')} />
        </div>
        <Button type="submit" variant="secondary" busy={update.isPending}>
          Save online payment
        </Button>
      </div>
      <p className="text-sm text-steel">A new currency applies to the next checkout a member opens.</p>
    </form>
  );
}
