import type { QueryClient } from '@tanstack/react-query';
import { useQuery, useSuspenseQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link, useNavigate, useParams, type LoaderFunctionArgs } from 'react-router';
import { toast } from 'sonner';
import { DEFAULT_WASTE_PERCENT } from '@shared/estimate/rivet-rules';
import { planningSettingsQueryOptions } from '@/features/forecast/api/planning-settings';
import { assemblyQueryOptions } from '@/features/planning/api/get-assembly';
import { buildQueryOptions } from '@/features/planning/api/get-builds';
import { useCreateAssembly, useDeleteAssembly, useUpdateAssembly } from '@/features/planning/api/save-assembly';
import { preferencesQueryOptions, useSetPreferredUnit } from '@/features/planning/api/preferences';
import { AssemblyForm } from '@/features/planning/components/assembly-form';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Card, PageHeader } from '@/components/ui/page';
import { messageOf } from '@/lib/errors';
import { loadAlongside, requireSignedIn } from './guards';
import { idFrom } from './id-param';

/**
 * The person's usual unit and the chapter's planning settings shape the editor but need not stop it:
 * without them it starts in inches with the usual 5 % waste and 10D widest pitch.
 */
const editorContext = (queryClient: QueryClient) =>
  Promise.all([queryClient.ensureQueryData(preferencesQueryOptions()).catch(() => null), queryClient.ensureQueryData(planningSettingsQueryOptions()).catch(() => null)]);

export const assemblyNewLoader = (queryClient: QueryClient) => async ({ request, params }: LoaderFunctionArgs) => {
  await loadAlongside(requireSignedIn(queryClient, request), Promise.all([queryClient.ensureQueryData(buildQueryOptions(idFrom(params))), editorContext(queryClient)]));
  return null;
};

export const assemblyEditLoader = (queryClient: QueryClient) => async ({ request, params }: LoaderFunctionArgs) => {
  // The build is known only from the assembly: that request follows it, not the sign-in check.
  const assemblyAndBuild = queryClient.ensureQueryData(assemblyQueryOptions(idFrom(params))).then((assembly) => queryClient.ensureQueryData(buildQueryOptions(assembly.buildId)));
  await loadAlongside(requireSignedIn(queryClient, request), Promise.all([assemblyAndBuild, editorContext(queryClient)]));
  return null;
};

function useEditorContext() {
  const preferences = useQuery(preferencesQueryOptions());
  const settings = useQuery(planningSettingsQueryOptions());
  const setUnit = useSetPreferredUnit();
  return {
    preferredUnit: preferences.data?.preferredUnit,
    onPreferUnit: setUnit.mutateAsync,
    settings: { wastePercent: settings.data?.wastePercent ?? DEFAULT_WASTE_PERCENT, maxPitchDiameters: settings.data?.maxPitchDiameters },
  };
}

export function AssemblyNewRoute() {
  const buildId = idFrom(useParams());
  const { data: build } = useSuspenseQuery(buildQueryOptions(buildId));
  const create = useCreateAssembly(buildId);
  const navigate = useNavigate();
  const { preferredUnit, onPreferUnit, settings } = useEditorContext();
  return (
    <>
      <PageHeader title="New assembly" lead={`Part of ${build.name}. The estimate beneath each rivet line follows as you type.`} />
      <AssemblyForm
        build={build}
        defaultUnit={preferredUnit ?? 'in'}
        preferredUnit={preferredUnit}
        onPreferUnit={onPreferUnit}
        settings={settings}
        submitLabel="Save the assembly"
        onSubmit={async (body) => {
          const assembly = await create.mutateAsync(body);
          toast.success(`${assembly.name} is saved.`);
          await navigate(`/assemblies/${assembly.id}`);
        }}
      />
    </>
  );
}

export function AssemblyEditRoute() {
  const id = idFrom(useParams());
  const { data: assembly } = useSuspenseQuery(assemblyQueryOptions(id));
  const { data: build } = useSuspenseQuery(buildQueryOptions(assembly.buildId));
  const update = useUpdateAssembly(id);
  const navigate = useNavigate();
  const { preferredUnit, onPreferUnit, settings } = useEditorContext();
  return (
    <>
      <PageHeader
        title={`Edit ${assembly.name}`}
        lead={`Part of ${build.name}.`}
        actions={
          <Link to={`/assemblies/${id}`} className="inline-flex min-h-12 items-center font-semibold underline underline-offset-4">
            Back to its estimate
          </Link>
        }
      />
      <AssemblyForm
        assembly={assembly}
        build={build}
        defaultUnit={assembly.unit}
        preferredUnit={preferredUnit}
        onPreferUnit={onPreferUnit}
        settings={settings}
        submitLabel="Save the assembly"
        onSubmit={async (body) => {
          await update.mutateAsync(body);
          toast.success(`${body.name} is saved.`);
          await navigate(`/assemblies/${id}`);
        }}
      />
      <DeleteAssembly id={id} name={assembly.name} />
    </>
  );
}

function DeleteAssembly({ id, name }: { id: number; name: string }) {
  const [asking, setAsking] = useState(false);
  const remove = useDeleteAssembly(id);
  const navigate = useNavigate();
  return (
    <Card title="Delete the assembly" className="mt-8">
      <p className="mb-3 text-sm">Its plan and estimate go; draws already booked to it stay in the bins’ ledgers.</p>
      {remove.isError && <Notice tone="bad">{messageOf(remove.error)}</Notice>}
      {asking ? (
        <div className="flex flex-wrap gap-3">
          <Button
            variant="danger"
            busy={remove.isPending}
            onClick={() =>
              remove.mutate(undefined, {
                onSuccess: () => {
                  toast.success(`${name} is deleted.`);
                  void navigate('/builds');
                },
              })
            }
          >
            Yes, delete {name}
          </Button>
          <Button variant="secondary" onClick={() => setAsking(false)}>
            Keep it
          </Button>
        </div>
      ) : (
        <Button variant="danger" onClick={() => setAsking(true)}>
          Delete this assembly
        </Button>
      )}
    </Card>
  );
}
