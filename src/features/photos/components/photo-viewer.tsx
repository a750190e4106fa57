import { useEffect, type ReactNode } from 'react';
import { photoUrl } from '@shared/schemas/photos';
import { Button } from '@/components/ui/button';

/** The full photo over the page; Escape or the Close button returns to the gallery. */
export function PhotoViewer({ id, title, onClose, actions }: { id: number; title: string; onClose: () => void; actions?: ReactNode }) {
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (e.key === 'Escape') onClose();
    };
    document.addEventListener('keydown', onKey);
    return () => document.removeEventListener('keydown', onKey);
  }, [onClose]);

  return (
    <div role="dialog" aria-modal="true" aria-label={title} className="fixed inset-0 z-50 flex flex-col bg-ink/95 p-3 text-card">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <p className="font-semibold">{title}</p>
        <div className="flex flex-wrap gap-2">
          {actions}
          <Button variant="secondary" autoFocus onClick={onClose}>
            Close
          </Button>
        </div>
      </div>
      <img src={photoUrl(id)} alt={title} className="mt-3 min-h-0 flex-1 object-contain" />
    </div>
  );
}
