import { useState } from 'react';

const KEYS = ['1', '2', '3', '4', '5', '6', '7', '8', '9'] as const;
const MAX_DIGITS = 8;

const keyClass = 'min-h-20 rounded-xl text-3xl font-bold focus-visible:outline-brass';

/** A large keypad for a 4–8 digit PIN, shown as dots; OK hands the PIN over and empties the pad. */
export function PinPad({ onPin, busy }: { onPin: (pin: string) => void; busy: boolean }) {
  const [pin, setPin] = useState('');
  const press = (digit: string) => setPin((p) => (p.length < MAX_DIGITS ? p + digit : p));
  return (
    <div className="flex flex-col items-center gap-5">
      <p aria-live="polite" className="flex h-10 items-center gap-3">
        <span className="sr-only">{`${pin.length} of 4 to 8 digits typed`}</span>
        {Array.from({ length: Math.max(4, pin.length) }, (_, i) => (
          <span key={i} aria-hidden className={`size-6 rounded-full border-4 border-brass ${i < pin.length ? 'bg-brass' : ''}`} />
        ))}
      </p>
      <div className="grid w-full max-w-sm grid-cols-3 gap-3">
        {KEYS.map((d) => (
          <button key={d} type="button" className={`${keyClass} bg-card text-ink`} onClick={() => press(d)}>
            {d}
          </button>
        ))}
        <button type="button" className={`${keyClass} border-2 border-card bg-ink text-card`} onClick={() => setPin('')}>
          Clear
        </button>
        <button type="button" className={`${keyClass} bg-card text-ink`} onClick={() => press('0')}>
          0
        </button>
        <button
          type="button"
          disabled={busy || pin.length < 4}
          aria-busy={busy || undefined}
          className={`${keyClass} bg-brass text-ink disabled:opacity-60`}
          onClick={() => {
            onPin(pin);
            setPin('');
          }}
        >
          OK
        </button>
      </div>
    </div>
  );
}
