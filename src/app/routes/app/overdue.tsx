import { useSuspenseQuery } from '@tanstack/react-query';
import { overdueQueryOptions } from '@/features/overdue/api/get-overdue';
import { LastRunNote } from '@/features/overdue/components/last-run-note';
import { OverdueTable } from '@/features/overdue/components/overdue-table';
import { PageHeader } from '@/components/ui/page';
import { pageLoader } from './guards';

export const overdueLoader = pageLoader('lead', [overdueQueryOptions()]);

export function OverdueRoute() {
  const { data } = useSuspenseQuery(overdueQueryOptions());
  return (
    <>
      <PageHeader title="Overdue" lead="Tools past their due date, the latest back first, with who has them and how to reach them." />
      <div className="flex flex-col gap-4">
        <LastRunNote run={data.lastRun} />
        <OverdueTable loans={data.data} />
      </div>
    </>
  );
}
