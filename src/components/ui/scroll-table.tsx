import type { ReactNode } from 'react';

/**
 * A table that may scroll sideways on a phone: a named region that takes focus, so the keyboard can
 * scroll it too (WCAG 2.2, success criterion 2.1.1).
 */
export function ScrollTable({ label, id, className = '', children }: { label: string; id?: string; className?: string; children: ReactNode }) {
  return (
    <div id={id} role="region" aria-label={label} tabIndex={0} className={`overflow-x-auto rounded-lg border border-rule ${className}`}>
      {children}
    </div>
  );
}
