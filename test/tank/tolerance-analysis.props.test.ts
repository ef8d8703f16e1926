import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { tankToleranceAnalysis } from "../../src/index.js";
import { summariseSamples } from "../../src/tank/percentiles.js";
import { capacitanceArb, inductanceArb, logUniform } from "./arbitraries.js";

describe("tankToleranceAnalysis properties", () => {
  it("orders its statistics: min ≤ p1 ≤ p5 ≤ p50 ≤ p95 ≤ p99 ≤ max, mean inside [min, max]", () => {
    fc.assert(
      fc.property(
        inductanceArb,
        capacitanceArb,
        logUniform(1e-3, 0.5),
        fc.double({ min: 0, max: 0.3, noNaN: true }),
        fc.double({ min: 0, max: 0.3, noNaN: true }),
        fc.integer({ min: 1, max: 3000 }),
        fc.integer({ min: -1e6, max: 1e6 }),
        fc.constantFrom("uniform" as const, "normal" as const),
        fc.constantFrom("series" as const, "parallel" as const),
        (L, C, ratio, tolL, tolC, samples, seed, distribution, topology) => {
          const mc = tankToleranceAnalysis({ topology, inductance: L, capacitance: C, resistance: ratio * Math.sqrt(L / C), inductanceTolerance: tolL, capacitanceTolerance: tolC, samples, seed, distribution });
          for (const s of [mc.frequency, mc.tankCurrentRms]) {
            const seq = [s.min, s.p1, s.p5, s.p50, s.p95, s.p99, s.max];
            for (let k = 1; k < seq.length; k++) expect(seq[k]).toBeGreaterThanOrEqual(seq[k - 1] as number);
            expect(s.mean).toBeGreaterThanOrEqual(s.min * (1 - 1e-12));
            expect(s.mean).toBeLessThanOrEqual(s.max * (1 + 1e-12));
            for (const v of seq) expect(Number.isFinite(v)).toBe(true);
          }
        },
      ),
      { seed: 1, numRuns: 100 },
    );
  });

  it("finds by selection the same percentiles as a full sort (type-7 rule), with ties", () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: -50, max: 50 }), { minLength: 1, maxLength: 400 }), (ints) => {
        const values = Float64Array.from(ints, (v) => v / 7);
        const sorted = Array.from(values).sort((x, y) => x - y);
        const type7 = (p: number): number => {
          const pos = p * (sorted.length - 1);
          const i = Math.floor(pos);
          return i + 1 < sorted.length ? (sorted[i] as number) + (pos - i) * ((sorted[i + 1] as number) - (sorted[i] as number)) : (sorted[i] as number);
        };
        const s = summariseSamples(values, values.length);
        expect(s.min).toBe(sorted[0]);
        expect(s.max).toBe(sorted[sorted.length - 1]);
        for (const [p, got] of [[0.01, s.p1], [0.05, s.p5], [0.5, s.p50], [0.95, s.p95], [0.99, s.p99]] as const) {
          expect(got).toBeCloseTo(type7(p), 12);
        }
      }),
      { seed: 1, numRuns: 300 },
    );
  });
});
