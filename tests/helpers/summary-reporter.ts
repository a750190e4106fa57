import type { Reporter, TestModule, TestRunEndReason } from 'vitest/node';

const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

/**
 * Ends the run with a plain "Tests: N passed, N failed" line that any CI log reader understands. A
 * file can fail with no failed test (it did not load, or a hook threw), and an error can escape every
 * test: both are counted on the same line, so it never reads as a clean run when Vitest exits red.
 */
export default class SummaryReporter implements Reporter {
  onTestRunEnd(testModules: ReadonlyArray<TestModule>, unhandledErrors: ReadonlyArray<unknown> = [], reason: TestRunEndReason = 'passed'): void {
    let passed = 0;
    let failed = 0;
    let skipped = 0;
    let failedFiles = 0;
    let filesWithoutTests = 0;
    for (const module of testModules) {
      let tests = 0;
      for (const test of module.children.allTests()) {
        tests++;
        const state = test.result().state;
        if (state === 'passed') passed++;
        else if (state === 'failed') failed++;
        else skipped++;
      }
      if (module.state() === 'failed') {
        failedFiles++;
        if (tests === 0) filesWithoutTests++;
      }
    }
    const parts = [`Tests: ${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}`];
    if (failedFiles) parts.push(`${plural(failedFiles, 'test file')} failed${filesWithoutTests ? ` (${filesWithoutTests} did not run any test)` : ''}`);
    if (unhandledErrors.length) parts.push(plural(unhandledErrors.length, 'unhandled error'));
    if (reason === 'interrupted') parts.push('the run was interrupted');
    console.log(`\n${parts.join('; ')}`);
  }
}
