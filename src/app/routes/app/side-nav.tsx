import { Link } from 'react-router';
import { sectionsOf, type NavLinkEntry } from './nav-links';

const LINK = 'flex items-center rounded-lg px-3 font-semibold text-ink-soft hover:text-ink aria-[current=page]:text-ink aria-[current=page]:shadow-[inset_4px_0_0_var(--color-brass-deep)]';
/** In the Menu on a phone (a card): thumb-sized rows. */
export const MENU_LINK = `${LINK} min-h-12 hover:bg-paper aria-[current=page]:bg-paper`;
/** Down the side on a wide screen (the page's paper): denser rows, so a lead's list fits a laptop's height. */
const SIDE_LINK = `${LINK} min-h-8 hover:bg-card aria-[current=page]:bg-card`;

export function NavItem({ link, current, onClick, className }: { link: NavLinkEntry; current: NavLinkEntry | undefined; onClick?: () => void; className: string }) {
  return (
    <Link to={link.to} aria-current={link === current ? 'page' : undefined} onClick={onClick} className={className}>
      {link.label}
    </Link>
  );
}

/**
 * The groups with their links, each group named for screen readers by its label; the group holding
 * the current page says so beside its name.
 */
export function NavSections({
  links,
  current,
  onNavigate,
  idPrefix,
  linkClass,
}: {
  links: NavLinkEntry[];
  current: NavLinkEntry | undefined;
  onNavigate?: () => void;
  idPrefix: string;
  linkClass: string;
}) {
  return sectionsOf(links).map((section) => {
    const here = section.id === current?.group;
    return (
      <div key={section.id} role="group" aria-labelledby={`${idPrefix}-${section.id}`} className="mt-3">
        <p id={`${idPrefix}-${section.id}`} className={`mb-1 px-3 text-xs font-semibold tracking-widest uppercase ${here ? 'text-brass-deep' : 'text-steel'}`}>
          {section.label}
          {here && <span className="sr-only"> (you are here)</span>}
        </p>
        <ul>
          {section.links.map((link) => (
            <li key={link.to}>
              <NavItem link={link} current={current} onClick={onNavigate} className={linkClass} />
            </li>
          ))}
        </ul>
      </div>
    );
  });
}

/** Wide screens: every page the role may open, down the side, grouped by job. */
export function SideNav({ links, current }: { links: NavLinkEntry[]; current: NavLinkEntry | undefined }) {
  const top = links.filter((link) => link.group === undefined);
  return (
    <nav aria-label="Main" className="sticky top-0 max-h-dvh w-52 shrink-0 self-start overflow-y-auto py-3 max-md:hidden">
      <ul>
        {top.map((link) => (
          <li key={link.to}>
            <NavItem link={link} current={current} className={SIDE_LINK} />
          </li>
        ))}
      </ul>
      <NavSections links={links} current={current} idPrefix="side" linkClass={SIDE_LINK} />
    </nav>
  );
}
