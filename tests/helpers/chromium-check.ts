import { existsSync } from 'node:fs';
import { delimiter, join } from 'node:path';

/** Debian's Chromium, which the browser tests drive (never a downloaded browser). */
export const CHROMIUM = '/usr/bin/chromium';
export const INSTALL_AS_ROOT = 'apt-get update -qq && apt-get install -y -qq chromium';
export const INSTALL_WITH_SUDO = 'sudo apt-get update && sudo apt-get install -y chromium';

export interface ChromiumFacts {
  installed: boolean;
  isRoot: boolean;
  hasAptGet: boolean;
}

export type ChromiumStep = { kind: 'ready' } | { kind: 'install'; command: string } | { kind: 'stop'; message: string };

/** What `npm test` does about Chromium before any test starts: nothing, install it (root with apt), or stop. */
export function chromiumStep(facts: ChromiumFacts): ChromiumStep {
  if (facts.installed) return { kind: 'ready' };
  if (facts.isRoot && facts.hasAptGet) return { kind: 'install', command: INSTALL_AS_ROOT };
  const lead = `The browser tests drive Debian's Chromium at ${CHROMIUM}, and it is not installed.`;
  if (facts.hasAptGet) return { kind: 'stop', message: `${lead} Install it, then run npm test again:\n\n  ${INSTALL_WITH_SUDO}\n` };
  return {
    kind: 'stop',
    message: `${lead} This machine has no apt-get: run the tests on Debian (or in a Debian container), where this installs it:\n\n  ${INSTALL_AS_ROOT}\n`,
  };
}

export interface MachineProbe {
  exists(path: string): boolean;
  uid: number | undefined;
  path: string;
}

const thisMachine = (): MachineProbe => ({ exists: existsSync, uid: process.getuid?.(), path: process.env.PATH ?? '' });

/** The facts of this machine (or of a probe, in tests). */
export function chromiumFacts(probe: MachineProbe = thisMachine()): ChromiumFacts {
  return {
    installed: probe.exists(CHROMIUM),
    isRoot: probe.uid === 0,
    hasAptGet: probe.path.split(delimiter).some((dir) => dir !== '' && probe.exists(join(dir, 'apt-get'))),
  };
}
