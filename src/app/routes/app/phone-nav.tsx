import { useRef, useState } from 'react';
import { barLinksOf, groupLabel, type NavLinkEntry } from './nav-links';
import { MENU_LINK, NavItem, NavSections } from './side-nav';

// 3.5 rem high: the toasts sit just above it (app/provider.tsx).
const SLOT = 'flex min-h-14 w-full flex-col items-center justify-center px-1 text-sm font-semibold text-ink-soft';
const BAR_LINK = `${SLOT} aria-[current=page]:text-ink aria-[current=page]:shadow-[inset_0_-4px_0_var(--color-brass-deep)]`;
/** Scan, the one thing a member comes to do, is the one filled slot. */
const SCAN_LINK =
  'm-1 flex w-full flex-col items-center justify-center rounded-xl bg-brass text-base font-bold text-ink shadow-sm aria-[current=page]:ring-2 aria-[current=page]:ring-ink aria-[current=page]:ring-inset';

/** Phones: the bottom bar (Scan in the middle, under the thumb) and the Menu with every other page by group. */
export function PhoneNav({ links, current }: { links: NavLinkEntry[]; current: NavLinkEntry | undefined }) {
  const dialog = useRef<HTMLDialogElement>(null);
  const [open, setOpen] = useState(false);
  const bar = barLinksOf(links);
  const middle = Math.floor((bar.length + 1) / 2);
  const inMenu = links.filter((link) => link.bar === undefined);
  const menuTop = inMenu.filter((link) => link.group === undefined);
  const menuHolds = current !== undefined && current.bar === undefined;
  const close = () => dialog.current?.close();

  return (
    <nav aria-label="Main" className="fixed inset-x-0 bottom-0 z-10 border-t border-rule bg-card md:hidden">
      <ul className="mx-auto grid max-w-lg" style={{ gridTemplateColumns: `repeat(${bar.length + 1}, minmax(0, 1fr))` }}>
        {bar.map((link, i) => (
          <li key={link.to} className="flex items-stretch">
            <NavItem link={link} current={current} className={i === middle ? SCAN_LINK : BAR_LINK} />
          </li>
        ))}
        <li className="flex items-stretch">
          <button
            type="button"
            aria-haspopup="dialog"
            aria-expanded={open}
            onClick={() => {
              dialog.current?.showModal();
              setOpen(true);
            }}
            className={`${SLOT} ${menuHolds ? 'text-ink shadow-[inset_0_-4px_0_var(--color-brass-deep)]' : ''}`}
          >
            Menu
            {menuHolds && (
              <>
                <span className="sr-only">, you are on </span>
                <span className="max-w-full truncate text-xs font-medium">{current.label}</span>
              </>
            )}
          </button>
        </li>
      </ul>
      <dialog
        ref={dialog}
        aria-labelledby="phone-menu-title"
        onClose={() => setOpen(false)}
        onClick={(e) => e.target === e.currentTarget && close()}
        className="m-0 mt-auto max-h-[calc(100dvh-3rem)] w-full max-w-none overflow-y-auto rounded-t-2xl bg-card p-3 pb-6 text-ink backdrop:bg-ink/50"
      >
        <div className="flex items-center justify-between gap-3">
          <p id="phone-menu-title" className="px-3 text-lg font-bold">
            Menu
          </p>
          <button type="button" onClick={close} className="min-h-12 rounded-lg border-2 border-edge px-4 font-semibold">
            Close
          </button>
        </div>
        {current && (
          <p className="px-3 text-sm text-ink-soft">
            You are on {current.group ? `${groupLabel(current.group)} · ` : ''}
            {current.label}.
          </p>
        )}
        {menuTop.length > 0 && (
          <ul className="mt-3">
            {menuTop.map((link) => (
              <li key={link.to}>
                <NavItem link={link} current={current} onClick={close} className={MENU_LINK} />
              </li>
            ))}
          </ul>
        )}
        <NavSections links={inMenu} current={current} onNavigate={close} idPrefix="menu" linkClass={MENU_LINK} />
      </dialog>
    </nav>
  );
}
