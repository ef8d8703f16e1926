import { describe, it, expect } from "vitest";
import { tubeAcResistance, roundWireAcRatio, InputError } from "../../src/index.js";
import data from "../fixtures/conductors/tube.json" with { type: "json" };

const rho = 1.7241e-8;
const MU0 = 1.25663706212e-6;

describe("tubeAcResistance", () => {
  it("matches the complex-Bessel closed form in mpmath (fixture tube.json)", () => {
    const outer = 10e-3;
    for (const row of data.rows) {
      const delta = outer / row.outerDiameterOverSkinDepth;
      const f = rho / (Math.PI * MU0 * delta * delta);
      const b = outer / 2;
      const wall = row.wallOverOuterRadius * b;
      const a = b - wall;
      const rdc = rho / (Math.PI * (b * b - a * a));
      const r = tubeAcResistance({ outerDiameter: outer, wallThickness: wall, frequency: f, resistivity: rho });
      expect(Math.abs(r / rdc / row.acRatio - 1)).toBeLessThan(data.meta.rtol);
      if (row.acRatioOde !== undefined) expect(Math.abs(r / rdc / row.acRatioOde - 1)).toBeLessThan(1e-9);
    }
  });

  it("equals the solid wire when the wall is half the diameter", () => {
    for (const f of [10, 1e4, 1e6]) {
      const r = tubeAcResistance({ outerDiameter: 4e-3, wallThickness: 2e-3, frequency: f, resistivity: rho });
      const solid = (rho / (Math.PI * 4e-6)) * roundWireAcRatio({ diameter: 4e-3, frequency: f, resistivity: rho });
      expect(Math.abs(r / solid - 1)).toBeLessThan(1e-14);
    }
  });

  it("tends to the flat-wall formula for a very large tube", () => {
    // wall 2 δ on a tube of 2e5 δ diameter: curvature negligible (flat-plate surface impedance, Ramo et al. 1994 ch. 5)
    const delta = 1e-4;
    const f = rho / (Math.PI * MU0 * delta * delta);
    const r = tubeAcResistance({ outerDiameter: 20, wallThickness: 2e-4, frequency: f, resistivity: rho });
    const u = 2;
    const flat = (rho / (2 * Math.PI * 10 * delta)) * ((Math.sinh(2 * u) + Math.sin(2 * u)) / (Math.cosh(2 * u) - Math.cos(2 * u)));
    expect(Math.abs(r / flat - 1)).toBeLessThan(1e-4);
  });

  it("tends to the flat-wall formula for walls much thinner than the radius", () => {
    // thin wall: curvature error ≈ t/b; flat plate with the field on one face (Ramo et al. 1994 ch. 5; Dowell's one-layer factor)
    for (const frac of [1e-4, 1e-6, 1e-8]) {
      for (const u of [0.01, 0.5, 2]) {
        const b = 5e-3;
        const t = frac * b;
        const delta = t / u;
        const f = rho / (Math.PI * MU0 * delta * delta);
        const rdc = rho / (Math.PI * (b * b - (b - t) ** 2));
        const flat = u * ((Math.sinh(2 * u) + Math.sin(2 * u)) / (Math.cosh(2 * u) - Math.cos(2 * u)));
        const r = tubeAcResistance({ outerDiameter: 2 * b, wallThickness: t, frequency: f, resistivity: rho }) / rdc;
        expect(Math.abs(r / flat - 1)).toBeLessThan(Math.max(2 * frac, 1e-7));
      }
    }
  });

  it("throws InputError on bad input", () => {
    const ok = { outerDiameter: 6e-3, wallThickness: 1e-3, frequency: 2e4, resistivity: rho };
    expect(() => tubeAcResistance({ ...ok, wallThickness: 4e-3 })).toThrow(/wallThickness/);
    expect(() => tubeAcResistance({ ...ok, wallThickness: 0 })).toThrow(InputError);
    expect(() => tubeAcResistance({ ...ok, outerDiameter: NaN })).toThrow(/outerDiameter/);
    expect(() => tubeAcResistance({ ...ok, relativePermeability: 0 })).toThrow(/relativePermeability/);
  });
});
