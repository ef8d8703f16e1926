import { describe, it } from "vitest";
import fc from "fast-check";
import { brentRoot } from "../../src/special/index.js";

describe("brentRoot invariants", () => {
  it("recovers the root of any monotone cubic (x − r)³ + (x − r) placed inside the bracket", () => {
    fc.assert(
      fc.property(
        fc.double({ min: -1e3, max: 1e3, noNaN: true, noDefaultInfinity: true }),
        fc.double({ min: 1e-3, max: 1e3, noNaN: true, noDefaultInfinity: true }),
        fc.double({ min: 1e-3, max: 1e3, noNaN: true, noDefaultInfinity: true }),
        (r, left, right) => {
          const x = brentRoot((t) => (t - r) ** 3 + (t - r), r - left, r + right);
          return Math.abs(x - r) <= 4 * Number.EPSILON * Math.max(1, Math.abs(r)) + 1e-12;
        },
      ),
      { seed: 1, numRuns: 200 },
    );
  });

  it("always returns a point inside the bracket", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 100, noNaN: true, noDefaultInfinity: true }), (c) => {
        const x = brentRoot((t) => Math.log(t) - Math.log(c), c / 7, c * 3);
        return x >= c / 7 && x <= c * 3;
      }),
      { seed: 1, numRuns: 200 },
    );
  });
});
