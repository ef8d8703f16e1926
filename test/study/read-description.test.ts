import { describe, it, expect } from "vitest";
import { HeaterDescriptionError, InputError, inventedExampleFerrite, lowCarbonSteel, readHeaterDescription, silver } from "../../src/index.js";
import type { ConductorMaterialId, PartMaterialId } from "../../src/index.js";
import { loadExample, MALFORMED, mutate } from "./cases.js";

describe("readHeaterDescription on the demo study files", () => {
  it("reads the bearing-race file into SI numbers, text quantities parsed (°C to K, mΩ, µH)", () => {
    const d = readHeaterDescription(loadExample("study-bearing-race.json"));
    expect(d.supply.voltage).toBe(48);
    expect(d.supply.internalResistance).toBeCloseTo(0.04, 15);
    expect(d.inverter.kind).toBe("current-fed-parallel");
    if (d.inverter.kind === "current-fed-parallel") expect(d.inverter.chokeInductance).toBeCloseTo(1e-4, 18);
    expect(d.part.targetTemperature).toBeCloseTo(393.15, 12);
    expect(d.part.material.id).toBe("lowCarbonSteel");
    expect(d.coil.conductor.material.id).toBe("copper");
  });

  it("fills defaults: ambient 20 °C, convection 10 W/(m²·K), start at ambient, emissivity from the material", () => {
    const d = readHeaterDescription(loadExample("study-plate-warmer.json"));
    expect(d.environment.ambientTemperature).toBeCloseTo(293.15, 12);
    expect(d.environment.convectionCoefficient).toBe(10);
    expect(d.part.startTemperature).toBeCloseTo(293.15, 12);
    expect(d.part.emissivity).toBe(d.part.material.emissivity.typical);
    expect(d.concentrator?.materialId).toBe("inventedExampleFerrite");
  });

  it("accepts plain SI numbers wherever text quantities are allowed", () => {
    const base = loadExample("study-bearing-race.json");
    const numeric = mutate(mutate(base, "coil.radius", 0.075), "part.targetTemperature", 393.15);
    const a = readHeaterDescription(base);
    const b = readHeaterDescription(numeric);
    expect(b.coil).toEqual(a.coil);
    expect(b.part.targetTemperature).toBeCloseTo(a.part.targetTemperature, 12);
  });

  it("accepts material sets passed in code in place of ids", () => {
    let input = mutate(loadExample("study-plate-warmer.json"), "part.material", lowCarbonSteel);
    input = mutate(input, "coil.conductor.material", silver);
    input = mutate(input, "concentrator.material", inventedExampleFerrite);
    const d = readHeaterDescription(input);
    expect(d.part.material).toEqual(lowCarbonSteel);
    expect(d.coil.conductor.material).toEqual(silver);
    expect(d.concentrator?.material).toEqual(inventedExampleFerrite);
    // a caller's own set is checked field by field, naming the field (issue: a missing
    // temperatureRange.typical gave a TypeError, a negative density blamed lumpedHeatUp's mass)
    expect(() => readHeaterDescription(mutate(input, "part.material", { id: "x" }))).toThrow(/part\.material\.name must be a string/);
    expect(() => readHeaterDescription(mutate(input, "part.material", { ...lowCarbonSteel, density: -7850 }))).toThrow(/part\.material\.density must be a finite number > 0/);
    expect(() => readHeaterDescription(mutate(input, "part.material", { ...lowCarbonSteel, emissivity: { min: 0.1, max: 0.9, source: "x" } }))).toThrow(/part\.material\.emissivity\.typical must be/);
    expect(() => readHeaterDescription(mutate(input, "part.material", { ...lowCarbonSteel, densty: 7850 }))).toThrow(/part\.material\.densty must be absent.*did you mean "density"/);
    expect(() => readHeaterDescription(mutate(input, "part.material", 42))).toThrow(/part\.material must be/);
  });

  it("rejects a non-object description", () => {
    expect(() => readHeaterDescription(null)).toThrow(InputError);
    expect(() => readHeaterDescription("coil")).toThrow(/description must be an object/);
  });
});

describe("readHeaterDescription on malformed study files: every class of fault names its field path", () => {
  for (const c of MALFORMED) {
    it(`${c.fault}: ${c.path} = ${JSON.stringify(c.value) ?? "(deleted)"} → "${c.message}"`, () => {
      const input = mutate(loadExample(c.file), c.path, c.value);
      let error: unknown;
      try {
        readHeaterDescription(input);
      } catch (e) {
        error = e;
      }
      expect(error).toBeInstanceOf(InputError);
      expect(error).toBeInstanceOf(RangeError);
      expect(error).toBeInstanceOf(HeaterDescriptionError);
      const problems = (error as HeaterDescriptionError).problems;
      const hit = problems.find((p) => p.message.includes(c.message));
      expect(hit, problems.map((p) => p.message).join("\n")).toBeDefined();
      expect(hit?.message.startsWith("readHeaterDescription: ")).toBe(true);
      expect(hit?.parameter.length).toBeGreaterThan(0);
    });
  }

  it("the thrown error is the first problem, with parameter = field path", () => {
    try {
      readHeaterDescription(mutate(loadExample("study-bearing-race.json"), "coil.turns", 0));
      expect.unreachable();
    } catch (e) {
      expect((e as InputError).parameter).toBe("coil.turns");
      expect((e as InputError).message).toBe("readHeaterDescription: coil.turns must be an integer ≥ 1, got 0");
    }
  });

  it("reports every problem of a file at once, in document order", () => {
    let input = loadExample("study-bearing-race.json");
    input = mutate(input, "supply.voltage", -1);
    input = mutate(input, "coil.turns", 0);
    input = mutate(input, "part.height", "3 kg");
    try {
      readHeaterDescription(input);
      expect.unreachable();
    } catch (e) {
      const paths = (e as HeaterDescriptionError).problems.map((p) => p.parameter);
      expect(paths).toEqual(expect.arrayContaining(["supply.voltage", "coil.turns", "part.height"]));
      expect(paths.indexOf("supply.voltage")).toBeLessThan(paths.indexOf("coil.turns"));
    }
  });
});

describe("readHeaterDescription with requireUnits (how study files are read)", () => {
  const problemsOf = (input: unknown): InputError[] => {
    try {
      readHeaterDescription(input, { requireUnits: true });
    } catch (e) {
      if (e instanceof HeaterDescriptionError) return [...e.problems];
      throw e;
    }
    return [];
  };

  it("refuses a bare number for a quantity with a dimension, naming the field and showing the fix", () => {
    const race = loadExample("study-bearing-race.json");
    const cases: [string, unknown, string][] = [
      ["coil.radius", 32, `"32 mm" or "32 m"`],
      ["part.targetTemperature", 1150, `"1150 °C" or "1150 K"`],
      ["capacitor.capacitance", 2.2, `"2.2 µF" or "2.2 F"`],
      ["environment.convectionCoefficient", 10, `"10 W/(m²·K)"`],
    ];
    for (const [path, value, fix] of cases) {
      const problems = problemsOf(mutate(race, path, value));
      expect(problems.map((p) => p.parameter), path).toEqual([path]);
      expect(problems[0]?.message).toContain(fix);
      expect(problems[0]?.message).toContain("a bare number has no unit in a study file");
    }
  });

  it("refuses text that is only a number (\"2.2\" for a capacitance) even without requireUnits", () => {
    const input = mutate(loadExample("study-bearing-race.json"), "capacitor.capacitance", "2.2");
    expect(() => readHeaterDescription(input)).toThrow(/capacitor\.capacitance must be a quantity with its unit, e\.g\. "2\.2 µF"/);
  });

  it("keeps plain numbers for counts and ratios (turns, strands, dissipation factor, emissivity)", () => {
    expect(problemsOf(loadExample("study-plate-warmer.json"))).toEqual([]);
  });

  it("accepts every length unit the units module converts: inches and mils (1 in = 25.4 mm exactly, NIST SP 811 B.8)", () => {
    const race = loadExample("study-bearing-race.json");
    const d = readHeaterDescription(mutate(race, "coil.radius", "3 in"), { requireUnits: true });
    if (d.coil.shape !== "solenoid") throw new Error("expected a solenoid");
    expect(d.coil.radius).toBe(0.0762);
    const w = readHeaterDescription(mutate(race, "coil.leadLength", "500 mil"), { requireUnits: true });
    expect(w.coil.leadLength).toBeCloseTo(0.0127, 15);
  });

  it("accepts the convection coefficient as text in W/(m²·K)", () => {
    const d = readHeaterDescription(mutate(loadExample("study-bearing-race.json"), "environment.convectionCoefficient", "25 W/(m2·K)"), { requireUnits: true });
    expect(d.environment.convectionCoefficient).toBe(25);
  });

  it("quotes limits in the unit the user wrote, 4 significant digits, unit after the number", () => {
    const race = loadExample("study-bearing-race.json");
    const [tooHot] = problemsOf(mutate(race, "part.targetTemperature", "1600 °C"));
    expect(tooHot?.message).toMatch(/melting temperature of .* = 1\d{3}(\.\d)? °C, got "1600 °C"$/);
    const [short] = problemsOf(mutate(race, "coil.length", "1 in"));
    expect(short?.message).toMatch(/≥ turns × conductor diameter = 1\.417 in \(turns would overlap\), got "1 in"$/);
  });

  it("rejects unknown options", () => {
    expect(() => readHeaterDescription(loadExample("study-bearing-race.json"), { requireUnit: true } as never)).toThrow(InputError);
  });
});

describe("the material-id types match the catalogue", () => {
  it("PartMaterialId lists exactly the ids of conductiveMaterials, ConductorMaterialId the coil conductors", async () => {
    const { conductiveMaterials } = await import("../../src/index.js");
    const partIds = {
      copper: true, aluminium: true, silver: true, lowCarbonSteel: true, mediumCarbonSteel: true, austeniticStainless: true,
      ferriticStainless: true, aluminiumAlloy: true, brass: true, titaniumAlloy: true,
    } satisfies Record<PartMaterialId, true>;
    expect(Object.keys(partIds).sort()).toEqual(conductiveMaterials.map((m) => m.id).sort());
    const conductorIds = { copper: true, aluminium: true, silver: true } satisfies Record<ConductorMaterialId, true>;
    for (const id of Object.keys(conductorIds)) expect(conductiveMaterials.some((m) => m.id === id)).toBe(true);
  });
});
