import { defineConfig } from "vitest/config";

export default defineConfig({
  test: {
    include: ["test/**/*.test.ts"],
    reporters: ["default", "./test/summary-reporter.ts"],
    testTimeout: 60_000,
    coverage: {
      provider: "v8",
      include: ["src/**"],
      // The level measured when the thresholds were set (npm run test:coverage, v8, all of src/):
      // a change that lowers coverage fails. Raise these as coverage grows; never lower them.
      thresholds: { lines: 96.4, statements: 94.9, functions: 95.6, branches: 85.5 },
    },
    benchmark: { include: ["test/bench/**/*.bench.ts"] },
  },
});
