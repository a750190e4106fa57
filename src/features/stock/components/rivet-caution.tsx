import type { BinKind } from '@shared/stock/kinds';
import { Notice } from '@/components/ui/notice';

/** Stock records say what is on the shelf, not what belongs in a given hole. */
export function RivetCaution({ kind }: { kind?: BinKind }) {
  return (
    <Notice tone="warn" title="Caution: which rivet goes where">
      <p>
        Gripline keeps count of rivets; it does not choose them. The kit&apos;s plans and the rivet maker&apos;s instructions decide which rivet goes in
        which hole, and on a certificated aircraft so do the approved data and a licensed mechanic.
      </p>
      <p className={`mt-1 ${kind === 'blind_general' ? 'font-semibold' : ''}`}>
        General-purpose (soft) blind rivets are not for structure: keep them to fairings, brackets and other non-structural work the plans allow.
      </p>
    </Notice>
  );
}
