import { describe, it, expect } from "vitest";
import { InputError, MU_0, ellipticE, ellipticK } from "../../src/index.js";
import { loopInductance, loopMutualInductance } from "../../src/inductance/index.js";
import mutual from "../fixtures/inductance/loop-mutual.json" with { type: "json" };
import loopSelf from "../fixtures/inductance/loop-self.json" with { type: "json" };

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

describe("loopMutualInductance", () => {
  it("matches the mpmath/Neumann fixture to 1e-13, from touching (gap 1e-12) to far (1e6 radii) filaments", () => {
    // fixture from mpmath ellipk/ellipe at 160 digits, confirmed by the Neumann integral (generate.py)
    expect(mutual.meta.rtol).toBe(1e-13);
    for (const c of mutual.cases) {
      const m = loopMutualInductance({ radius1: c.radius1, radius2: c.radius2, axialDistance: c.axialDistance });
      expect(rel(m, c.mutual)).toBeLessThanOrEqual(1e-13);
    }
  });

  it("agrees with Maxwell's formula from ellipticK/ellipticE where that form is well conditioned", () => {
    // special/ellipticK, ellipticE; at moderate k the textbook form loses < 1e-12
    for (const [a, b, z] of [[0.1, 0.08, 0.03], [0.05, 0.05, 0.05], [0.2, 0.1, 0.1]] as const) {
      const m = (4 * a * b) / ((a + b) ** 2 + z * z);
      const k = Math.sqrt(m);
      const maxwell = MU_0 * Math.sqrt(a * b) * ((2 / k - k) * ellipticK(m) - (2 / k) * ellipticE(m));
      expect(rel(loopMutualInductance({ radius1: a, radius2: b, axialDistance: z }), maxwell)).toBeLessThan(1e-12);
    }
  });

  it("tends to the dipole limit μ0 π a²b²/(2z³) far away and to μ0 a[ln(8a/d) − 2] when nearly touching", () => {
    // Grover 1946, ch. 11 (limiting forms); relative remainders O((a/z)^2) and O((d/a)^2 ln)
    const a = 0.1;
    const z = 1e3;
    expect(rel(loopMutualInductance({ radius1: a, radius2: a, axialDistance: z }), (MU_0 * Math.PI * a ** 4) / (2 * z ** 3))).toBeLessThan(1e-7);
    const d = 1e-7;
    expect(rel(loopMutualInductance({ radius1: a, radius2: a, axialDistance: d }), MU_0 * a * (Math.log((8 * a) / d) - 2))).toBeLessThan(1e-11);
  });

  it("throws InputError for bad radii, negative distance and coinciding filaments", () => {
    expect(() => loopMutualInductance({ radius1: 0, radius2: 1, axialDistance: 1 })).toThrow(InputError);
    expect(() => loopMutualInductance({ radius1: 1, radius2: NaN, axialDistance: 1 })).toThrow(InputError);
    expect(() => loopMutualInductance({ radius1: 1, radius2: 1, axialDistance: -1 })).toThrow(InputError);
    expect(() => loopMutualInductance({ radius1: 1, radius2: 1, axialDistance: 0 })).toThrow(InputError);
    expect(() => loopMutualInductance({ radius1: 1, radius2: 1, axialDistance: Infinity })).toThrow(InputError);
  });
});

describe("loopInductance", () => {
  it("uses Wien's second-order form for uniform current and Kirchhoff's for surface current", () => {
    // Wien 1894 / Rosa & Grover 1912 (from memory): L = μ0 a[(1 + ρ²/8a²) ln(8a/ρ) + ρ²/24a² − 7/4]
    const a = 0.05;
    const r = 0.001;
    const e = (r * r) / (a * a);
    expect(rel(loopInductance({ loopRadius: a, wireRadius: r }), MU_0 * a * ((1 + e / 8) * Math.log((8 * a) / r) + e / 24 - 1.75))).toBeLessThan(1e-15);
    expect(rel(loopInductance({ loopRadius: a, wireRadius: r, currentDistribution: "surface" }), MU_0 * a * (Math.log((8 * a) / r) - 2))).toBeLessThan(1e-15);
  });

  it("with uniform current matches the double integral over the wire section within 5e-3 (ρ/a)⁴", () => {
    // fixture from scipy: Maxwell's formula integrated over the cross-section twice (generate.py)
    for (const c of loopSelf.cases) {
      const e = c.wireRadius / c.loopRadius;
      expect(rel(loopInductance({ loopRadius: c.loopRadius, wireRadius: c.wireRadius }), c.inductance)).toBeLessThan(5e-3 * e ** 4 + 1e-12);
    }
  });

  it("differs between uniform and surface current by the internal inductance μ0 a/4 for thin wire", () => {
    // internal inductance of round wire μ0/(8π) per metre (common practice), times 2πa
    const a = 0.1;
    const diff = loopInductance({ loopRadius: a, wireRadius: 1e-5 }) - loopInductance({ loopRadius: a, wireRadius: 1e-5, currentDistribution: "surface" });
    expect(rel(diff, (MU_0 * a) / 4)).toBeLessThan(1e-6);
  });

  it("throws InputError for bad radii, wire thicker than the loop and unknown distributions", () => {
    expect(() => loopInductance({ loopRadius: 0.01, wireRadius: 0.01 })).toThrow(InputError);
    expect(() => loopInductance({ loopRadius: -0.01, wireRadius: 0.001 })).toThrow(InputError);
    expect(() => loopInductance({ loopRadius: 0.01, wireRadius: 0 })).toThrow(InputError);
    expect(() => loopInductance({ loopRadius: 0.01, wireRadius: 0.001, currentDistribution: "ac" as never })).toThrow(InputError);
  });
});
