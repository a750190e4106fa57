import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { useFormInProgress } from './use-form-in-progress';

/**
 * A quiet note that a new version of Gripline is ready. It reloads only when the member taps, and
 * offers no tap while a form is half filled in, so nothing typed is lost. After the tap it says so at
 * once, since the reload may wait a moment for the page's fetches to finish.
 */
export function UpdateNotice({ needRefresh, onUpdate }: { needRefresh: boolean; onUpdate: () => void }) {
  const formInProgress = useFormInProgress();
  const [updating, setUpdating] = useState(false);
  if (!needRefresh) return null;
  return (
    <div
      role="status"
      className="fixed inset-x-3 bottom-20 z-30 mx-auto flex max-w-md items-center justify-between gap-3 rounded-xl border border-rule bg-card px-4 py-2 text-ink shadow-lg sm:bottom-4"
    >
      {updating ? (
        <p className="py-2 text-sm font-semibold">Updating…</p>
      ) : formInProgress ? (
        <p className="py-2 text-sm">Update ready — finish or leave this form first.</p>
      ) : (
        <>
          <p className="text-sm font-semibold">Update ready</p>
          <Button
            variant="secondary"
            onClick={() => {
              setUpdating(true);
              onUpdate();
            }}
          >
            Reload now
          </Button>
        </>
      )}
    </div>
  );
}
