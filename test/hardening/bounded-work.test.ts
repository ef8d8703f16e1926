/**
 * Valid-looking input must not run for minutes or exhaust memory: each function whose cost grows
 * with its input either bounds the cost or refuses beyond a stated limit. Each case is checked
 * just inside the limit (under a time limit, with a physical cross-check where one is cheap) and
 * just beyond it (an InputError that names the limit, at once). Time limits are generous (CI
 * machines are shared); the costs stated in the TSDoc are measured on an idle core.
 */
import { describe, expect, it } from "vitest";
import {
  InputError,
  coaxialCoilMutualInductance,
  leadImpedance,
  coilOverPlate,
  coilOverPlateTruncatedRegion,
  encirclingCoilOverRod,
  lumpedHeatUp,
  multilayerCoilInductance,
  spiralCoilInductance,
  spiralCoilInductanceMohan,
  studyHeater,
} from "../../src/index.js";
import { loadExample } from "../study/cases.js";

function timed<T>(f: () => T): { value: T; seconds: number } {
  const start = performance.now();
  const value = f();
  return { value, seconds: (performance.now() - start) / 1000 };
}

function refusedQuickly(f: () => unknown, pattern: RegExp): void {
  const start = performance.now();
  expect(f).toThrow(InputError);
  expect(f).toThrow(pattern);
  expect(performance.now() - start).toBeLessThan(200);
}

describe("bounded work", () => {
  it("spiralCoilInductance: 3000 turns within seconds, 30 000 refused", () => {
    const spiral = { innerRadius: 0.01, outerRadius: 0.1, wireDiameter: 1e-6 };
    const { value, seconds } = timed(() => spiralCoilInductance({ ...spiral, turns: 3000 }));
    expect(seconds).toBeLessThan(5);
    // Mohan et al. (1999) current-sheet expression agrees within a few per cent for dense spirals
    expect(Math.abs(value / spiralCoilInductanceMohan({ ...spiral, turns: 3000 }) - 1)).toBeLessThan(0.1);
    refusedQuickly(() => spiralCoilInductance({ ...spiral, turns: 30_000 }), /between 1 and 3000/);
  });

  it("coaxialCoilMutualInductance: two 3000-turn spirals within seconds, 3001 turns refused", () => {
    const a = { kind: "flatSpiral" as const, innerTurnRadius: 0.01, outerTurnRadius: 0.04, turns: 3000 };
    const b = { kind: "flatSpiral" as const, innerTurnRadius: 0.012, outerTurnRadius: 0.05, turns: 3000 };
    const { seconds } = timed(() => coaxialCoilMutualInductance(a, b, 0.015));
    expect(seconds).toBeLessThan(10);
    refusedQuickly(() => coaxialCoilMutualInductance({ ...a, turns: 3001 }, b, 0.015), /between 1 and 3000/);
    refusedQuickly(() => coaxialCoilMutualInductance({ ...a, turns: 1.2e301 }, b, 0.015), /coilA\.turns/);
  });

  it("leadImpedance: a radius of 1e6 skin depths within a second, higher frequencies refused", () => {
    const coax = { shape: "coaxial" as const, innerDiameter: 6e-3, returnInnerDiameter: 12e-3, returnWallThickness: 1e-3 };
    const rho = 1.7241e-8;
    // the return tube's outer radius, 7 mm, at just under 1e6 skin depths: δ = 7e-9 m
    const f = rho / (Math.PI * 4e-7 * Math.PI * 7.0001e-9 ** 2);
    const { seconds } = timed(() => leadImpedance({ lead: coax, length: 0.4, frequency: f, resistivity: rho }));
    expect(seconds).toBeLessThan(1);
    refusedQuickly(() => leadImpedance({ lead: coax, length: 0.4, frequency: 1e300, resistivity: rho }), /frequency.*skin depth/);
    refusedQuickly(() => leadImpedance({ lead: { shape: "round-pair", diameter: 6e-3, spacing: 12e-3 }, length: 0.4, frequency: 1e20, resistivity: rho }), /frequency.*skin depth/);
  });

  it("multilayerCoilInductance: length 1e-4 outer radii within seconds, thinner refused", () => {
    const { seconds } = timed(() => multilayerCoilInductance({ innerRadius: 1e-3, outerRadius: 1, length: 1e-4, turns: 10 }));
    expect(seconds).toBeLessThan(10);
    refusedQuickly(() => multilayerCoilInductance({ innerRadius: 1e-3, outerRadius: 1, length: 1e-6, turns: 10 }), /at least 0\.0001 × outerRadius/);
  });

  it("coilOverPlateTruncatedRegion: lift-off 20 radii within seconds and close to coilOverPlate, 300 refused", () => {
    const base = { plate: { thickness: 0.005, resistivity: 2e-7, relativePermeability: 1 }, frequency: 1e4 };
    const coil = { innerRadius: 0.01, outerRadius: 0.02, length: 0.005, turns: 10 };
    const { value, seconds } = timed(() => coilOverPlateTruncatedRegion({ ...base, coil: { ...coil, liftOff: 0.4 } }));
    expect(seconds).toBeLessThan(10);
    const open = coilOverPlate({ ...base, coil: { ...coil, liftOff: 0.4 } });
    expect(Math.abs(value.reflectedResistance / open.reflectedResistance - 1)).toBeLessThan(1e-3);
    refusedQuickly(() => coilOverPlateTruncatedRegion({ ...base, coil: { ...coil, liftOff: 6 } }), /at most 20 × coil\.outerRadius/);
  });

  it("encirclingCoilOverRod: a gap of 1/2000 of the coil length within seconds, a µm gap refused", () => {
    const rod = { radius: 0.05, resistivity: 2e-7, relativePermeability: 1 };
    const { seconds } = timed(() => encirclingCoilOverRod({ coil: { innerRadius: 0.05 + 1.23 / 1900, outerRadius: 0.06, length: 1.23, turns: 10 }, rod, frequency: 1e4 }));
    expect(seconds).toBeLessThan(10);
    refusedQuickly(() => encirclingCoilOverRod({ coil: { innerRadius: 0.0500012, outerRadius: 0.06, length: 1.23, turns: 10 }, rod, frequency: 1e4 }), /coil\.length\/2000/);
  });

  it("lumpedHeatUp: 1e5 time constants within seconds, longer refused", () => {
    const part = { mass: 0.01, specificHeat: 460, power: 100, surfaceArea: 0.01, convectionCoefficient: 50, emissivity: 0.5, ambientTemperature: 293.15 };
    const probe = lumpedHeatUp({ ...part, duration: 1 });
    const tau = probe.timeConstant!;
    const { value, seconds } = timed(() => lumpedHeatUp({ ...part, duration: 0.9e5 * tau }));
    expect(seconds).toBeLessThan(10);
    expect(value.finalTemperature).toBeCloseTo(value.steadyStateTemperature!, 6);
    refusedQuickly(() => lumpedHeatUp({ ...part, duration: 1e8 }), /at most 100000 time constants/);
  });

  it("studyHeater: heatUpPoints above 1000 refused", () => {
    refusedQuickly(() => studyHeater(loadExample("study-bearing-race.json"), { heatUpPoints: 1e6 }), /between 4 and 1000/);
  });
});
