import { CATEGORY_LABELS, STATUS_LABELS } from '@shared/tools/categories';
import { Notice } from '@/components/ui/notice';
import { formatDate } from '@/lib/format';
import { offlineTool } from '../utils/offline-state';
import { OfflineCheckoutForm } from './offline-checkout-form';
import { FromOfflineCopy, OfflineItemPage, type CopySource } from './offline-item';
import { OfflineReturnForm } from './offline-return-form';

/** A scanned tool opened from the phone's copy: check out and return are queued, the rest waits for the connection. */
export function OfflineToolView({ code, ...source }: { code: string } & CopySource) {
  return (
    <FromOfflineCopy source={source} code={code} kind="tool" find={offlineTool}>
      {(copy, state) => {
        const { tool } = state;
        return (
          <OfflineItemPage
            copy={copy}
            code={tool.code}
            title={tool.name}
            subtitle={CATEGORY_LABELS[tool.category]}
            location={tool.location}
            facts={
              <>
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
              </>
            }
            waiting={state.waiting}
            needsConnection="holds, photos, the tool's history and the quartermaster's commands"
          >
            {state.reason && (
              <Notice tone="warn" title="Not available to you now">
                {state.reason}
              </Notice>
            )}
            {state.canCheckOut && <OfflineCheckoutForm copy={copy} tool={tool} />}
            {state.canReturn && <OfflineReturnForm copy={copy} tool={tool} />}
          </OfflineItemPage>
        );
      }}
    </FromOfflineCopy>
  );
}
