import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { litzWindingAcRatio, optimalLitzStrandCount } from "../../src/index.js";

const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log10(lo), max: Math.log10(hi), noNaN: true, noDefaultInfinity: true }).map((e) => 10 ** e);
const rho = 1.7241e-8;
const arb = fc.record({
  strands: fc.integer({ min: 1, max: 5000 }),
  strandDiameter: logUniform(2e-5, 5e-4),
  turns: fc.integer({ min: 1, max: 200 }),
  windowBreadth: logUniform(2e-3, 0.2),
  frequency: logUniform(10, 2e6),
});

describe("litzWindingAcRatio properties", () => {
  it("Fr ≥ 1, non-decreasing in frequency, strands and turns", () => {
    fc.assert(
      fc.property(arb, (o) => {
        const base = { ...o, resistivity: rho };
        const f = litzWindingAcRatio(base);
        expect(f).toBeGreaterThanOrEqual(1);
        expect(litzWindingAcRatio({ ...base, frequency: o.frequency * 2 })).toBeGreaterThanOrEqual(f);
        expect(litzWindingAcRatio({ ...base, strands: o.strands + 1 })).toBeGreaterThanOrEqual(f);
        expect(litzWindingAcRatio({ ...base, turns: o.turns + 1 })).toBeGreaterThanOrEqual(f);
      }),
      { seed: 1, numRuns: 200 },
    );
  });
  it("scales as f² and d⁶ in its proximity term", () => {
    fc.assert(
      fc.property(arb, (o) => {
        const base = { ...o, resistivity: rho };
        const p = litzWindingAcRatio(base) - 1;
        if (p < 1e-9) return;
        expect((litzWindingAcRatio({ ...base, frequency: o.frequency * 3 }) - 1) / p).toBeCloseTo(9, 6);
        expect((litzWindingAcRatio({ ...base, strandDiameter: o.strandDiameter * 2 }) - 1) / p).toBeCloseTo(64, 5);
      }),
      { seed: 1, numRuns: 200 },
    );
  });
  it("optimalLitzStrandCount is a local minimum of Rdc·Fr", () => {
    fc.assert(
      fc.property(arb, (o) => {
        const base = { ...o, resistivity: rho };
        const { strandDiameter, turns, windowBreadth, frequency, resistivity } = base;
        const n = optimalLitzStrandCount({ strandDiameter, turns, windowBreadth, frequency, resistivity });
        const loss = (k: number) => litzWindingAcRatio({ ...base, strands: k }) / k;
        expect(Number.isInteger(n) && n >= 1).toBe(true);
        // the count is capped where a bundle no wider than the window is full (hexagonal packing)
        const fit = Math.floor((Math.PI / (2 * Math.sqrt(3))) * (windowBreadth / strandDiameter) ** 2);
        expect(n).toBeLessThanOrEqual(fit);
        if (n < fit) expect(loss(n)).toBeLessThanOrEqual(loss(n + 1) * (1 + 1e-12));
        if (n > 1) expect(loss(n)).toBeLessThanOrEqual(loss(n - 1) * (1 + 1e-12));
      }),
      { seed: 1, numRuns: 200 },
    );
  });
});
