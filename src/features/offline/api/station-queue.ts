import { offlineDb, type QueuedAction } from '../db';

/** A station's entries in one state, in the order they were done; the phone's own entries are not among them. */
export async function stationEntries(stationId: number, state: QueuedAction['state']): Promise<QueuedAction[]> {
  return offlineDb.actions.filter((a) => a.station?.stationId === stationId && a.state === state).sortBy('seq');
}

export const stationWaitingOf = (stationId: number) => stationEntries(stationId, 'waiting');
export const stationRefusedOf = (stationId: number) => stationEntries(stationId, 'refused');

/** Someone at the station has read a refusal ("Seen"): it leaves the Not sent list. Only this station's refused entries go. */
export async function dismissStationRefused(seq: number, stationId: number): Promise<void> {
  await offlineDb.transaction('rw', offlineDb.actions, async () => {
    const entry = await offlineDb.actions.get(seq);
    if (entry?.station?.stationId === stationId && entry.state === 'refused') await offlineDb.actions.delete(seq);
  });
}
