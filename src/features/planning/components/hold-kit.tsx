import type { KitHoldsResult } from '@shared/schemas/builds';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { messageOf } from '@/lib/errors';
import { useHoldKit } from '../api/hold-kit';

/** One tap asks the crib to hold every tool of the kit; what could not be held says why. */
export function HoldKit({ assemblyId }: { assemblyId: number }) {
  const hold = useHoldKit(assemblyId);
  const result: KitHoldsResult | undefined = hold.data;
  return (
    <div className="flex flex-col gap-3">
      <Button onClick={() => hold.mutate()} busy={hold.isPending} className="w-full sm:w-auto sm:self-start">
        Hold the kit
      </Button>
      {hold.isError && <Notice tone="bad">{messageOf(hold.error)}</Notice>}
      {result && (
        <div role="status" className="flex flex-col gap-2 rounded-lg border border-rule bg-paper p-3">
          {result.placed.length > 0 ? (
            <div>
              <p className="font-semibold">Holds placed</p>
              <ul className="mt-1 list-disc pl-5">
                {result.placed.map((t) => (
                  <li key={t.code}>
                    <span className="font-mono">{t.code}</span> {t.name}
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
                    <span className="font-mono">{t.code}</span>: {t.reason}
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
