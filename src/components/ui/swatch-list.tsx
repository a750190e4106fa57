import type { ReactNode } from 'react';

export interface SwatchItem {
  key: string;
  /** The fill of this part in the chart beside. */
  colour: string;
  label: string;
  value: ReactNode;
}

/** A chart's parts as a list in a table cell: each with its chart colour, name and figure; a sentence when there are none. */
export function SwatchList({ items, empty }: { items: SwatchItem[]; empty: string }) {
  if (items.length === 0) return <span className="text-steel">{empty}</span>;
  return (
    <ul className="flex flex-col gap-0.5">
      {items.map((item) => (
        <li key={item.key} className="flex items-center gap-1.5 text-sm">
          <span aria-hidden className="size-3 shrink-0 rounded-sm" style={{ backgroundColor: item.colour }} />
          <span>{item.label}</span> {item.value}
        </li>
      ))}
    </ul>
  );
}
