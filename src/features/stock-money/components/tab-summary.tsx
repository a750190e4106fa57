import type { Tab } from '@shared/schemas/stock-money';
import { dollars } from './format';

/** What the balance means, in words: colour alone never says it. */
function balanceWords(balanceCents: number): string {
  if (balanceCents > 0) return `You owe the chapter ${dollars(balanceCents)}.`;
  if (balanceCents < 0) return `You have paid ${dollars(-balanceCents)} ahead.`;
  return 'You owe the chapter nothing.';
}

export function TabSummary({ tab }: { tab: Tab }) {
  const figures = [
    { label: 'Charged', cents: tab.chargedCents, hint: 'What you drew, less returns, at the unit cost of the day' },
    { label: 'Paid', cents: tab.paidCents, hint: 'Paid online, or recorded by the quartermaster or the lead, less any refunds' },
  ];
  return (
    <section aria-labelledby="tab-balance" className="rounded-xl border border-rule bg-card p-4 shadow-sm sm:p-5">
      <h2 id="tab-balance" className="text-sm font-semibold tracking-wide text-steel uppercase">
        Balance
      </h2>
      <p className={`mt-1 font-mono text-4xl font-medium ${tab.balanceCents > 0 ? 'text-brass-deep' : 'text-ok'}`}>{dollars(tab.balanceCents)}</p>
      <p className="mt-1 font-semibold">{balanceWords(tab.balanceCents)}</p>
      <dl className="mt-4 grid grid-cols-2 gap-3 border-t border-rule pt-3">
        {figures.map((f) => (
          <div key={f.label}>
            <dt className="text-sm font-semibold">{f.label}</dt>
            <dd className="font-mono text-xl">{dollars(f.cents)}</dd>
            <dd className="text-sm text-steel">{f.hint}</dd>
          </div>
        ))}
      </dl>
    </section>
  );
}
