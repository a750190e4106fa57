import { stationCopySchema, type StationCopy } from '@shared/schemas/stations';
import { api } from '@/lib/api-client';
import { offlineDb, type StoredStationCopy } from '../db';

export const STATION_COPY_PATH = '/api/station/copy';

/** Takes the station's copy from the server (the request carries the station's token) and keeps it under the station's id. */
export async function refreshStationCopy(stationId: number): Promise<StationCopy> {
  const copy = stationCopySchema.parse(await api.getOrGiveUp<unknown>(STATION_COPY_PATH));
  await offlineDb.stationCopies.put({ stationId, copy });
  return copy;
}

export async function readStationCopy(stationId: number): Promise<StoredStationCopy | undefined> {
  return offlineDb.stationCopies.get(stationId);
}

/** The station is forgotten (revoked, or not enrolled any more): nothing of its people stays on the device. */
export async function forgetStationCopy(stationId: number): Promise<void> {
  await offlineDb.transaction('rw', offlineDb.stationCopies, offlineDb.stationPinFailures, async () => {
    await offlineDb.stationCopies.delete(stationId);
    await offlineDb.stationPinFailures.where('[stationId+badgeHash]').between([stationId, ''], [stationId, '\uffff']).delete();
  });
}
