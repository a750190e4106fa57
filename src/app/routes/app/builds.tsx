import type { QueryClient } from '@tanstack/react-query';
import { useQuery, useSuspenseQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { LoaderFunctionArgs } from 'react-router';
import { hasRole } from '@shared/roles';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { buildsQueryOptions } from '@/features/planning/api/get-builds';
import { BuildList } from '@/features/planning/components/build-list';
import { NewBuildForm } from '@/features/planning/components/new-build-form';
import { preferencesQueryOptions } from '@/features/planning/api/preferences';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Card, PageHeader } from '@/components/ui/page';
import { messageOf } from '@/lib/errors';
import { loadAlongside, requireSignedIn } from './guards';

export const buildsLoader = (queryClient: QueryClient) => async ({ request }: LoaderFunctionArgs) => {
  await loadAlongside(requireSignedIn(queryClient, request), Promise.all([queryClient.ensureQueryData(buildsQueryOptions()), queryClient.ensureQueryData(preferencesQueryOptions()).catch(() => null)]));
  return null;
};

/** My builds and their assemblies; quartermasters and leads may look at everyone's. */
export function BuildsRoute() {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const { data: mine } = useSuspenseQuery(buildsQueryOptions());
  const [showAll, setShowAll] = useState(false);
  const [adding, setAdding] = useState(false);
  const canSeeAll = !!me && hasRole(me.role, 'quartermaster');
  const everyone = useQuery({ ...buildsQueryOptions({ all: true }), enabled: canSeeAll && showAll });
  const unit = useQuery(preferencesQueryOptions()).data?.preferredUnit ?? 'in';
  if (!me) return null;
  const builds = showAll ? everyone.data : mine;

  return (
    <>
      <PageHeader
        title={showAll ? 'All builds' : 'My builds'}
        lead="Each build holds its assemblies; an assembly’s rivet lines say what it will take from the bins and the crib."
        actions={
          !adding && (
            <Button onClick={() => setAdding(true)} className="max-sm:w-full">
              New build
            </Button>
          )
        }
      />
      {adding && (
        <Card title="New build" className="mb-5">
          <NewBuildForm unit={unit} onDone={() => setAdding(false)} />
          <Button variant="quiet" className="mt-2 px-0" onClick={() => setAdding(false)}>
            Cancel
          </Button>
        </Card>
      )}
      {canSeeAll && (
        <label className="mb-4 flex min-h-12 cursor-pointer items-center gap-3 font-semibold">
          <input type="checkbox" className="size-6" checked={showAll} onChange={(e) => setShowAll(e.target.checked)} />
          Show every member’s builds
        </label>
      )}
      {showAll && everyone.isError && <Notice tone="bad">{messageOf(everyone.error)}</Notice>}
      {builds ? (
        <BuildList builds={builds} unit={unit} meId={me.id} />
      ) : (
        !everyone.isError && (
          <p role="status" className="text-steel">
            Loading every build…
          </p>
        )
      )}
    </>
  );
}
