import { describe, expect, it } from 'vitest';
import { CHROMIUM, chromiumFacts, chromiumStep, INSTALL_AS_ROOT, INSTALL_WITH_SUDO } from '../helpers/chromium-check';

describe('chromiumStep (before npm test starts any test)', () => {
  it('does nothing when Chromium is installed, whoever runs it', () => {
    expect(chromiumStep({ installed: true, isRoot: false, hasAptGet: false })).toEqual({ kind: 'ready' });
    expect(chromiumStep({ installed: true, isRoot: true, hasAptGet: true })).toEqual({ kind: 'ready' });
  });

  it('installs it with apt-get when run as root where apt-get exists (as CI does)', () => {
    expect(chromiumStep({ installed: false, isRoot: true, hasAptGet: true })).toEqual({ kind: 'install', command: INSTALL_AS_ROOT });
    expect(INSTALL_AS_ROOT).toBe('apt-get update -qq && apt-get install -y -qq chromium');
  });

  it('stops with the one sudo command for a person without root', () => {
    const step = chromiumStep({ installed: false, isRoot: false, hasAptGet: true });
    expect(step.kind).toBe('stop');
    expect(step.kind === 'stop' && step.message).toContain(`\n  ${INSTALL_WITH_SUDO}\n`);
    expect(step.kind === 'stop' && step.message).toContain(CHROMIUM);
  });

  it('stops, saying there is no apt-get, where apt-get is missing even for root', () => {
    const step = chromiumStep({ installed: false, isRoot: true, hasAptGet: false });
    expect(step.kind).toBe('stop');
    expect(step.kind === 'stop' && step.message).toMatch(/no apt-get: run the tests on Debian/);
  });
});

describe('chromiumFacts', () => {
  it('looks for the browser at its Debian path, for root by uid, and for apt-get on PATH', () => {
    const present = new Set([CHROMIUM, '/usr/sbin/apt-get']);
    const probe = (uid: number | undefined, path: string) => chromiumFacts({ exists: (p) => present.has(p), uid, path });
    expect(probe(0, '/usr/local/bin:/usr/sbin')).toEqual({ installed: true, isRoot: true, hasAptGet: true });
    expect(probe(1000, '/usr/local/bin:/usr/bin')).toEqual({ installed: true, isRoot: false, hasAptGet: false });
    expect(probe(undefined, '')).toEqual({ installed: true, isRoot: false, hasAptGet: false });
    expect(chromiumFacts({ exists: () => false, uid: 0, path: '/usr/bin' }).installed).toBe(false);
  });
});
