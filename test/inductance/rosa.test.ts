import { describe, it, expect } from "vitest";
import { InputError, rosaCorrectionA, rosaCorrectionB } from "../../src/index.js";
import rosa from "../fixtures/inductance/rosa.json" with { type: "json" };

describe("Rosa's corrections", () => {
  it("match their defining formulas evaluated in mpmath to 1e-12", () => {
    // fixture from mpmath, test/fixtures/inductance/generate.py
    for (const c of rosa.cases) {
      if ("turns" in c && c.turns !== undefined) {
        const b = rosaCorrectionB(c.turns);
        expect(Math.abs(b - (c.rosaB))).toBeLessThanOrEqual(1e-12 * Math.max(1e-3, c.rosaB));
      } else {
        expect(Math.abs(rosaCorrectionA(c.pitchOverDiameter) - (c.rosaA))).toBeLessThan(1e-14);
      }
    }
  });

  it("match Rosa's table of B to its 4 decimals", () => {
    // Rosa 1906 / Grover 1946, table of the mutual-inductance correction B (values from memory)
    const table: [number, number][] = [[1, 0], [2, 0.1137], [3, 0.1663], [4, 0.1973], [5, 0.218], [10, 0.2664]];
    for (const [n, b] of table) expect(Math.abs(rosaCorrectionB(n) - b)).toBeLessThanOrEqual(0.5e-4 + 1e-12);
  });

  it("B grows with N to a limit near 0.338 and its cost does not grow with N", () => {
    const big = rosaCorrectionB(1e9);
    expect(big).toBeGreaterThan(rosaCorrectionB(1e6));
    expect(big).toBeLessThan(0.3380);
    expect(big).toBeGreaterThan(0.3378);
  });

  it("throw InputError outside their domains", () => {
    expect(() => rosaCorrectionA(0.9)).toThrow(InputError);
    expect(() => rosaCorrectionA(NaN)).toThrow(InputError);
    expect(() => rosaCorrectionB(0)).toThrow(InputError);
    expect(() => rosaCorrectionB(2.5)).toThrow(InputError);
  });
});
