import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { tubeAcResistance, roundWireAcRatio, skinDepth, complex, cAdd, cSub, cMul, cDiv, cScale, besselI0Complex, besselI1Complex, besselK0Complex, besselK1Complex } from "../../src/index.js";

const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log10(lo), max: Math.log10(hi), noNaN: true, noDefaultInfinity: true }).map((e) => 10 ** e);
const rho = 1.7241e-8;

describe("tubeAcResistance properties", () => {
  it("Rac ≥ Rdc of the tube and finite over thin (1e-9 of the radius) to solid walls", () => {
    fc.assert(
      fc.property(logUniform(1e-3, 0.1), logUniform(1e-9, 1), logUniform(1, 1e8), (od, frac, f) => {
        const b = od / 2;
        const wall = frac * b;
        const a = b - wall;
        const r = tubeAcResistance({ outerDiameter: od, wallThickness: wall, frequency: f, resistivity: rho });
        expect(Number.isFinite(r)).toBe(true);
        expect(r).toBeGreaterThanOrEqual((rho / (Math.PI * (b * b - a * a))) * (1 - 1e-12));
      }),
      { seed: 1, numRuns: 200 },
    );
  });
  it("a tube with a wall ≥ 3δ has the resistance of the solid wire within 1 %", () => {
    fc.assert(
      fc.property(logUniform(1e-3, 0.1), logUniform(3, 1000), logUniform(1e2, 1e8), (od, wallOverDelta, f) => {
        const delta = skinDepth({ resistivity: rho, frequency: f });
        const wall = wallOverDelta * delta;
        if (wall >= od / 2) return;
        const r = tubeAcResistance({ outerDiameter: od, wallThickness: wall, frequency: f, resistivity: rho });
        const solid = ((4 * rho) / (Math.PI * od * od)) * roundWireAcRatio({ diameter: od, frequency: f, resistivity: rho });
        expect(Math.abs(r / solid - 1)).toBeLessThan(0.01);
      }),
      { seed: 1, numRuns: 200 },
    );
  });
  it("tends to the DC resistance as f → 0", () => {
    fc.assert(
      fc.property(logUniform(1e-3, 0.1), fc.double({ min: 0.01, max: 1, noNaN: true, noDefaultInfinity: true }), (od, frac) => {
        const b = od / 2;
        const a = b - frac * b;
        const r = tubeAcResistance({ outerDiameter: od, wallThickness: frac * b, frequency: 1e-4, resistivity: rho });
        expect(Math.abs(r / (rho / (Math.PI * (b * b - a * a))) - 1)).toBeLessThan(1e-9);
      }),
      { seed: 1, numRuns: 200 },
    );
  });
});

describe("tubeAcResistance against the complex-Bessel form", () => {
  it("agrees with Re Z' = Re[ρτ/(2πb)·(I0(τb)K1(τa) + I1(τa)K0(τb))/(I1(τb)K1(τa) − I1(τa)K1(τb))] from the special module", () => {
    // Schelkunoff 1934 (tube impedance), evaluated with besselI*/K*Complex (a second, independent route through special)
    fc.assert(
      fc.property(logUniform(2e-3, 3e-2), fc.double({ min: 0.02, max: 0.98, noNaN: true, noDefaultInfinity: true }), logUniform(10, 1e6), (od, frac, f) => {
        const b = od / 2;
        const a = b * (1 - frac);
        const delta = skinDepth({ resistivity: rho, frequency: f });
        if (b / delta > 300) return; // unscaled functions overflow beyond this
        const tau = complex(1 / delta, 1 / delta);
        const tb = cScale(tau, b);
        const ta = cScale(tau, a);
        const num = cAdd(cMul(besselI0Complex(tb), besselK1Complex(ta)), cMul(besselI1Complex(ta), besselK0Complex(tb)));
        const den = cSub(cMul(besselI1Complex(tb), besselK1Complex(ta)), cMul(besselI1Complex(ta), besselK1Complex(tb)));
        const z = cMul(cScale(tau, rho / (2 * Math.PI * b)), cDiv(num, den));
        const r = tubeAcResistance({ outerDiameter: od, wallThickness: b - a, frequency: f, resistivity: rho });
        expect(Math.abs(r / z.re - 1)).toBeLessThan(1e-10);
      }),
      { seed: 1, numRuns: 200 },
    );
  });
});
