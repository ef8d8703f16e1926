/**
 * A vitest reporter that ends the run with one plain line, `N passed, N failed[, N skipped]`,
 * which CI reads as the test count.
 */
import type { Reporter, TestModule } from "vitest/node";

export default class SummaryReporter implements Reporter {
  onTestRunEnd(testModules: ReadonlyArray<TestModule>): void {
    let passed = 0;
    let failed = 0;
    let skipped = 0;
    for (const mod of testModules) {
      for (const t of mod.children.allTests()) {
        const state = t.result().state;
        if (state === "passed") passed++;
        else if (state === "failed") failed++;
        else skipped++;
      }
      // A file that fails to load has no tests but is still a failure.
      if (mod.state() === "failed" && !mod.children.size) failed++;
    }
    const tail = skipped > 0 ? `, ${skipped} skipped` : "";
    process.stdout.write(`\n${passed} passed, ${failed} failed${tail}\n`);
  }
}
