import { Link } from 'react-router';
import type { Build, LengthUnit } from '@shared/schemas/builds';
import { Card } from '@/components/ui/page';
import { lengthText, plannedDatesText } from '../utils/words';
import { AssemblyStatusBadge } from './assembly-status';

const LINK_BUTTON = 'inline-flex min-h-12 items-center justify-center rounded-lg border-2 border-ink bg-card px-4 font-semibold hover:bg-paper';

/** Builds with their assemblies, each opening its estimate; the owner may add assemblies. */
export function BuildList({ builds, unit, meId }: { builds: Build[]; unit: LengthUnit; meId: number }) {
  if (builds.length === 0) return <p className="text-steel">No builds yet. Start one with “New build”.</p>;
  return (
    <ul className="flex flex-col gap-4">
      {builds.map((build) => {
        const mine = build.owner.id === meId;
        return (
          <li key={build.id}>
            <Card>
              <div className="flex flex-wrap items-start justify-between gap-3">
                <div className="min-w-0">
                  <h2 className="text-lg font-semibold break-words">{build.name}</h2>
                  {!mine && <p className="text-sm text-steel">{build.owner.name}’s build</p>}
                  {build.description && <p className="mt-1 break-words">{build.description}</p>}
                  {build.edgeFloorIn !== null && (
                    <p className="mt-1 text-sm text-steel">Edge distance floor {lengthText(unit === 'mm' ? build.edgeFloorIn * 25.4 : build.edgeFloorIn, unit)}</p>
                  )}
                </div>
                {mine && (
                  <Link to={`/builds/${build.id}/assemblies/new`} className={LINK_BUTTON}>
                    Add assembly<span className="sr-only"> to {build.name}</span>
                  </Link>
                )}
              </div>
              {build.assemblies.length === 0 ? (
                <p className="mt-3 text-steel">No assemblies yet.</p>
              ) : (
                <ul className="mt-3 flex flex-col divide-y divide-rule border-t border-rule" aria-label={`Assemblies of ${build.name}`}>
                  {build.assemblies.map((a) => (
                    <li key={a.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
                      <Link to={`/assemblies/${a.id}`} className="inline-flex min-h-12 items-center font-semibold underline underline-offset-4">
                        {a.name}
                      </Link>
                      <span className="flex flex-wrap items-center gap-2 text-sm">
                        <AssemblyStatusBadge status={a.status} />
                        <span className="text-steel">{plannedDatesText(a.plannedStart, a.plannedFinish)}</span>
                      </span>
                    </li>
                  ))}
                </ul>
              )}
            </Card>
          </li>
        );
      })}
    </ul>
  );
}
