import { describe, expect, it } from "vitest";
import {
  aluminium,
  aluminiumAlloy,
  austeniticStainless,
  brass,
  conductiveMaterials,
  copper,
  ferriticStainless,
  inventedExampleFerrite,
  inventedExampleIronPowder,
  lowCarbonSteel,
  mediumCarbonSteel,
  silver,
  thermalConductivityAt,
  titaniumAlloy,
} from "../../src/materials/index.js";

describe("material sets", () => {
  it("lists all ten conducting sets, each id naming its constant", () => {
    const named = { copper, aluminium, silver, lowCarbonSteel, mediumCarbonSteel, austeniticStainless, ferriticStainless, aluminiumAlloy, brass, titaniumAlloy };
    expect(conductiveMaterials.length).toBe(10);
    for (const [id, m] of Object.entries(named)) {
      expect(m.id).toBe(id);
      expect(conductiveMaterials).toContain(m);
    }
  });

  it("gives copper the IEC 60028 density 8890 kg/m³ and aluminium the IEC 60889 density 2703 kg/m³", () => {
    expect(copper.density).toBe(8890); // IEC 60028
    expect(aluminium.density).toBe(2703); // IEC 60889
  });

  it("marks exactly the ferritic materials as magnetic, each with a Curie temperature and permeability model", () => {
    for (const m of conductiveMaterials) {
      const shouldBe = m === lowCarbonSteel || m === mediumCarbonSteel || m === ferriticStainless;
      expect(m.magnetic).toBe(shouldBe);
      expect(m.curieTemperature !== undefined).toBe(shouldBe);
      expect(m.permeability !== undefined).toBe(shouldBe);
    }
  });

  it("puts the Curie point of carbon steel at 768 °C (A2 of iron, common practice)", () => {
    expect(lowCarbonSteel.curieTemperature).toBeCloseTo(768 + 273.15, 9);
  });

  it("keeps emissivity ranges ordered inside (0, 1]", () => {
    for (const m of conductiveMaterials) {
      const e = m.emissivity;
      expect(0 < e.min && e.min <= e.typical && e.typical <= e.max && e.max <= 1).toBe(true);
    }
  });

  it("keeps every table strictly increasing in temperature and equal in length", () => {
    for (const m of conductiveMaterials) {
      const tables = [m.thermalConductivityTable];
      if (m.resistivity.kind === "table") tables.push(m.resistivity.table);
      if (m.specificHeat.kind === "table") tables.push(m.specificHeat.table);
      for (const t of tables) {
        expect(t.temperatures.length).toBe(t.values.length);
        expect(t.temperatures.length).toBeGreaterThanOrEqual(2);
        for (let i = 1; i < t.temperatures.length; i++) {
          expect(t.temperatures[i] as number).toBeGreaterThan(t.temperatures[i - 1] as number);
        }
      }
      expect(m.temperatureRange.min).toBeLessThan(m.temperatureRange.max);
      expect(m.temperatureRange.max).toBeLessThan(m.meltingTemperature);
    }
  });

  it("is frozen", () => {
    expect(Object.isFrozen(copper)).toBe(true);
    expect(Object.isFrozen(lowCarbonSteel.permeability)).toBe(true);
    expect(Object.isFrozen(conductiveMaterials)).toBe(true);
  });

  it("gives AISI 304 a conductivity of 19.8 W/(m·K) at 600 K (Incropera Table A.1, from memory)", () => {
    expect(thermalConductivityAt(austeniticStainless, 600)).toBe(19.8);
  });

  it("ships only core-material sets labelled as invented", () => {
    for (const c of [inventedExampleFerrite, inventedExampleIronPowder]) {
      expect(c.invented).toBe(true);
      expect(c.name).toMatch(/invented/);
    }
  });
});
