import { useSuspenseQuery } from '@tanstack/react-query';
import { Link } from 'react-router';
import { hasRole } from '@shared/roles';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { toolsQueryOptions } from '@/features/tools/api/get-tools';
import { ToolCatalog } from '@/features/tools/components/tool-catalog';
import { PageHeader } from '@/components/ui/page';
import { pageLoader } from './guards';

export const toolsLoader = pageLoader('signed-in', [toolsQueryOptions()]);

export function ToolsRoute() {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const { data } = useSuspenseQuery(toolsQueryOptions());
  return (
    <>
      <PageHeader
        title="Tools"
        lead="Everything in the crib: what it is, where it lives, who has it."
        actions={
          me && hasRole(me.role, 'quartermaster') ? (
            <Link to="/tools/new" className="inline-flex min-h-12 items-center rounded-lg bg-ink px-5 font-semibold text-card">
              Add a tool
            </Link>
          ) : undefined
        }
      />
      <ToolCatalog tools={data.data} />
    </>
  );
}
