import { useSuspenseQuery } from '@tanstack/react-query';
import { Link } from 'react-router';
import { hasRole } from '@shared/roles';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { binsQueryOptions } from '@/features/stock/api/get-bins';
import { BinTable } from '@/features/stock/components/bin-table';
import { PageHeader } from '@/components/ui/page';
import { pageLoader } from './guards';

export const binsLoader = pageLoader('signed-in', [binsQueryOptions()]);

export function BinsRoute() {
  const { data: me } = useSuspenseQuery(meQueryOptions());
  const { data } = useSuspenseQuery(binsQueryOptions());
  return (
    <>
      <PageHeader
        title="Bins"
        lead="Rivets, screws, bits and sealant on the shelves: what each bin holds and how much is left."
        actions={
          me && hasRole(me.role, 'quartermaster') ? (
            <div className="flex flex-wrap gap-2">
              <Link to="/bins/new" className="inline-flex min-h-12 items-center rounded-lg bg-ink px-5 font-semibold text-card">
                Add bin
              </Link>
              <Link to="/bins/import" className="inline-flex min-h-12 items-center rounded-lg border-2 border-ink px-5 font-semibold text-ink">
                Import or export (CSV)
              </Link>
            </div>
          ) : undefined
        }
      />
      <BinTable bins={data.data} />
    </>
  );
}
