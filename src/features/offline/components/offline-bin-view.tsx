import { useState } from 'react';
import { BIN_KIND_LABELS } from '@shared/stock/kinds';
import { Card } from '@/components/ui/page';
import { formatQuantity } from '@/lib/format';
import { useCatalogueCopy, useWaiting } from '../hooks';
import { offlineBin } from '../utils/offline-state';
import { OfflineBinForm } from './offline-bin-forms';
import { NeedsConnection, NoOfflineCopy, NotInOfflineCopy, OfflineCopyNote } from './offline-copy-note';
import { WaitingHere } from './waiting-here';

/** A scanned bin opened from the phone's copy: draw and return unused are queued. */
export function OfflineBinView({ memberId, code }: { memberId: number; code: string }) {
  const copy = useCatalogueCopy(memberId);
  const waiting = useWaiting(memberId);
  const [picked, setPicked] = useState<'draw' | 'return_unused'>('draw');
  if (copy === undefined || waiting === undefined) return <p role="status">Opening the offline copy…</p>;
  if (copy === null) return <NoOfflineCopy code={code} />;
  const state = offlineBin(copy.catalogue, code, waiting);
  if (!state) {
    return <NotInOfflineCopy code={code} kind="bin" takenAt={copy.catalogue.takenAt} />;
  }
  const { bin } = state;
  const kinds = [...(state.onHand > 0 ? (['draw'] as const) : []), ...(state.drawnByYou > 0 ? (['return_unused'] as const) : [])];
  const chosen = kinds.includes(picked) ? picked : kinds[0];
  return (
    <div className="flex flex-col gap-4">
      <OfflineCopyNote takenAt={copy.catalogue.takenAt} />
      <Card>
        <p className="font-mono text-lg font-medium text-brass-deep">{bin.code}</p>
        <h1 className="text-2xl leading-tight font-bold">{bin.designation}</h1>
        <p className="text-steel">{BIN_KIND_LABELS[bin.kind]}</p>
        <dl className="mt-3 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1.5">
          <dt className="text-steel">Lives at</dt>
          <dd className="font-medium">{bin.location || 'not set'}</dd>
          <dt className="text-steel">On hand</dt>
          <dd className="font-mono">{formatQuantity(state.onHand, bin.unit)}</dd>
          {state.drawnByYou > 0 && (
            <>
              <dt className="text-steel">Drawn by you</dt>
              <dd className="font-mono">{formatQuantity(state.drawnByYou, bin.unit)}</dd>
            </>
          )}
        </dl>
      </Card>
      <Card title="What you can do">
        <div className="flex flex-col gap-4">
          <WaitingHere waiting={state.waiting} />
          {kinds.length === 0 && <p className="text-steel">{bin.code} is empty by the copy. Tell the quartermaster if you need some.</p>}
          {kinds.length > 1 && (
            <fieldset>
              <legend className="mb-2 text-sm font-semibold">Choose what to do</legend>
              <div className="grid grid-cols-2 gap-2">
                {kinds.map((k) => (
                  <label key={k} className="flex min-h-12 items-center gap-3 rounded-lg border-2 border-ink px-3 font-semibold has-checked:bg-ink has-checked:text-card">
                    <input type="radio" name="offline-bin-action" className="size-5 accent-brass" checked={chosen === k} onChange={() => setPicked(k)} />
                    {k === 'draw' ? 'Draw' : 'Return unused'}
                  </label>
                ))}
              </div>
            </fieldset>
          )}
          {chosen && <OfflineBinForm key={chosen} copy={copy} state={state} kind={chosen} />}
          <NeedsConnection what="the ledger, receiving, counting, moving and writing off stock" />
        </div>
      </Card>
    </div>
  );
}
