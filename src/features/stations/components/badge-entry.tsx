import { useRef, useState } from 'react';

/**
 * Where a USB scanner in keyboard mode types a badge (the code, then Enter). Focus stays here
 * unless the person moves it on purpose; what is typed is masked, so a badge's token is never shown.
 */
export function BadgeEntry({ onBadge }: { onBadge: (badge: string) => void }) {
  const [value, setValue] = useState('');
  const input = useRef<HTMLInputElement>(null);
  return (
    <form
      className="flex flex-col gap-2"
      onSubmit={(e) => {
        e.preventDefault();
        const badge = value.trim();
        setValue('');
        if (badge) onBadge(badge);
      }}
    >
      <label htmlFor="station-badge" className="text-lg font-semibold">
        Badge scanner
      </label>
      <input
        id="station-badge"
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
