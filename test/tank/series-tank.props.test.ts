import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { seriesTank, tankImpedance } from "../../src/index.js";
import { capacitanceArb, inductanceArb, logUniform, resistanceArb, settings } from "./arbitraries.js";

describe("seriesTank properties", () => {
  it("frequency scales as 1/√(LC): L×k and C×m divide f0 by √(km)", () => {
    fc.assert(
      fc.property(inductanceArb, capacitanceArb, resistanceArb, logUniform(1e-3, 1e3), logUniform(1e-3, 1e3), (L, C, R, k, m) => {
        const a = seriesTank({ inductance: L, capacitance: C, resistance: R });
        const b = seriesTank({ inductance: L * k, capacitance: C * m, resistance: R });
        expect(b.undampedFrequency * Math.sqrt(k * m) / a.undampedFrequency).toBeCloseTo(1, 12);
      }),
      settings,
    );
  });

  it("adding series resistance never raises Q", () => {
    fc.assert(
      fc.property(inductanceArb, capacitanceArb, resistanceArb, logUniform(1e-6, 1e3), (L, C, R, extra) => {
        const a = seriesTank({ inductance: L, capacitance: C, resistance: R });
        const b = seriesTank({ inductance: L, capacitance: C, resistance: R + extra });
        expect(b.qualityFactor).toBeLessThanOrEqual(a.qualityFactor);
      }),
      settings,
    );
  });

  it("half-power frequencies straddle f0 geometrically (f1·f2 = f0²), span the bandwidth, and give |Z| = √2·R", () => {
    fc.assert(
      fc.property(inductanceArb, capacitanceArb, resistanceArb, (L, C, R) => {
        const t = seriesTank({ inductance: L, capacitance: C, resistance: R });
        expect((t.lowerHalfPowerFrequency * t.upperHalfPowerFrequency) / t.undampedFrequency ** 2).toBeCloseTo(1, 11);
        // f2 − f1 cancels: relative rounding error ≈ ε·Q.
        expect(Math.abs((t.upperHalfPowerFrequency - t.lowerHalfPowerFrequency) / t.bandwidth - 1)).toBeLessThan(1e-12 + 1e-15 * t.qualityFactor);
        expect(t.bandwidth * t.qualityFactor / t.undampedFrequency).toBeCloseTo(1, 12);
        const z = tankImpedance(t, t.upperHalfPowerFrequency);
        // X = ωL − 1/(ωC) also cancels: relative rounding ≈ ε·Q.
        expect(Math.abs(Math.hypot(z.re, z.im) / (Math.SQRT2 * R) - 1)).toBeLessThan(1e-12 + 1e-15 * t.qualityFactor);
      }),
      settings,
    );
  });

  it("never returns NaN: damped frequency is a number below f0 or null", () => {
    fc.assert(
      fc.property(inductanceArb, capacitanceArb, resistanceArb, (L, C, R) => {
        const t = seriesTank({ inductance: L, capacitance: C, resistance: R });
        for (const v of Object.values(t)) if (typeof v === "number") expect(Number.isFinite(v)).toBe(true);
        if (t.dampedFrequency === null) expect(t.qualityFactor).toBeLessThanOrEqual(0.5 + 1e-12);
        else expect(t.dampedFrequency).toBeLessThanOrEqual(t.undampedFrequency);
      }),
      settings,
    );
  });
});
