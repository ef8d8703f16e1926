import { describe, it, expect } from "vitest";
import { nagaokaCoefficient } from "../../src/inductance/index.js";
import grover36 from "../fixtures/inductance/published/grover-1946-table36-nagaoka.json" with { type: "json" };
import nagaoka1909 from "../fixtures/inductance/published/nagaoka-1909-table.json" with { type: "json" };

describe("nagaokaCoefficient against published tables", () => {
  it("matches Grover's Table 36 (p. 144) at all 100 ratios length/diameter = 0.01 … 1 within 2e-6", () => {
    // F. W. Grover, Inductance Calculations (1946), Table 36, p. 144: K to six decimals, computed by
    // hand. Rounding alone allows 0.5e-6; the printed values scatter by up to about 3 units of the
    // last decimal (1.66e-6 at b/2a = 0.89, where mpmath gives 0.6625303 and the table 0.662532),
    // so the bound is 4 units (2e-6). Copy read from a secondary transcription (see the JSON's meta).
    expect(grover36.meta.atol).toBe(2e-6);
    expect(grover36.cases.length).toBe(100);
    let withinRounding = 0;
    for (const c of grover36.cases) {
      const k = nagaokaCoefficient(1 / c.lengthOverDiameter);
      const error = Math.abs(k - c.nagaoka);
      expect(error, `b/2a = ${c.lengthOverDiameter}`).toBeLessThanOrEqual(2e-6);
      if (error <= 0.5e-6 + 1e-12) withinRounding++;
    }
    // most entries are correctly rounded: the differences are the table's scatter, not a bias here
    expect(withinRounding).toBeGreaterThanOrEqual(60);
  });

  it("matches Grover's Table 36 rounded to four decimals at the ratios the older checks use (d/l = 1, 2, 5, 10)", () => {
    // Grover 1946, Table 36, p. 144: b/2a = 1, 0.5, 0.2, 0.1 -> 0.688423, 0.525510, 0.319825, 0.203324
    const table: [number, number][] = [[1, 0.688423], [2, 0.52551], [5, 0.319825], [10, 0.203324]];
    for (const [x, k] of table) expect(Math.abs(nagaokaCoefficient(x) - k)).toBeLessThanOrEqual(2e-6);
  });

  it("matches Nagaoka's own 1909 table at 4 ratios within 1e-5 (his value at d/l = 10 is 8.5e-6 low)", () => {
    // H. Nagaoka, J. Coll. Sci. Imp. Univ. Tokyo 27, art. 6 (1909), table of K (p. 31), six decimals.
    // d/l = 0.25, 1, 5 agree to rounding (≤ 0.5e-6); at d/l = 10 the printed 0.203315 differs from the
    // exact 0.2033235 by 8.5e-6 (Grover's later table has 0.203324), hence the 1e-5 bound.
    expect(nagaoka1909.meta.atol).toBe(1e-5);
    for (const c of nagaoka1909.cases) {
      const error = Math.abs(nagaokaCoefficient(c.diameterOverLength) - c.nagaoka);
      expect(error, `d/l = ${c.diameterOverLength}`).toBeLessThanOrEqual(c.diameterOverLength < 10 ? 0.5e-6 + 1e-12 : 1e-5);
    }
  });
});
