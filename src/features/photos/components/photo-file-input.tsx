import { useId } from 'react';

/**
 * A file input dressed as a 48 px button. On a phone, capture="environment" opens the back
 * camera straight away; on a computer it opens the file picker.
 */
export function PhotoFileInput({ label, busy, onFile }: { label: string; busy: boolean; onFile: (file: File) => void }) {
  const id = useId();
  return (
    <label
      htmlFor={id}
      aria-disabled={busy || undefined}
      className={`inline-flex min-h-12 cursor-pointer items-center justify-center gap-2 rounded-lg border-2 border-ink bg-card px-5 text-base font-semibold text-ink hover:bg-paper focus-within:outline-2 focus-within:outline-offset-2 ${busy ? 'cursor-wait opacity-70' : ''}`}
    >
      <input
        id={id}
        type="file"
        accept="image/*"
        capture="environment"
        className="sr-only"
        disabled={busy}
        onChange={(e) => {
          const file = e.target.files?.[0];
          e.target.value = '';
          if (file) onFile(file);
        }}
      />
      {busy && <span aria-hidden className="size-4 animate-spin rounded-full border-2 border-current border-t-transparent" />}
      {busy ? 'Uploading photo…' : label}
    </label>
  );
}
