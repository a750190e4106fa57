import { useSuspenseQuery } from '@tanstack/react-query';
import { serviceDueQueryOptions } from '@/features/service/api/get-service-due';
import { ServiceDueTable } from '@/features/service/components/service-due-table';
import { Notice } from '@/components/ui/notice';
import { PageHeader } from '@/components/ui/page';
import { pageLoader } from './guards';

export const serviceLoader = pageLoader('quartermaster', [serviceDueQueryOptions()]);

export function ServiceRoute() {
  const { data } = useSuspenseQuery(serviceDueQueryOptions());
  return (
    <>
      <PageHeader
        title="Service"
        lead={`Tools out of service, tools missing an accessory that did not come back, and tools whose service or calibration is overdue or due within ${data.meta.dueWithinDays} days.`}
      />
      <div className="flex flex-col gap-4">
        <Notice tone="warn" title="Service to the maker's instructions">
          Service and calibrate each tool as its maker's instructions say. Wear eye and hearing protection when you test a powered tool, and
          keep a tool that is not safe out of service.
        </Notice>
        <ServiceDueTable items={data.data} withinDays={data.meta.dueWithinDays} />
      </div>
    </>
  );
}
