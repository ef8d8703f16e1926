import { describe, it } from "vitest";
import fc from "fast-check";
import { complex, cMul, cDiv, cSqrt, cExp, cLog, cTanh, cCoth, cAbs, cSub, type Complex } from "../../src/special/index.js";

const part = fc.double({ min: -1e3, max: 1e3, noNaN: true, noDefaultInfinity: true });
const nonZero = fc.tuple(part, part).filter(([re, im]) => Math.hypot(re, im) > 1e-6).map(([re, im]) => complex(re, im));
const close = (a: Complex, b: Complex, tol: number): boolean => cAbs(cSub(a, b)) <= tol * Math.max(cAbs(b), 1e-300);

describe("complex arithmetic invariants", () => {
  it("division undoes multiplication", () => {
    fc.assert(fc.property(nonZero, nonZero, (a, b) => close(cDiv(cMul(a, b), b), a, 4e-16 * 4)), { seed: 1, numRuns: 200 });
  });

  it("sqrt squared gives back z, with Re √z ≥ 0", () => {
    fc.assert(
      fc.property(nonZero, (z) => {
        const r = cSqrt(z);
        return r.re >= 0 && close(cMul(r, r), z, 1e-15);
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("exp undoes log", () => {
    fc.assert(fc.property(nonZero, (z) => close(cExp(cLog(z)), z, 1e-13)), { seed: 1, numRuns: 200 });
  });

  it("tanh · coth = 1 away from the poles", () => {
    fc.assert(
      fc.property(nonZero, (z) => {
        const s = Math.sin(z.im);
        const c = Math.cos(z.im);
        if (Math.abs(z.re) < 1e-3 && (Math.abs(s) < 1e-3 || Math.abs(c) < 1e-3)) return true;
        return close(cMul(cTanh(z), cCoth(z)), complex(1, 0), 1e-12);
      }),
      { seed: 1, numRuns: 200 },
    );
  });
});
