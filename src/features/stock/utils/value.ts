export { valueAtCost } from '@shared/stock/money';
import { formatCents } from './format';

/** A signed money amount in cents with a real minus sign: +$4.13, −$0.65, $0.00. */
export function formatSignedCents(valueCents: number): string {
  if (valueCents > 0) return `+${formatCents(valueCents)}`;
  if (valueCents < 0) return `−${formatCents(-valueCents)}`;
  return formatCents(0);
}
