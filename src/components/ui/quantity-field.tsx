import type { ReactNode } from 'react';
import { FieldShell } from '@/components/ui/field';

interface QuantityFieldProps {
  label: string;
  value: number | undefined;
  onChange: (value: number | undefined) => void;
  onBlur?: () => void;
  min?: number;
  max?: number;
  /** What a step of the − / + buttons adds: 1, or a pack. */
  step?: number;
  hint?: ReactNode;
  error?: string;
  name?: string;
  autoFocus?: boolean;
}

const STEPPER = 'inline-flex size-14 shrink-0 items-center justify-center rounded-lg border-2 border-ink bg-card text-2xl font-bold hover:bg-paper disabled:border-rule disabled:text-steel';

/** A whole-number field for gloved thumbs: a big numeric keypad input between − and + buttons. */
export function QuantityField({ label, value, onChange, onBlur, min = 0, max, step = 1, hint, error, name, autoFocus }: QuantityFieldProps) {
  const current = value === undefined || Number.isNaN(value) ? undefined : value;
  const clamp = (n: number) => Math.min(max ?? Number.POSITIVE_INFINITY, Math.max(min, n));
  const bump = (by: number) => onChange(clamp((current ?? 0) + by));
  return (
    <FieldShell label={label} hint={hint} error={error}>
      {({ id, describedBy }) => (
        <div className="flex items-center gap-2">
          <button type="button" className={STEPPER} aria-label={`${step} less`} disabled={current === undefined || current <= min} onClick={() => bump(-step)}>
            −
          </button>
          <input
            id={id}
            name={name}
            type="number"
            inputMode="numeric"
            pattern="[0-9]*"
            min={min}
            max={max}
            step={1}
            autoFocus={autoFocus}
            value={current ?? ''}
            onChange={(e) => onChange(e.target.value === '' ? undefined : Number(e.target.value))}
            onBlur={onBlur}
            aria-invalid={error ? true : undefined}
            aria-describedby={describedBy}
            className="min-h-14 w-full min-w-0 rounded-lg border-2 border-edge bg-card px-3 text-center font-mono text-2xl text-ink focus:border-ink aria-[invalid=true]:border-bad"
          />
          <button type="button" className={STEPPER} aria-label={`${step} more`} disabled={max !== undefined && current !== undefined && current >= max} onClick={() => bump(step)}>
            +
          </button>
        </div>
      )}
    </FieldShell>
  );
}
