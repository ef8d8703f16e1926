import { describe, expect, it } from "vitest";
import { InputError, lumpedHeatUp, radialHeatUp } from "../../src/index.js";
import type { RadialGenerationRequest } from "../../src/index.js";

const steel = { density: 7800, specificHeat: 500 };

describe("radialHeatUp: power at the surface only tends to the lumped model as Biot → 0 (lumpedHeatUp, an independent ODE integration)", () => {
  const radius = 0.01;
  const length = 0.1;
  const power = 2000;
  const h = 50;
  const ambient = 293.15;
  const duration = 200;
  const lumped = lumpedHeatUp({
    mass: steel.density * Math.PI * radius * radius * length,
    specificHeat: steel.specificHeat,
    power,
    surfaceArea: 2 * Math.PI * radius * length,
    convectionCoefficient: h,
    emissivity: 0,
    ambientTemperature: ambient,
    duration,
  }).finalTemperature;
  const differences = [1, 10, 100, 1000].map((factor) => {
    const k = 0.5 * factor; // Bi = hR/k = 1, 0.1, 0.01, 0.001
    const r = radialHeatUp({
      geometry: "cylinder",
      radius,
      length,
      power,
      ...steel,
      thermalConductivity: k,
      convectionCoefficient: h,
      emissivity: 0,
      ambientTemperature: ambient,
      duration,
      temperatureTolerance: 1e-4,
    });
    return { bi: (h * radius) / k, difference: Math.abs(r.finalMeanTemperature - lumped) / (lumped - ambient) };
  });
  it("the mean temperature approaches the lumped temperature in proportion to Bi", () => {
    for (let i = 1; i < differences.length; i++) {
      expect(differences[i]!.difference).toBeLessThan(differences[i - 1]!.difference);
    }
    expect(differences[3]!.bi).toBeCloseTo(1e-3, 12);
    expect(differences[3]!.difference).toBeLessThan(1e-3); // Bi = 1e-3: within 0.1 % of the temperature rise
  });
});

describe("radialHeatUp: generationAt, stop, soak and hardening", () => {
  const base = {
    geometry: "cylinder" as const,
    radius: 0.01,
    ...steel,
    thermalConductivity: 40,
    convectionCoefficient: 20,
    emissivity: 0,
    ambientTemperature: 293.15,
    duration: 60,
  };
  // 1 MW/m² of surface generated in the outer 1 mm (W/m² of heated surface per CV)
  const skin = (request: RadialGenerationRequest): void => {
    const f = request.faces;
    const last = f.length - 1;
    let total = 0;
    for (let i = 0; i < request.generation.length; i++) {
      const a = Math.max(f[i]!, f[last]! - 0.001);
      const b = f[i + 1]!;
      const share = b > a ? (b * b - a * a) / (f[last]! ** 2 - (f[last]! - 0.001) ** 2) : 0;
      request.generation[i] = 1e6 * share;
      total += share;
    }
    expect(total).toBeCloseTo(1, 12);
  };
  it("matches the built-in fixed generation for the same surface density (energy input 1e-12)", () => {
    const r = radialHeatUp({ ...base, generationAt: skin, duration: 5 });
    expect(Math.abs(r.energy.input - 5e6) / 5e6).toBeLessThan(1e-12);
    expect(Math.abs(r.energy.imbalance)).toBeLessThan(1e-9 * r.energy.input);
  });
  it("stops on the surface target within the tolerance, reports the difference, and soaks into the band", () => {
    const r = radialHeatUp({
      ...base,
      generationAt: skin,
      targetTemperature: 900,
      stopAt: "surface",
      soakBand: 10,
      duration: 600,
      hardeningTemperature: 880,
    });
    expect(r.heatingTime).not.toBeNull();
    const k = r.times.indexOf(r.heatingTime!);
    expect(Math.abs(r.surfaceTemperatures[k]! - 900)).toBeLessThan(0.005 + 1e-9);
    expect(r.surfaceCoreDifferenceAtStop).toBeCloseTo(r.surfaceTemperatures[k]! - r.coreTemperatures[k]!, 12);
    expect(r.surfaceCoreDifferenceAtStop!).toBeGreaterThan(10);
    expect(r.soakTime).not.toBeNull();
    const end = r.times.length - 1;
    expect(Math.abs(r.surfaceTemperatures[end]! - r.coreTemperatures[end]!)).toBeLessThanOrEqual(10 + 1e-9);
    expect(r.times[end]! - r.heatingTime!).toBeGreaterThanOrEqual(r.soakTime!);
    // no generation after the stop: the input is the heating phase only
    expect(Math.abs(r.energy.imbalance)).toBeLessThan(1e-9 * r.energy.input);
    expect(r.energy.input).toBeCloseTo(1e6 * r.heatingTime!, 3);
    expect(r.hardeningDepth!).toBeGreaterThan(0);
    expect(r.hardeningDepth!).toBeLessThan(0.01);
    for (let i = 1; i < r.hardeningDepths!.length; i++) expect(r.hardeningDepths![i]!).toBeGreaterThanOrEqual(r.hardeningDepths![i - 1]!);
  });
  it("stops on the mean and on the core target", () => {
    const mean = radialHeatUp({ ...base, generationAt: skin, targetTemperature: 600, stopAt: "mean", duration: 600 });
    const k = mean.times.indexOf(mean.heatingTime!);
    expect(Math.abs(mean.meanTemperatures[k]! - 600)).toBeLessThan(0.006);
    expect(Math.abs(mean.timeToMeanTarget! - mean.heatingTime!)).toBeLessThan(1e-4 * mean.heatingTime!);
    const core = radialHeatUp({ ...base, generationAt: skin, targetTemperature: 600, stopAt: "core", duration: 600 });
    expect(core.heatingTime!).toBeGreaterThan(mean.heatingTime!);
    expect(core.timeToSurfaceTarget!).toBeLessThan(mean.timeToMeanTarget!);
  });
  it("a tube: the core is the insulated bore surface and the hardening depth stops at the wall", () => {
    const r = radialHeatUp({ ...base, innerRadius: 0.008, power: 3000, length: 0.1, duration: 60, hardeningTemperature: 400 });
    expect(r.positions[0]).toBe(0.008);
    expect(r.finalCoreTemperature).toBeLessThan(r.finalSurfaceTemperature);
    expect(r.hardeningDepth!).toBeLessThanOrEqual(0.002 + 1e-15);
  });
  it("rejects unknown keys, bad generation and inconsistent options", () => {
    expect(() => radialHeatUp({ ...base, power: 1, length: 0.1, stopat: "mean" } as never)).toThrow(/did you mean "stopAt"/);
    expect(() => radialHeatUp({ ...base, generationAt: (q: RadialGenerationRequest) => q.generation.fill(NaN) })).toThrow(InputError);
    expect(() => radialHeatUp({ ...base, generationAt: skin, power: 5 })).toThrow(InputError);
    expect(() => radialHeatUp({ ...base, power: 1, length: 0.1, stopAt: "mean" })).toThrow(InputError);
    expect(() => radialHeatUp({ ...base, power: 1, length: 0.1, targetTemperature: 400, soakBand: 5 })).toThrow(InputError);
    expect(() => radialHeatUp({ ...base, power: 1, length: 0.1, innerRadius: 0.01 })).toThrow(InputError);
    expect(() => radialHeatUp({ geometry: "slab", thickness: 0.01, innerRadius: 0.001, surfacePowerDensity: 1, ...steel, thermalConductivity: 1, convectionCoefficient: 1, emissivity: 0, ambientTemperature: 300, duration: 1 })).toThrow(InputError);
  });
});

import cj from "../fixtures/thermal/carslaw-jaeger.json" with { type: "json" };

describe("radialHeatUp: Carslaw & Jaeger series for radial conduction with uniform properties (fixture from mpmath, generate_carslaw_jaeger.py)", () => {
  const rtol = cj.meta.rtol;
  it.each(cj.cases.map((c) => [c.label, c] as const))("%s", (_label, c) => {
    const ambient = 293.15;
    const common = {
      geometry: "cylinder" as const,
      radius: c.radius,
      density: c.density,
      specificHeat: c.specificHeat,
      thermalConductivity: c.thermalConductivity,
      convectionCoefficient: c.convectionCoefficient,
      emissivity: 0,
      ambientTemperature: ambient,
      duration: c.time,
      temperatureTolerance: 1e-4,
    };
    const r =
      c.kind === "generation"
        ? radialHeatUp({
            ...common,
            // uniform q (W/m³): per CV and per m² of surface, q·(b² − a²)/(2R)
            generationAt: (q: RadialGenerationRequest) => {
              for (let i = 0; i < q.generation.length; i++) {
                const a = q.faces[i]!;
                const b = q.faces[i + 1]!;
                q.generation[i] = (c.generation * (b * b - a * a)) / (2 * c.radius);
              }
            },
          })
        : radialHeatUp({ ...common, ...(c.innerRadius > 0 ? { innerRadius: c.innerRadius } : {}), surfacePowerDensity: c.surfaceFlux });
    const scale = c.surface; // the surface temperature rise
    expect(Math.abs(r.finalCoreTemperature - ambient - c.core)).toBeLessThan(rtol * scale);
    expect(Math.abs(r.finalSurfaceTemperature - ambient - c.surface)).toBeLessThan(rtol * scale);
    const middle = r.finalTemperatures[30]!; // 60 uniform cells: node 30 is the mid-radius (mid-wall)
    expect(r.positions[30]).toBeCloseTo(c.innerRadius + (c.radius - c.innerRadius) / 2, 12);
    expect(Math.abs(middle - ambient - c.middle)).toBeLessThan(rtol * scale);
  });
});
