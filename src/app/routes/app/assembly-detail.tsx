import type { QueryClient } from '@tanstack/react-query';
import { useSuspenseQuery } from '@tanstack/react-query';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { assemblyEstimateQueryOptions, assemblyQueryOptions } from '@/features/planning/api/get-assembly';
import { AssemblyStatusBadge } from '@/features/planning/components/assembly-status';
import { BillList } from '@/features/planning/components/bill-list';
import { EstimateTotalsView } from '@/features/planning/components/estimate-totals';
import { HoldKit } from '@/features/planning/components/hold-kit';
import { KitList } from '@/features/planning/components/kit-list';
import { LineEstimateView } from '@/features/planning/components/line-estimate';
import { PlanningCaution } from '@/features/planning/components/planning-caution';
import { plannedDatesText } from '@/features/planning/utils/words';
import { LinkButton } from '@/components/ui/link-button';
import { Notice } from '@/components/ui/notice';
import { Card, PageHeader } from '@/components/ui/page';
import { loadAlongside, requireSignedIn } from './guards';
import { idFrom } from './id-param';

export const assemblyDetailLoader = (queryClient: QueryClient) => async ({ request, params }: LoaderFunctionArgs) => {
  const id = idFrom(params);
  await loadAlongside(
    requireSignedIn(queryClient, request),
    Promise.all([queryClient.ensureQueryData(assemblyQueryOptions(id)), queryClient.ensureQueryData(assemblyEstimateQueryOptions(id))]),
  );
  return null;
};

/** A saved assembly's estimate: what to draw from which bin, what to hold in the crib, each line worked out. */
export function AssemblyDetailRoute() {
  const id = idFrom(useParams());
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const { data: assembly } = useSuspenseQuery(assemblyQueryOptions(id));
  const { data: estimate } = useSuspenseQuery(assemblyEstimateQueryOptions(id));
  const mine = me?.id === assembly.owner.id;
  const edit = `/assemblies/${id}/edit`;

  return (
    <div className="flex flex-col gap-4">
      <PageHeader
        title={assembly.name}
        lead={
          <span className="flex flex-wrap items-center gap-2">
            <span>{assembly.buildName}</span>
            <AssemblyStatusBadge status={assembly.status} />
            <span>{plannedDatesText(assembly.plannedStart, assembly.plannedFinish)}</span>
            {!mine && <span>· {assembly.owner.name}</span>}
          </span>
        }
        actions={
          mine && (
            <LinkButton to={edit} variant="secondary" className="max-sm:w-full">
              Edit the assembly
            </LinkButton>
          )
        }
      />
      <PlanningCaution lead={estimate.caution} cautions={estimate.cautions} />
      {estimate.errors.length > 0 && (
        <Notice tone="bad" title="Some rivet lines cannot be estimated">
          <ul className="list-disc pl-5">
            {estimate.errors.map((e) => (
              <li key={`${e.line}-${e.code}`}>{e.message}</li>
            ))}
          </ul>
          {mine && (
            <Link to={edit} className="mt-2 inline-flex min-h-12 items-center font-semibold underline underline-offset-4">
              Fix them in the editor
            </Link>
          )}
        </Notice>
      )}
      {estimate.warnings.length > 0 && (
        <Notice tone="warn">
          <ul className="list-disc pl-5">
            {estimate.warnings.map((w, i) => (
              <li key={i}>{w.message}</li>
            ))}
          </ul>
        </Notice>
      )}

      <Card title="Totals">
        <EstimateTotalsView totals={estimate.totals} wastePercent={estimate.wastePercent} />
      </Card>
      <Card title="From the bins">
        <BillList bill={estimate.bill} wastePercent={estimate.wastePercent} />
      </Card>
      <Card title="From the crib">
        <div className="flex flex-col gap-4">
          <KitList kit={estimate.kit} />
          {mine && estimate.kit.length > 0 && <HoldKit assemblyId={id} plannedStart={assembly.plannedStart} />}
        </div>
      </Card>
      <Card title="Rivet lines">
        {estimate.lines.length === 0 ? (
          <p className="text-steel">
            No rivet lines to show.{' '}
            {mine && (
              <Link to={edit} className="font-semibold underline underline-offset-4">
                Add them in the editor
              </Link>
            )}
          </p>
        ) : (
          <ol className="flex flex-col gap-4">
            {estimate.lines.map((line, i) => (
              <li key={i} className="rounded-lg border border-rule p-3">
                <h3 className="mb-2 font-semibold">{line.label ?? `Line ${i + 1}`}</h3>
                <LineEstimateView line={line} unit={estimate.unit} kind={assembly.lines[i]?.rivet.kind ?? 'blind-structural'} layout={assembly.lines[i]} />
              </li>
            ))}
          </ol>
        )}
      </Card>
    </div>
  );
}
