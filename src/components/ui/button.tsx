import type { ComponentProps } from 'react';

type Variant = 'primary' | 'secondary' | 'danger' | 'quiet';

const VARIANTS: Record<Variant, string> = {
  primary: 'bg-ink text-card hover:bg-ink-soft disabled:bg-steel',
  secondary: 'bg-card text-ink border-2 border-ink hover:bg-paper',
  danger: 'bg-card text-bad border-2 border-bad hover:bg-bad-soft',
  quiet: 'bg-transparent text-ink underline underline-offset-4 hover:text-ink-soft',
};

export interface ButtonProps extends ComponentProps<'button'> {
  variant?: Variant;
  busy?: boolean;
}

/** At least 48 px tall: thumbs in work gloves. */
export function Button({ variant = 'primary', busy = false, className = '', children, disabled, ...rest }: ButtonProps) {
  return (
    <button
      type="button"
      {...rest}
      disabled={disabled || busy}
      aria-busy={busy || undefined}
      className={`inline-flex min-h-12 items-center justify-center gap-2 rounded-lg px-5 text-base font-semibold transition-colors disabled:cursor-not-allowed ${VARIANTS[variant]} ${className}`}
    >
      {busy && <span aria-hidden className="size-4 animate-spin rounded-full border-2 border-current border-t-transparent" />}
      {children}
    </button>
  );
}
