import { describe, it, expect } from "vitest";
import {
  besselJ0Complex,
  besselJ1Complex,
  besselI0Complex,
  besselI1Complex,
  besselK0Complex,
  besselK1Complex,
  besselI0ComplexScaled,
  besselI1ComplexScaled,
  besselK0ComplexScaled,
  besselK1ComplexScaled,
  besselI1OverI0Complex,
  besselIKComplexScaled,
  complex,
  type Complex,
} from "../../src/special/index.js";
import data from "../fixtures/special/bessel-complex.json" with { type: "json" };

interface Row {
  z: number[];
  [name: string]: number[] | undefined;
}
const rows = data.cases as Row[];
const TOL = data.meta.rtol; // 5e-15, the bound stated in the TSDoc

/** |w − ref| / max(|ref|, floor): relative, or relative to the envelope `floor` near zeros. */
function err(w: Complex, ref: number[], floor = 0): number {
  return Math.hypot(w.re - ref[0]!, w.im - ref[1]!) / Math.max(Math.hypot(ref[0]!, ref[1]!), floor);
}
/** Envelope of the oscillating I (or J) near the imaginary (real) axis: √(2/(π|z|)), capped at 1. */
const envelope = (z: number[]): number => Math.min(1, Math.sqrt(2 / (Math.PI * Math.hypot(z[0]!, z[1]!))));

function worst(name: string, fn: (z: Complex) => Complex, floor: (r: Row) => number = () => 0): number {
  let w = 0;
  for (const r of rows) {
    const ref = r[name];
    if (ref === undefined) continue;
    w = Math.max(w, err(fn(complex(r.z[0]!, r.z[1] ?? NaN)), ref, floor(r)));
  }
  return w;
}

describe("Bessel functions of complex argument (fixture from mpmath, test/fixtures/special/generate.py)", () => {
  it("scaled I₀, I₁ match mpmath to 5e-15 (envelope-relative near zeros) for |z| from 1e-3 to 1e4", () => {
    expect(worst("i0s", besselI0ComplexScaled, (r) => envelope(r.z))).toBeLessThanOrEqual(TOL);
    expect(worst("i1s", besselI1ComplexScaled, (r) => envelope(r.z))).toBeLessThanOrEqual(TOL);
  });

  it("scaled K₀, K₁ match mpmath to 5e-15 relative on Re z ≥ 0", () => {
    expect(worst("k0s", besselK0ComplexScaled)).toBeLessThanOrEqual(TOL);
    expect(worst("k1s", besselK1ComplexScaled)).toBeLessThanOrEqual(TOL);
  });

  it("unscaled I₀, I₁, K₀, K₁ match mpmath to 5e-15 where representable", () => {
    const envI = (r: Row) => envelope(r.z) * Math.exp(Math.abs(r.z[0]!));
    expect(worst("i0", besselI0Complex, envI)).toBeLessThanOrEqual(TOL);
    expect(worst("i1", besselI1Complex, envI)).toBeLessThanOrEqual(TOL);
    expect(worst("k0", besselK0Complex)).toBeLessThanOrEqual(TOL);
    expect(worst("k1", besselK1Complex)).toBeLessThanOrEqual(TOL);
  });

  it("J₀, J₁ match mpmath to 5e-15 (envelope-relative near their real zeros)", () => {
    const envJ = (r: Row) => envelope(r.z) * Math.exp(Math.abs(r.z[1]!));
    expect(worst("j0", besselJ0Complex, envJ)).toBeLessThanOrEqual(TOL);
    expect(worst("j1", besselJ1Complex, envJ)).toBeLessThanOrEqual(TOL);
  });

  it("I₁/I₀ matches mpmath to 5e-15 relative for |arg z| ≤ 3π/8, up to |z| = 1e4 where I₀ itself overflows", () => {
    let w = 0;
    for (const r of rows) {
      const [x, y] = r.z as [number, number];
      if (x <= 0 || Math.abs(Math.atan2(y, x)) > (3 * Math.PI) / 8 + 1e-12) continue;
      w = Math.max(w, err(besselI1OverI0Complex(complex(x, y)), r.ratio!));
    }
    expect(w).toBeLessThanOrEqual(TOL);
  });

  it("K returns NaN for Re z < 0 and +∞ at z = 0; I₁/I₀ is odd", () => {
    expect(besselK0Complex(complex(-1, 0)).re).toBeNaN();
    expect(besselK1ComplexScaled(complex(-1, 2)).im).toBeNaN();
    expect(besselK0ComplexScaled(complex(0, 0)).re).toBe(Infinity);
    const a = besselI1OverI0Complex(complex(3, 4));
    const b = besselI1OverI0Complex(complex(-3, -4));
    expect(b.re).toBe(-a.re);
    expect(b.im).toBe(-a.im);
  });

  it("real-axis values e^{-1}I₀(1) and e·K₀(1) agree with mpmath (25 digits: 0.4657596075936404, 1.144463079806895)", () => {
    expect(besselI0ComplexScaled(complex(1, 0)).re).toBeCloseTo(0.4657596075936404, 15);
    expect(besselK0ComplexScaled(complex(1, 0)).re).toBeCloseTo(1.144463079806895, 14);
  });
});

describe("besselIKComplexScaled: the four scaled functions at once (fixture from mpmath, test/fixtures/special/generate.py)", () => {
  const pick = (name: "i0" | "i1" | "k0" | "k1") => (z: Complex): Complex => {
    const b = besselIKComplexScaled(z);
    return { re: b[`${name}r`], im: b[`${name}i`] };
  };
  it("matches mpmath to 5e-15 on Re z ≥ 0 (I envelope-relative near zeros)", () => {
    const right = (name: string, fn: (z: Complex) => Complex, floor: (r: Row) => number = () => 0): number => {
      let w = 0;
      for (const r of rows) {
        const ref = r[name];
        if (ref === undefined || !(r.z[0]! >= 0) || (r.z[0] === 0 && (r.z[1] ?? 0) === 0)) continue;
        w = Math.max(w, err(fn(complex(r.z[0]!, r.z[1] ?? 0)), ref, floor(r)));
      }
      return w;
    };
    expect(right("i0s", pick("i0"), (r) => envelope(r.z))).toBeLessThanOrEqual(TOL);
    expect(right("i1s", pick("i1"), (r) => envelope(r.z))).toBeLessThanOrEqual(TOL);
    expect(right("k0s", pick("k0"))).toBeLessThanOrEqual(TOL);
    expect(right("k1s", pick("k1"))).toBeLessThanOrEqual(TOL);
  });
  it("the TSDoc example, and NaN outside Re z ≥ 0, z ≠ 0 (kernel convention)", () => {
    expect(besselIKComplexScaled(complex(1, 0)).k0r).toBeCloseTo(1.14446307980689, 12); // mpmath: e·K0(1) = 1.14446307980689
    expect(besselIKComplexScaled(complex(-1, 0)).i0r).toBeNaN();
    expect(besselIKComplexScaled(complex(0, 0)).k0r).toBeNaN();
  });
});
