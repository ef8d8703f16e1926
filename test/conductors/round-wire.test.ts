import { describe, it, expect } from "vitest";
import { roundWireAcRatio, roundWireAcRatioSweep, InputError } from "../../src/index.js";
import data from "../fixtures/conductors/round-wire.json" with { type: "json" };

const rho = 1.7241e-8;
const MU0 = 1.25663706212e-6;
/** frequency that makes d/δ equal to `ratio` for a 1 mm copper wire */
const frequencyFor = (ratio: number, d = 1e-3) => (rho * ratio * ratio) / (Math.PI * MU0 * d * d);

describe("roundWireAcRatio", () => {
  it("matches the Kelvin-function closed form in mpmath over d/δ = 1e-3 … 1e4 (fixture round-wire.json)", () => {
    let worst = 0;
    for (const row of data.rows) {
      const r = roundWireAcRatio({ diameter: 1e-3, frequency: frequencyFor(row.diameterOverSkinDepth), resistivity: rho });
      worst = Math.max(worst, Math.abs(r / row.acRatio - 1));
    }
    expect(worst).toBeLessThan(data.meta.rtol);
  });

  it("matches the numerical solution of the radial diffusion equation (fixture round-wire.json, acRatioOde)", () => {
    for (const row of data.rows) {
      if (row.acRatioOde === undefined) continue;
      const r = roundWireAcRatio({ diameter: 1e-3, frequency: frequencyFor(row.diameterOverSkinDepth), resistivity: rho });
      expect(Math.abs(r / row.acRatioOde - 1)).toBeLessThan(1e-11);
    }
  });

  it("follows the published high-frequency asymptote r/(2δ) + 1/4 + 3δ/(32r)", () => {
    // Ramo, Whinnery & Van Duzer 1994 §5.5 (asymptotic internal impedance; from memory)
    for (const ratio of [200, 2000, 3e4]) {
      const r = roundWireAcRatio({ diameter: 1e-3, frequency: frequencyFor(ratio), resistivity: rho });
      const x = ratio / 2; // r/δ
      expect(Math.abs(r / (x / 2 + 0.25 + 3 / (32 * x)) - 1)).toBeLessThan(1e-8);
    }
  });

  it("depends on the permeability only through the skin depth", () => {
    const a = roundWireAcRatio({ diameter: 2e-3, frequency: 5e3, resistivity: 2e-7, relativePermeability: 100 });
    const b = roundWireAcRatio({ diameter: 2e-3, frequency: 5e5, resistivity: 2e-7 });
    expect(Math.abs(a / b - 1)).toBeLessThan(1e-13);
  });

  it("throws InputError on bad input", () => {
    expect(() => roundWireAcRatio({ diameter: 0, frequency: 1, resistivity: rho })).toThrow(/diameter/);
    expect(() => roundWireAcRatio({ diameter: 1e-3, frequency: -5, resistivity: rho })).toThrow(InputError);
    expect(() => roundWireAcRatio({ diameter: 1e-3, frequency: 5, resistivity: Infinity })).toThrow(/resistivity/);
    expect(() => roundWireAcRatio({ diameter: 1e-3, frequency: 5, resistivity: rho, relativePermeability: -1 })).toThrow(/relativePermeability/);
  });
});

describe("roundWireAcRatioSweep", () => {
  it("equals roundWireAcRatio point by point and fills a given output array", () => {
    const frequencies = Float64Array.from([1, 50, 1e3, 2e4, 1e6, 1e9]);
    const out = new Float64Array(8);
    const r = roundWireAcRatioSweep({ diameter: 1.5e-3, frequencies, resistivity: rho }, out);
    expect(r).toBe(out);
    frequencies.forEach((f, i) => {
      expect(r[i]).toBe(roundWireAcRatio({ diameter: 1.5e-3, frequency: f, resistivity: rho }));
    });
  });
  it("throws InputError on a bad frequency or a short output array", () => {
    expect(() => roundWireAcRatioSweep({ diameter: 1e-3, frequencies: [1, -1], resistivity: rho })).toThrow(/frequencies\[1\]/);
    expect(() => roundWireAcRatioSweep({ diameter: 1e-3, frequencies: [1, 2], resistivity: rho }, new Float64Array(1))).toThrow(/out/);
  });
});
