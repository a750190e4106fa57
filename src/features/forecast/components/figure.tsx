/** One labelled figure in a card's row of key levels (inside a <dl>). */
export function Figure({ label, value, extra }: { label: string; value: string; extra?: string }) {
  return (
    <div className="flex flex-col">
      <dt className="text-sm text-steel">{label}</dt>
      <dd>
        <span className="font-mono font-medium">{value}</span>
        {extra && <span className="block text-sm">{extra}</span>}
      </dd>
    </div>
  );
}
