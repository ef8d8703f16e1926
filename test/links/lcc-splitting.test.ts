import { describe, expect, it } from "vitest";
import { inductiveLink, InputError, lccSplitting, type LccSplittingOptions } from "../../src/index.js";
import fixture from "../fixtures/links/lcc-splitting.json" with { type: "json" };

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

interface FixtureInput { compensation: "lcc-series" | "double-lcc"; L1: number; L2: number; Lf1: number; Lf2?: number; R1: number; R2: number; RL: number; f0: number }

function options(i: FixtureInput, k: number): LccSplittingOptions {
  return {
    compensation: i.compensation, primaryInductance: i.L1, secondaryInductance: i.L2, mutualInductance: k * Math.sqrt(i.L1 * i.L2),
    primaryFilterInductance: i.Lf1, ...(i.Lf2 === undefined ? {} : { secondaryFilterInductance: i.Lf2 }),
    primaryResistance: i.R1, secondaryResistance: i.R2, loadResistance: i.RL, resonantFrequency: i.f0,
  };
}

describe("lccSplitting", () => {
  const tol = fixture.meta.rtol; // 1e-9
  for (const c of fixture.cases) {
    const i = c.input as FixtureInput;
    it(`matches the mpmath tangency and root scan (${i.compensation}, L₁ = ${i.L1}, f₀ = ${i.f0})`, () => {
      // fixture: mpmath 30 digits, direct evaluation of Z_in, test/fixtures/links/generate_lcc_splitting.py
      for (const p of c.points) {
        const s = lccSplitting(options(i, p.k));
        expect(rel(s.criticalCoupling, Number(c.criticalCoupling))).toBeLessThanOrEqual(tol);
        expect(s.zeroPhaseFrequencies.length).toBe(p.zeroPhaseFrequencies.length);
        s.zeroPhaseFrequencies.forEach((f, n) => { expect(rel(f, Number(p.zeroPhaseFrequencies[n]))).toBeLessThanOrEqual(tol); });
        expect(s.split).toBe(p.k > Number(c.criticalCoupling));
      }
    });
  }

  it("f₀ is a zero-phase frequency at every coupling (the LCC tuning makes Z_in real at f₀; Li et al. 2015), and inductiveLink agrees", () => {
    for (const compensation of ["lcc-series", "double-lcc"] as const) {
      for (const k of [0.05, 0.2, 0.4, 0.7]) {
        const i: FixtureInput = { compensation, L1: 60e-6, L2: 40e-6, Lf1: 10e-6, Lf2: compensation === "double-lcc" ? 8e-6 : undefined, R1: 0.05, R2: 0.05, RL: 5, f0: 100e3 } as FixtureInput;
        const s = lccSplitting(options(i, k));
        expect(Math.min(...s.zeroPhaseFrequencies.map((f) => rel(f, 100e3)))).toBeLessThanOrEqual(1e-9);
        const link = inductiveLink({
          primaryInductance: 60e-6, secondaryInductance: 40e-6, mutualInductance: k * Math.sqrt(60e-6 * 40e-6), primaryResistance: 0.05,
          secondaryResistance: 0.05, frequency: 100e3, compensation, loadResistance: 5, sourceVoltage: 1, primaryFilterInductance: 10e-6,
          ...(compensation === "double-lcc" ? { secondaryFilterInductance: 8e-6 } : {}),
        });
        expect(Math.abs(link.inputImpedance.im)).toBeLessThanOrEqual(1e-9 * Math.abs(link.inputImpedance.re));
      }
    }
  });

  it("the documented example", () => {
    const s = lccSplitting({
      compensation: "lcc-series", primaryInductance: 60e-6, secondaryInductance: 40e-6, mutualInductance: 0.3 * Math.sqrt(60e-6 * 40e-6),
      primaryFilterInductance: 10e-6, primaryResistance: 0.05, secondaryResistance: 0.05, loadResistance: 5, resonantFrequency: 100e3,
    });
    expect(s.split).toBe(true);
    expect(s.weakCouplingCount).toBe(3);
    expect(s.criticalCoupling.toFixed(4)).toBe("0.1819");
    expect(s.zeroPhaseFrequencies.map((f) => Math.round(f))).toEqual([74985, 89937, 100000, 120681, 123258]);
  });

  it("throws InputError for bad input and a filter inductance that does not fit", () => {
    const base = options({ compensation: "lcc-series", L1: 60e-6, L2: 40e-6, Lf1: 10e-6, R1: 0.05, R2: 0.05, RL: 5, f0: 100e3 }, 0.2);
    expect(() => lccSplitting({ ...base, primaryFilterInductance: 60e-6 })).toThrow(InputError);
    expect(() => lccSplitting({ ...base, secondaryFilterInductance: 5e-6 })).toThrow(InputError);
    expect(() => lccSplitting({ ...base, compensation: "double-lcc" })).toThrow(InputError);
    expect(() => lccSplitting({ ...base, mutualInductance: 60e-6 })).toThrow(InputError);
    expect(() => lccSplitting({ ...base, extra: 1 } as never)).toThrow(InputError);
    expect(() => lccSplitting({ ...base, compensation: "series-series" } as never)).toThrow(InputError);
  });
});
