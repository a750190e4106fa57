import { TOOL_CATEGORIES } from '@shared/tools/categories';
import { fillsFor } from '@/components/ui/chart-palette';

/** One fill per tool kind for the loans chart, in catalogue order. */
export const TOOL_KIND_COLOURS = fillsFor(TOOL_CATEGORIES);
