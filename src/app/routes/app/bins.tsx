import { useSuspenseQuery } from '@tanstack/react-query';
import { hasRole } from '@shared/roles';
import { meQueryOptions } from '@/features/auth/api/get-me';
import { binsQueryOptions } from '@/features/stock/api/get-bins';
import { BinTable } from '@/features/stock/components/bin-table';
import { LinkButton } from '@/components/ui/link-button';
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
              <LinkButton to="/bins/new">
                Add bin
              </LinkButton>
              <LinkButton to="/bins/import" variant="secondary">
                Import or export (CSV)
              </LinkButton>
            </div>
          ) : undefined
        }
      />
      <BinTable bins={data.data} />
    </>
  );
}
