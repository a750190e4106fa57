import { Notice } from '@/components/ui/notice';

export const PLANNING_CAUTION =
  'Gripline plans stock and tools; it does not design structures. The kit’s plans and the rivet maker’s instructions govern rivet counts, grips, edge distances and drill sizes, and on a certificated aircraft so do the approved data and a licensed mechanic or inspector. Follow local codes and rules.';

/** Shown wherever rivet counts, grips, edge distances or drill sizes are worked out. */
export function PlanningCaution({ text = PLANNING_CAUTION }: { text?: string }) {
  return (
    <Notice tone="warn" title="Caution: a plan for stock, not a design">
      <p>{text}</p>
    </Notice>
  );
}
