import { describe, it } from "vitest";
import fc from "fast-check";
import {
  besselJ0,
  besselJ1,
  besselY0,
  besselY1,
  besselI0Scaled,
  besselI1Scaled,
  besselK0Scaled,
  besselK1Scaled,
  besselI0ComplexScaled,
  besselI1ComplexScaled,
  besselK0ComplexScaled,
  besselK1ComplexScaled,
  besselI1OverI0Complex,
  besselJ0Complex,
  complex,
  cMul,
  cSub,
  cAbs,
} from "../../src/special/index.js";

const logX = (lo: number, hi: number) =>
  fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true, noDefaultInfinity: true }).map(Math.exp);

describe("Bessel function invariants", () => {
  it("J₁Y₀ − J₀Y₁ = 2/(πx) (Wronskian, DLMF 10.5.2)", () => {
    fc.assert(
      fc.property(logX(1e-3, 1e5), (x) => {
        const w = besselJ1(x) * besselY0(x) - besselJ0(x) * besselY1(x);
        const env = 2 / (Math.PI * x);
        return Math.abs(w - env) <= 1e-14 * Math.max(env, Math.abs(besselY0(x) * besselJ1(x)) + Math.abs(besselJ0(x) * besselY1(x)));
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("I₀K₁ + I₁K₀ = 1/x in scaled form (Wronskian, DLMF 10.28.2)", () => {
    fc.assert(
      fc.property(logX(1e-3, 1e6), (x) => {
        const w = besselI0Scaled(x) * besselK1Scaled(x) + besselI1Scaled(x) * besselK0Scaled(x);
        return Math.abs(w * x - 1) <= 1e-14;
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("the complex Wronskian I₀(z)K₁(z) + I₁(z)K₀(z) = 1/z holds on the right half plane", () => {
    fc.assert(
      fc.property(logX(1e-3, 1e4), fc.double({ min: -Math.PI / 2, max: Math.PI / 2, noNaN: true }), (r, t) => {
        const z = complex(r * Math.cos(t), r * Math.sin(t));
        // the scale factors e^{−|Re z|} and e^{z} multiply to e^{i Im z}: undo that unit rotation
        const w = cMul(
          complex(Math.cos(z.im), -Math.sin(z.im)),
          cSub(
            cMul(besselI0ComplexScaled(z), besselK1ComplexScaled(z)),
            cMul(cMul(besselI1ComplexScaled(z), besselK0ComplexScaled(z)), complex(-1, 0)),
          ),
        );
        const target = complex(z.re / (r * r), -z.im / (r * r));
        const scale =
          cAbs(besselI0ComplexScaled(z)) * cAbs(besselK1ComplexScaled(z)) +
          cAbs(besselI1ComplexScaled(z)) * cAbs(besselK0ComplexScaled(z));
        return cAbs(cSub(w, target)) <= 2e-14 * Math.max(scale, 1 / r);
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("J₀ of complex argument reduces to the real J₀ on the real axis", () => {
    fc.assert(
      fc.property(logX(1e-3, 1e5), (x) => {
        const v = besselJ0Complex(complex(x, 0));
        return Math.abs(v.re - besselJ0(x)) <= 1e-15 && Math.abs(v.im) <= 1e-16;
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("I₁/I₀ on the skin-effect ray z = (1 + i)·s tends to 1 − 1/(2z) and stays finite to s = 1e8", () => {
    fc.assert(
      fc.property(logX(50, 1e8), (s) => {
        const q = besselI1OverI0Complex(complex(s, s));
        // 1 − 1/(2z) with 1/z = (1 − i)/(2s); next term O(1/s²)
        const er = q.re - (1 - 1 / (4 * s));
        const ei = q.im - 1 / (4 * s);
        return Number.isFinite(q.re) && Math.abs(er) + Math.abs(ei) <= 1 / (s * s) + 4e-16;
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("real Bessel functions and scaled forms are finite for 1e-300 ≤ x ≤ 1e300", () => {
    fc.assert(
      fc.property(logX(1e-300, 1e300), (x) =>
        [besselJ0(x), besselJ1(x), besselY0(x), besselY1(x), besselI0Scaled(x), besselI1Scaled(x), besselK0Scaled(x), besselK1Scaled(x)].every(
          Number.isFinite,
        ),
      ),
      { seed: 1, numRuns: 200 },
    );
  });
});
