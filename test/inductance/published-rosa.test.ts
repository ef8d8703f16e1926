import { describe, it, expect } from "vitest";
import { rosaCorrectionB } from "../../src/index.js";
import grover150 from "../fixtures/inductance/published/grover-1946-p150-rosa-b.json" with { type: "json" };

describe("rosaCorrectionB against the published table", () => {
  it("matches Grover's table of Rosa's B (p. 150) for N = 1 … 100 to its four decimals, two entries excepted", () => {
    // F. W. Grover, Inductance Calculations (1946), p. 150 (Rosa 1906, Bull. Bur. Stand. 2, 161),
    // four decimals: rounding allows 0.5e-4. Two printed entries are one unit low in the last
    // decimal (N = 30: 0.3079 vs 0.307953; N = 75: 0.3238 vs 0.323871; both confirmed with
    // mpmath in rosa.json and an independent 30-digit sum), so those two get 1e-4.
    // Copy read from a secondary reproduction of the table (see the JSON's meta).
    const lastDigitErrata = new Set([30, 75]);
    expect(grover150.cases.length).toBe(60);
    for (const c of grover150.cases) {
      const bound = lastDigitErrata.has(c.turns) ? 1e-4 : 0.5e-4 + 1e-12;
      expect(Math.abs(rosaCorrectionB(c.turns) - c.rosaB), `N = ${c.turns}`).toBeLessThanOrEqual(bound);
    }
  });

  it("the two exceptions really are errors of the printed table: the exact values round the other way", () => {
    // 0.307953 rounds to 0.3080 and 0.323871 to 0.3239 (rosa.json, mpmath 40 digits)
    expect(rosaCorrectionB(30).toFixed(4)).toBe("0.3080");
    expect(rosaCorrectionB(75).toFixed(4)).toBe("0.3239");
  });
});
