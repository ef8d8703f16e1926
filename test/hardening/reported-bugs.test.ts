/**
 * One test per wrong answer reported in the adversarial review of the public surface; each
 * would have caught it. Outside references are named beside the assertions.
 */
import { describe, expect, it } from "vitest";
import {
  InputError,
  celsius,
  fieldNearCoil,
  fieldOnAxis,
  lumpedHeatUp,
  optimalLitzStrandCount,
  parseQuantity,
  steadyStateTemperature,
  HeaterDescriptionError,
  integrateAdaptive,
  integrateToInfinity,
  logSpacedFrequencies,
  readHeaterDescription,
  roundWireAcRatioSweep,
  safetyCautions,
  seriesTank,
  sinusoidalFluxWaveform,
  SI_PREFIXES,
  tankImpedanceSweep,
} from "../../src/index.js";
import { loadExample } from "../study/cases.js";

describe("reported wrong answers", () => {
  it("parseQuantity refuses a Celsius text below absolute zero, as celsius() does", () => {
    expect(() => celsius(-300)).toThrow(InputError);
    expect(() => parseQuantity("-300 °C", "K")).toThrow(InputError);
    // −273.15 °C is absolute zero exactly (SI Brochure, 9th ed., 2.3.1)
    expect(parseQuantity("-273.15 °C", "K")).toBeCloseTo(0, 12);
  });

  it("steadyStateTemperature refuses a balance above 1e6 K instead of returning ambient or 7.7e52 K", () => {
    const base = { surfaceArea: 0.01, convectionCoefficient: 10, emissivity: 0.5, ambientTemperature: 293.15 };
    expect(() => steadyStateTemperature({ ...base, power: 1e300 })).toThrow(InputError);
    expect(() => steadyStateTemperature({ ...base, emissivity: 0, power: 1e6 })).toThrow(InputError); // 1e7 K by Newton's law
    // Newton's law of cooling alone: T = Ta + P/(hA) (closed form)
    expect(steadyStateTemperature({ ...base, emissivity: 0, power: 50 })).toBeCloseTo(293.15 + 50 / (10 * 0.01), 9);
  });

  it("lumpedHeatUp balances energy to 1e-6 for a 1000 kg part with a nano-kelvin rise", () => {
    const r = lumpedHeatUp({
      mass: 1000,
      specificHeat: 460,
      power: 1e-6,
      surfaceArea: 1,
      convectionCoefficient: 10,
      emissivity: 0.5,
      ambientTemperature: 293.15,
      duration: 10,
    });
    expect(Math.abs(r.energy.imbalance)).toBeLessThanOrEqual(1e-6 * r.energy.input);
    // energy conservation: input P·t = 1e-5 J (closed form), stored m·c·ΔT within the losses (< 1e-3 of it)
    expect(r.energy.input).toBeCloseTo(1e-5, 17);
    expect(Math.abs(r.energy.stored - 1e-5)).toBeLessThan(1e-3 * 1e-5);
  });

  it("lumpedHeatUp and steadyStateTemperature refuse a negative absorbed power from powerAt", () => {
    const base = { surfaceArea: 0.01, convectionCoefficient: 0, emissivity: 0, ambientTemperature: 293.15 };
    expect(() => lumpedHeatUp({ ...base, mass: 1, specificHeat: 460, powerAt: () => -1, duration: 1e6 })).toThrow(/powerAt/);
    expect(() => steadyStateTemperature({ ...base, convectionCoefficient: 10, powerAt: () => -1 })).toThrow(/powerAt/);
  });

  it("optimalLitzStrandCount returns a representable integer no bundle wider than the window exceeds", () => {
    // 0.1 mm strands in a 20 mm window: hexagonal packing π/(2√3) (Lagrange 1773, Thue 1910)
    // bounds the count at floor(0.9069 × 200²) = 36275, where the unconstrained optimum at 50 Hz is 7.6e7
    const at50Hz = optimalLitzStrandCount({ strandDiameter: 0.1e-3, turns: 20, windowBreadth: 20e-3, frequency: 50, resistivity: 1.7241e-8 });
    expect(at50Hz).toBe(Math.floor((Math.PI / (2 * Math.sqrt(3))) * 200 * 200));
    const tiny = optimalLitzStrandCount({ strandDiameter: 1e-9, turns: 1, windowBreadth: 1e-3, frequency: 1, resistivity: 1e-6 });
    expect(Number.isSafeInteger(tiny)).toBe(true);
    expect(() => optimalLitzStrandCount({ strandDiameter: 1e-12, turns: 1, windowBreadth: 1, frequency: 1, resistivity: 1e-6 })).toThrow(InputError);
  });

  it("fieldOnAxis and fieldNearCoil refuse 1e9 turns at once instead of running out of memory", () => {
    const start = performance.now();
    expect(() => fieldOnAxis({ coil: { kind: "solenoid", radius: 0.05, length: 0.1, turns: 1e9 }, current: 1, axialPosition: 0 })).toThrow(/at most 100000|between 1 and 100000/);
    expect(() => fieldNearCoil({ kind: "spiral", innerRadius: 0, outerRadius: 0.1, turns: 1e7 }, 1, { radialDistance: 0, axialPosition: 0.01 })).toThrow(InputError);
    expect(performance.now() - start).toBeLessThan(100);
  });

  it("fieldOnAxis at its edge (1e5 turns) stays within 1 s and matches the finite-solenoid closed form", () => {
    const start = performance.now();
    const b = fieldOnAxis({ coil: { kind: "solenoid", radius: 0.05, length: 0.1, turns: 100_000 }, current: 1e-3, axialPosition: 0 });
    expect(performance.now() - start).toBeLessThan(1000);
    // centre of a finite current sheet: B = µ0 n I · (L/2)/√((L/2)² + a²) (Jackson §5.5 / any text)
    const mu0 = 1.25663706212e-6;
    const sheet = mu0 * (100_000 / 0.1) * 1e-3 * (0.05 / Math.hypot(0.05, 0.05));
    expect(Math.abs(b / sheet - 1)).toBeLessThan(1e-8);
  });

  it("errors name the field the caller wrote", () => {
    expect(() => safetyCautions({ tankVoltageRms: Number.NaN })).toThrow(/^safetyCautions: tankVoltageRms must be/);
    expect(() => safetyCautions({ surfaceTemperature: Number.NaN })).toThrow(/^safetyCautions: surfaceTemperature must be/);
    expect(() => integrateAdaptive(Math.sin, 0, 1, null as never)).toThrow(InputError);
    expect(() => integrateToInfinity((x) => Math.exp(-x), 0, null as never)).toThrow(InputError);
  });

  it("huge array requests get an InputError naming the limit, not a plain RangeError", () => {
    const tank = seriesTank({ inductance: 1e-4, capacitance: 1e-6, resistance: 0.5 });
    expect(() => logSpacedFrequencies(1, 10, 1e12)).toThrow(InputError);
    expect(() => sinusoidalFluxWaveform({ fluxDensityPeak: 0.1, frequency: 1e3, samples: 1e12 })).toThrow(InputError);
    for (const length of [2 ** 40, -1, 1.5]) {
      expect(() => tankImpedanceSweep(tank, { length })).toThrow(InputError);
      expect(() => roundWireAcRatioSweep({ diameter: 1e-3, frequencies: { length }, resistivity: 1.7e-8 })).toThrow(InputError);
    }
  });

  it("a study file with 100 000 unknown fields stops after a few hundred problems, quickly", () => {
    const d = loadExample("study-bearing-race.json");
    const coil = { ...(d.coil as unknown as Record<string, unknown>) };
    for (let i = 0; i < 100_000; i++) coil[`extra${i}`] = i;
    const start = performance.now();
    let problems = 0;
    try {
      readHeaterDescription({ ...d, coil });
    } catch (e) {
      expect(e).toBeInstanceOf(HeaterDescriptionError);
      problems = (e as InstanceType<typeof HeaterDescriptionError>).problems.length;
    }
    expect(problems).toBeGreaterThan(100);
    expect(problems).toBeLessThanOrEqual(201);
    expect(performance.now() - start).toBeLessThan(2000);
  });

  it("SI_PREFIXES entries are frozen like every other exported object", () => {
    for (const p of SI_PREFIXES) expect(Object.isFrozen(p)).toBe(true);
  });
});
