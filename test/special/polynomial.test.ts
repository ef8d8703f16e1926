import { describe, expect, it } from "vitest";
import { polynomialProduct, polynomialRealRoots, polynomialRootBound } from "../../src/special/internal.js";

/** Coefficients (ascending) of ∏ (x − r_i) times a scale. */
function fromRoots(roots: number[], scale = 1): number[] {
  let p = [scale];
  for (const r of roots) p = polynomialProduct(p, [-r, 1]);
  return p;
}

describe("polynomialRealRoots", () => {
  it("finds every real root of polynomials built from known roots (the roots are the reference)", () => {
    const sets = [[0.5, 1, 2], [0.1, 0.11, 3, 7.5, 20], [-2, 0.3, 0.31, 0.32, 5], [1e-3, 1, 1e3]];
    for (const roots of sets) {
      const p = fromRoots(roots, 3.7);
      const found = polynomialRealRoots(p, -polynomialRootBound(p), polynomialRootBound(p));
      expect(found.length).toBe(roots.length);
      found.forEach((r, i) => { expect(Math.abs(r - roots[i]!)).toBeLessThanOrEqual(1e-10 * Math.max(1, Math.abs(roots[i]!))); });
    }
  });

  it("skips complex pairs and counts only the real roots", () => {
    // (x² + 1)(x − 2)(x² − 2x + 5)(x + 0.5)
    const p = polynomialProduct(polynomialProduct(polynomialProduct([1, 0, 1], [-2, 1]), [5, -2, 1]), [0.5, 1]);
    expect(polynomialRealRoots(p, -10, 10)).toEqual([expect.closeTo(-0.5, 14), expect.closeTo(2, 14)]);
    expect(polynomialRealRoots(p, 0, 10)).toHaveLength(1);
  });

  it("separates two close roots that a sampled scan would merge", () => {
    const p = fromRoots([1, 1 + 1e-6, 4]);
    const found = polynomialRealRoots(p, 0, 10);
    expect(found).toHaveLength(3);
    expect(Math.abs((found[1] ?? 0) - (found[0] ?? 0) - 1e-6)).toBeLessThanOrEqual(1e-9);
  });
});
