import type { ReactNode } from 'react';

/**
 * A short state in words, boxed on one line. The caller gives the colours (`className`) and an optional
 * mark; the words always say the state, so colour is never the only cue.
 */
export function Badge({ mark, className = '', children }: { mark?: ReactNode; className?: string; children: ReactNode }) {
  return (
    <span className={`inline-flex items-center gap-1.5 rounded-md px-2 py-0.5 text-sm font-semibold whitespace-nowrap ${className}`}>
      {mark !== undefined && <span aria-hidden>{mark}</span>}
      {children}
    </span>
  );
}
