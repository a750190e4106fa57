import type { QueryClient } from '@tanstack/react-query';
import { useQuery, useSuspenseQuery } from '@tanstack/react-query';
import { useLoaderData, useParams, type LoaderFunctionArgs } from 'react-router';
import { hasRole } from '@shared/roles';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { OfflineBinView } from '@/features/offline/components/offline-bin-view';
import { binReorderQueryOptions } from '@/features/stock/api/get-bin-reorder';
import { binQueryOptions } from '@/features/stock/api/get-bins';
import { ledgerQueryOptions } from '@/features/stock/api/get-ledger';
import { BinActionsPanel } from '@/features/stock/components/bin-actions-panel';
import { BinDetails, BinSummary } from '@/features/stock/components/bin-summary';
import { LedgerList } from '@/features/stock/components/ledger-list';
import { LinkButton } from '@/components/ui/link-button';
import { Card } from '@/components/ui/page';
import { loadAlongside, requireSignedIn } from './guards';
import { loadOrOffline, useOfflinePage, type ScanLoaderData } from './offline-fallback';

const codeOf = (params: { code?: string }) => (params.code ?? '').toUpperCase();

export const binDetailLoader =
  (queryClient: QueryClient) =>
  async ({ request, params }: LoaderFunctionArgs): Promise<ScanLoaderData> => {
    const code = codeOf(params);
    return loadAlongside(
      requireSignedIn(queryClient, request),
      loadOrOffline(() => {
        void queryClient.prefetchQuery(ledgerQueryOptions(code));
        void queryClient.prefetchQuery(binReorderQueryOptions(code));
        return queryClient.ensureQueryData(binQueryOptions(code));
      }),
    );
  };

/** A bin's page, opened by scanning its label; with no connection, the bin as the phone's offline copy has it. */
export function BinDetailRoute() {
  const code = codeOf(useParams());
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const offline = useOfflinePage(useLoaderData<ScanLoaderData>());
  if (offline && me) return <OfflineBinView memberId={me.id} code={code} />;
  return <OnlineBinDetail code={code} />;
}

/** What it holds, what you may do with it, its ledger. */
function OnlineBinDetail({ code }: { code: string }) {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const { data: bin } = useSuspenseQuery(binQueryOptions(code));
  // What to order comes from the forecast: read beside the scan answer, never holding it up.
  const { data: reorder } = useQuery(binReorderQueryOptions(code));
  const isQuartermaster = !!me && hasRole(me.role, 'quartermaster');
  return (
    // On a phone: what it is and how many, then the actions, then the details; side by side on a wide screen.
    <div className="grid items-start gap-4 lg:grid-cols-[3fr_2fr]">
      <Card className="lg:col-start-1">
        <BinSummary bin={bin} reorder={reorder} isQuartermaster={isQuartermaster} />
      </Card>
      <div className="flex flex-col gap-4 lg:col-start-2 lg:row-span-2 lg:row-start-1">
        <BinActionsPanel bin={bin} />
        <LinkButton to="/scan" variant="secondary">
          Scan another label
        </LinkButton>
      </div>
      <Card className="lg:col-start-1">
        <BinDetails bin={bin} reorder={reorder} isQuartermaster={isQuartermaster} />
      </Card>
      <div className="lg:col-span-2">
        <LedgerList code={bin.code} isQuartermaster={isQuartermaster} />
      </div>
    </div>
  );
}
