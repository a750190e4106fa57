import { z } from 'zod';

/** Where an enrolled browser keeps its station: `{ token, id, name }`. */
export const KEPT_STATION_KEY = 'gripline.station';

const keptStationSchema = z.object({ token: z.string().min(1), id: z.number().int(), name: z.string() });
export type KeptStation = z.infer<typeof keptStationSchema>;

/** The station this browser is, or undefined when it is none (or what is kept is not one). */
export function readKeptStation(): KeptStation | undefined {
  try {
    const parsed = keptStationSchema.safeParse(JSON.parse(localStorage.getItem(KEPT_STATION_KEY) ?? 'null'));
    return parsed.success ? parsed.data : undefined;
  } catch {
    return undefined;
  }
}

export function keepStation(station: KeptStation): void {
  localStorage.setItem(KEPT_STATION_KEY, JSON.stringify(station));
}

/** The station was revoked: this browser is no longer one. */
export function forgetStation(): void {
  localStorage.removeItem(KEPT_STATION_KEY);
}
