import { describe, expect, it } from "vitest";
import {
  copper,
  InputError,
  lowCarbonSteel,
  relativePermeabilityAt,
  resistivityAt,
  saturationFluxDensityAt,
  specificEnthalpyChange,
  specificHeatAt,
  thermalConductivityAt,
  wireDcResistanceAt,
} from "../../src/index.js";
import type { ConductiveMaterial } from "../../src/index.js";

// A material of the caller's own is allowed ("one of the exported sets, or one of your own").
// Before, a missing or non-finite field of it came back as NaN (or a TypeError for a missing
// model object); now the reader throws InputError naming the field.

function thrownBy(fn: () => unknown): InputError {
  try {
    fn();
  } catch (e) {
    if (e instanceof InputError) return e;
    throw new Error(`expected an InputError, got ${String(e)}`, { cause: e });
  }
  throw new Error("expected an InputError, got a result");
}

function withField(base: ConductiveMaterial, path: string, value: unknown): ConductiveMaterial {
  const keys = path.split(".");
  const set = (node: unknown, i: number): unknown => {
    if (i === keys.length) return value;
    const rec = node as Record<string, unknown>;
    const key = keys[i] as string;
    if (Array.isArray(rec)) {
      const copy: unknown[] = [...(rec as unknown[])];
      copy[Number(key)] = set(copy[Number(key)], i + 1);
      return copy;
    }
    return { ...rec, [key]: set(rec[key], i + 1) };
  };
  return set(base, 0) as ConductiveMaterial;
}

const BAD = [Number.NaN, Infinity, -1, "1", undefined];

describe("property readers reject a broken material of the caller's own with InputError naming the field", () => {
  const cases: [string, ConductiveMaterial, string, (m: ConductiveMaterial) => unknown][] = [
    ["resistivityAt", copper, "resistivity20", (m) => resistivityAt(m, 373.15)],
    ["resistivityAt", copper, "temperatureRange.max", (m) => resistivityAt(m, 373.15)],
    ["wireDcResistanceAt", copper, "resistivity20", (m) => wireDcResistanceAt({ material: m, temperature: 373.15, length: 1, diameter: 1e-3 })],
    ["thermalConductivityAt", lowCarbonSteel, "thermalConductivityTable.values.2", (m) => thermalConductivityAt(m, 600)],
    ["thermalConductivityAt", lowCarbonSteel, "thermalConductivityTable.temperatures.1", (m) => thermalConductivityAt(m, 600)],
    ["specificHeatAt", lowCarbonSteel, "temperatureRange.min", (m) => specificHeatAt(m, 600)],
    ["specificEnthalpyChange", lowCarbonSteel, "temperatureRange.min", (m) => specificEnthalpyChange(m, { fromTemperature: 300, toTemperature: 900 })],
    ["relativePermeabilityAt", lowCarbonSteel, "permeability.transitionWidth", (m) => relativePermeabilityAt(m, { temperature: 300, fieldStrengthPeak: 1e4 })],
    ["relativePermeabilityAt", lowCarbonSteel, "curieTemperature", (m) => relativePermeabilityAt(m, { temperature: 300 })],
    ["saturationFluxDensityAt", lowCarbonSteel, "permeability.saturationFluxDensity", (m) => saturationFluxDensityAt(m, 300)],
  ];
  for (const [name, base, path, call] of cases) {
    it(`${name}: material.${path} non-finite, negative, text or missing`, () => {
      // a magnetic material without a Curie temperature is read as non-magnetic (documented)
      for (const bad of path === "curieTemperature" ? BAD.filter((v) => v !== undefined) : BAD) {
        const e = thrownBy(() => call(withField(base, path, bad)));
        expect(e.parameter.startsWith(`material.${path.split(".")[0] ?? ""}`)).toBe(true);
      }
    });
  }

  it("a material without its model objects throws InputError, not a TypeError", () => {
    expect(() => resistivityAt({} as ConductiveMaterial, 300)).toThrow(InputError);
    expect(() => specificHeatAt({} as ConductiveMaterial, 300)).toThrow(InputError);
    expect(() => thermalConductivityAt({} as ConductiveMaterial, 300)).toThrow(InputError);
  });

  it("the library's own materials read exactly as before (checks add no change on valid input)", () => {
    // same numbers as the @examples of each reader
    expect(resistivityAt(copper, 373.15)).toBeCloseTo(2.2662e-8, 12);
    expect(thermalConductivityAt(lowCarbonSteel, 293.15)).toBeGreaterThan(0);
    expect(relativePermeabilityAt(lowCarbonSteel, { temperature: 293.15, fieldStrengthPeak: 1e5 }).toFixed(1)).toBe("16.7");
  });
});
