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
