import { useId, useRef, useState } from 'react';

/**
 * Where a USB scanner in keyboard mode types a code (then Enter): a badge, or a tool or bin label.
 * Focus stays here unless the person moves it on purpose; what is typed is masked, so a badge's
 * token is never shown. The code is handed over as typed: a badge's token is case-sensitive.
 */
export function ScanEntry({ label, onCode }: { label: string; onCode: (code: string) => void }) {
  const [value, setValue] = useState('');
  const input = useRef<HTMLInputElement>(null);
  const id = useId();
  return (
    <form
      className="flex flex-col gap-2"
      onSubmit={(e) => {
        e.preventDefault();
        const code = value.trim();
        setValue('');
        if (code) onCode(code);
      }}
    >
      <label htmlFor={id} className="text-lg font-semibold">
        {label}
      </label>
      <input
        id={id}
        ref={input}
        type="password"
        value={value}
        onChange={(e) => setValue(e.target.value)}
        // Focus that drops to the page (a tap on nothing) comes back, so the next scan lands here.
        onBlur={(e) => {
          if (!e.relatedTarget) setTimeout(() => input.current?.focus(), 0);
        }}
        autoFocus
        autoComplete="off"
        className="min-h-14 rounded-lg border-2 border-brass bg-ink px-4 text-2xl text-card"
      />
    </form>
  );
}
