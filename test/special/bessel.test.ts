import { describe, it, expect } from "vitest";
import j0 from "@stdlib/math-base-special-besselj0";
import j1 from "@stdlib/math-base-special-besselj1";
import y0 from "@stdlib/math-base-special-bessely0";
import y1 from "@stdlib/math-base-special-bessely1";
import {
  besselJ0,
  besselJ1,
  besselY0,
  besselY1,
  besselI0,
  besselI1,
  besselK0,
  besselK1,
  besselI0Scaled,
  besselI1Scaled,
  besselK0Scaled,
  besselK1Scaled,
} from "../../src/special/index.js";
import data from "../fixtures/special/bessel-real.json" with { type: "json" };

type Row = { x: number } & Record<string, number | undefined>;
const rows = data.cases as Row[];
const TOL = data.meta.rtol; // 5e-15, the bound stated in the TSDoc
/** Envelope of J and Y, √(2/(πx)) capped at 1: the floor of the error scale near zeros. */
const envelope = (x: number): number => Math.min(1, Math.sqrt(2 / (Math.PI * x)));

function worst(name: string, fn: (x: number) => number, floor: (x: number) => number = () => 0): number {
  let w = 0;
  for (const r of rows) {
    const ref = r[name];
    if (ref === undefined) continue;
    w = Math.max(w, Math.abs(fn(r.x) - ref) / Math.max(Math.abs(ref), floor(r.x)));
  }
  return w;
}

describe("Bessel functions of real argument (fixture from mpmath, test/fixtures/special/generate.py)", () => {
  it("J₀, J₁, Y₀, Y₁ match mpmath to 5e-15 of max(|value|, envelope) for 1e-3 ≤ x ≤ 1e6", () => {
    expect(worst("j0", besselJ0, envelope)).toBeLessThanOrEqual(TOL);
    expect(worst("j1", besselJ1, envelope)).toBeLessThanOrEqual(TOL);
    expect(worst("y0", besselY0, envelope)).toBeLessThanOrEqual(TOL);
    expect(worst("y1", besselY1, envelope)).toBeLessThanOrEqual(TOL);
  });

  it("I₀, I₁, K₀, K₁ and their scaled forms match mpmath to 5e-15 relative", () => {
    expect(worst("i0", besselI0)).toBeLessThanOrEqual(TOL);
    expect(worst("i1", besselI1)).toBeLessThanOrEqual(TOL);
    expect(worst("k0", besselK0)).toBeLessThanOrEqual(TOL);
    expect(worst("k1", besselK1)).toBeLessThanOrEqual(TOL);
    expect(worst("i0s", besselI0Scaled)).toBeLessThanOrEqual(TOL);
    expect(worst("i1s", besselI1Scaled)).toBeLessThanOrEqual(TOL);
    expect(worst("k0s", besselK0Scaled)).toBeLessThanOrEqual(TOL);
    expect(worst("k1s", besselK1Scaled)).toBeLessThanOrEqual(TOL);
  });

  it("J₀, J₁, Y₀, Y₁ agree with @stdlib to 1e-13 of max(|value|, envelope) on 0.005 ≤ x ≤ 1e5 (general-purpose reference library)", () => {
    // @stdlib's own documented accuracy is a few ulp with absolute accuracy near zeros; 1e-13 leaves room for that.
    let w = 0;
    for (let i = 1; i < 4000; i++) {
      const x = i < 2000 ? i * 0.025 : 10 ** (1.7 + ((i - 2000) / 2000) * 3.3);
      const e = (a: number, b: number): number => Math.abs(a - b) / Math.max(Math.abs(b), envelope(x));
      w = Math.max(w, e(besselJ0(x), j0(x)), e(besselJ1(x), j1(x)), e(besselY0(x), y0(x)), e(besselY1(x), y1(x)));
    }
    expect(w).toBeLessThan(1e-13);
  });

  it("respect parity: J₀, I₀ even; J₁, I₁ odd", () => {
    for (const x of [0.3, 2.7, 25, 400]) {
      expect(besselJ0(-x)).toBe(besselJ0(x));
      expect(besselJ1(-x)).toBe(-besselJ1(x));
      expect(besselI0Scaled(-x)).toBe(besselI0Scaled(x));
      expect(besselI1Scaled(-x)).toBe(-besselI1Scaled(x));
    }
  });

  it("take the limits at 0 (J₀ = I₀ = 1, Y → −∞, K → +∞) and give NaN for Y, K at x < 0", () => {
    expect(besselJ0(0)).toBe(1);
    expect(besselJ1(0)).toBe(0);
    expect(besselI0(0)).toBe(1);
    expect(besselY0(0)).toBe(-Infinity);
    expect(besselY1(0)).toBe(-Infinity);
    expect(besselK0(0)).toBe(Infinity);
    expect(besselK1Scaled(0)).toBe(Infinity);
    expect(besselY0(-1)).toBeNaN();
    expect(besselK1(-1)).toBeNaN();
  });

  it("first zero of J₀ is j₀,₁ = 2.404825557695773 (A&S Table 9.5, from memory; confirmed with mpmath besseljzero)", () => {
    expect(Math.abs(besselJ0(2.404825557695773))).toBeLessThan(1e-15);
  });
});
