import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { leadImpedance } from "../../src/index.js";

const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log10(lo), max: Math.log10(hi), noNaN: true, noDefaultInfinity: true }).map((e) => 10 ** e);
const rho = 1.7241e-8;

describe("leadImpedance properties", () => {
  it("round pair: R ≥ R_dc, L between the δ → 0 value and the DC value, and both grow with the length in proportion", () => {
    fc.assert(
      fc.property(logUniform(1e-3, 3e-2), logUniform(1.02, 20), fc.double({ min: 0.05, max: 1, noNaN: true, noDefaultInfinity: true }), logUniform(1, 1e7), logUniform(0.01, 10), (d, ratio, wallShare, f, length) => {
        const lead = { shape: "round-pair" as const, diameter: d, wallThickness: (wallShare * d) / 2, spacing: ratio * d };
        const z = leadImpedance({ lead, length, frequency: f, resistivity: rho });
        const dc = leadImpedance({ lead, length, frequency: 1e-6, resistivity: rho });
        expect(z.resistance).toBeGreaterThanOrEqual(z.dcResistance * (1 - 1e-12));
        expect(z.inductance).toBeGreaterThanOrEqual(z.highFrequencyInductance * (1 - 1e-9));
        expect(z.inductance).toBeLessThanOrEqual(dc.inductance * (1 + 1e-9));
        const twice = leadImpedance({ lead, length: 2 * length, frequency: f, resistivity: rho });
        expect(Math.abs(twice.inductance / z.inductance - 2)).toBeLessThan(1e-12);
        expect(Math.abs(twice.resistance / z.resistance - 2)).toBeLessThan(1e-12);
      }),
      { seed: 14, numRuns: 150 },
    );
  });

  it("round pair: scaling all lengths by k at frequency f/k² keeps L and multiplies R by 1/k (length fixed)", () => {
    fc.assert(
      fc.property(logUniform(1e-3, 3e-2), logUniform(1.05, 10), logUniform(10, 1e6), logUniform(0.2, 5), (d, ratio, f, k) => {
        const a = leadImpedance({ lead: { shape: "round-pair", diameter: d, spacing: ratio * d }, length: 1, frequency: f, resistivity: rho });
        const b = leadImpedance({ lead: { shape: "round-pair", diameter: k * d, spacing: k * ratio * d }, length: 1, frequency: f / (k * k), resistivity: rho });
        expect(Math.abs(b.inductance / a.inductance - 1)).toBeLessThan(1e-9);
        expect(Math.abs((b.resistance * k * k) / a.resistance - 1)).toBeLessThan(1e-9);
      }),
      { seed: 15, numRuns: 100 },
    );
  });

  it("round pair: resistance rises and inductance falls as the frequency rises; wider spacing raises L and lowers R", () => {
    fc.assert(
      fc.property(logUniform(1e-3, 2e-2), logUniform(1.05, 10), logUniform(1, 1e6), (d, ratio, f) => {
        const lead = { shape: "round-pair" as const, diameter: d, spacing: ratio * d };
        const lo = leadImpedance({ lead, length: 1, frequency: f, resistivity: rho });
        const hi = leadImpedance({ lead, length: 1, frequency: 1.5 * f, resistivity: rho });
        expect(hi.resistance).toBeGreaterThanOrEqual(lo.resistance * (1 - 1e-12));
        expect(hi.inductance).toBeLessThanOrEqual(lo.inductance * (1 + 1e-12));
        const wide = leadImpedance({ lead: { ...lead, spacing: 1.3 * ratio * d }, length: 1, frequency: f, resistivity: rho });
        expect(wide.inductance).toBeGreaterThan(lo.inductance);
        expect(wide.resistance).toBeLessThanOrEqual(lo.resistance * (1 + 1e-12));
      }),
      { seed: 16, numRuns: 100 },
    );
  });

  it("coaxial and flat pair: R ≥ R_dc and L above the δ → 0 value", () => {
    fc.assert(
      fc.property(logUniform(1e-3, 2e-2), logUniform(1.1, 5), logUniform(1e-4, 5e-3), logUniform(1, 1e7), (d, ratio, t, f) => {
        const coax = leadImpedance({ lead: { shape: "coaxial", innerDiameter: d, returnInnerDiameter: ratio * d, returnWallThickness: t }, length: 1, frequency: f, resistivity: rho });
        expect(coax.resistance).toBeGreaterThanOrEqual(coax.dcResistance * (1 - 1e-12));
        expect(coax.inductance).toBeGreaterThanOrEqual(coax.highFrequencyInductance * (1 - 1e-12));
        const bus = leadImpedance({ lead: { shape: "flat-pair", width: 10 * d, thickness: t, gap: d }, length: 1, frequency: f, resistivity: rho });
        expect(bus.resistance).toBeGreaterThanOrEqual(bus.dcResistance * (1 - 1e-12));
        expect(bus.inductance).toBeGreaterThanOrEqual(bus.highFrequencyInductance * (1 - 1e-12));
      }),
      { seed: 17, numRuns: 150 },
    );
  });
});
