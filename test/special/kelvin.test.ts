import { describe, it, expect } from "vitest";
import {
  kelvinFunctions,
  kelvinFunctionsScaled,
  kelvinBer,
  kelvinBei,
  kelvinKer,
  kelvinKei,
  kelvinBerPrime,
  kelvinBeiPrime,
  kelvinKerPrime,
  kelvinKeiPrime,
  type KelvinFunctions,
} from "../../src/special/index.js";
import data from "../fixtures/special/kelvin.json" with { type: "json" };
import scaledData from "../fixtures/special/kelvin-scaled.json" with { type: "json" };

type Row = KelvinFunctions & { x: number };
const PAIRS = [
  ["ber", "bei"],
  ["ker", "kei"],
  ["berPrime", "beiPrime"],
  ["kerPrime", "keiPrime"],
] as const;

/** Worst error of each function relative to the modulus of its pair (see fixture meta.note). */
function worstErrors(rows: Row[], evaluate: (x: number) => KelvinFunctions, from = 0, to = Infinity) {
  const worst: Record<string, number> = {};
  for (const row of rows) {
    if (row.x < from || row.x > to) continue;
    const k = evaluate(row.x);
    for (const [a, b] of PAIRS) {
      const modulus = Math.hypot(row[a], row[b]);
      for (const name of [a, b]) {
        const e = Math.abs(k[name] - row[name]) / modulus;
        worst[name] = Math.max(worst[name] ?? 0, e);
      }
    }
  }
  return worst;
}

describe("Kelvin functions (fixture from mpmath, test/fixtures/special/generate.py)", () => {
  const tol = data.meta.rtol; // 5e-15, the bound stated in the TSDoc

  it("all eight match mpmath to 5e-15 of their pair's modulus over 0 < x ≤ 1000", () => {
    const worst = worstErrors(data.cases, kelvinFunctions);
    for (const [name, e] of Object.entries(worst)) expect(e, name).toBeLessThanOrEqual(tol);
  });

  it("hold 5e-15 across the series / node-table crossover at x = 1.5 and the node-table / asymptotic crossover at x = 19", () => {
    for (const [from, to] of [
      [1.4, 1.6],
      [18.9, 19.1],
      [5, 20],
    ] as const) {
      const worst = worstErrors(data.cases, kelvinFunctions, from, to);
      for (const [name, e] of Object.entries(worst)) expect(e, `${name} on [${from}, ${to}]`).toBeLessThanOrEqual(tol);
    }
  });

  it("scaled forms match mpmath to 5e-15 of their pair's modulus for 0.01 ≤ x ≤ 1e4", () => {
    const worst = worstErrors(scaledData.cases, kelvinFunctionsScaled);
    for (const [name, e] of Object.entries(worst)) expect(e, name).toBeLessThanOrEqual(scaledData.meta.rtol);
  });

  it("single-function forms equal the fields of kelvinFunctions", () => {
    for (const x of [0.3, 2.2, 7.7, 19, 123.4]) {
      const k = kelvinFunctions(x);
      expect(kelvinBer(x)).toBe(k.ber);
      expect(kelvinBei(x)).toBe(k.bei);
      expect(kelvinKer(x)).toBe(k.ker);
      expect(kelvinKei(x)).toBe(k.kei);
      expect(kelvinBerPrime(x)).toBe(k.berPrime);
      expect(kelvinBeiPrime(x)).toBe(k.beiPrime);
      expect(kelvinKerPrime(x)).toBe(k.kerPrime);
      expect(kelvinKeiPrime(x)).toBe(k.keiPrime);
    }
  });

  it("reproduce the tabulated values at x = 1 (A&S 1964 Table 9.12, from memory; confirmed with mpmath)", () => {
    // x = 1.0: ber 0.98438 178, bei 0.24956 604, ker 0.28670 621, kei −0.49499 464.
    const k = kelvinFunctions(1);
    expect(k.ber).toBeCloseTo(0.98438178, 8);
    expect(k.bei).toBeCloseTo(0.24956604, 8);
    expect(k.ker).toBeCloseTo(0.28670621, 8);
    expect(k.kei).toBeCloseTo(-0.49499464, 8);
  });

  it("take the limits at x = 0: ber 1, bei 0, ker +∞, kei −π/4, ker′ −∞, and NaN for x < 0", () => {
    const k = kelvinFunctions(0);
    expect(k).toEqual({
      ber: 1,
      bei: 0,
      ker: Infinity,
      kei: -Math.PI / 4,
      berPrime: 0,
      beiPrime: 0,
      kerPrime: -Infinity,
      keiPrime: 0,
    });
    expect(kelvinFunctions(-1).ber).toBeNaN();
    expect(kelvinFunctionsScaled(NaN).ker).toBeNaN();
  });

  it("scaled forms stay finite far beyond overflow of the plain ones (x = 1e6)", () => {
    const k = kelvinFunctionsScaled(1e6);
    for (const v of Object.values(k)) expect(Number.isFinite(v)).toBe(true);
  });
});
