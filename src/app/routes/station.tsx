import { useLayoutEffect, useState } from 'react';
import { Link } from 'react-router';
import { forgetStation, readKeptStation, type KeptStation } from '@/features/stations/api/kept-station';
import { PageHeading } from '@/components/ui/page';
import { setStationToken } from '@/lib/api-client';
import { STATION_SCREEN_CLASS, StationScreen } from './station/station-screen';

const screenClass = STATION_SCREEN_CLASS;

/**
 * The full-screen crib station, outside the signed-in app: badge, PIN, then tools and bins for
 * that person until Done, a minute without a scan or tap, or the next badge. With the station's
 * copy it goes on without the network, and sends what was done when the connection is back.
 */
export function StationRoute() {
  const [station, setStation] = useState<KeptStation | undefined>(readKeptStation);
  // Before the screen's own effects run: its first request (the copy) carries the token.
  useLayoutEffect(() => {
    setStationToken(station?.token);
    return () => setStationToken(undefined);
  }, [station]);

  if (!station) {
    return (
      <main className={screenClass}>
        <div className="mx-auto flex max-w-xl flex-col gap-4">
          <PageHeading title="This device is not a station" tabTitle="Station" className="text-4xl" />
          <p className="text-xl">A quartermaster makes a device a station on the Stations page.</p>
          <Link to="/sign-in?next=%2Fstations" className="inline-flex min-h-12 items-center self-start text-xl font-semibold text-brass underline underline-offset-4">
            Sign in
          </Link>
        </div>
      </main>
    );
  }
  return (
    <StationScreen
      station={station}
      onRevoked={() => {
        forgetStation();
        setStation(undefined);
      }}
    />
  );
}

