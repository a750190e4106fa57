import { useSyncExternalStore } from 'react';
import { onReachability } from '@/lib/api-client';

/**
 * Whether Gripline can be reached: the browser says it is online, and the last request got an
 * answer. A phone on hangar Wi-Fi can be "online" to a dead access point, hence both.
 */
let serverAnswered = true;
const listeners = new Set<() => void>();

const emit = () => listeners.forEach((l) => l());

onReachability((answered) => {
  if (answered !== serverAnswered) {
    serverAnswered = answered;
    emit();
  }
});

if (typeof window !== 'undefined') {
  // Back on the network: assume the server answers until a request says otherwise.
  window.addEventListener('online', () => {
    serverAnswered = true;
    emit();
  });
  window.addEventListener('offline', emit);
}

export function isOffline(): boolean {
  return !navigator.onLine || !serverAnswered;
}

function subscribe(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

/** Re-renders when the connection comes or goes. */
export function useOffline(): boolean {
  return useSyncExternalStore(subscribe, isOffline, () => false);
}
