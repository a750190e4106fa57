import { useEffect } from 'react';
import { useRevalidator } from 'react-router';
import { useOffline } from '@/features/offline/connection';
import { isNoConnection } from '@/lib/api-client';

/** What a scanned tool's or bin's loader answers: the page from the server, or the phone's copy. */
export interface ScanLoaderData {
  offline: boolean;
}

/**
 * Loads a scanned tool or bin from the server; with no network, or no answer from the server, the
 * page opens from the phone's offline copy instead of the error page.
 */
export async function loadOrOffline(load: () => Promise<unknown>): Promise<ScanLoaderData> {
  if (!navigator.onLine) return { offline: true };
  try {
    await load();
    return { offline: false };
  } catch (err) {
    if (isNoConnection(err)) return { offline: true };
    throw err;
  }
}

/**
 * Whether the page shows the offline copy: when the loader could not reach the server, or the
 * connection drops while the page is open. When it comes back, the loader runs again for the real page.
 */
export function useOfflinePage(loaded: ScanLoaderData | undefined): boolean {
  const offline = useOffline();
  const { revalidate, state } = useRevalidator();
  const loadedOffline = loaded?.offline ?? false;
  useEffect(() => {
    if (!offline && loadedOffline && state === 'idle') void revalidate();
  }, [offline, loadedOffline, state, revalidate]);
  return offline || loadedOffline;
}
