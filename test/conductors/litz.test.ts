import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { litzAcRatio, litzGeometry, litzDcResistance, litzWindingAcRatio, roundWireAcRatio, wireDcResistance, InputError } from "../../src/index.js";

import { wireProximityFactorKernel } from "../../src/conductors/round-wire-kernels.js";
const rho = 1.7241e-8;
const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log10(lo), max: Math.log10(hi), noNaN: true, noDefaultInfinity: true }).map((e) => 10 ** e);

describe("litzGeometry and litzDcResistance", () => {
  it("computes copper area, bundle and outer diameter from the packing factor", () => {
    const g = litzGeometry({ strands: 100, strandDiameter: 0.1e-3, strandOuterDiameter: 0.115e-3, bundleLevels: [5, 5, 4], twistPitch: 25e-3, servingThickness: 0.05e-3 });
    expect(g.copperArea).toBeCloseTo((100 * Math.PI * 1e-8) / 4, 20);
    expect(Math.abs(g.bundleDiameter / (0.115e-3 * Math.sqrt(100 / 0.7)) - 1)).toBeLessThan(1e-14);
    expect(g.outerDiameter.toPrecision(5)).toBe("0.0014745");
    expect(g.layFactor).toBeGreaterThan(1);
    expect(g.layFactor).toBeLessThan(1.01);
  });
  it("one strand is a solid wire: same DC resistance as wireDcResistance", () => {
    const r = litzDcResistance({ construction: { strands: 1, strandDiameter: 1e-3 }, resistivity: rho, length: 2 });
    expect(Math.abs(r / wireDcResistance({ resistivity: rho, length: 2, diameter: 1e-3 }) - 1)).toBeLessThan(1e-15);
  });
  it("gives ρ·ℓ/(N·πd²/4) for 100 strands of 0.1 mm (computed by hand)", () => {
    const byHand = (rho * 1) / (100 * (Math.PI / 4) * (0.1e-3) ** 2);
    const got = litzDcResistance({ construction: { strands: 100, strandDiameter: 0.1e-3 }, resistivity: rho, length: 1 });
    expect(Math.abs(got - byHand) / byHand).toBeLessThan(1e-14);
  });
  it("throws InputError on a bad construction", () => {
    expect(() => litzGeometry({ strands: 0, strandDiameter: 1e-4 })).toThrow(/construction.strands/);
    expect(() => litzGeometry({ strands: 100, strandDiameter: 1e-4, bundleLevels: [5, 5, 5] })).toThrow(/bundleLevels/);
    expect(() => litzGeometry({ strands: 100, strandDiameter: 1e-4, packingFactor: 0.95 })).toThrow(/packingFactor/);
    expect(() => litzGeometry({ strands: 100, strandDiameter: 1e-4, strandOuterDiameter: 0.9e-4 })).toThrow(/strandOuterDiameter/);
    expect(() => litzGeometry(null as never)).toThrow(InputError);
    expect(() => litzDcResistance({ construction: { strands: 2, strandDiameter: 1e-4 }, resistivity: rho, length: 0 })).toThrow(/length/);
  });
});

describe("litzAcRatio", () => {
  it("litz with one strand equals solid wire (roundWireAcRatio)", () => {
    fc.assert(
      fc.property(logUniform(1e-5, 1e-2), logUniform(1, 1e8), (d, f) => {
        const a = litzAcRatio({ construction: { strands: 1, strandDiameter: d }, frequency: f, resistivity: rho });
        expect(a).toBe(roundWireAcRatio({ diameter: d, frequency: f, resistivity: rho }));
      }),
      { seed: 1, numRuns: 200 },
    );
  });
  it("reduces to Sullivan's winding factor at d ≪ δ when the bundle term is negligible", () => {
    // Sullivan 1999 §II (low-frequency 1-D model); the bundle-internal term is removed by a loose packing
    const construction = { strands: 400, strandDiameter: 0.02e-3, packingFactor: 0.01 };
    const o = { frequency: 20e3, resistivity: rho, turns: 40, windowBreadth: 10e-3 };
    const a = litzAcRatio({ construction, ...o });
    const s = litzWindingAcRatio({ strands: 400, strandDiameter: 0.02e-3, ...o });
    expect(Math.abs((a - 1) / (s - 1) - 1)).toBeLessThan(2e-3);
  });
  it("is ≥ 1, non-decreasing in frequency and larger in a winding than alone", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 2000 }), logUniform(2e-5, 4e-4), logUniform(10, 3e6), fc.integer({ min: 1, max: 60 }), (n, d, f, turns) => {
        const construction = { strands: n, strandDiameter: d };
        const alone = litzAcRatio({ construction, frequency: f, resistivity: rho });
        const wound = litzAcRatio({ construction, frequency: f, resistivity: rho, turns, windowBreadth: 0.02 });
        expect(alone).toBeGreaterThanOrEqual(1);
        expect(wound).toBeGreaterThanOrEqual(alone);
        expect(litzAcRatio({ construction, frequency: f * 2, resistivity: rho })).toBeGreaterThanOrEqual(alone * (1 - 1e-13));
      }),
      { seed: 1, numRuns: 200 },
    );
  });
  it("throws InputError on bad input", () => {
    const construction = { strands: 10, strandDiameter: 1e-4 };
    expect(() => litzAcRatio({ construction, frequency: 0, resistivity: rho })).toThrow(/frequency/);
    expect(() => litzAcRatio({ construction, frequency: 1e5, resistivity: rho, turns: 10 })).toThrow(/windowBreadth/);
    expect(() => litzAcRatio({ construction, frequency: 1e5, resistivity: rho, windowBreadth: 0.01 })).toThrow(/turns/);
  });
});

describe("Sullivan's low-frequency strand loss against the exact round-wire function", () => {
  it("is 0.7 % high at d_s = δ and 11 % high at d_s = 2δ (the validity figures in the TSDoc)", () => {
    // exact transverse-field loss g(q) (Kelvin functions; fixture-checked) vs its first term π q⁴/8
    const ratio = (dOverDelta: number) => {
      const q = dOverDelta / Math.SQRT2;
      return ((Math.PI * q ** 4) / 8) / wireProximityFactorKernel(q);
    };
    expect(ratio(1)).toBeCloseTo(1.007, 3);
    expect(ratio(2)).toBeCloseTo(1.114, 3);
  });
});
