import { describe, expect, it } from 'vitest';
import { hasRole, ROLE_ABILITIES, ROLES } from '@shared/roles';

describe('hasRole', () => {
  it('lets a lead do what a quartermaster and a member can, and not the other way round', () => {
    expect(hasRole('lead', 'quartermaster')).toBe(true);
    expect(hasRole('lead', 'member')).toBe(true);
    expect(hasRole('quartermaster', 'member')).toBe(true);
    expect(hasRole('quartermaster', 'lead')).toBe(false);
    expect(hasRole('member', 'quartermaster')).toBe(false);
    expect(hasRole('member', 'member')).toBe(true);
  });

  it('describes what every role may do', () => {
    for (const role of ROLES) expect(ROLE_ABILITIES[role].length).toBeGreaterThan(0);
  });
});

describe('ROLE_ABILITIES', () => {
  const all = ROLES.flatMap((role) => ROLE_ABILITIES[role]);

  it('speaks of stock as open: no ability waits for a feature that is already here', () => {
    for (const line of all) expect(line).not.toMatch(/when .* opens|\(when|coming soon/i);
  });

  it('tells a member they draw fasteners, plan assemblies and keep a tab', () => {
    const member = ROLE_ABILITIES.member.join(' ');
    expect(member).toMatch(/draw fasteners/i);
    expect(member).toMatch(/assembl/i);
    expect(member).toMatch(/tab/i);
  });

  it('tells a quartermaster they count and restock bins and act on reorder alerts', () => {
    const quartermaster = ROLE_ABILITIES.quartermaster.join(' ');
    expect(quartermaster).toMatch(/count/i);
    expect(quartermaster).toMatch(/restock|receive/i);
    expect(quartermaster).toMatch(/reorder alerts/i);
    expect(quartermaster).toMatch(/tabs|payments/i);
  });

  it('tells a lead they see the chapter’s consumable spend', () => {
    expect(ROLE_ABILITIES.lead.join(' ')).toMatch(/spend/i);
  });
});
