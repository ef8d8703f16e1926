import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { tubeAcResistance, roundWireAcRatio, skinDepth } from "../../src/index.js";

const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log10(lo), max: Math.log10(hi), noNaN: true, noDefaultInfinity: true }).map((e) => 10 ** e);
const rho = 1.7241e-8;

describe("tubeAcResistance properties", () => {
  it("Rac ≥ Rdc of the tube and finite over thin to thick walls", () => {
    fc.assert(
      fc.property(logUniform(1e-3, 0.1), fc.double({ min: 0.001, max: 1, noNaN: true, noDefaultInfinity: true }), logUniform(1, 1e8), (od, frac, f) => {
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
