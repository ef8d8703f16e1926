import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { parallelTank, tankImpedance } from "../../src/index.js";
import { capacitanceArb, inductanceArb, logUniform, settings } from "./arbitraries.js";

/** Coil resistance as a fraction of √(L/C), so that both resonant and non-resonant tanks occur. */
const ratioArb = logUniform(1e-4, 3);

describe("parallelTank properties", () => {
  it("orders zero-phase ≤ max-impedance ≤ undamped for a coil with series resistance only", () => {
    // Note: with no parallel resistance the maximum of |Z| lies BELOW f0 (x_m = √(1+2a) − a ≤ 1).
    fc.assert(
      fc.property(inductanceArb, capacitanceArb, ratioArb, (L, C, ratio) => {
        const t = parallelTank({ inductance: L, capacitance: C, coilResistance: ratio * Math.sqrt(L / C) });
        if (t.zeroPhaseFrequency !== null && t.maxImpedanceFrequency !== null) {
          expect(t.zeroPhaseFrequency).toBeLessThanOrEqual(t.maxImpedanceFrequency * (1 + 1e-12));
          expect(t.maxImpedanceFrequency).toBeLessThanOrEqual(t.undampedFrequency * (1 + 1e-12));
        }
      }),
      settings,
    );
  });

  it("orders zero-phase ≤ undamped ≤ max-impedance where that holds: parallel resistance ≤ 2·L/(RC)", () => {
    fc.assert(
      fc.property(inductanceArb, capacitanceArb, logUniform(1e-4, 0.9), logUniform(1e-3, 1), (L, C, ratio, share) => {
        const R = ratio * Math.sqrt(L / C);
        const Rp = share * 2 * (L / (R * C));
        const t = parallelTank({ inductance: L, capacitance: C, coilResistance: R, parallelResistance: Rp });
        expect(t.zeroPhaseFrequency).not.toBeNull();
        expect(t.zeroPhaseFrequency as number).toBeLessThanOrEqual(t.undampedFrequency);
        expect(t.undampedFrequency).toBeLessThanOrEqual((t.maxImpedanceFrequency as number) * (1 + 1e-12));
      }),
      settings,
    );
  });

  it("has a real impedance equal to the dynamic resistance at the zero-phase frequency", () => {
    fc.assert(
      fc.property(inductanceArb, capacitanceArb, logUniform(1e-4, 0.95), fc.option(logUniform(1e-2, 1e6), { nil: undefined }), (L, C, ratio, rp) => {
        const z0 = Math.sqrt(L / C);
        const t = parallelTank({ inductance: L, capacitance: C, coilResistance: ratio * z0, ...(rp === undefined ? {} : { parallelResistance: rp * z0 }) });
        const z = tankImpedance(t, t.zeroPhaseFrequency as number);
        expect(z.re / t.dynamicResistance).toBeCloseTo(1, 6);
        expect(Math.abs(z.im) / t.dynamicResistance).toBeLessThan(1e-6);
      }),
      settings,
    );
  });

  it("puts the largest |Z| of a dense scan no higher than |Z| at maxImpedanceFrequency", () => {
    fc.assert(
      fc.property(inductanceArb, capacitanceArb, ratioArb, fc.option(logUniform(1e-2, 1e4), { nil: undefined }), (L, C, ratio, rp) => {
        const z0 = Math.sqrt(L / C);
        const t = parallelTank({ inductance: L, capacitance: C, coilResistance: ratio * z0, ...(rp === undefined ? {} : { parallelResistance: rp * z0 }) });
        let scanMax = 0;
        for (let k = 1; k <= 400; k++) {
          const z = tankImpedance(t, (t.undampedFrequency * k) / 200);
          scanMax = Math.max(scanMax, Math.hypot(z.re, z.im));
        }
        if (t.maxImpedanceFrequency === null) {
          // No peak: |Z| falls from its DC value R ∥ Rp.
          const dc = rp === undefined ? ratio * z0 : (ratio * z0 * rp * z0) / (ratio * z0 + rp * z0);
          expect(scanMax).toBeLessThanOrEqual(dc * (1 + 1e-9));
        } else {
          expect(scanMax).toBeLessThanOrEqual((t.maxImpedance as number) * (1 + 1e-9));
        }
      }),
      settings,
    );
  });

  it("adding coil resistance never raises Q, and frequency scales as 1/√(LC)", () => {
    fc.assert(
      fc.property(inductanceArb, capacitanceArb, ratioArb, logUniform(1e-6, 10), logUniform(1e-2, 1e2), (L, C, ratio, extra, k) => {
        const R = ratio * Math.sqrt(L / C);
        const a = parallelTank({ inductance: L, capacitance: C, coilResistance: R });
        const b = parallelTank({ inductance: L, capacitance: C, coilResistance: R * (1 + extra) });
        expect(b.qualityFactor).toBeLessThanOrEqual(a.qualityFactor);
        const c = parallelTank({ inductance: L * k, capacitance: C * k, coilResistance: R });
        expect((c.undampedFrequency * k) / a.undampedFrequency).toBeCloseTo(1, 12);
      }),
      settings,
    );
  });

  it("never returns NaN or Infinity", () => {
    fc.assert(
      fc.property(inductanceArb, capacitanceArb, logUniform(1e-6, 1e3), fc.option(logUniform(1e-3, 1e6), { nil: undefined }), (L, C, ratio, rp) => {
        const z0 = Math.sqrt(L / C);
        const t = parallelTank({ inductance: L, capacitance: C, coilResistance: ratio * z0, ...(rp === undefined ? {} : { parallelResistance: rp * z0 }) });
        for (const v of Object.values(t)) if (typeof v === "number") expect(Number.isFinite(v)).toBe(true);
        // at ratio = 1 exactly the test's √(L/C) and the library's √L/√C may differ in the last bit
        if (Math.abs(ratio - 1) > 1e-12) expect(t.resonant).toBe(ratio < 1);
      }),
      settings,
    );
  });
});
