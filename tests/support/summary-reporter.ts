import type { Reporter, TestModule } from 'vitest/node';

/**
 * Ends the run with one plain line, `Tests: N passed, N failed, N skipped`, which CI reads.
 * Failed modules (a file that did not load) count as failed.
 */
export default class SummaryReporter implements Reporter {
  onTestRunEnd(modules: ReadonlyArray<TestModule>, unhandledErrors: ReadonlyArray<unknown>): void {
    let passed = 0;
    let failed = unhandledErrors.length;
    let skipped = 0;
    for (const mod of modules) {
      if (mod.state() === 'failed' && [...mod.children.allTests()].length === 0) failed += 1;
      for (const test of mod.children.allTests()) {
        const state = test.result().state;
        if (state === 'passed') passed += 1;
        else if (state === 'failed') failed += 1;
        else skipped += 1;
      }
    }
    process.stdout.write(`\nTests: ${passed} passed, ${failed} failed, ${skipped} skipped\n`);
  }
}
