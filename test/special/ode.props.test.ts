import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { solveOde } from "../../src/index.js";
import { logUniform } from "../support/arbitraries.js";

describe("solveOde properties", () => {
  it("linear decay y' = −k y: relative error at the end within 1e-7 for any rate and span (rtol 1e-10)", () => {
    fc.assert(
      fc.property(logUniform(1e-3, 1e3), logUniform(0.1, 20), (k, periods) => {
        const end = periods / k;
        const r = solveOde((_t, y, dy) => { dy[0] = -k * y[0]!; }, [1], { end, relativeTolerance: 1e-10, absoluteTolerance: 1e-300 });
        expect(r.status).toBe("completed");
        expect(Math.abs(r.finalState[0]! / Math.exp(-periods) - 1)).toBeLessThan(1e-7);
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("time-reversal: integrating forward then backward returns to the start (oscillator, rtol 1e-11)", () => {
    fc.assert(
      fc.property(logUniform(0.1, 10), logUniform(0.5, 10), (w, end) => {
        const f = (_t: number, y: Float64Array, dy: Float64Array): void => {
          dy[0] = y[1]!;
          dy[1] = -w * w * y[0]!;
        };
        const forward = solveOde(f, [1, 0], { end, relativeTolerance: 1e-11, absoluteTolerance: 1e-13 });
        const back = solveOde(f, forward.finalState, { start: end, end: 0, relativeTolerance: 1e-11, absoluteTolerance: 1e-13 });
        expect(Math.abs(back.finalState[0]! - 1)).toBeLessThan(1e-7);
        expect(Math.abs(back.finalState[1]!) / w).toBeLessThan(1e-7);
      }),
      { seed: 1, numRuns: 50 },
    );
  });

  it("the event time of a level crossing of y' = −k y is ln(y0/level)/k", () => {
    fc.assert(
      fc.property(logUniform(1e-2, 1e2), fc.double({ min: 0.01, max: 0.99, noNaN: true, noDefaultInfinity: true }), (k, level) => {
        const r = solveOde((_t, y, dy) => { dy[0] = -k * y[0]!; }, [1], {
          end: 100 / k,
          relativeTolerance: 1e-11,
          absoluteTolerance: 1e-14,
          event: (_t, y) => y[0]! - level,
        });
        expect(r.status).toBe("event");
        expect(Math.abs((r.eventTime! * k) / Math.log(1 / level) - 1)).toBeLessThan(1e-8);
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("dense samples lie between the neighbouring recorded states for a monotone solution", () => {
    fc.assert(
      fc.property(logUniform(0.1, 10), (k) => {
        const r = solveOde((_t, y, dy) => { dy[0] = -k * y[0]!; }, [1], { end: 5 / k, dense: true });
        for (let i = 1; i < r.times.length; i++) {
          const mid = r.sample!(0.5 * (r.times[i - 1]! + r.times[i]!))[0]!;
          expect(mid).toBeLessThanOrEqual(r.states[i - 1]![0]! + 1e-15);
          expect(mid).toBeGreaterThanOrEqual(r.states[i]![0]! - 1e-15);
        }
      }),
      { seed: 1, numRuns: 50 },
    );
  });
});
