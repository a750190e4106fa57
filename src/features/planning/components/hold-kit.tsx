import type { KitHoldsResult } from '@shared/schemas/builds';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { ItemCode } from '@/components/ui/page';
import { messageOf } from '@/lib/errors';
import { formatDay } from '@/lib/format';
import { useHoldKit } from '../api/hold-kit';

/**
 * One tap asks the crib to hold every tool of the kit from the assembly's planned start; what could
 * not be held says why.
 */
export function HoldKit({ assemblyId, plannedStart, onHeld }: { assemblyId: number; plannedStart: string | null; onHeld?: () => void }) {
  const hold = useHoldKit(assemblyId);
  const result: KitHoldsResult | undefined = hold.data;
  return (
    <div className="flex flex-col gap-3">
      <p id="hold-kit-hint" className="text-sm text-ink-soft">
        {plannedStart
          ? `Holds start on the planned start, ${formatDay(plannedStart)}: you join each tool's queue now, and the tools are set aside for you from that morning (at once if it has come). Until then they stay on the shelf for others.`
          : 'With no planned start, tools on the shelf are set aside for you at once, for the chapter’s hold time.'}
      </p>
      <Button onClick={() => hold.mutate(undefined, { onSuccess: () => onHeld?.() })} busy={hold.isPending} aria-describedby="hold-kit-hint" className="w-full sm:w-auto sm:self-start">
        Hold the kit
      </Button>
      {hold.isError && <Notice tone="bad">{messageOf(hold.error)}</Notice>}
      {result && (
        <div role="status" className="flex flex-col gap-2 rounded-lg border border-rule bg-paper p-3">
          {result.placed.length > 0 ? (
            <div>
              <p className="font-semibold">Holds placed</p>
              {result.holdsFrom && <p>Set aside for you from {formatDay(result.holdsFrom)}; you are in each queue now.</p>}
              <ul className="mt-1 list-disc pl-5">
                {result.placed.map((t) => (
                  <li key={t.code}>
                    <ItemCode code={t.code} /> {t.name}
                  </li>
                ))}
              </ul>
            </div>
          ) : (
            <p className="font-semibold">No holds placed.</p>
          )}
          {result.skipped.length > 0 && (
            <div>
              <p className="font-semibold">Not held</p>
              <ul className="mt-1 list-disc pl-5">
                {result.skipped.map((t) => (
                  <li key={t.code}>
                    <ItemCode code={t.code} />: {t.reason}
                  </li>
                ))}
              </ul>
            </div>
          )}
        </div>
      )}
    </div>
  );
}
