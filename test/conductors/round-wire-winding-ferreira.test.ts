import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { roundWireWindingAcRatioFerreira, roundWireWindingAcRatio, roundWireAcRatio, InputError } from "../../src/index.js";
import data from "../fixtures/conductors/round-wire.json" with { type: "json" };

const rho = 1.7241e-8;
const MU0 = 1.25663706212e-6;
const frequencyFor = (ratio: number, d: number) => (rho * ratio * ratio) / (Math.PI * MU0 * d * d);

describe("roundWireWindingAcRatioFerreira", () => {
  it("equals the skin factor plus the transverse-field loss of the mpmath Kelvin closed forms, d/δ = 1e-3 … 1e4 (fixture round-wire.json)", () => {
    const d = 1e-3;
    const m = 4;
    const eta = (8 * d) / 10e-3;
    let worst = 0;
    for (const row of data.rows) {
      const f = frequencyFor(row.diameterOverSkinDepth, d);
      const expected = row.acRatio + ((Math.PI * eta * eta * (4 * m * m - 1)) / 24) * row.proximity;
      const fr = roundWireWindingAcRatioFerreira({ wireDiameter: d, frequency: f, resistivity: rho, layers: m, turnsPerLayer: 8, windowBreadth: 10e-3 });
      worst = Math.max(worst, Math.abs(fr / expected - 1));
    }
    expect(worst).toBeLessThan(data.meta.rtol);
  });

  it("adds the transverse-field eddy loss of the radial-ODE solutions to the skin factor (fixture round-wire.json)", () => {
    const d = 1e-3;
    for (const row of data.rows) {
      if (row.proximityOde === undefined) continue;
      const f = frequencyFor(row.diameterOverSkinDepth, d);
      const m = 3;
      const eta = (10 * d) / 12e-3;
      const expected = row.acRatioOde + ((Math.PI * eta * eta * (4 * m * m - 1)) / 24) * row.proximityOde;
      const fr = roundWireWindingAcRatioFerreira({ wireDiameter: d, frequency: f, resistivity: rho, layers: m, turnsPerLayer: 10, windowBreadth: 12e-3 });
      expect(Math.abs(fr / expected - 1)).toBeLessThan(1e-11);
    }
  });

  it("has the low-frequency eddy loss π σ ω² B² r⁴/8 of a wire in a transverse field", () => {
    // Lammeraner & Štafl 1966, ch. 6 (classical low-frequency cylinder loss, from memory)
    const d = 0.2e-3;
    const f = 10;
    const eta = 0.5;
    const m = 2;
    const fr = roundWireWindingAcRatioFerreira({ wireDiameter: d, frequency: f, resistivity: rho, layers: m, turnsPerLayer: 10, windowBreadth: (10 * d) / eta });
    const omega = 2 * Math.PI * f;
    const g = (Math.PI * omega * omega * MU0 * MU0 * (d / 2) ** 4) / (8 * rho * rho); // P/(ρ H²)
    const skin = roundWireAcRatio({ diameter: d, frequency: f, resistivity: rho });
    expect(Math.abs((fr - skin) / (((Math.PI * eta * eta * (4 * m * m - 1)) / 24) * g) - 1)).toBeLessThan(1e-8);
  });

  it("agrees with the Dowell equivalent-foil model within 10 % while d < δ", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.05, max: 1, noNaN: true, noDefaultInfinity: true }),
        fc.integer({ min: 1, max: 12 }),
        fc.double({ min: 0.5, max: 1, noNaN: true, noDefaultInfinity: true }),
        (ratio, m, eta) => {
          const d = 1e-3;
          const o = { wireDiameter: d, frequency: frequencyFor(ratio, d), resistivity: rho, layers: m, turnsPerLayer: 10, windowBreadth: (10 * d) / eta };
          const a = roundWireWindingAcRatioFerreira(o);
          const b = roundWireWindingAcRatio(o);
          expect(Math.abs(a / b - 1)).toBeLessThan(0.1);
        },
      ),
      { seed: 1, numRuns: 200 },
    );
  });

  it("agrees with the Dowell equivalent-foil model within 4 % for d ≤ 1.5 δ at porosity 0.9 (the TSDoc figure)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.05, max: 1.5, noNaN: true, noDefaultInfinity: true }), fc.integer({ min: 1, max: 12 }), (ratio, m) => {
        const d = 1e-3;
        const o = { wireDiameter: d, frequency: frequencyFor(ratio, d), resistivity: rho, layers: m, turnsPerLayer: 9, windowBreadth: 10e-3 };
        expect(Math.abs(roundWireWindingAcRatioFerreira(o) / roundWireWindingAcRatio(o) - 1)).toBeLessThan(0.04);
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("is ≥ 1, grows with layers and is non-decreasing in frequency", () => {
    fc.assert(
      fc.property(
        fc.double({ min: -3, max: 3.5, noNaN: true, noDefaultInfinity: true }).map((e) => 10 ** e),
        fc.integer({ min: 1, max: 20 }),
        (ratio, m) => {
          const d = 1e-3;
          const o = { wireDiameter: d, frequency: frequencyFor(ratio, d), resistivity: rho, layers: m, turnsPerLayer: 8, windowBreadth: 10e-3 };
          const a = roundWireWindingAcRatioFerreira(o);
          expect(a).toBeGreaterThanOrEqual(1);
          expect(roundWireWindingAcRatioFerreira({ ...o, layers: m + 1 })).toBeGreaterThan(a);
          expect(roundWireWindingAcRatioFerreira({ ...o, frequency: o.frequency * 1.5 })).toBeGreaterThanOrEqual(a * (1 - 1e-13));
        },
      ),
      { seed: 1, numRuns: 200 },
    );
  });

  it("throws InputError on bad input", () => {
    const ok = { wireDiameter: 1e-3, frequency: 1e4, resistivity: rho, layers: 2, turnsPerLayer: 10, windowBreadth: 12e-3 };
    expect(() => roundWireWindingAcRatioFerreira({ ...ok, windowBreadth: 5e-3 })).toThrow(/windowBreadth/);
    expect(() => roundWireWindingAcRatioFerreira({ ...ok, layers: -1 })).toThrow(InputError);
  });
});
