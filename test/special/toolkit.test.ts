/**
 * The numerical toolkit of `src/special/internal.ts` against mpmath at 30 digits (fixture from
 * mpmath, test/fixtures/toolkit/generate.py). Each tolerance is the accuracy stated in the
 * routine's file header.
 */
import { describe, expect, it } from "vitest";
import data from "../fixtures/toolkit/toolkit.json" with { type: "json" };
import {
  NormalDeviates,
  Xoshiro128,
  andersonStep,
  exponentialIntegralE5,
  gaussLegendreAdaptive,
  gaussLegendreAdaptiveAbsolute,
  gaussLegendreAdaptiveSingularAtStart,
  gaussLegendrePanel,
  gaussLegendreRule,
  leastSquaresQr,
  logGamma,
  solveTridiagonal,
} from "../../src/special/internal.js";

const relative = (got: number, want: number): number => Math.abs(got - want) / Math.abs(want);

describe("gaussLegendreRule", () => {
  it("nodes and weights of n = 1 … 64 within 5e-16 absolute (fixture from mpmath, Newton on P_n at 30 digits)", () => {
    expect(data.gaussLegendre.length).toBeGreaterThan(5);
    for (const reference of data.gaussLegendre) {
      const rule = gaussLegendreRule(reference.n);
      expect(rule.nodes.length).toBe(reference.n);
      reference.nodes.forEach((x, i) => {
        expect(Math.abs(rule.nodes[i]! - x)).toBeLessThanOrEqual(5e-16);
        expect(Math.abs(rule.weights[i]! - reference.weights[i]!)).toBeLessThanOrEqual(5e-16);
      });
    }
  });

  it("a panel of n points integrates x^(2n−1) exactly (Gauss's theorem, closed form 1/(2n) on [0, 1])", () => {
    for (const n of [2, 5, 9]) {
      const value = gaussLegendrePanel((x) => x ** (2 * n - 1), 0, 1, gaussLegendreRule(n));
      expect(relative(value, 1 / (2 * n))).toBeLessThan(1e-14);
    }
  });
});

describe("gaussLegendreAdaptive", () => {
  const integrands: readonly ((x: number) => number)[] = [(x) => Math.exp(-x) * Math.cos(3 * x), (x) => 1 / (1 + 25 * x * x), Math.sqrt];
  it("meets a 1e-12 relative tolerance on smooth and kinked integrands (fixture from mpmath quad)", () => {
    expect(data.integrals.length).toBe(integrands.length);
    data.integrals.forEach((c, i) => {
      expect(relative(gaussLegendreAdaptive(integrands[i]!, c.a, c.b, 1e-12), c.value), c.name).toBeLessThan(1e-12);
      expect(Math.abs(gaussLegendreAdaptiveAbsolute(integrands[i]!, c.a, c.b, 1e-13) - c.value), c.name).toBeLessThan(1e-12);
    });
  });

  it("meets 1e-12 relative with a logarithmic singularity at the start (fixture from mpmath quad)", () => {
    const integrands2: readonly ((x: number) => number)[] = [(x) => Math.log(x) * Math.cos(x), (x) => Math.log(Math.abs(x - 1))];
    data.singularIntegrals.forEach((c, i) => {
      expect(relative(gaussLegendreAdaptiveSingularAtStart(integrands2[i]!, c.a, c.b, 1e-12), c.value), c.name).toBeLessThan(1e-12);
    });
  });

  it("returns NaN, not a hang, for a NaN integrand, and 0 on an empty interval", () => {
    expect(gaussLegendreAdaptive(() => NaN, 0, 1, 1e-10)).toBeNaN();
    expect(gaussLegendreAdaptive(Math.exp, 2, 2, 1e-10)).toBe(0);
  });
});

describe("logGamma", () => {
  it("within 3e-15 relative (absolute below 1) on [1e-3, 170] (fixture from mpmath loggamma)", () => {
    for (const c of data.logGamma) {
      expect(Math.abs(logGamma(c.x) - c.value) / Math.max(1, Math.abs(c.value)), `x = ${c.x}`).toBeLessThanOrEqual(3e-15);
    }
  });
});

describe("exponentialIntegralE5", () => {
  it("within 1e-16 absolute on [0, 50], and 1e-10 relative (fixture from mpmath expint)", () => {
    for (const c of data.expintE5) {
      const value = exponentialIntegralE5(c.x);
      expect(Math.abs(value - c.value), `x = ${c.x}`).toBeLessThanOrEqual(1e-16);
      expect(relative(value, c.value), `x = ${c.x}`).toBeLessThanOrEqual(1e-10);
    }
  });
});

describe("leastSquaresQr", () => {
  it("within 3e-15 relative of mpmath's qr_solve at 30 digits", () => {
    for (const c of data.leastSquares) {
      const x = leastSquaresQr(Float64Array.from(c.a.flat()), Float64Array.from(c.b), c.rows, c.columns);
      expect(x).toBeDefined();
      c.x.forEach((v, i) => { expect(relative(x![i]!, v)).toBeLessThanOrEqual(3e-15); });
    }
  });

  it("reports a rank-deficient matrix as undefined", () => {
    expect(leastSquaresQr(Float64Array.from([1, 2, 2, 4, 3, 6]), Float64Array.from([1, 2, 3]), 3, 2)).toBeUndefined();
  });
});

describe("solveTridiagonal", () => {
  it("within 5e-16 of the largest unknown (fixture from mpmath lu_solve at 30 digits)", () => {
    for (const c of data.tridiagonal) {
      const n = c.diag.length;
      const out = new Float64Array(n);
      solveTridiagonal(Float64Array.from(c.lower), Float64Array.from(c.diag), Float64Array.from(c.upper), Float64Array.from(c.rhs), out, new Float64Array(n), n);
      const scale = Math.max(...c.x.map(Math.abs));
      c.x.forEach((v, i) => { expect(Math.abs(out[i]! - v) / scale).toBeLessThanOrEqual(5e-16); });
    }
  });
});

describe("andersonStep", () => {
  it("is the secant step for an affine map: one step lands on the fixed point (closed form x* = b/(1 − a))", () => {
    const a = 0.9;
    const b = 2;
    const g = (x: number): number => a * x + b;
    const next = [0];
    expect(andersonStep(1, [1], [g(1)], [0], [g(0)], [1], next)).toBe(true);
    expect(relative(next[0]!, b / (1 - a))).toBeLessThan(1e-14);
  });

  it("reaches the fixed point of a nonlinear map within 1e-14 in fewer iterations than plain iteration (fixture from mpmath findroot)", () => {
    const map = (x: readonly number[]): number[] => [Math.cos(x[1]!) / 2 + 0.3, Math.sin(x[0]!) / 3 + x[0]! / 2 + 0.1];
    const run = (accelerate: boolean): { x: number[]; iterations: number } => {
      let x = [0, 0];
      let previousX: number[] | null = null;
      let previousG = [0, 0];
      const next = [0, 0];
      for (let iterations = 0; iterations < 500; iterations++) {
        const g = map(x);
        if (Math.abs(g[0]! - x[0]!) + Math.abs(g[1]! - x[1]!) < 1e-15) return { x, iterations };
        let nextX = g;
        if (accelerate && previousX !== null && andersonStep(2, x, g, previousX, previousG, [1, 1], next)) nextX = [next[0]!, next[1]!];
        previousX = x;
        previousG = g;
        x = nextX;
      }
      throw new Error("no convergence");
    };
    const accelerated = run(true);
    const plain = run(false);
    expect(relative(accelerated.x[0]!, data.anderson.fixedPoint[0]!)).toBeLessThan(1e-14);
    expect(relative(accelerated.x[1]!, data.anderson.fixedPoint[1]!)).toBeLessThan(1e-14);
    expect(accelerated.iterations).toBeLessThan(plain.iterations / 2);
  });

  it("declines a step when the residual did not change", () => {
    expect(andersonStep(1, [1], [2], [1], [2], [1], [0])).toBe(false);
  });
});

describe("Xoshiro128 and NormalDeviates", () => {
  it("bit-exact uniforms and normals within 1e-15 of an independent transcription (Blackman and Vigna 2021; fixture generate.py)", () => {
    expect(data.generator.length).toBeGreaterThan(2);
    for (const g of data.generator) {
      const uniform = new Xoshiro128(g.seed | 0);
      for (const u of g.uniform) expect(uniform.next()).toBe(u);
      const normal = new NormalDeviates(new Xoshiro128(g.seed | 0));
      for (const z of g.normal) expect(Math.abs(normal.next() - z)).toBeLessThanOrEqual(1e-15);
    }
  });
});
