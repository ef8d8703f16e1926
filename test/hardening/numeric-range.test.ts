/**
 * Inputs far from everyday scales: every input whose result is representable gets it (the
 * formulas scale internally — separate square roots, logarithms of products), anything else is
 * an InputError. References: exact identities (homogeneity in the lengths), closed forms and
 * published asymptotes, named beside each assertion.
 */
import { describe, expect, it } from "vitest";
import {
  InputError,
  cSqrt,
  couplingCoefficient,
  loopMutualInductance,
  parallelTank,
  seriesTank,
  solenoidInductance,
  steinmetzLoss,
  toInches,
  toMils,
} from "../../src/index.js";

const MU_0 = 1.25663706212e-6; // CODATA 2018
const rel = (a: number, b: number): number => Math.abs(a / b - 1);

describe("numeric range", () => {
  it("steinmetzLoss: f = 1e200 Hz with B = 1e-200 T gives k f^α B^β = 1e-200 (closed form), overflow is refused", () => {
    expect(rel(steinmetzLoss({ frequency: 1e200, fluxDensityPeak: 1e-200, k: 1, alpha: 1.5, beta: 2.5 }), 1e-200)).toBeLessThan(1e-12);
    expect(() => steinmetzLoss({ frequency: 1e300, fluxDensityPeak: 1, k: 1, alpha: 2, beta: 2 })).toThrow(InputError);
  });

  it("loopMutualInductance is homogeneous of degree 1 in the lengths down to 1e-300 m and up to 1e300 m", () => {
    const unit = loopMutualInductance({ radius1: 0.1, radius2: 0.2, axialDistance: 0.05 });
    for (const s of [1e-300, 1e-150, 1e150, 1e300]) {
      expect(rel(loopMutualInductance({ radius1: 0.1 * s, radius2: 0.2 * s, axialDistance: 0.05 * s }), unit * s)).toBeLessThan(1e-13);
    }
  });

  it("loopMutualInductance of very unequal loops is the dipole far field µ0πa²b²/(2(a²+b²+z²)^{3/2}) (Jackson §5.6)", () => {
    const m = loopMutualInductance({ radius1: 1e-100, radius2: 1e100, axialDistance: 0 });
    expect(rel(m, (MU_0 * Math.PI * 1e-200) / (2 * 1e100))).toBeLessThan(1e-12);
    expect(() => loopMutualInductance({ radius1: 1e-300, radius2: 1e300, axialDistance: 1 })).toThrow(InputError);
  });

  it("solenoidInductance at 1e±300 m: homogeneity, and the thin band µ0 a N² (ln(8a/l) − 1/2) (Rosa & Grover 1916, from memory)", () => {
    const unit = solenoidInductance({ radius: 0.05, length: 0.1, turns: 10 });
    for (const s of [1e-300, 1e300]) expect(rel(solenoidInductance({ radius: 0.05 * s, length: 0.1 * s, turns: 10 }), unit * s)).toBeLessThan(1e-13);
    const band = solenoidInductance({ radius: 1e300, length: 1e-300, turns: 1 });
    expect(rel(band, MU_0 * 1e300 * (Math.log(8) + 600 * Math.log(10) - 0.5))).toBeLessThan(1e-12);
    expect(() => solenoidInductance({ radius: 1e-300, length: 1e300, turns: 1e10 })).toThrow(InputError);
  });

  it("couplingCoefficient keeps √L1·√L2 in range: k(0, 1e-170, 1e-170) = 0 and k(1e160, 1e160, 1e160) = 1 (definition)", () => {
    expect(couplingCoefficient({ mutualInductance: 0, selfInductance1: 1e-170, selfInductance2: 1e-170 })).toBe(0);
    expect(couplingCoefficient({ mutualInductance: 1e160, selfInductance1: 1e160, selfInductance2: 1e160 })).toBe(1);
  });

  it("seriesTank and parallelTank: f0 = 1/(2π√(LC)) with L·C beyond the double range (Thomson's formula)", () => {
    const s = seriesTank({ inductance: 1e-300, capacitance: 1e300, resistance: 1 });
    expect(rel(s.undampedFrequency, 1 / (2 * Math.PI))).toBeLessThan(1e-15);
    expect(Number.isFinite(s.lowerHalfPowerFrequency) && Number.isFinite(s.upperHalfPowerFrequency)).toBe(true);
    const p = parallelTank({ inductance: 1e160, capacitance: 1e160, coilResistance: 1 });
    expect(rel(p.undampedFrequency, 1 / (2 * Math.PI * 1e160))).toBeLessThan(1e-15);
    expect(() => seriesTank({ inductance: 1e300, capacitance: 1e-300, resistance: 1e-300 })).toThrow(InputError); // Q = 1e600
  });

  it("length conversions refuse results beyond the double range (1 in = 0.0254 m exactly, 1959 agreement)", () => {
    expect(() => toInches(1.7e308)).toThrow(InputError);
    expect(() => toMils(1e306)).toThrow(InputError);
    expect(rel(toInches(1e306), 1e306 / 0.0254)).toBeLessThan(1e-15);
    expect(rel(toMils(1e300), 1e303 / 0.0254)).toBeLessThan(1e-15);
  });

  it("cSqrt near the top of the double range: √(1e308(1+i)) by the polar form (DLMF 4.2.8)", () => {
    const z = cSqrt({ re: 1e308, im: 1e308 });
    const modulus = 1e154 * 2 ** 0.25;
    expect(rel(z.re, modulus * Math.cos(Math.PI / 8))).toBeLessThan(1e-14);
    expect(rel(z.im, modulus * Math.sin(Math.PI / 8))).toBeLessThan(1e-14);
    const w = cSqrt({ re: -1.7e308, im: 1 });
    expect(rel(w.im, Math.sqrt(1.7e308))).toBeLessThan(1e-14);
  });
});
