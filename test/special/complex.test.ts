import { describe, it, expect } from "vitest";
import {
  complex,
  cAdd,
  cSub,
  cMul,
  cDiv,
  cScale,
  cNeg,
  cConj,
  cAbs,
  cArg,
  cSqrt,
  cExp,
  cLog,
  cSinh,
  cCosh,
  cTanh,
  cCoth,
  type Complex,
} from "../../src/special/index.js";
import data from "../fixtures/special/complex.json" with { type: "json" };

/** Normwise relative error |w − ref| / |ref|. */
const err = (w: Complex, ref: number[]): number =>
  Math.hypot(w.re - ref[0]!, w.im - ref[1]!) / Math.hypot(ref[0]!, ref[1]!);
const z = (p: number[]): Complex => complex(p[0]!, p[1] ?? NaN);

// Normwise relative tolerance read by every fixture assertion below; the TSDoc states the same bound.
const TOL = 1e-15;

describe("complex elementary functions (fixture from mpmath, test/fixtures/special/generate.py)", () => {
  const fns = { sqrt: cSqrt, exp: cExp, log: cLog, sinh: cSinh, cosh: cCosh, tanh: cTanh, coth: cCoth } as const;
  for (const [name, fn] of Object.entries(fns)) {
    it(`c${name[0]!.toUpperCase()}${name.slice(1)} matches mpmath to ${TOL} normwise relative`, () => {
      let worst = 0;
      for (const c of data.cases) {
        const ref = (c as Record<string, number[] | undefined>)[name];
        if (ref === undefined) continue;
        worst = Math.max(worst, err(fn(z(c.z)), ref));
      }
      expect(worst).toBeLessThanOrEqual(TOL);
    });
  }

  it("cMul and cDiv match mpmath to 1e-15 normwise relative", () => {
    for (const p of data.pairs) {
      expect(err(cMul(z(p.a), z(p.b)), p.mul)).toBeLessThanOrEqual(TOL);
      expect(err(cDiv(z(p.a), z(p.b)), p.div)).toBeLessThanOrEqual(TOL);
    }
  });
});

describe("complex arithmetic basics", () => {
  it("add, sub, scale, neg, conj act per component", () => {
    expect(cAdd(complex(1, 2), complex(3, -1))).toEqual({ re: 4, im: 1 });
    expect(cSub(complex(1, 2), complex(3, -1))).toEqual({ re: -2, im: 3 });
    expect(cScale(complex(1, -2), 3)).toEqual({ re: 3, im: -6 });
    expect(cNeg(complex(1, -2))).toEqual({ re: -1, im: 2 });
    expect(cConj(complex(1, -2))).toEqual({ re: 1, im: 2 });
    expect(complex(5)).toEqual({ re: 5, im: 0 });
  });

  it("abs and arg give the polar form, arg in (−π, π]", () => {
    expect(cAbs(complex(3, 4))).toBe(5);
    expect(cArg(complex(-1, 0))).toBe(Math.PI);
    expect(cArg(complex(0, -1))).toBe(-Math.PI / 2);
    expect(cAbs(complex(3e300, 4e300))).toBeCloseTo(5e300, -286);
  });

  it("sqrt takes the principal branch and is exact on perfect squares", () => {
    expect(cSqrt(complex(-4, 0))).toEqual({ re: 0, im: 2 });
    expect(cSqrt(complex(-4, -0))).toEqual({ re: 0, im: -2 });
    expect(cSqrt(complex(0, 0))).toEqual({ re: 0, im: 0 });
    expect(cSqrt(complex(-3, 4))).toEqual({ re: 1, im: 2 });
  });

  it("division by Smith's method neither overflows nor underflows on extreme scales", () => {
    const q = cDiv(complex(1e300, 1e300), complex(1e300, 1e300));
    expect(q.re).toBeCloseTo(1, 15);
    expect(q.im).toBeCloseTo(0, 15);
    const s = cDiv(complex(1e-300, 0), complex(0, 1e-300));
    expect(s.re).toBeCloseTo(0, 15);
    expect(s.im).toBeCloseTo(-1, 15);
  });

  it("tanh and coth stay finite and tend to ±1 for huge real parts", () => {
    expect(cTanh(complex(1000, 1))).toEqual({ re: 1, im: 0 });
    expect(cTanh(complex(-1e5, 0.3)).re).toBe(-1);
    expect(cCoth(complex(-1000, 2)).re).toBe(-1);
    expect(Number.isFinite(cCoth(complex(800, 1)).im)).toBe(true);
  });
});
