import { CATEGORY_LABELS, STATUS_LABELS } from '@shared/tools/categories';
import { Card } from '@/components/ui/page';
import { Notice } from '@/components/ui/notice';
import { formatDate } from '@/lib/format';
import { useCatalogueCopy, useWaiting } from '../hooks';
import { offlineTool } from '../utils/offline-state';
import { NeedsConnection, NoOfflineCopy, NotInOfflineCopy, OfflineCopyNote } from './offline-copy-note';
import { OfflineCheckoutForm } from './offline-checkout-form';
import { OfflineReturnForm } from './offline-return-form';
import { WaitingHere } from './waiting-here';

/** A scanned tool opened from the phone's copy: check out and return are queued, the rest waits for the connection. */
export function OfflineToolView({ memberId, code }: { memberId: number; code: string }) {
  const copy = useCatalogueCopy(memberId);
  const waiting = useWaiting(memberId);
  if (copy === undefined || waiting === undefined) return <p role="status">Opening the offline copy…</p>;
  if (copy === null) return <NoOfflineCopy code={code} />;
  const state = offlineTool(copy.catalogue, code, waiting);
  if (!state) {
    return <NotInOfflineCopy code={code} kind="tool" takenAt={copy.catalogue.takenAt} />;
  }
  const { tool } = state;
  return (
    <div className="flex flex-col gap-4">
      <OfflineCopyNote takenAt={copy.catalogue.takenAt} />
      <Card>
        <p className="font-mono text-lg font-medium text-brass-deep">{tool.code}</p>
        <h1 className="text-2xl leading-tight font-bold">{tool.name}</h1>
        <p className="text-steel">{CATEGORY_LABELS[tool.category]}</p>
        <dl className="mt-3 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1.5">
          <dt className="text-steel">Lives at</dt>
          <dd className="font-medium">{tool.location || 'not set'}</dd>
          <dt className="text-steel">State in the copy</dt>
          <dd>{STATUS_LABELS[tool.status]}</dd>
          {tool.holder && (
            <>
              <dt className="text-steel">With</dt>
              <dd>
                {tool.holder.name}
                {tool.dueAt && ` until ${formatDate(tool.dueAt)}`}
              </dd>
            </>
          )}
        </dl>
      </Card>
      <Card title="What you can do">
        <div className="flex flex-col gap-4">
          <WaitingHere waiting={state.waiting} />
          {state.reason && (
            <Notice tone="warn" title="Not available to you now">
              {state.reason}
            </Notice>
          )}
          {state.canCheckOut && <OfflineCheckoutForm copy={copy} tool={tool} />}
          {state.canReturn && <OfflineReturnForm copy={copy} tool={tool} />}
          <NeedsConnection what="holds, photos, the tool's history and the quartermaster's commands" />
        </div>
      </Card>
    </div>
  );
}
