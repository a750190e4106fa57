/** A bin at or below its reorder point, said in words with a mark (never colour alone). */
export function LowStockBadge({ className = '' }: { className?: string }) {
  return (
    <span className={`inline-flex items-center gap-1.5 rounded-md bg-warn-soft px-2 py-0.5 text-sm font-semibold whitespace-nowrap text-warn ${className}`}>
      <span aria-hidden>▼</span>
      Low stock
    </span>
  );
}
