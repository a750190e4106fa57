import { useSuspenseQuery } from '@tanstack/react-query';
import { hasRole } from '@shared/roles';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { toolsQueryOptions } from '@/features/tools/api/get-tools';
import { ToolCatalog } from '@/features/tools/components/tool-catalog';
import { LinkButton } from '@/components/ui/link-button';
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
            <LinkButton to="/tools/new">
              Add a tool
            </LinkButton>
          ) : undefined
        }
      />
      <ToolCatalog tools={data.data} />
    </>
  );
}
