import { describe, expect, it } from "vitest";
import { solveDense } from "../../src/index.js";
import fixture from "../fixtures/special/dense-solve.json" with { type: "json" };

describe("solveDense", () => {
  it("matches numpy.linalg.solve (LAPACK gesv) on the fixture systems (test/fixtures/special/generate_dense_solve.py)", () => {
    for (const s of fixture.systems) {
      const a = Float64Array.from(s.matrix);
      const b = Float64Array.from(s.rhs);
      expect(solveDense(s.n, a, b)).toBe(true);
      const scale = Math.max(...s.solution.map(Math.abs));
      for (let i = 0; i < s.n; i++) {
        // backward-stable solve: error ≲ ε·cond; the fixture's rtol 1e-13 at cond ≤ 1e4 times the largest entry
        expect(Math.abs((b[i] ?? 0) - (s.solution[i] ?? 0))).toBeLessThanOrEqual(fixture.meta.rtol * scale * Math.max(1, s.condition / 100));
      }
    }
  });

  it("reports a singular matrix", () => {
    expect(solveDense(2, Float64Array.from([1, 2, 2, 4]), Float64Array.from([1, 1]))).toBe(false);
  });
});

describe("factorDense + solveFactored (the chord-step path of the converter solvers)", () => {
  it("matches numpy.linalg.solve on the fixture systems, twice with one factorisation", async () => {
    const { factorDense, solveFactored } = await import("../../src/special/internal.js");
    for (const s of fixture.systems) {
      const lu = Float64Array.from(s.matrix);
      const pivots = new Int32Array(s.n);
      expect(factorDense(s.n, lu, pivots)).toBe(true);
      const scale = Math.max(...s.solution.map(Math.abs));
      for (let repeat = 0; repeat < 2; repeat++) {
        const b = Float64Array.from(s.rhs);
        expect(solveFactored(s.n, lu, pivots, b)).toBe(true);
        for (let i = 0; i < s.n; i++) {
          expect(Math.abs((b[i] ?? 0) - (s.solution[i] ?? 0))).toBeLessThanOrEqual(fixture.meta.rtol * scale * Math.max(1, s.condition / 100));
        }
      }
    }
  });

  it("reports a singular matrix", async () => {
    const { factorDense } = await import("../../src/special/internal.js");
    expect(factorDense(2, Float64Array.from([1, 2, 2, 4]), new Int32Array(2))).toBe(false);
  });
});
