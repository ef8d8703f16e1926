import { describe, it } from "vitest";
import fc from "fast-check";
import { slabInTangentialField } from "../../src/index.js";
import { logUniform } from "../support/arbitraries.js";

const slab = fc.record({
  thickness: logUniform(1e-6, 1),
  resistivity: logUniform(1e-8, 1e-5),
  relativePermeability: logUniform(1, 1000),
  frequency: logUniform(1, 1e7),
  fieldStrengthRms: logUniform(1, 1e6),
});

describe("slabInTangentialField properties", () => {
  it("power and reactive power are positive and finite, p in [0, 1.0904]", () => {
    fc.assert(
      fc.property(slab, (o) => {
        const r = slabInTangentialField(o);
        return r.powerPerArea >= 0 && Number.isFinite(r.powerPerArea) && r.q > 0 && r.p >= 0 && r.p <= 1.0904;
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("power scales with the square of the field strength", () => {
    fc.assert(
      fc.property(slab, logUniform(0.01, 100), (o, k) => {
        const a = slabInTangentialField(o).powerPerArea;
        const b = slabInTangentialField({ ...o, fieldStrengthRms: o.fieldStrengthRms * k }).powerPerArea;
        return Math.abs(b / (a * k * k) - 1) < 1e-12;
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("a slab much thicker than the skin depth behaves as the half-space (p, q within 1e-9 of 1)", () => {
    fc.assert(
      fc.property(slab, (o) => {
        const r = slabInTangentialField(o);
        if (o.thickness < 50 * r.skinDepth) return true;
        return Math.abs(r.p - 1) < 1e-9 && Math.abs(r.q - 1) < 1e-9;
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("as frequency falls the slab becomes transparent (power per face falls)", () => {
    fc.assert(
      fc.property(slab, (o) => {
        const hi = slabInTangentialField(o).powerPerArea;
        const lo = slabInTangentialField({ ...o, frequency: o.frequency / 10 }).powerPerArea;
        return lo < hi;
      }),
      { seed: 1, numRuns: 200 },
    );
  });
});
