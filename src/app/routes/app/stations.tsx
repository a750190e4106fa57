import { useSuspenseQuery } from '@tanstack/react-query';
import { stationsQueryOptions } from '@/features/stations/api/stations';
import { EnrolStationForm } from '@/features/stations/components/enrol-station-form';
import { StationList } from '@/features/stations/components/station-list';
import { Card, PageHeader } from '@/components/ui/page';
import { pageLoader } from './guards';

export const stationsLoader = pageLoader('quartermaster', [stationsQueryOptions()]);

/** The shared tablets at the crib where members sign in with a badge and PIN. */
export function StationsRoute() {
  const { data: stations } = useSuspenseQuery(stationsQueryOptions());
  return (
    <>
      <PageHeader title="Stations" lead="Shared tablets at the crib where members sign in with their badge and PIN." />
      <div className="flex flex-col gap-4">
        <Card title="Enrolled stations">
          <StationList stations={stations} />
        </Card>
        <Card title="Use this device as a station">
          <EnrolStationForm />
        </Card>
      </div>
    </>
  );
}
