/**
 * leadImpedance against outside references: mpmath at 30 digits (cylindrical-harmonic solution
 * of the round pair written independently in Python, DC and δ → 0 closed forms, the coaxial
 * lead; fixture test/fixtures/leads/generate_series.py) and a 2-D finite-element solution
 * (scikit-fem; fixtures test/fixtures/leads/generate_fem.py).
 */
import { describe, expect, it } from "vitest";
import series from "../fixtures/leads/series.json" with { type: "json" };
import femRound from "../fixtures/leads/fem-round.json" with { type: "json" };
import femTube from "../fixtures/leads/fem-tube.json" with { type: "json" };
import femFlat from "../fixtures/leads/fem-flat.json" with { type: "json" };
import { FLAT_PAIR_ACCURACY, InputError, leadImpedance } from "../../src/index.js";

const RHO = series.meta.resistivity;
const rel = (a: number, b: number): number => Math.abs(a / b - 1);

describe("leadImpedance: round pair", () => {
  it("matches the mpmath cylindrical-harmonic solution to 1e-9 (fixture from mpmath, generate_series.py)", () => {
    let worst = 0;
    for (const c of series.roundPair) {
      const lead = c.wallThickness === null
        ? { shape: "round-pair" as const, diameter: c.diameter, spacing: c.spacing }
        : { shape: "round-pair" as const, diameter: c.diameter, wallThickness: c.wallThickness, spacing: c.spacing };
      const z = leadImpedance({ lead, length: 1, frequency: c.frequency, resistivity: RHO });
      worst = Math.max(worst, rel(z.resistance, c.resistancePerMetre), rel(z.inductance, c.inductancePerMetre));
    }
    expect(worst).toBeLessThanOrEqual(series.meta.rtol);
  });

  it("reaches the uniform-current DC values, μ0/(8π) internal per solid conductor and the tube's wall term (fixture from mpmath, closed forms)", () => {
    for (const c of series.dc) {
      const lead = c.wallThickness === null
        ? { shape: "round-pair" as const, diameter: c.diameter, spacing: c.spacing }
        : { shape: "round-pair" as const, diameter: c.diameter, wallThickness: c.wallThickness, spacing: c.spacing };
      // 0.01 Hz: d/δ ≈ 1e-4, the DC limit to well below 1e-9
      const z = leadImpedance({ lead, length: 1, frequency: 0.01, resistivity: RHO });
      expect(rel(z.inductance, c.inductancePerMetre)).toBeLessThan(1e-9);
      expect(rel(z.resistance, c.resistancePerMetre)).toBeLessThan(1e-9);
      expect(rel(z.dcResistance, c.resistancePerMetre)).toBeLessThan(1e-12);
    }
  });

  it("tends to acosh(D/d) and the proximity factor (D/d)/√((D/d)² − 1) as δ → 0 (Ramo, Whinnery & Van Duzer, Table 5.11a)", () => {
    const mu0 = series.meta.mu0;
    for (const ratio of [1.1, 1.5, 3, 10]) {
      const d = 6e-3;
      const f = 1e10; // d/δ ≈ 9000
      const z = leadImpedance({ lead: { shape: "round-pair", diameter: d, spacing: ratio * d }, length: 1, frequency: f, resistivity: RHO });
      const delta = Math.sqrt(RHO / (Math.PI * f * mu0));
      const rHigh = ((2 * RHO) / (Math.PI * d * delta)) * (ratio / Math.sqrt(ratio * ratio - 1));
      const lHigh = (mu0 / Math.PI) * Math.acosh(ratio);
      // first-order corrections are of order δ/a (internal inductance) and δ/(D − d) (proximity)
      const order = delta / (d / 2) + delta / (ratio * d - d);
      expect(rel(z.resistance, rHigh)).toBeLessThan(3 * order);
      expect(rel(z.inductance, lHigh)).toBeLessThan(3 * order);
      expect(rel(z.highFrequencyInductance, lHigh)).toBeLessThan(1e-12);
    }
  });

  it("agrees with the 2-D finite-element solution within 0.3 % (fixtures from scikit-fem, generate_fem.py)", () => {
    const cases: readonly { diameter: number; wallThickness?: number; spacing: number; frequency: number; resistancePerMetre: number; inductancePerMetre: number; uncertainty: number }[] = [...femRound.cases, ...femTube.cases];
    for (const c of cases) {
      const lead = c.wallThickness === undefined
        ? { shape: "round-pair" as const, diameter: c.diameter, spacing: c.spacing }
        : { shape: "round-pair" as const, diameter: c.diameter, wallThickness: c.wallThickness, spacing: c.spacing };
      const z = leadImpedance({ lead, length: 1, frequency: c.frequency, resistivity: femRound.meta.resistivity });
      expect(c.uncertainty).toBeLessThan(femRound.meta.rtol);
      expect(rel(z.resistance, c.resistancePerMetre)).toBeLessThan(femRound.meta.rtol);
      expect(rel(z.inductance, c.inductancePerMetre)).toBeLessThan(femRound.meta.rtol);
    }
  });

  it("runs the documented example", () => {
    const z = leadImpedance({ lead: { shape: "round-pair", diameter: 6e-3, wallThickness: 1e-3, spacing: 12e-3 }, length: 0.4, frequency: 50e3, resistivity: 1.7241e-8 });
    expect(z.inductance).toBeCloseTo(2.2e-7, 8);
    expect(z.resistance).toBeCloseTo(3.0e-3, 4);
  });
});

describe("leadImpedance: coaxial", () => {
  it("matches Schelkunoff's rod and return-tube impedances to 1e-9 (fixture from mpmath)", () => {
    for (const c of series.coaxial) {
      const z = leadImpedance({
        lead: { shape: "coaxial", innerDiameter: c.innerDiameter, returnInnerDiameter: c.returnInnerDiameter, returnWallThickness: c.returnWallThickness },
        length: 1,
        frequency: c.frequency,
        resistivity: RHO,
      });
      expect(rel(z.resistance, c.resistancePerMetre)).toBeLessThan(series.meta.rtol);
      expect(rel(z.inductance, c.inductancePerMetre)).toBeLessThan(series.meta.rtol);
    }
  });
});

describe("leadImpedance: flat pair (strip-line model)", () => {
  it("is within its stated accuracy of the 2-D finite-element solution for width ≥ 5 gap, and notes narrower bars (fixture from scikit-fem)", () => {
    let worstL = 0;
    let worstR = 0;
    for (const c of femFlat.cases) {
      const z = leadImpedance({ lead: { shape: "flat-pair", width: c.width, thickness: c.thickness, gap: c.gap }, length: 1, frequency: c.frequency, resistivity: femFlat.meta.resistivity });
      const inside = c.width >= 5 * c.gap && c.thickness <= c.width / 2;
      expect(z.validity.some((n) => n.code === "flat-pair-narrow")).toBe(!inside);
      if (!inside) continue;
      worstL = Math.max(worstL, rel(z.inductance, c.inductancePerMetre));
      worstR = Math.max(worstR, rel(z.resistance, c.resistancePerMetre));
    }
    expect(worstL).toBeLessThanOrEqual(FLAT_PAIR_ACCURACY.inductance);
    expect(worstR).toBeLessThanOrEqual(FLAT_PAIR_ACCURACY.resistance);
  });
});

describe("leadImpedance: bad input", () => {
  const ok = { lead: { shape: "round-pair" as const, diameter: 6e-3, spacing: 10e-3 }, length: 1, frequency: 1e4, resistivity: RHO };
  it("throws InputError for touching conductors, thick walls, unknown keys and bad numbers", () => {
    expect(() => leadImpedance({ ...ok, lead: { ...ok.lead, spacing: 6e-3 } })).toThrow(InputError);
    expect(() => leadImpedance({ ...ok, lead: { ...ok.lead, wallThickness: 4e-3 } })).toThrow(InputError);
    expect(() => leadImpedance({ ...ok, frequency: 0 })).toThrow(InputError);
    expect(() => leadImpedance({ ...ok, length: Number.NaN })).toThrow(InputError);
    expect(() => leadImpedance({ ...ok, lead: { ...ok.lead, spacng: 1 } as never })).toThrow(/spacng/);
    expect(() => leadImpedance({ ...ok, lead: { shape: "triangle" } as never })).toThrow(InputError);
    expect(() => leadImpedance({ ...ok, lead: { shape: "coaxial", innerDiameter: 6e-3, returnInnerDiameter: 5e-3, returnWallThickness: 1e-3 } })).toThrow(InputError);
  });
});
