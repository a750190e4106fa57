import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { TestModule } from 'vitest/node';
import SummaryReporter from '../helpers/summary-reporter';

type State = 'passed' | 'failed' | 'skipped' | 'pending';

/** A stand-in for Vitest's TestModule: only what the reporter reads. */
function testModule(moduleState: 'passed' | 'failed' | 'skipped', tests: State[]): TestModule {
  return {
    moduleId: `/repo/tests/${Math.random()}.test.ts`,
    state: () => moduleState,
    children: { *allTests() { for (const state of tests) yield { result: () => ({ state }) }; } },
  } as unknown as TestModule;
}

let printed: string[];
beforeEach(() => {
  printed = [];
  vi.spyOn(console, 'log').mockImplementation((...args: unknown[]) => void printed.push(args.join(' ')));
});
afterEach(() => vi.restoreAllMocks());

const lastLine = () => printed.join('\n').trim().split('\n').pop();
const run = (modules: TestModule[], errors: unknown[] = [], reason: 'passed' | 'failed' | 'interrupted' = 'passed') =>
  new SummaryReporter().onTestRunEnd(modules, errors, reason);

describe('the summary line at the end of a test run', () => {
  it('counts passed, failed and skipped tests', () => {
    run([testModule('failed', ['passed', 'failed', 'skipped']), testModule('passed', ['passed', 'pending'])], [], 'failed');
    expect(lastLine()).toBe('Tests: 2 passed, 1 failed, 2 skipped; 1 test file failed');
  });

  it('says a clean run is clean, with nothing about files or errors', () => {
    run([testModule('passed', ['passed', 'passed'])]);
    expect(lastLine()).toBe('Tests: 2 passed, 0 failed');
  });

  it('never says "0 failed" alone when a test file failed to load', () => {
    run([testModule('passed', ['passed']), testModule('failed', [])], [], 'failed');
    expect(lastLine()).toBe('Tests: 1 passed, 0 failed; 1 test file failed (1 did not run any test)');
  });

  it('counts a file whose hook failed while its tests passed', () => {
    run([testModule('failed', ['passed', 'passed'])], [], 'failed');
    expect(lastLine()).toBe('Tests: 2 passed, 0 failed; 1 test file failed');
  });

  it('counts unhandled errors', () => {
    run([testModule('passed', ['passed'])], [{ message: 'boom' }, { message: 'bang' }], 'failed');
    expect(lastLine()).toBe('Tests: 1 passed, 0 failed; 2 unhandled errors');
  });

  it('puts every kind of failure on one line, and says so when the run was interrupted', () => {
    run([testModule('failed', ['failed']), testModule('failed', []), testModule('failed', [])], [{ message: 'boom' }], 'interrupted');
    expect(lastLine()).toBe('Tests: 0 passed, 1 failed; 3 test files failed (2 did not run any test); 1 unhandled error; the run was interrupted');
  });
});
