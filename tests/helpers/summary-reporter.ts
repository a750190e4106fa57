import type { Reporter, TestModule } from 'vitest/node';

/** Ends the run with a plain "Tests: N passed, N failed" line that any CI log reader understands. */
export default class SummaryReporter implements Reporter {
  onTestRunEnd(testModules: ReadonlyArray<TestModule>): void {
    let passed = 0;
    let failed = 0;
    let skipped = 0;
    for (const module of testModules) {
      for (const test of module.children.allTests()) {
        const state = test.result().state;
        if (state === 'passed') passed++;
        else if (state === 'failed') failed++;
        else skipped++;
      }
    }
    console.log(`\nTests: ${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}`);
  }
}
