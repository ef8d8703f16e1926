import { describe, it, expect } from "vitest";
import { besselIKScaled } from "../../src/special/bessel-core.js";
import { besselI0Scaled, besselI1OverI0Complex, besselI1Scaled, besselK0Scaled, besselK1Scaled, complex } from "../../src/special/index.js";
import {
  IK_I0I,
  IK_I0R,
  IK_I1I,
  IK_I1R,
  IK_K0I,
  IK_K0R,
  IK_K1I,
  IK_K1R,
  besselI1OverI0ComplexInto,
  besselIKScaledInto,
} from "../../src/special/internal.js";
import data from "../fixtures/special/bessel-complex.json" with { type: "json" };

interface Row {
  z: number[];
  [name: string]: number[] | undefined;
}
const rows = data.cases as Row[];
const TOL = data.meta.rtol; // 5e-15, the bound of the public functions built on the same engine

/** Arguments on Re z ≥ 0 in every region of the engine (series, continued fractions, asymptotic). */
function grid(): [number, number][] {
  const out: [number, number][] = [];
  for (let k = 0; k <= 60; k++) {
    const r = 1e-3 * 10 ** (k / 10); // 1e-3 … 1e3
    for (let j = 0; j <= 8; j++) {
      const phi = ((j / 8) * Math.PI) / 2 - (j % 2 === 0 ? 0 : Math.PI / 2);
      out.push([r * Math.abs(Math.cos(phi)), r * Math.sin(phi)]);
    }
  }
  return out;
}

describe("allocation-free Bessel engine (special/internal)", () => {
  it("besselIKScaledInto writes exactly the numbers besselIKScaled returns, with and without K", () => {
    const out = new Float64Array(8);
    for (const [zr, zi] of grid()) {
      for (const withK of [false, true]) {
        besselIKScaledInto(zr, zi, withK, out);
        const o = besselIKScaled(zr, zi, withK);
        expect([...out]).toEqual([o.i0r, o.i0i, o.i1r, o.i1i, o.k0r, o.k0i, o.k1r, o.k1i]);
      }
    }
  });

  it("the I values do not depend on withK, so one call serves all four functions", () => {
    const a = new Float64Array(8);
    const b = new Float64Array(8);
    for (const [zr, zi] of grid()) {
      besselIKScaledInto(zr, zi, false, a);
      besselIKScaledInto(zr, zi, true, b);
      expect([...b.subarray(0, 4)]).toEqual([...a.subarray(0, 4)]);
    }
    // the real scaled functions are the same numbers
    for (let k = 0; k <= 60; k++) {
      const x = 1e-3 * 10 ** (k / 10);
      besselIKScaledInto(x, 0, true, b);
      expect([b[IK_I0R], b[IK_I1R], b[IK_K0R], b[IK_K1R]]).toEqual([besselI0Scaled(x), besselI1Scaled(x), besselK0Scaled(x), besselK1Scaled(x)]);
    }
  });

  it("besselIKScaledInto matches mpmath to 5e-15 on Re z ≥ 0 (fixture test/fixtures/special/bessel-complex.json)", () => {
    const out = new Float64Array(8);
    let worst = 0;
    let checked = 0;
    const err = (re: number, im: number, ref: number[], floor: number): number =>
      Math.hypot(re - ref[0]!, im - ref[1]!) / Math.max(Math.hypot(ref[0]!, ref[1]!), floor);
    for (const r of rows) {
      const zr = r.z[0]!;
      const zi = r.z[1]!;
      if (!(zr >= 0) || (zr === 0 && zi === 0) || r.i0s === undefined || r.k0s === undefined || r.i1s === undefined || r.k1s === undefined) continue;
      besselIKScaledInto(zr, zi, true, out);
      // I oscillates near the imaginary axis: relative to its envelope √(2/(π|z|)) there, as the public functions' test
      const envelope = Math.min(1, Math.sqrt(2 / (Math.PI * Math.hypot(zr, zi))));
      worst = Math.max(
        worst,
        err(out[IK_I0R]!, out[IK_I0I]!, r.i0s, envelope),
        err(out[IK_I1R]!, out[IK_I1I]!, r.i1s, envelope),
        err(out[IK_K0R]!, out[IK_K0I]!, r.k0s, 0),
        err(out[IK_K1R]!, out[IK_K1I]!, r.k1s, 0),
      );
      checked++;
    }
    expect(checked).toBeGreaterThan(50);
    expect(worst).toBeLessThanOrEqual(TOL);
  });

  it("besselI1OverI0ComplexInto writes exactly what besselI1OverI0Complex returns, on both half planes", () => {
    const out = new Float64Array(2);
    for (const [zr, zi] of grid()) {
      for (const [sr, si] of [[1, 1], [-1, -1], [-1, 1]]) {
        besselI1OverI0ComplexInto(sr! * zr, si! * zi, out);
        const w = besselI1OverI0Complex(complex(sr! * zr, si! * zi));
        expect([out[0], out[1]]).toEqual([w.re, w.im]);
      }
    }
  });
});
