import { useEffect, useId, useRef, type KeyboardEvent, type ReactNode } from 'react';
import { photoUrl } from '@shared/schemas/photos';
import { Button } from '@/components/ui/button';

/** A modal dialog leaves the page inert, but Tab past its last control would leave for the browser's own bar: wrap instead. */
function keepTabInside(e: KeyboardEvent<HTMLDialogElement>) {
  if (e.key !== 'Tab') return;
  const controls = [...e.currentTarget.querySelectorAll<HTMLElement>('button:not(:disabled), a[href], input:not(:disabled)')];
  const [first, last] = [controls[0], controls.at(-1)];
  const edge = e.shiftKey ? first : last;
  if (!edge || document.activeElement !== edge) return;
  e.preventDefault();
  (e.shiftKey ? last : first)?.focus();
}

/**
 * The full photo over the page, as the browser's own modal dialog: the page behind is inert, so
 * focus stays inside; Escape or Close closes it, and the browser gives focus back to the thumbnail
 * that opened it. Every way out goes through the dialog's close event, then `onClose`.
 */
export function PhotoViewer({ id, title, onClose, actions }: { id: number; title: string; onClose: () => void; actions?: ReactNode }) {
  const dialog = useRef<HTMLDialogElement>(null);
  const closeButton = useRef<HTMLButtonElement>(null);
  const titleId = useId();

  useEffect(() => {
    if (!dialog.current || dialog.current.open) return;
    dialog.current.showModal();
    closeButton.current?.focus();
  }, []);

  return (
    <dialog
      ref={dialog}
      aria-labelledby={titleId}
      onClose={onClose}
      onKeyDown={keepTabInside}
      className="fixed inset-0 m-0 size-full max-h-none max-w-none flex-col border-0 bg-ink/95 p-3 text-card open:flex backdrop:bg-ink/60"
    >
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 id={titleId} className="font-semibold">
          {title}
        </h2>
        <div className="flex flex-wrap gap-2">
          {actions}
          <Button ref={closeButton} variant="secondary" onClick={() => dialog.current?.close()}>
            Close
          </Button>
        </div>
      </div>
      <img src={photoUrl(id)} alt={title} className="mt-3 min-h-0 flex-1 object-contain" />
    </dialog>
  );
}
