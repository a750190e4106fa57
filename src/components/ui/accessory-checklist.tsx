import type { ReactNode } from 'react';

/** A tool's accessories as big checkboxes: what goes out at checkout, what came back at return. */
export function AccessoryChecklist({
  legend,
  items,
  ticked,
  onChange,
  children,
}: {
  legend: string;
  items: readonly string[];
  ticked: readonly string[];
  onChange: (ticked: string[]) => void;
  children?: ReactNode;
}) {
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="text-sm font-semibold">{legend}</legend>
      {items.map((a) => (
        <label key={a} className="flex min-h-12 items-center gap-3">
          <input
            type="checkbox"
            className="size-6 accent-ink"
            checked={ticked.includes(a)}
            onChange={(e) => onChange(e.target.checked ? [...ticked, a] : ticked.filter((x) => x !== a))}
          />
          {a}
        </label>
      ))}
      {children}
    </fieldset>
  );
}
