import { useEffect, useRef, useState } from 'react';

const KEYS = ['1', '2', '3', '4', '5', '6', '7', '8', '9'] as const;
const MIN_DIGITS = 4;
const MAX_DIGITS = 8;

const keyClass = 'min-h-20 rounded-xl text-3xl font-bold focus-visible:outline-brass';

/** Keys typed into a field are the field's; the pad takes only those typed anywhere else. */
const addDigit = (digit: string) => (p: string) => (p.length < MAX_DIGITS ? p + digit : p);

const typedIntoField = (target: EventTarget | null) => target instanceof HTMLElement && (target.isContentEditable || ['INPUT', 'TEXTAREA', 'SELECT'].includes(target.tagName));

/**
 * A large keypad for a 4–8 digit PIN, shown as dots; OK hands the PIN over and empties the pad.
 * A USB keypad or keyboard works as the buttons do: digits, Backspace, and Enter for OK.
 */
export function PinPad({ onPin, busy }: { onPin: (pin: string) => void; busy: boolean }) {
  const [pin, setPin] = useState('');
  const press = (digit: string) => setPin(addDigit(digit));
  const ready = !busy && pin.length >= MIN_DIGITS;
  const submit = () => {
    onPin(pin);
    setPin('');
  };

  const pad = useRef<HTMLDivElement>(null);
  const keys = useRef({ ready, submit });
  useEffect(() => {
    keys.current = { ready, submit };
  });
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (e.ctrlKey || e.altKey || e.metaKey || typedIntoField(e.target)) return;
      if (/^\d$/.test(e.key)) {
        e.preventDefault();
        setPin(addDigit(e.key));
      } else if (e.key === 'Backspace') {
        e.preventDefault();
        setPin((p) => p.slice(0, -1));
      } else if (e.key === 'Enter' && (e.target === document.body || (e.target instanceof Node && pad.current?.contains(e.target)))) {
        // Also on a focused key of the pad: Enter means OK, never "press the key again". On another button it is that button's.
        e.preventDefault();
        if (keys.current.ready) keys.current.submit();
      }
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, []);

  return (
    <div ref={pad} className="flex flex-col items-center gap-5">
      <p aria-live="polite" className="flex h-10 items-center gap-3">
        <span className="sr-only">{`${pin.length} of 4 to 8 digits typed`}</span>
        {Array.from({ length: Math.max(MIN_DIGITS, pin.length) }, (_, i) => (
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
        <button type="button" disabled={!ready} aria-busy={busy || undefined} className={`${keyClass} bg-brass text-ink disabled:opacity-60`} onClick={submit}>
          OK
        </button>
      </div>
    </div>
  );
}
