import { useRegisterSW } from 'virtual:pwa-register/react';
import { networkQuiet } from './network-quiet';
import { UpdateNotice } from './update-notice';

/** An installed app kept open all day at the bench still hears of a new version within the hour. */
const UPDATE_CHECK_MS = 60 * 60 * 1000;

/** Registers the service worker (the app then opens offline) and offers a new version when one is waiting. */
export function AppUpdate() {
  const {
    needRefresh: [needRefresh],
    updateServiceWorker,
  } = useRegisterSW({
    onRegisteredSW(_url, registration) {
      if (registration) setInterval(() => navigator.onLine && void registration.update().catch(() => {}), UPDATE_CHECK_MS);
    },
    onRegisterError(error: unknown) {
      console.warn('Gripline could not install its offline copy:', error);
    },
  });
  return <UpdateNotice needRefresh={needRefresh} onUpdate={() => void networkQuiet().then(() => updateServiceWorker())} />;
}
