import { Badge } from '@/components/ui/badge';

/** A bin at or below its reorder point, said in words with a mark (never colour alone). */
export function LowStockBadge({ className = '' }: { className?: string }) {
  return (
    <Badge mark="▼" className={`bg-warn-soft text-warn ${className}`}>
      Low stock
    </Badge>
  );
}
