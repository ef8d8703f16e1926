import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { roundWireAcRatio } from "../../src/index.js";

const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log10(lo), max: Math.log10(hi), noNaN: true, noDefaultInfinity: true }).map((e) => 10 ** e);
const rho = 1.7241e-8;

describe("roundWireAcRatio properties", () => {
  it("Rac/Rdc ≥ 1, finite, and non-decreasing in frequency from d ≪ δ to d ≫ δ", () => {
    fc.assert(
      fc.property(logUniform(1e-5, 1e-1), logUniform(1e-2, 1e9), logUniform(1, 10), (d, f, k) => {
        const a = roundWireAcRatio({ diameter: d, frequency: f, resistivity: rho });
        const b = roundWireAcRatio({ diameter: d, frequency: f * k, resistivity: rho });
        expect(Number.isFinite(a)).toBe(true);
        expect(a).toBeGreaterThanOrEqual(1);
        expect(b).toBeGreaterThanOrEqual(a * (1 - 1e-13));
      }),
      { seed: 1, numRuns: 200 },
    );
  });
  it("tends to 1 as f → 0 and to the skin-effect asymptote d/(4δ) at high f", () => {
    fc.assert(
      fc.property(logUniform(1e-5, 1e-1), (d) => {
        expect(roundWireAcRatio({ diameter: d, frequency: 1e-6, resistivity: rho }) - 1).toBeLessThan(1e-12);
        const f = (rho * 1e6) / (Math.PI * 1.25663706212e-6 * d * d); // d = 1000 δ
        expect(Math.abs(roundWireAcRatio({ diameter: d, frequency: f, resistivity: rho }) / 250.25 - 1)).toBeLessThan(1e-4);
      }),
      { seed: 1, numRuns: 200 },
    );
  });
  it("depends on diameter and frequency only through d·√f (scaling)", () => {
    fc.assert(
      fc.property(logUniform(1e-5, 1e-2), logUniform(1, 1e7), logUniform(0.1, 10), (d, f, k) => {
        const a = roundWireAcRatio({ diameter: d, frequency: f, resistivity: rho });
        const b = roundWireAcRatio({ diameter: d * k, frequency: f / (k * k), resistivity: rho });
        expect(Math.abs(a / b - 1)).toBeLessThan(1e-12);
      }),
      { seed: 1, numRuns: 200 },
    );
  });
});
