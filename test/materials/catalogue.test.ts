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

  it("puts the Curie point of carbon steel at 768 °C (Atlas Steels: about 768 °C for carbon steel; A2 of iron)", () => {
    expect(lowCarbonSteel.curieTemperature).toBeCloseTo(768 + 273.15, 9);
  });

  it("puts the emissivity endpoints where instrument makers' tables put them", () => {
    // Raytek 'Emissivity Table for Metals', 8–14 µm: stainless steel 0.1–0.8; Ideal HeatSeeker 160 manual: stainless oxidised at 800 °C 0.85
    for (const m of [austeniticStainless, ferriticStainless]) {
      expect(m.emissivity.min).toBe(0.1);
      expect(m.emissivity.max).toBe(0.85);
    }
    // Omega OS100 table: highly polished brass 0.03; FLIR Table 22.1: brass oxidised at 100 °C 0.61
    expect(brass.emissivity.min).toBe(0.03);
    expect(brass.emissivity.max.toFixed(1)).toBe((0.61).toFixed(1)); // 0.61 to the one digit the set carries
    // Omega OS100: aluminium 0.04–0.06 polished … 0.20–0.31 heavily oxidised; Raytek MI3: polished 0.02–0.1
    expect(aluminiumAlloy.emissivity.min).toBeGreaterThanOrEqual(0.02);
    expect(aluminiumAlloy.emissivity.max).toBeLessThanOrEqual(0.31);
    expect(aluminiumAlloy.emissivity.max).toBeGreaterThanOrEqual(0.2);
    // Raytek MI3 table: silver 0.02; Raytek metals table: oxidised titanium 0.6–0.8 at 1.6 µm
    expect(silver.emissivity.min).toBe(0.02);
    expect(titaniumAlloy.emissivity.max).toBe(0.8);
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

  it("gives AISI 304 12.6, 14.9, 16.6, 19.8, 22.6, 25.4 W/(m·K) at 200, 300, 400, 600, 800, 1000 K (Incropera & DeWitt 5th ed., Table A.1, pp. 905 and 907, as transcribed in the FCSys Modelica library, Regions.mo)", () => {
    // Incropera & DeWitt 2002, Table A.1, AISI 304 row, via github.com/kdavies4/FCSys Regions.mo
    const row: [number, number][] = [[200, 12.6], [300, 14.9], [400, 16.6], [600, 19.8], [800, 22.6], [1000, 25.4]];
    for (const [t, k] of row) expect(thermalConductivityAt(austeniticStainless, t)).toBe(k);
  });

  it("gives AISI 304 28.0 and 31.7 W/(m·K) at 1200 and 1500 K (Incropera et al. 7th ed., Table A.1, AISI 304 row, as transcribed in two public heat-transfer scripts)", () => {
    expect(thermalConductivityAt(austeniticStainless, 1200)).toBe(28.0); // Incropera et al. 2011, Table A.1, AISI 304
    expect(thermalConductivityAt(austeniticStainless, 1500)).toBe(31.7); // Incropera et al. 2011, Table A.1, AISI 304
  });

  it("gives low-carbon steel the 7870 kg/m³ of AISI 1010 data sheets (MatMake; MatWeb as reproduced on a179.net)", () => {
    expect(lowCarbonSteel.density).toBe(7870); // MatMake SAE/AISI 1010: 7870 kg/m³; MatWeb AISI 1010: 7.87 g/cm³
  });

  it("gives AISI 304 a density of 7900 kg/m³ (Valley Design type 304 page, 7.90 g/cm³; Incropera et al. 7th ed., Table A.1)", () => {
    expect(austeniticStainless.density).toBe(7900); // Valley Design 'Type 304 and 304L Stainless Steel': 7.90 g/cm³
  });

  it("gives pure copper, aluminium and silver the conductivities of Incropera et al. 7th ed. Table A.1 (pp. 983–986)", () => {
    // Incropera et al. 2011, Table A.1: k [W/(m·K)] at 200, 300, 400, 600, 800 K
    const table: [typeof copper, number[]][] = [
      [copper, [413, 401, 393, 379, 366]],
      [aluminium, [237, 237, 240, 231, 218]],
      [silver, [430, 429, 425, 412, 396]],
    ];
    for (const [m, k] of table) {
      [200, 300, 400, 600, 800].forEach((t, i) => {
        expect(thermalConductivityAt(m, t)).toBe(k[i]);
      });
    }
  });

  it("gives cartridge brass 110, 137 and 149 W/(m·K) at 300, 400 and 600 K (Incropera et al. 7th ed. Table A.1, p. 983)", () => {
    expect(thermalConductivityAt(brass, 300)).toBe(110); // Incropera Table A.1, p. 983
    expect(thermalConductivityAt(brass, 400)).toBe(137); // Incropera Table A.1, p. 983
    expect(thermalConductivityAt(brass, 600)).toBe(149); // Incropera Table A.1, p. 983
  });

  it("gives AISI 1010 63.9, 48.8 and 31.3 W/(m·K) at 300, 600 and 1000 K (Incropera et al. Table A.1, plain carbon steel AISI 1010)", () => {
    expect(thermalConductivityAt(lowCarbonSteel, 300)).toBe(63.9); // Incropera Table A.1
    expect(thermalConductivityAt(lowCarbonSteel, 600)).toBe(48.8); // Incropera Table A.1
    expect(thermalConductivityAt(lowCarbonSteel, 1000)).toBe(31.3); // Incropera Table A.1
  });

  it("gives AISI 430 25.0 W/(m·K) at 20 °C (KOOZ 1.4016 data page), 26.1 W/(m·K) at 100 °C and 26.3 at 500 °C (AK Steel Type 430 product data sheet)", () => {
    expect(thermalConductivityAt(ferriticStainless, 293.15)).toBeCloseTo(25.0, 12); // KOOZ 1.4016 / X6Cr17: 25.0 W/(m·K) at ambient temperature
    expect(thermalConductivityAt(ferriticStainless, 373.15)).toBeCloseTo(26.1, 12); // AK Steel 430 data sheet
    expect(thermalConductivityAt(ferriticStainless, 773.15)).toBeCloseTo(26.3, 12); // AK Steel 430 data sheet
  });

  it("gives the data-sheet densities: cartridge brass 8530 (Olin Brass C26000; Incropera Table A.1), AISI 430 7750 (Atlas Steels), 6061 2700 (Aluminum Association typical), Ti-6Al-4V 4430 (ASM/MatWeb)", () => {
    expect(brass.density).toBe(8530);
    expect(ferriticStainless.density).toBe(7750);
    expect(aluminiumAlloy.density).toBe(2700);
    expect(titaniumAlloy.density).toBe(4430);
  });

  it("ships only core-material sets labelled as invented", () => {
    for (const c of [inventedExampleFerrite, inventedExampleIronPowder]) {
      expect(c.invented).toBe(true);
      expect(c.name).toMatch(/invented/);
    }
  });
});
