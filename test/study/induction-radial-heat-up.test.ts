import { describe, expect, it } from "vitest";
import {
  austeniticStainless,
  barInLongCoil,
  celsius,
  inductionRadialHeatUp,
  InputError,
  lowCarbonSteel,
  resistivityAt,
  specificEnthalpyChange,
  tubeInLongCoil,
} from "../../src/index.js";
import type { ConductiveMaterial, InductionRadialHeatUpResult } from "../../src/index.js";

const coil = { innerRadius: 0.025, length: 0.2, turns: 40 };
const surroundings = { convectionCoefficient: 10, emissivity: 0.8, ambientTemperature: celsius(20) };

/** Enthalpy stored in the part [J], from the exact enthalpy of the material model per control volume. */
function storedEnthalpy(r: InductionRadialHeatUpResult, material: ConductiveMaterial, initial: number, outer: number): number {
  const x = r.positions;
  const n = x.length - 1;
  let sum = 0;
  for (let i = 0; i <= n; i++) {
    const a = i === 0 ? x[0]! : 0.5 * (x[i - 1]! + x[i]!);
    const b = i === n ? outer : 0.5 * (x[i]! + x[i + 1]!);
    const mass = material.density * Math.PI * (b * b - a * a) * coil.length;
    sum += mass * specificEnthalpyChange(material, { fromTemperature: initial, toTemperature: r.finalTemperatures[i]! });
  }
  return sum;
}

describe("inductionRadialHeatUp: energy balance (electrical power in = stored enthalpy + surface losses)", () => {
  it.each([
    ["magnetic steel bar through Curie", lowCarbonSteel, { shape: "bar" as const, radius: 0.015 }],
    ["stainless tube", austeniticStainless, { shape: "tube" as const, radius: 0.015, innerRadius: 0.01 }],
  ])("%s: within 2e-3 of the input, enthalpy from specificEnthalpyChange", (_label, material, part) => {
    const initial = celsius(20);
    const r = inductionRadialHeatUp({
      part,
      material,
      coil,
      frequency: 1e4,
      coilCurrentRms: 250,
      ...surroundings,
      duration: 300,
      targetTemperature: celsius(900),
      targetLocation: "surface",
    });
    expect(r.heatingTime).not.toBeNull();
    const stored = storedEnthalpy(r, material, initial, part.radius);
    // scheme's own bookkeeping closes to rounding
    expect(Math.abs(r.partEnergy.imbalance)).toBeLessThan(1e-9 * r.partEnergy.input);
    // against the exact enthalpy of the final profile: time discretisation of c(T) only
    expect(Math.abs(r.partEnergy.input - stored - r.partEnergy.lost) / r.partEnergy.input).toBeLessThan(2e-3);
    // the input is the time integral of the electrical power samples (held between solutions)
    expect(r.partEnergy.input).toBeGreaterThan(0);
  });
});

describe("inductionRadialHeatUp: at a uniform temperature the power is the uniform exact Bessel solution", () => {
  it("stainless bar: first power = barInLongCoil(ρ(T0), μr = 1)·I² within 1e-12", () => {
    const r = inductionRadialHeatUp({
      part: { shape: "bar", radius: 0.015 },
      material: austeniticStainless,
      coil,
      frequency: 2e4,
      coilCurrentRms: 100,
      ...surroundings,
      duration: 1,
    });
    const ref = barInLongCoil({
      coil,
      bar: { radius: 0.015, resistivity: resistivityAt(austeniticStainless, celsius(20)), relativePermeability: 1 },
      frequency: 2e4,
    });
    expect(Math.abs(r.electrical.power[0]! / (ref.reflectedResistance * 100 * 100) - 1)).toBeLessThan(1e-12);
    expect(Math.abs(r.electrical.inductanceChange[0]! / ref.inductanceChange - 1)).toBeLessThan(1e-10);
  });
  it("stainless tube: first power = tubeInLongCoil within 1e-12", () => {
    const r = inductionRadialHeatUp({
      part: { shape: "tube", radius: 0.015, innerRadius: 0.012 },
      material: austeniticStainless,
      coil,
      frequency: 2e4,
      coilCurrentRms: 100,
      ...surroundings,
      duration: 1,
    });
    const ref = tubeInLongCoil({
      coil,
      tube: { outerRadius: 0.015, innerRadius: 0.012, resistivity: resistivityAt(austeniticStainless, celsius(20)), relativePermeability: 1 },
      frequency: 2e4,
    });
    expect(Math.abs(r.electrical.power[0]! / (ref.reflectedResistance * 100 * 100) - 1)).toBeLessThan(1e-12);
  });
});

describe("inductionRadialHeatUp: drives, targets and results", () => {
  const base = {
    part: { shape: "bar" as const, radius: 0.015 },
    material: lowCarbonSteel,
    coil,
    ...surroundings,
    duration: 300,
  };
  it("held power: every field solution absorbs the requested power (1e-9)", () => {
    const r = inductionRadialHeatUp({ ...base, frequency: 1e4, power: 15000, targetTemperature: celsius(700) });
    for (const p of r.electrical.power) expect(Math.abs(p / 15000 - 1)).toBeLessThan(1e-9);
    expect(r.heatingTime).not.toBeNull();
  });
  it("driveAt: the callback sees the state and sets frequency and current", () => {
    const seen: number[] = [];
    const r = inductionRadialHeatUp({
      ...base,
      driveAt: (s) => {
        seen.push(s.surfaceTemperature);
        return { frequency: s.surfaceTemperature > celsius(700) ? 1.2e4 : 1e4, coilCurrentRms: 250 };
      },
      targetTemperature: celsius(900),
      targetLocation: "surface",
    });
    expect(seen.length).toBeGreaterThan(10);
    expect(r.electrical.frequency).toContain(1.2e4);
  });
  it("the target applies to the chosen temperature: surface first, then mean, then core", () => {
    const at = (targetLocation: "surface" | "mean" | "core") =>
      inductionRadialHeatUp({ ...base, frequency: 1e4, coilCurrentRms: 250, targetTemperature: celsius(850), targetLocation }).heatingTime!;
    const surface = at("surface");
    const mean = at("mean");
    const core = at("core");
    expect(surface).toBeLessThan(mean);
    expect(mean).toBeLessThan(core);
  });
  it("reports the surface-to-core difference at target, the soak time and the hardening depth, with a hot-surface caution", () => {
    const r = inductionRadialHeatUp({
      ...base,
      frequency: 1e4,
      coilCurrentRms: 250,
      targetTemperature: celsius(900),
      targetLocation: "surface",
      soakBand: 25,
      hardeningTemperature: celsius(880),
    });
    expect(r.surfaceCoreDifferenceAtStop!).toBeGreaterThan(25);
    expect(r.soakTime!).toBeGreaterThan(0);
    // soaking carries the peak temperature through the section; without the soak (quench at target) it stays in a case
    expect(r.hardeningDepth!).toBeGreaterThan(0);
    const quenched = inductionRadialHeatUp({
      ...base,
      frequency: 1e4,
      coilCurrentRms: 250,
      targetTemperature: celsius(900),
      targetLocation: "surface",
      hardeningTemperature: celsius(880),
    });
    expect(quenched.hardeningDepth!).toBeGreaterThan(0);
    expect(quenched.hardeningDepth!).toBeLessThan(0.015);
    expect(quenched.hardeningDepth!).toBeLessThanOrEqual(r.hardeningDepth!);
    expect(r.cautions.map((c) => c.code)).toContain("hot-surface-burn");
    // the magnetic bar loses its permeability at Curie: the surface shell's μr ends at 1
    expect(r.electrical.surfacePermeability[0]!).toBeGreaterThan(5);
    expect(r.electrical.surfacePermeability.at(-1)).toBe(1);
  });
  it("rejects unknown keys, two drives, no drive, a part wider than the coil bore", () => {
    expect(() => inductionRadialHeatUp({ ...base, frequency: 1e4, coilCurrentRms: 1, targetLocaton: "core" } as never)).toThrow(/did you mean "targetLocation"/);
    expect(() => inductionRadialHeatUp({ ...base, frequency: 1e4, coilCurrentRms: 1, power: 5 })).toThrow(InputError);
    expect(() => inductionRadialHeatUp({ ...base, frequency: 1e4 })).toThrow(InputError);
    expect(() => inductionRadialHeatUp({ ...base, driveAt: () => ({ frequency: 1e4, coilCurrentRms: 1 }), frequency: 1e4 })).toThrow(InputError);
    expect(() => inductionRadialHeatUp({ ...base, driveAt: () => ({ frequency: -1, coilCurrentRms: 1 }) })).toThrow(InputError);
    expect(() => inductionRadialHeatUp({ ...base, part: { shape: "bar", radius: 0.03 }, frequency: 1e4, coilCurrentRms: 1 })).toThrow(InputError);
    expect(() => inductionRadialHeatUp({ ...base, part: { shape: "tube", radius: 0.01, innerRadius: 0.01 }, frequency: 1e4, coilCurrentRms: 1 })).toThrow(InputError);
  });
  it("the TSDoc example", () => {
    const r = inductionRadialHeatUp({
      part: { shape: "bar", radius: 0.015 },
      material: lowCarbonSteel,
      coil: { innerRadius: 0.025, length: 0.2, turns: 40 },
      frequency: 1e4,
      coilCurrentRms: 600,
      convectionCoefficient: 10,
      emissivity: 0.8,
      ambientTemperature: celsius(20),
      duration: 120,
      targetTemperature: celsius(900),
      targetLocation: "surface",
    });
    expect(r.heatingTime !== null && r.surfaceCoreDifferenceAtStop! > 0).toBe(true);
  });
});

describe("inductionRadialHeatUp: the default re-solve step and time tolerance against a finer run (better method: same model, 8× finer re-solve, 20× tighter tolerance)", () => {
  it("heating time within 0.3 %, surface-to-core difference within 0.5 K", () => {
    const run = (fine: boolean) =>
      inductionRadialHeatUp({
        part: { shape: "bar", radius: 0.015 },
        material: lowCarbonSteel,
        coil,
        frequency: 1e4,
        coilCurrentRms: 250,
        ...surroundings,
        duration: 300,
        targetTemperature: celsius(900),
        targetLocation: "surface",
        ...(fine ? { resolveStep: 0.25, temperatureTolerance: 0.01 } : {}),
      });
    const coarse = run(false);
    const fine = run(true);
    expect(Math.abs(coarse.heatingTime! / fine.heatingTime! - 1)).toBeLessThan(3e-3);
    expect(Math.abs(coarse.surfaceCoreDifferenceAtStop! - fine.surfaceCoreDifferenceAtStop!)).toBeLessThan(0.5);
  });
});
