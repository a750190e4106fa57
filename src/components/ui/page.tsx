import { useRef, type ReactNode } from 'react';
import { useFocusOnNewPage } from './use-focus-on-new-page';

/** What the browser tab (and a screen reader, on arrival) calls a page: "Overdue · Gripline". */
export const pageTitle = (name: string) => `${name} · Gripline`;

/**
 * A page's one h1 and its `<title>` (React hoists it into the head), so every page that has a
 * heading has a title of its own. `tabIndex={-1}`: focus moves here after a route change
 * (`useFocusOnNewPage`). `tabTitle` names the page when the heading says more or less
 * ("Hello, Marco" is the Home page; a tool's heading is its name, its tab its code and name).
 */
export function PageHeading({ title, tabTitle = title, id, className = '' }: { title: string; tabTitle?: string; id?: string; className?: string }) {
  const heading = useRef<HTMLHeadingElement>(null);
  useFocusOnNewPage(heading);
  return (
    <>
      <title>{pageTitle(tabTitle)}</title>
      <h1 ref={heading} id={id} tabIndex={-1} className={`text-2xl font-bold focus:outline-none ${className}`}>
        {title}
      </h1>
    </>
  );
}

export function PageHeader({ title, tabTitle, lead, actions }: { title: string; tabTitle?: string; lead?: ReactNode; actions?: ReactNode }) {
  return (
    <header className="mb-5 flex flex-wrap items-end justify-between gap-3">
      <div>
        <PageHeading title={title} tabTitle={tabTitle} className="tracking-tight" />
        {lead && <p className="mt-1 text-ink-soft">{lead}</p>}
      </div>
      {actions}
    </header>
  );
}

export function Card({ title, children, className = '' }: { title?: string; children: ReactNode; className?: string }) {
  return (
    <section className={`rounded-xl border border-rule bg-card p-4 shadow-sm sm:p-5 ${className}`}>
      {title && <h2 className="mb-3 text-lg font-semibold">{title}</h2>}
      {children}
    </section>
  );
}

export function Code({ children }: { children: ReactNode }) {
  return <span className="font-mono text-[0.95em]">{children}</span>;
}

/** A tool's or bin's code in running text: never broken at its hyphen ("T-" above "0051") on a narrow phone. */
export function ItemCode({ code, className = '' }: { code: string; className?: string }) {
  return <span className={`font-mono whitespace-nowrap ${className}`}>{code}</span>;
}
