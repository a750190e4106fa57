import { useId, useState } from 'react';
import type { LineRule } from '@shared/estimate/line-rules';

/**
 * A "Why?" disclosure beside a number in a FactList: two `dd`s of the term, the button and, on a row
 * of its own, the rule that gave the number and where the rule is published. `about` names the
 * number for screen readers ("Why? Pitch").
 */
export function WhyRule({ about, rules }: { about: string; rules: readonly LineRule[] }) {
  const [open, setOpen] = useState(false);
  const id = useId();
  return (
    <>
      <dd className="col-start-3">
        <button
          type="button"
          aria-expanded={open}
          aria-controls={id}
          onClick={() => setOpen((o) => !o)}
          className="inline-flex min-h-11 min-w-11 items-center justify-center rounded-md px-2 text-sm font-semibold text-ink-soft underline underline-offset-4"
        >
          Why?<span className="sr-only"> {about}</span>
        </button>
      </dd>
      <dd id={id} hidden={!open} className="col-span-full mb-2 rounded-md bg-card px-3 py-2 text-sm">
        <ul className="flex flex-col gap-1">
          {rules.map((r) => (
            <li key={`${r.value}|${r.rule}`}>
              {r.rule}. <span className="text-steel">Source: {r.source}.</span>
            </li>
          ))}
        </ul>
      </dd>
    </>
  );
}

/** The rules that explain some of an estimate's values, in the order asked. */
export function rulesFor(rules: readonly LineRule[] | undefined, ...values: LineRule['value'][]): readonly LineRule[] {
  if (!rules) return [];
  return values.flatMap((v) => rules.filter((r) => r.value === v));
}
