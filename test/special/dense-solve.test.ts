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
