import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { lumpedHeatUp, steadyStateTemperature, STEFAN_BOLTZMANN } from "../../src/index.js";
import { logUniform } from "../support/arbitraries.js";

const part = fc.record({
  mass: logUniform(0.01, 10),
  specificHeat: logUniform(300, 1000),
  power: logUniform(10, 5000),
  surfaceArea: logUniform(1e-3, 0.3),
  convectionCoefficient: logUniform(2, 100),
  emissivity: fc.double({ min: 0, max: 1, noNaN: true, noDefaultInfinity: true }),
  // steady states above 1e6 K are refused (documented): keep the convective bound below that
}).filter((o) => o.power / (o.convectionCoefficient * o.surfaceArea) < 5e5);
const ambientTemperature = 293.15;

/** Independent second method: t = ∫ m c / (P − loss(T)) dT by composite Gauss–Legendre. */
function timeByQuadrature(o: { mass: number; specificHeat: number; power: number; surfaceArea: number; convectionCoefficient: number; emissivity: number }, target: number): number {
  const f = (t: number): number =>
    (o.mass * o.specificHeat) /
    (o.power - o.surfaceArea * (o.convectionCoefficient * (t - ambientTemperature) + o.emissivity * STEFAN_BOLTZMANN * (t ** 4 - ambientTemperature ** 4)));
  const nodes = [-0.906179845938664, -0.5384693101056831, 0, 0.5384693101056831, 0.906179845938664];
  const weights = [0.2369268850561891, 0.4786286704993665, 0.5688888888888889, 0.4786286704993665, 0.2369268850561891];
  const pieces = 400;
  let sum = 0;
  const h = (target - ambientTemperature) / pieces;
  for (let p = 0; p < pieces; p++) {
    const c = ambientTemperature + (p + 0.5) * h;
    for (let i = 0; i < 5; i++) sum += weights[i]! * f(c + 0.5 * h * nodes[i]!);
  }
  return 0.5 * h * sum;
}

/** The fields of a part that steadyStateTemperature takes (it rejects mass and specific heat). */
function steadyOptions(o: { power: number; surfaceArea: number; convectionCoefficient: number; emissivity: number }) {
  return { power: o.power, surfaceArea: o.surfaceArea, convectionCoefficient: o.convectionCoefficient, emissivity: o.emissivity };
}

describe("lumpedHeatUp properties", () => {
  it("time to target agrees with the quadrature ∫ mc/(P − loss) dT (two methods) within 1e-7", () => {
    fc.assert(
      fc.property(part, fc.double({ min: 0.05, max: 0.8, noNaN: true, noDefaultInfinity: true }), (o, fraction) => {
        const steady = steadyStateTemperature({ ...steadyOptions(o), ambientTemperature });
        const target = ambientTemperature + fraction * (steady - ambientTemperature);
        const r = lumpedHeatUp({ ...o, ambientTemperature, targetTemperature: target });
        expect(r.reachable).toBe(true);
        expect(Math.abs(r.timeToTarget! / timeByQuadrature(o, target) - 1)).toBeLessThan(1e-7);
      }),
      { seed: 1, numRuns: 50 },
    );
  });

  it("more power → shorter time to a target", () => {
    fc.assert(
      fc.property(part, logUniform(1.01, 10), (o, factor) => {
        const target = ambientTemperature + 0.3 * (steadyStateTemperature({ ...steadyOptions(o), ambientTemperature }) - ambientTemperature);
        const slow = lumpedHeatUp({ ...o, ambientTemperature, targetTemperature: target });
        const fast = lumpedHeatUp({ ...o, power: o.power * factor, ambientTemperature, targetTemperature: target });
        expect(fast.timeToTarget!).toBeLessThan(slow.timeToTarget!);
      }),
      { seed: 1, numRuns: 50 },
    );
  });

  it("time to target rises with the target", () => {
    fc.assert(
      fc.property(part, fc.double({ min: 0.05, max: 0.45, noNaN: true, noDefaultInfinity: true }), (o, fraction) => {
        const span = steadyStateTemperature({ ...steadyOptions(o), ambientTemperature }) - ambientTemperature;
        const near = lumpedHeatUp({ ...o, ambientTemperature, targetTemperature: ambientTemperature + fraction * span });
        const far = lumpedHeatUp({ ...o, ambientTemperature, targetTemperature: ambientTemperature + 2 * fraction * span });
        expect(far.timeToTarget!).toBeGreaterThan(near.timeToTarget!);
      }),
      { seed: 1, numRuns: 50 },
    );
  });

  it("more area or more convection → lower steady state", () => {
    fc.assert(
      fc.property(part, logUniform(1.01, 10), (o, factor) => {
        const t = steadyStateTemperature({ ...steadyOptions(o), ambientTemperature });
        expect(steadyStateTemperature({ ...steadyOptions(o), surfaceArea: o.surfaceArea * factor, ambientTemperature })).toBeLessThan(t);
        expect(steadyStateTemperature({ ...steadyOptions(o), convectionCoefficient: o.convectionCoefficient * factor, ambientTemperature })).toBeLessThan(t);
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("energy balance closes to 1e-6 of the input", () => {
    fc.assert(
      fc.property(part, logUniform(1, 3000), (o, duration) => {
        const r = lumpedHeatUp({ ...o, ambientTemperature, duration });
        expect(Math.abs(r.energy.imbalance)).toBeLessThanOrEqual(1e-6 * r.energy.input);
      }),
      { seed: 1, numRuns: 50 },
    );
  });

  it("scaling mass, power and area together leaves the curve unchanged", () => {
    fc.assert(
      fc.property(part, logUniform(0.1, 10), (o, k) => {
        const a = lumpedHeatUp({ ...o, ambientTemperature, duration: 100 });
        const b = lumpedHeatUp({ ...o, mass: o.mass * k, power: o.power * k, surfaceArea: o.surfaceArea * k, ambientTemperature, duration: 100 });
        expect(Math.abs(b.finalTemperature - a.finalTemperature)).toBeLessThan(1e-7 * a.finalTemperature);
      }),
      { seed: 1, numRuns: 50 },
    );
  });

  it("temperatures stay between the start and the steady state (no overshoot)", () => {
    fc.assert(
      fc.property(part, logUniform(1, 3000), (o, duration) => {
        const r = lumpedHeatUp({ ...o, ambientTemperature, duration });
        const steady = r.steadyStateTemperature!;
        for (const t of r.temperatures) {
          expect(t).toBeGreaterThanOrEqual(ambientTemperature - 1e-9);
          expect(t).toBeLessThanOrEqual(steady + 1e-6);
        }
      }),
      { seed: 1, numRuns: 50 },
    );
  });
});
