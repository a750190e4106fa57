import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import { useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { toast } from 'sonner';
import { signoffsQueryOptions } from '@/features/signoffs/api/get-signoffs';
import { toolQueryOptions } from '@/features/tools/api/get-tool';
import { useCreateTool, useEditTool } from '@/features/tools/api/save-tool';
import { ToolForm } from '@/features/tools/components/tool-form';
import { Card, PageHeader } from '@/components/ui/page';
import { loadAlongside, requireRole } from './guards';

export const toolNewLoader = (queryClient: QueryClient) => async ({ request }: LoaderFunctionArgs) => {
  await loadAlongside(requireRole(queryClient, request, 'quartermaster'), queryClient.ensureQueryData(signoffsQueryOptions()));
  return null;
};

export const toolEditLoader = (queryClient: QueryClient) => async ({ request, params }: LoaderFunctionArgs) => {
  await loadAlongside(
    requireRole(queryClient, request, 'quartermaster'),
    Promise.all([
      queryClient.ensureQueryData(toolQueryOptions((params.code ?? '').toUpperCase())),
      queryClient.ensureQueryData(signoffsQueryOptions()),
    ]),
  );
  return null;
};

export function ToolNewRoute() {
  const create = useCreateTool();
  const { data: signoffs } = useSuspenseQuery(signoffsQueryOptions());
  const navigate = useNavigate();
  return (
    <>
      <PageHeader title="Add a tool" lead="It gets the next free code; print its label from the Labels page." />
      <Card>
        <ToolForm
          signoffs={signoffs}
          submitLabel="Add the tool"
          onSubmit={async (body) => {
            const tool = await create.mutateAsync(body);
            toast.success(`${tool.name} is ${tool.code}.`);
            await navigate(`/tools/${tool.code}`);
          }}
        />
      </Card>
    </>
  );
}

export function ToolEditRoute() {
  const code = (useParams().code ?? '').toUpperCase();
  const { data: tool } = useSuspenseQuery(toolQueryOptions(code));
  const edit = useEditTool(code);
  const { data: signoffs } = useSuspenseQuery(signoffsQueryOptions());
  const navigate = useNavigate();
  return (
    <>
      <PageHeader title={`Edit ${tool.code}`} lead={tool.name} />
      <Card>
        <ToolForm
          tool={tool}
          signoffs={signoffs}
          submitLabel="Save changes"
          onSubmit={async (body) => {
            await edit.mutateAsync(body);
            toast.success(`${code} saved.`);
            await navigate(`/tools/${code}`);
          }}
        />
      </Card>
    </>
  );
}
