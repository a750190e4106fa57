import { useMutation } from '@tanstack/react-query';
import type { StationSession, StationSignInBody } from '@shared/schemas/stations';
import { api, ApiError, setCsrfToken } from '@/lib/api-client';

/** Badge and PIN at the station; the server starts a new session, so the old CSRF token is dropped. */
export function useStationSignIn() {
  return useMutation({
    mutationFn: async (body: StationSignInBody) => {
      const session = await api.post<StationSession>('/api/station/sign-in', body);
      setCsrfToken(undefined);
      return session;
    },
  });
}

/** Ends the person's station session; an already ended one is no reason to stop. */
export async function endStationSession(): Promise<void> {
  try {
    await api.post('/api/station/done');
  } catch {
    // Ended already (idle, revoked) or no connection: the screen is cleared either way.
  } finally {
    setCsrfToken(undefined);
  }
}

/** The server says the station session is over: idle on the server, or the station revoked. */
export function endsStationSession(err: unknown): 'ended' | 'not-enrolled' | undefined {
  if (!(err instanceof ApiError) || err.status !== 401) return undefined;
  if (err.code === 'STATION_SESSION_ENDED') return 'ended';
  if (err.code === 'STATION_NOT_ENROLLED') return 'not-enrolled';
  return undefined;
}

/**
 * The server ends a station session a minute after its last request; a tap counts as activity at
 * the station too, so taps tell the server now and then (at most every this often).
 */
export const KEEP_ALIVE_EVERY_MS = 15_000;

/** A request in the station's allow-list that keeps the session going and answers who is signed in. */
export function keepStationSessionAlive(): Promise<unknown> {
  return api.get('/api/auth/me');
}
