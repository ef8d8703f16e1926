import { describe, it, expect } from "vitest";
import { roundWireWindingValidity, litzWindingValidity, InputError } from "../../src/index.js";

const rho = 1.7241e-8;

describe("roundWireWindingValidity", () => {
  it("flags wires thicker than 1.5 δ in multilayer windings and loose layers", () => {
    const o = { wireDiameter: 1e-3, frequency: 100e3, resistivity: rho, layers: 4, turnsPerLayer: 8, windowBreadth: 10e-3 };
    expect(roundWireWindingValidity(o).map((n) => n.code)).toEqual(["wire-thick-for-1d-models"]);
    expect(roundWireWindingValidity({ ...o, layers: 1 })).toEqual([]);
    expect(roundWireWindingValidity({ ...o, frequency: 1e3 })).toEqual([]);
    expect(roundWireWindingValidity({ ...o, frequency: 1e3, windowBreadth: 40e-3 }).map((n) => n.code)).toEqual(["loose-layer"]);
  });
  it("throws InputError on bad input", () => {
    expect(() => roundWireWindingValidity({ wireDiameter: 1e-3, frequency: 1e3, resistivity: rho, layers: 0, turnsPerLayer: 8, windowBreadth: 10e-3 })).toThrow(InputError);
  });
});

describe("litzWindingValidity", () => {
  it("flags strands thicker than a skin depth", () => {
    const o = { strands: 100, strandDiameter: 0.1e-3, turns: 20, windowBreadth: 20e-3, frequency: 100e3, resistivity: rho };
    expect(litzWindingValidity(o)).toEqual([]);
    const notes = litzWindingValidity({ ...o, frequency: 2e6 });
    expect(notes.map((n) => n.code)).toEqual(["strand-thick-for-low-frequency-model"]);
    expect(notes[0]?.limit).toBe(1);
  });
  it("throws InputError on bad input", () => {
    expect(() => litzWindingValidity({ strands: 0, strandDiameter: 0.1e-3, turns: 20, windowBreadth: 20e-3, frequency: 100e3, resistivity: rho })).toThrow(/strands/);
  });
});
