import { useState } from 'react';
import { BIN_KIND_LABELS } from '@shared/stock/kinds';
import { formatQuantity } from '@/lib/format';
import { offlineBin } from '../utils/offline-state';
import { OfflineBinForm } from './offline-bin-forms';
import { FromOfflineCopy, OfflineItemPage, type CopySource } from './offline-item';

/** A scanned bin opened from the phone's copy: draw and return unused are queued. */
export function OfflineBinView({ code, ...source }: { code: string } & CopySource) {
  const [picked, setPicked] = useState<'draw' | 'return_unused'>('draw');
  return (
    <FromOfflineCopy source={source} code={code} kind="bin" find={offlineBin}>
      {(copy, state) => {
        const { bin } = state;
        const kinds = [...(state.onHand > 0 ? (['draw'] as const) : []), ...(state.drawnByYou > 0 ? (['return_unused'] as const) : [])];
        const chosen = kinds.includes(picked) ? picked : kinds[0];
        return (
          <OfflineItemPage
            copy={copy}
            code={bin.code}
            title={bin.designation}
            subtitle={BIN_KIND_LABELS[bin.kind]}
            location={bin.location}
            facts={
              <>
                <dt className="text-steel">On hand</dt>
                <dd className="font-mono">{formatQuantity(state.onHand, bin.unit)}</dd>
                {state.drawnByYou > 0 && (
                  <>
                    <dt className="text-steel">Drawn by you</dt>
                    <dd className="font-mono">{formatQuantity(state.drawnByYou, bin.unit)}</dd>
                  </>
                )}
              </>
            }
            waiting={state.waiting}
            needsConnection="the ledger, receiving, counting, moving and writing off stock"
          >
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
          </OfflineItemPage>
        );
      }}
    </FromOfflineCopy>
  );
}
