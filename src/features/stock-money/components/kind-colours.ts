import { BIN_KINDS } from '@shared/stock/kinds';
import { fillsFor } from '@/components/ui/chart-palette';

/** One fill per bin kind for the spend chart, in BIN_KINDS order. */
export const KIND_COLOURS = fillsFor(BIN_KINDS);
