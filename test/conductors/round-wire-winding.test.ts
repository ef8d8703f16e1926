import { describe, it, expect } from "vitest";
import { roundWireWindingAcRatio, dowellFactor, skinDepth, InputError } from "../../src/index.js";
import data from "../fixtures/conductors/dowell.json" with { type: "json" };

const rho = 1.7241e-8;

describe("roundWireWindingAcRatio", () => {
  it("uses the textbook equivalent-foil penetration ratio (π/4)^{3/4}·(d/δ)·√(d·N_l/w)", () => {
    // Hurley, Gath & Breslin 2000 / Dowell 1966 equivalent square conductor with porosity (from memory)
    const o = { wireDiameter: 0.4e-3, frequency: 50e3, resistivity: rho, layers: 3, turnsPerLayer: 20, windowBreadth: 10e-3 };
    const delta = skinDepth({ resistivity: rho, frequency: o.frequency });
    const pen = (Math.PI / 4) ** 0.75 * (o.wireDiameter / delta) * Math.sqrt((o.wireDiameter * o.turnsPerLayer) / o.windowBreadth);
    expect(roundWireWindingAcRatio(o)).toBe(dowellFactor({ penetrationRatio: pen, layers: 3 }));
  });

  it("reproduces the finite-difference foil-stack solution at the same penetration ratio (fixture dowell.json)", () => {
    // choose the frequency so that Δ equals the fixture's value for a fully packed layer (N_l d = w)
    for (const row of data.rows.fd) {
      const d = 1e-3;
      const deltaNeeded = ((Math.PI / 4) ** 0.75 * d) / row.penetrationRatio;
      const f = rho / (Math.PI * 1.25663706212e-6 * deltaNeeded ** 2);
      const fr = roundWireWindingAcRatio({ wireDiameter: d, frequency: f, resistivity: rho, layers: row.layers, turnsPerLayer: 10, windowBreadth: 10e-3 });
      expect(Math.abs(fr / row.factorFd - 1)).toBeLessThan(data.meta.fdRtol);
    }
  });

  it("throws InputError on bad input, including wires that do not fit the width", () => {
    const ok = { wireDiameter: 1e-3, frequency: 1e4, resistivity: rho, layers: 2, turnsPerLayer: 10, windowBreadth: 12e-3 };
    expect(() => roundWireWindingAcRatio({ ...ok, windowBreadth: 9e-3 })).toThrow(/windowBreadth/);
    expect(() => roundWireWindingAcRatio({ ...ok, layers: 0 })).toThrow(InputError);
    expect(() => roundWireWindingAcRatio({ ...ok, turnsPerLayer: 1.5 })).toThrow(/turnsPerLayer/);
    expect(() => roundWireWindingAcRatio({ ...ok, wireDiameter: -1 })).toThrow(/wireDiameter/);
    expect(() => roundWireWindingAcRatio({ ...ok, frequency: 0 })).toThrow(/frequency/);
    expect(() => roundWireWindingAcRatio({ ...ok, resistivity: NaN })).toThrow(/resistivity/);
  });
});
