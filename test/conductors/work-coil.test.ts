import { describe, it, expect } from "vitest";
import { workCoilResistanceCurrentSheet, skinDepth, InputError } from "../../src/index.js";

describe("workCoilResistanceCurrentSheet", () => {
  const o = { innerDiameter: 0.06, coilLength: 0.08, turns: 8, spaceFactor: 0.75, frequency: 20e3, resistivity: 1.86e-8 };
  it("is the current-sheet formula ρ·πD·N²/(k_s·ℓ·δ)", () => {
    // Davies & Simpson 1979, ch. 3 (from memory)
    const delta = skinDepth({ resistivity: o.resistivity, frequency: o.frequency });
    const expected = (o.resistivity * Math.PI * o.innerDiameter * 64) / (0.75 * 0.08 * delta);
    expect(Math.abs(workCoilResistanceCurrentSheet(o) / expected - 1)).toBeLessThan(1e-14);
  });
  it("grows as N² and as √f", () => {
    const r = workCoilResistanceCurrentSheet(o);
    expect(workCoilResistanceCurrentSheet({ ...o, turns: 16 }) / r).toBeCloseTo(4, 12);
    expect(workCoilResistanceCurrentSheet({ ...o, frequency: 80e3 }) / r).toBeCloseTo(2, 12);
  });
  it("prints the TSDoc example value", () => {
    expect(workCoilResistanceCurrentSheet(o).toPrecision(2)).toBe("0.0077");
  });
  it("throws InputError on bad input", () => {
    expect(() => workCoilResistanceCurrentSheet({ ...o, spaceFactor: 0 })).toThrow(/spaceFactor/);
    expect(() => workCoilResistanceCurrentSheet({ ...o, spaceFactor: 1.2 })).toThrow(InputError);
    expect(() => workCoilResistanceCurrentSheet({ ...o, turns: 0 })).toThrow(/turns/);
    expect(() => workCoilResistanceCurrentSheet({ ...o, coilLength: -1 })).toThrow(/coilLength/);
  });
});
