import { describe, it, expect } from "vitest";
import { InputError, MU_0 } from "../../src/index.js";
import {
  coaxialCoilMutualInductance,
  couplingCoefficient,
  loopMutualInductance,
  multilayerCoilInductance,
  solenoidInductance,
  type CoilGeometry,
} from "../../src/inductance/index.js";
import mutual from "../fixtures/inductance/loop-mutual.json" with { type: "json" };
import multilayer from "../fixtures/inductance/multilayer.json" with { type: "json" };
import coaxial from "../fixtures/inductance/coaxial.json" with { type: "json" };

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

describe("coaxialCoilMutualInductance", () => {
  it("for two loops is Maxwell's formula (mpmath fixture, 1e-13)", () => {
    // fixture from mpmath, generate.py
    for (const c of mutual.cases.slice(0, 40)) {
      if (c.radius1 === c.radius2 && c.axialDistance === 0) continue;
      const m = coaxialCoilMutualInductance({ kind: "loop", radius: c.radius1 }, { kind: "loop", radius: c.radius2 }, c.axialDistance);
      expect(rel(m, c.mutual)).toBeLessThanOrEqual(1e-13);
    }
  });

  it("matches the mpmath fixture for separated and nested windings of different kinds to 1e-9", () => {
    // fixture from mpmath: Maxwell's formula averaged over both windings by nested mpmath.quad (generate.py)
    expect(coaxial.meta.rtol).toBe(1e-9);
    for (const c of coaxial.cases) {
      const m = coaxialCoilMutualInductance(c.coilA as CoilGeometry, c.coilB as CoilGeometry, c.axialDistance);
      expect(rel(m, c.mutual)).toBeLessThanOrEqual(1e-9);
    }
  });

  it("of a current sheet with itself is its self-inductance (Nagaoka, 1e-12)", () => {
    const coil: CoilGeometry = { kind: "solenoid", radius: 0.03, length: 0.05, turns: 12 };
    expect(rel(coaxialCoilMutualInductance(coil, coil, 0), solenoidInductance({ radius: 0.03, length: 0.05, turns: 12 }))).toBeLessThan(1e-12);
  });

  it("of a multilayer coil with itself is its self-inductance (Bessel–Struve fixture, 1e-8)", () => {
    // fixture from scipy/mpmath Bessel–Struve integral, generate.py
    const c = multilayer.cases[0]!;
    const geometry = { innerRadius: c.innerRadius, outerRadius: c.outerRadius, length: c.length, turns: c.turns };
    const coil: CoilGeometry = { kind: "multilayer", ...geometry };
    expect(rel(coaxialCoilMutualInductance(coil, coil, 0), c.inductance)).toBeLessThan(1e-8);
    expect(multilayerCoilInductance(geometry)).toBe(coaxialCoilMutualInductance(coil, coil, 0));
  });

  it("of a long solenoid and a small loop at its centre is μ0 N π b²/l (ideal-solenoid field)", () => {
    // textbook limit; correction O((a/l)^2) for a long coil
    const m = coaxialCoilMutualInductance({ kind: "solenoid", radius: 0.01, length: 10, turns: 1000 }, { kind: "loop", radius: 0.002 }, 0);
    expect(rel(m, (MU_0 * 1000 * Math.PI * 0.002 ** 2) / 10)).toBeLessThan(1e-4);
  });

  it("of a far pair of coils tends to the dipole limit with the coils' total area-turns", () => {
    const z = 5;
    const m = coaxialCoilMutualInductance(
      { kind: "spiral", innerRadius: 0.01, outerRadius: 0.03, turns: 5 },
      { kind: "multilayer", innerRadius: 0.01, outerRadius: 0.02, length: 0.01, turns: 50 },
      z,
    );
    let areaA = 0;
    for (let i = 0; i < 5; i++) areaA += Math.PI * (0.01 + 0.005 * i) ** 2;
    const areaB = 50 * Math.PI * ((0.02 ** 3 - 0.01 ** 3) / 3) / 0.01; // N π <r²> over the section
    expect(rel(m, (MU_0 * areaA * areaB) / (2 * Math.PI * z ** 3))).toBeLessThan(1e-3);
  });

  it("is symmetric in its two coils", () => {
    const a: CoilGeometry = { kind: "solenoid", radius: 0.02, length: 0.03, turns: 10 };
    const b: CoilGeometry = { kind: "flatSpiral", innerTurnRadius: 0.01, outerTurnRadius: 0.04, turns: 8 };
    expect(rel(coaxialCoilMutualInductance(a, b, 0.02), coaxialCoilMutualInductance(b, a, 0.02))).toBeLessThan(1e-9);
  });

  it("throws InputError for malformed coils, negative distance and coinciding filaments", () => {
    const loop: CoilGeometry = { kind: "loop", radius: 0.02 };
    expect(() => coaxialCoilMutualInductance(loop, loop, 0)).toThrow(InputError);
    expect(() => coaxialCoilMutualInductance(loop, loop, -0.01)).toThrow(InputError);
    expect(() => coaxialCoilMutualInductance({ kind: "coil" } as never, loop, 0.01)).toThrow(InputError);
    expect(() => coaxialCoilMutualInductance({ kind: "solenoid", radius: 0.01, length: 0, turns: 3 }, loop, 0.01)).toThrow(InputError);
    expect(() => coaxialCoilMutualInductance({ kind: "multilayer", innerRadius: 0.02, outerRadius: 0.01, length: 0.01, turns: 3 }, loop, 0.01)).toThrow(InputError);
    expect(() => coaxialCoilMutualInductance({ kind: "spiral", innerRadius: 0.01, outerRadius: 0.02, turns: 2.5 }, loop, 0.01)).toThrow(InputError);
    expect(() => coaxialCoilMutualInductance({ kind: "loop", radius: 0.01, turns: 0 }, loop, 0.01)).toThrow(InputError);
  });
});

describe("couplingCoefficient", () => {
  it("is M/√(L1 L2) and rejects |M| > √(L1 L2)", () => {
    expect(couplingCoefficient({ mutualInductance: 2e-6, selfInductance1: 4e-6, selfInductance2: 9e-6 })).toBe(2e-6 / 6e-6);
    expect(couplingCoefficient({ mutualInductance: -3e-6, selfInductance1: 1e-6, selfInductance2: 9e-6 })).toBe(-1);
    expect(() => couplingCoefficient({ mutualInductance: 7e-6, selfInductance1: 4e-6, selfInductance2: 9e-6 })).toThrow(InputError);
    expect(() => couplingCoefficient({ mutualInductance: 1e-6, selfInductance1: 0, selfInductance2: 9e-6 })).toThrow(InputError);
    expect(() => couplingCoefficient({ mutualInductance: NaN, selfInductance1: 1, selfInductance2: 1 })).toThrow(InputError);
  });

  it("of two identical adjacent loops follows from Maxwell's formula", () => {
    const m = loopMutualInductance({ radius1: 0.05, radius2: 0.05, axialDistance: 0.01 });
    expect(couplingCoefficient({ mutualInductance: m, selfInductance1: 1e-6, selfInductance2: 1e-6 })).toBeCloseTo(m / 1e-6, 15);
  });
});
