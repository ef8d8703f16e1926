import { describe, it, expect } from "vitest";
import { InputError, MU_0, ellipticE, ellipticK } from "../../src/index.js";
import { nagaokaCoefficient, solenoidInductance, solenoidInductanceWheeler, coaxialCoilMutualInductance, loopInductance } from "../../src/inductance/index.js";
import solenoid from "../fixtures/inductance/solenoid.json" with { type: "json" };

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

describe("nagaokaCoefficient", () => {
  it("matches Nagaoka's published table to its 4 decimals at 11 ratios", () => {
    // Nagaoka 1909 / Grover 1946, ch. 16 (Nagaoka's constant vs diameter/length), values from memory
    const table: [number, number][] = [
      [0.1, 0.9588], [0.2, 0.9201], [0.3, 0.8838], [0.4, 0.8499], [0.5, 0.8181], [1, 0.6884],
      [2, 0.5255], [3, 0.4292], [4, 0.3654], [5, 0.3198], [10, 0.2033],
    ];
    for (const [x, k] of table) expect(Math.abs(nagaokaCoefficient(x) - k)).toBeLessThanOrEqual(0.5e-4 + 1e-12);
  });

  it("matches the mpmath fixture to 1e-13 from d/l = 1e-6 to 1e9", () => {
    // fixture from mpmath, test/fixtures/inductance/generate.py (closed form + direct double integral)
    expect(solenoid.meta.rtol).toBe(1e-13);
    for (const c of solenoid.cases) expect(rel(nagaokaCoefficient(c.diameterOverLength), c.nagaoka)).toBeLessThanOrEqual(1e-13);
  });

  it("agrees with Nagaoka's formula evaluated with the library's ellipticK/ellipticE where that form is well conditioned", () => {
    // special/ellipticK, ellipticE (Cephes polynomials, checked against mpmath in test/special)
    for (const x of [0.3, 0.7, 1, 1.3, 2, 4]) {
      const m = (x * x) / (1 + x * x);
      const k = Math.sqrt(m);
      const kp = 1 / Math.sqrt(1 + x * x);
      const kk = ellipticK(m);
      const ee = ellipticE(m);
      const direct = (4 / (3 * Math.PI * kp)) * ((kp * kp / m) * (kk - ee) + ee - k);
      expect(rel(nagaokaCoefficient(x), direct)).toBeLessThan(1e-13);
    }
  });

  it("throws InputError for non-positive or non-finite ratios", () => {
    for (const bad of [0, -1, NaN, Infinity]) expect(() => nagaokaCoefficient(bad)).toThrow(InputError);
  });
});

describe("solenoidInductance", () => {
  it("matches the current-sheet fixture to 1e-13", () => {
    // fixture from mpmath (Nagaoka closed form and direct Neumann double integral), generate.py
    for (const c of solenoid.cases) {
      const l = solenoidInductance({ radius: c.radius, length: c.length, turns: c.turns });
      expect(rel(l, c.inductance)).toBeLessThanOrEqual(1e-13);
    }
  });

  it("with wire diameter agrees with the exact sum over its rings within 2e-4", () => {
    // Rosa 1907 compared his corrections with filament (ring) sums; here the ring sum is exact:
    // each turn a ring of round wire (Wien) plus Maxwell's mutual inductance of every pair.
    const radius = 0.05;
    const turns = 12;
    const pitch = 0.002;
    const wireDiameter = 0.0015;
    let ringSum = 0;
    for (let i = 0; i < turns; i++) {
      ringSum += loopInductance({ loopRadius: radius, wireRadius: wireDiameter / 2 });
      for (let j = i + 1; j < turns; j++) {
        ringSum += 2 * coaxialCoilMutualInductance({ kind: "loop", radius }, { kind: "loop", radius }, (j - i) * pitch);
      }
    }
    const rosa = solenoidInductance({ radius, length: turns * pitch, turns, wireDiameter });
    const sheet = solenoidInductance({ radius, length: turns * pitch, turns });
    expect(rel(rosa, ringSum)).toBeLessThan(2e-4);
    // and the correction is needed: the bare current sheet is off by more than 1 %
    expect(rel(sheet, ringSum)).toBeGreaterThan(0.01);
  });

  it("reduces to the single-ring formula for one turn", () => {
    // Rosa's A term is defined so that one turn gives mu0 a (ln(16a/d) - 7/4) (Rosa 1906)
    const a = 0.1;
    const d = 0.002;
    const one = solenoidInductance({ radius: a, length: d * 1.5, turns: 1, wireDiameter: d });
    // current sheet of a short coil differs from its asymptote by O((l/a)^2 ln)
    expect(rel(one, MU_0 * a * (Math.log((16 * a) / d) - 1.75))).toBeLessThan(1e-4); // (l/a)^2 ln = 4e-5
  });

  it("throws InputError naming the parameter for bad dimensions, turns < 1 and overlapping turns", () => {
    const ok = { radius: 0.02, length: 0.02, turns: 10 };
    const cases: [object, string][] = [
      [{ ...ok, radius: 0 }, "radius"], [{ ...ok, radius: -1 }, "radius"], [{ ...ok, length: NaN }, "length"],
      [{ ...ok, length: Infinity }, "length"], [{ ...ok, turns: 0.5 }, "turns"], [{ ...ok, wireDiameter: 0.0021 }, "wireDiameter"],
      [{ ...ok, wireDiameter: -0.001 }, "wireDiameter"], [{ ...ok, turns: 10.5, wireDiameter: 0.001 }, "turns"],
    ];
    for (const [o, p] of cases) {
      expect(() => solenoidInductance(o as never)).toThrow(InputError);
      try {
        solenoidInductance(o as never);
      } catch (e) {
        expect((e as InputError).parameter).toBe(p);
      }
    }
    expect(() => solenoidInductance(null as never)).toThrow(InputError);
  });
});

describe("solenoidInductanceWheeler", () => {
  it("reproduces Wheeler's stated accuracy of about 1 % for length > 0.8 radius", () => {
    // Wheeler 1928: "accurate within 1 per cent for l > 0.8 r" — checked against the exact sheet
    let worst = 0;
    for (let x = 0.8; x < 1000; x *= 1.05) {
      const e = solenoidInductanceWheeler({ radius: 1, length: x, turns: 3 }) / solenoidInductance({ radius: 1, length: x, turns: 3 }) - 1;
      worst = Math.max(worst, Math.abs(e));
    }
    expect(worst).toBeLessThan(0.01);
    expect(worst).toBeGreaterThan(0.004); // the approximation is not accidentally exact
  });

  it("uses the original coefficients r^2 N^2 / (9r + 10l) µH in inches", () => {
    // Wheeler 1928, eq. (1): r = 1 in, l = 1 in, N = 10 -> 100/19 µH
    expect(rel(solenoidInductanceWheeler({ radius: 0.0254, length: 0.0254, turns: 10 }), 100e-6 / 19)).toBeLessThan(1e-15);
  });

  it("throws InputError for bad input", () => {
    expect(() => solenoidInductanceWheeler({ radius: 0.01, length: 0, turns: 3 })).toThrow(InputError);
    expect(() => solenoidInductanceWheeler({ radius: 0.01, length: 0.01, turns: 0 })).toThrow(InputError);
  });
});
