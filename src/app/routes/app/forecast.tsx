import { useSuspenseQuery } from '@tanstack/react-query';
import { forecastQueryOptions } from '@/features/forecast/api/get-forecast';
import { ForecastList } from '@/features/forecast/components/forecast-list';
import { formatDay, formatPercent } from '@/features/forecast/utils/format';
import { LinkButton } from '@/components/ui/link-button';
import { PageHeader } from '@/components/ui/page';
import { pageLoader } from './guards';

export const forecastLoader = pageLoader('quartermaster', [forecastQueryOptions()]);

export function ForecastRoute() {
  const { data } = useSuspenseQuery(forecastQueryOptions());
  return (
    <>
      <PageHeader
        title="Forecast"
        lead={`Each bin's next ${data.meta.horizonWeeks} weeks: demand from planned assemblies (or past draws), projected on hand, and when to reorder. Worked out ${formatDay(data.meta.generatedAt)} at a ${formatPercent(data.meta.serviceLevel)} service level.`}
        actions={
          <LinkButton to="/settings" variant="secondary">
            Planning settings
          </LinkButton>
        }
      />
      <ForecastList list={data} />
    </>
  );
}
