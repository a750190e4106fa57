import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import { useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { toast } from 'sonner';
import { binQueryOptions } from '@/features/stock/api/get-bins';
import { useCreateBin, useEditBin } from '@/features/stock/api/save-bin';
import { BinForm } from '@/features/stock/components/bin-form';
import { Card, PageHeader } from '@/components/ui/page';
import { loadAlongside, requireRole } from './guards';

export const binNewLoader = (queryClient: QueryClient) => async ({ request }: LoaderFunctionArgs) => {
  await requireRole(queryClient, request, 'quartermaster');
  return null;
};

export const binEditLoader = (queryClient: QueryClient) => async ({ request, params }: LoaderFunctionArgs) => {
  await loadAlongside(requireRole(queryClient, request, 'quartermaster'), queryClient.ensureQueryData(binQueryOptions((params.code ?? '').toUpperCase())));
  return null;
};

export function BinNewRoute() {
  const create = useCreateBin();
  const navigate = useNavigate();
  return (
    <>
      <PageHeader title="Add a bin" lead="It takes the next free code unless you give one; print its label from the Labels page." />
      <Card>
        <BinForm
          submitLabel="Add the bin"
          onSubmit={async (body) => {
            const bin = await create.mutateAsync(body);
            toast.success(`${bin.designation} is ${bin.code}.`);
            await navigate(`/bins/${bin.code}`);
          }}
        />
      </Card>
    </>
  );
}

export function BinEditRoute() {
  const code = (useParams().code ?? '').toUpperCase();
  const { data: bin } = useSuspenseQuery(binQueryOptions(code));
  const edit = useEditBin(code);
  const navigate = useNavigate();
  return (
    <>
      <PageHeader title={`Edit ${bin.code}`} lead={bin.designation} />
      <Card>
        <BinForm
          bin={bin}
          submitLabel="Save changes"
          onSubmit={async ({ code: _code, initialQuantity: _opening, ...change }) => {
            await edit.mutateAsync(change);
            toast.success(`${code} saved.`);
            await navigate(`/bins/${code}`);
          }}
        />
      </Card>
    </>
  );
}
