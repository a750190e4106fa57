import { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router';
import { describe, expect, it } from 'vitest';
import { appRoutes } from '@/app/router';
import { barLinksOf, currentLink, linksFor, NAV_LINKS, sectionsOf } from '@/app/routes/app/nav-links';

/** The signed-in app's own paths ("/tools", "/settings"), without parameters. */
function appPaths(routes: RouteObject[]): string[] {
  const app = routes.find((route) => route.path === '/')!;
  return (app.children ?? []).map((route) => (route.index ? '/' : `/${route.path}`));
}

describe('the navigation table', () => {
  it('leads only to pages the router has', () => {
    const paths = appPaths(appRoutes(new QueryClient()));
    expect(NAV_LINKS.map((link) => link.to).filter((to) => !paths.includes(to))).toEqual([]);
  });

  it('gives a member none of the quartermaster’s or the lead’s pages, and a lead all of them', () => {
    const member = linksFor('member').map((link) => link.label);
    expect(member).not.toContain('Restock');
    expect(member).not.toContain('People');
    // Settings holds everyone's own station PIN; the chapter's figures there stay read-only for a member.
    expect(member).toContain('Settings');
    expect(linksFor('quartermaster').map((link) => link.label)).toContain('Settings');
    expect(linksFor('quartermaster').map((link) => link.label)).not.toContain('Sign-offs');
    expect(linksFor('lead')).toHaveLength(NAV_LINKS.length);
  });

  it('leaves out a group with nothing in it for the role', () => {
    expect(sectionsOf(linksFor('member')).map((s) => s.label)).toEqual(['Crib', 'Stock', 'Builds', 'Chapter', 'Mine']);
    expect(sectionsOf(linksFor('lead')).map((s) => s.label)).toEqual(['Crib', 'Stock', 'Builds', 'Chapter', 'Mine']);
  });

  it('fills the phone bar left to right with Scan in the middle of five', () => {
    expect(barLinksOf(linksFor('member')).map((link) => link.label)).toEqual(['Home', 'My loans', 'Scan', 'Tools']);
  });

  it('finds the place a page belongs to: its own link, the nearest above it, or the one it is part of', () => {
    const links = linksFor('lead');
    const at = (path: string) => currentLink(links, path)?.label;
    expect(at('/')).toBe('Home');
    expect(at('/tools')).toBe('Tools');
    expect(at('/tools/T-0012/edit')).toBe('Tools');
    expect(at('/toolsmith')).toBeUndefined();
    expect(at('/assemblies/3')).toBe('My builds');
    expect(at('/settings/planning')).toBe('Settings');
    expect(at('/queue')).toBeUndefined();
    expect(currentLink(linksFor('member'), '/people')).toBeUndefined();
  });
});
