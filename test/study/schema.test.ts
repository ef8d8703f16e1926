import { describe, it, expect } from "vitest";
import { readFileSync } from "node:fs";
import { InputError, readHeaterDescription } from "../../src/index.js";
import { loadExample, MALFORMED, mutate } from "./cases.js";
import { checkSchema } from "./schema-check.js";

const schema = JSON.parse(readFileSync(new URL("../../docs/heater-study.schema.json", import.meta.url), "utf8")) as Record<string, unknown>;
const accepts = (v: unknown): boolean => {
  try {
    readHeaterDescription(v, { requireUnits: true });
    return true;
  } catch (e) {
    if (!(e instanceof InputError)) throw e; // only a reported rejection counts as "not accepted"
    return false;
  }
};

describe("the generated JSON Schema agrees with readHeaterDescription", () => {
  for (const file of ["study-bearing-race.json", "study-plate-warmer.json", "study-forging-bar.json"] as const) {
    it(`both accept the demo file ${file}`, () => {
      const example = loadExample(file);
      expect(checkSchema(schema, example)).toEqual([]);
      expect(accepts(example)).toBe(true);
    });
  }

  for (const c of MALFORMED.filter((m) => m.schema)) {
    it(`both reject ${c.fault}: ${c.path} = ${JSON.stringify(c.value) ?? "(deleted)"}`, () => {
      const input = mutate(loadExample(c.file), c.path, c.value);
      expect(checkSchema(schema, input).length).toBeGreaterThan(0);
      expect(accepts(input)).toBe(false);
    });
  }

  it("consistency faults are the reader's alone (the schema cannot express them) and the reader catches them", () => {
    for (const c of MALFORMED.filter((m) => !m.schema)) expect(accepts(mutate(loadExample(c.file), c.path, c.value))).toBe(false);
  });

  it("both refuse a bare number where the field has a dimension (a study file must say its unit)", () => {
    const race = loadExample("study-bearing-race.json");
    for (const [path, value] of [["coil.radius", 32], ["part.targetTemperature", 1150], ["capacitor.capacitance", "2.2"], ["environment.convectionCoefficient", 10]] as const) {
      const input = mutate(race, path, value);
      expect(checkSchema(schema, input).length, path).toBeGreaterThan(0);
      expect(accepts(input), path).toBe(false);
    }
  });

  it("both accept the variants the demo files do not use", () => {
    const race = loadExample("study-bearing-race.json");
    const variants: [string, unknown][] = [
      ["coil.conductor", { kind: "solid", diameter: "4 mm" }],
      ["coil.conductor", { kind: "litz", strands: 400, strandDiameter: "0.1 mm", material: "copper" }],
      ["part", { shape: "bar", material: "mediumCarbonSteel", radius: "20 mm", length: "100 mm", targetTemperature: "900 °C" }],
      ["part", { shape: "tube", material: "austeniticStainless", outerRadius: "30 mm", wallThickness: "3 mm", length: "60 mm", targetTemperature: "473.15 K" }],
      ["inverter", { kind: "voltage-fed-series", bridge: "half", control: "fixed", frequency: "40 kHz", switchOnResistance: "0.01 ohm" }],
      ["supply", { kind: "dc-bus", voltage: "60 V" }],
      ["coil.conductor", { kind: "solid", diameter: "0.125 in" }],
      ["environment", { convectionCoefficient: "25 W/(m2·K)" }],
    ];
    for (const [path, value] of variants) {
      const input = mutate(race, path, value);
      expect(checkSchema(schema, input), path).toEqual([]);
      expect(accepts(input), path).toBe(true);
    }
  });
});
