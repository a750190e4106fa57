import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import { Link, useLoaderData, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { hasRole } from '@shared/roles';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { OfflineToolView } from '@/features/offline/components/offline-tool-view';
import { ReturnPhotoPicker } from '@/features/photos/components/return-photo-picker';
import { AskForSignoff } from '@/features/signoffs/components/ask-for-signoff';
import { ToolPhotos } from '@/features/photos/components/tool-photos';
import { toolQueryOptions } from '@/features/tools/api/get-tool';
import { MissingAccessories } from '@/features/tools/components/missing-accessories';
import { QuartermasterCommands } from '@/features/tools/components/quartermaster-commands';
import { ToolActionsPanel } from '@/features/tools/components/tool-actions-panel';
import { ToolHistory } from '@/features/tools/components/tool-history';
import { ToolSummary } from '@/features/tools/components/tool-summary';
import { LinkButton } from '@/components/ui/link-button';
import { Card } from '@/components/ui/page';
import { loadAlongside, requireSignedIn } from './guards';
import { loadOrOffline, useOfflinePage, type ScanLoaderData } from './offline-fallback';

const codeOf = (params: { code?: string }) => (params.code ?? '').toUpperCase();

export const toolDetailLoader =
  (queryClient: QueryClient) =>
  async ({ request, params }: LoaderFunctionArgs): Promise<ScanLoaderData> => {
    return loadAlongside(
      requireSignedIn(queryClient, request),
      loadOrOffline(() => queryClient.ensureQueryData(toolQueryOptions(codeOf(params)))),
    );
  };

/** A tool's page; with no connection, the tool as the phone's offline copy has it. */
export function ToolDetailRoute() {
  const code = codeOf(useParams());
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const offline = useOfflinePage(useLoaderData<ScanLoaderData>());
  if (offline && me) return <OfflineToolView memberId={me.id} code={code} />;
  return <OnlineToolDetail code={code} />;
}

/** What it is, what you can do with it, and (for the quartermaster) its upkeep. */
function OnlineToolDetail({ code }: { code: string }) {
  const navigate = useNavigate();
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const { data: tool } = useSuspenseQuery(toolQueryOptions(code));
  const isQuartermaster = !!me && hasRole(me.role, 'quartermaster');
  const holdsIt = tool.loan?.holder.id === me?.id;
  return (
    <div className="grid gap-4 lg:grid-cols-[3fr_2fr]">
      <div className="flex flex-col gap-4">
        <Card>
          <ToolSummary tool={tool} />
        </Card>
        {tool.missingAccessories.length > 0 && (
          <Card>
            <MissingAccessories tool={tool} canResolve={isQuartermaster} />
          </Card>
        )}
        {tool.notes && <Card title="Notes">{tool.notes}</Card>}
        {(tool.photoIds.length > 0 || isQuartermaster) && (
          <Card title="Photos">
            <ToolPhotos
              code={tool.code}
              photoIds={tool.photoIds}
              canUpload={isQuartermaster}
              canDelete={isQuartermaster}
            />
          </Card>
        )}
      </div>
      <div className="flex flex-col gap-4 max-lg:order-first">
        <ToolActionsPanel
          tool={tool}
          photoSlot={holdsIt || isQuartermaster ? (onUploaded) => <ReturnPhotoPicker code={tool.code} onUploaded={onUploaded} /> : undefined}
          onDone={() => void navigate(`/tools/${tool.code}`, { replace: true })}
        />
        {tool.requiredSignoff && <AskForSignoff toolCode={tool.code} signoff={tool.requiredSignoff} />}
        <LinkButton to="/scan" variant="secondary">
          Scan another label
        </LinkButton>
        {isQuartermaster && <QuartermasterCommands tool={tool} />}
        {isQuartermaster && (
          <Link to={`/tools/${tool.code}/edit`} className="inline-flex min-h-12 items-center font-semibold underline underline-offset-4">
            Edit {tool.code}
          </Link>
        )}
      </div>
      <div className="lg:col-span-2">
        <ToolHistory code={tool.code} />
      </div>
    </div>
  );
}
