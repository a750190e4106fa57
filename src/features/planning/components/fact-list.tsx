/** Terms and their values side by side, values in the figures' font. */
export function FactList({ facts }: { facts: readonly (readonly [string, string])[] }) {
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-base">
      {facts.map(([term, value]) => (
        <div key={term} className="contents">
          <dt className="text-sm text-steel">{term}</dt>
          <dd className="font-mono">{value}</dd>
        </div>
      ))}
    </dl>
  );
}
