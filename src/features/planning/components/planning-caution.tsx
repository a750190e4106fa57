import { PLAN_NOT_DESIGN } from '@shared/safety/estimate-cautions';
import { Notice } from '@/components/ui/notice';

/**
 * Shown once wherever rivet counts, grips, edge distances or drill sizes are worked out: what the
 * estimate is, then its cautions (the plans govern, approved data, drilling, soft blind rivets).
 */
export function PlanningCaution({ lead = PLAN_NOT_DESIGN, cautions }: { lead?: string; cautions: readonly string[] }) {
  return (
    <Notice tone="warn" title="Caution: a plan for stock, not a design">
      <p>{lead}</p>
      <ul className="mt-1 list-disc pl-5">
        {cautions.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </Notice>
  );
}
