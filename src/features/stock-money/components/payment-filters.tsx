import { Form } from 'react-router';
import { PAYMENT_METHOD_LABELS, PAYMENT_METHODS } from '@shared/schemas/payment-methods';
import type { PaymentsQuery } from '@shared/schemas/payments';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { paymentsCsvUrl } from '../utils/payments-query';

/** The list's filters (chapter days, both ends included, and the method) and the CSV of what they show. */
export function PaymentFilters({ query }: { query: PaymentsQuery }) {
  return (
    <div className="flex flex-col gap-3">
      <Form method="get" className="grid items-end gap-3 sm:grid-cols-4" aria-label="Filter payments">
        <TextField label="First day" type="date" name="from" defaultValue={query.from ?? ''} />
        <TextField label="Last day" type="date" name="to" defaultValue={query.to ?? ''} />
        <SelectField
          label="Method"
          name="method"
          defaultValue={query.method ?? ''}
          options={[{ value: '', label: 'Cash and online' }, ...PAYMENT_METHODS.map((m) => ({ value: m, label: PAYMENT_METHOD_LABELS[m] }))]}
        />
        <Button type="submit" variant="secondary">
          Show
        </Button>
      </Form>
      <a href={paymentsCsvUrl(query)} download className="inline-flex min-h-12 items-center self-start rounded-lg border-2 border-ink px-5 font-semibold text-ink">
        Export CSV
      </a>
    </div>
  );
}
