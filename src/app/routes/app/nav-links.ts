import { hasRole, type Role } from '@shared/roles';

/** The jobs the app's pages are grouped by, in the order the menus show them. */
export const NAV_GROUPS = [
  { id: 'crib', label: 'Crib' },
  { id: 'stock', label: 'Stock' },
  { id: 'builds', label: 'Builds' },
  { id: 'chapter', label: 'Chapter' },
  { id: 'mine', label: 'Mine' },
] as const;

export type NavGroupId = (typeof NAV_GROUPS)[number]['id'];

export interface NavLinkEntry {
  to: string;
  label: string;
  /** The least role that may open the page (a lead may open everything a quartermaster may). */
  role: Role;
  /** Where it sits in the menus; none: above the groups (Home). */
  group?: NavGroupId;
  /** Its place in the phone's bottom bar (1 to 4; 3 is the middle of five, the fifth is Menu). */
  bar?: 1 | 2 | 3 | 4;
  /** Other paths that are part of this place (an assembly belongs to My builds). */
  under?: readonly string[];
}

/**
 * Every page a menu leads to, one entry each: adding a page to the navigation is one line here.
 * Within a group, the order of this table is the order shown.
 */
export const NAV_LINKS: readonly NavLinkEntry[] = [
  { to: '/', label: 'Home', role: 'member', bar: 1 },
  { to: '/scan', label: 'Scan', role: 'member', group: 'crib', bar: 3 },
  { to: '/tools', label: 'Tools', role: 'member', group: 'crib', bar: 4 },
  { to: '/overdue', label: 'Overdue', role: 'lead', group: 'crib' },
  { to: '/service', label: 'Service', role: 'quartermaster', group: 'crib' },
  { to: '/labels', label: 'Labels', role: 'quartermaster', group: 'crib' },
  { to: '/stations', label: 'Stations', role: 'quartermaster', group: 'crib' },
  { to: '/bins', label: 'Bins', role: 'member', group: 'stock' },
  { to: '/restock', label: 'Restock', role: 'quartermaster', group: 'stock' },
  { to: '/alerts', label: 'Reorder alerts', role: 'quartermaster', group: 'stock' },
  { to: '/forecast', label: 'Forecast', role: 'quartermaster', group: 'stock' },
  { to: '/spend', label: 'Consumables', role: 'lead', group: 'stock' },
  { to: '/payments', label: 'Payments', role: 'quartermaster', group: 'stock' },
  { to: '/builds', label: 'My builds', role: 'member', group: 'builds', under: ['/assemblies'] },
  { to: '/overview', label: 'Overview', role: 'lead', group: 'chapter' },
  { to: '/people', label: 'People', role: 'lead', group: 'chapter' },
  { to: '/signoffs', label: 'Sign-offs', role: 'lead', group: 'chapter' },
  { to: '/mail', label: 'Sent mail', role: 'lead', group: 'chapter' },
  { to: '/settings', label: 'Settings', role: 'member', group: 'chapter' },
  { to: '/loans', label: 'My loans', role: 'member', group: 'mine', bar: 2 },
  { to: '/tab', label: 'My tab', role: 'member', group: 'mine' },
  { to: '/my-mail', label: 'My mail', role: 'member', group: 'mine' },
];

export interface NavSection {
  id: NavGroupId;
  label: string;
  links: NavLinkEntry[];
}

/** The links a role may open. */
export const linksFor = (role: Role): NavLinkEntry[] => NAV_LINKS.filter((link) => hasRole(role, link.role));

/** Links under their group headings, empty groups left out. */
export const sectionsOf = (links: readonly NavLinkEntry[]): NavSection[] =>
  NAV_GROUPS.map((group) => ({ ...group, links: links.filter((link) => link.group === group.id) })).filter((section) => section.links.length > 0);

/** The bottom bar's links in their slots, left to right. */
export const barLinksOf = (links: readonly NavLinkEntry[]): NavLinkEntry[] =>
  links.filter((link) => link.bar !== undefined).sort((a, b) => a.bar! - b.bar!);

/** The link for the page at `pathname`: its own, or the nearest one above it ("/tools/T-12" is under Tools). */
export function currentLink(links: readonly NavLinkEntry[], pathname: string): NavLinkEntry | undefined {
  const within = (to: string) => (to === '/' ? pathname === '/' : pathname === to || pathname.startsWith(`${to}/`));
  const depth = (link: NavLinkEntry) => Math.max(...[link.to, ...(link.under ?? [])].map((to) => (within(to) ? to.length : -1)));
  return links.filter((link) => depth(link) >= 0).sort((a, b) => depth(b) - depth(a))[0];
}

export const groupLabel = (id: NavGroupId | undefined): string | undefined => NAV_GROUPS.find((group) => group.id === id)?.label;
