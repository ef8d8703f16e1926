import { describe, expect, it } from "vitest";
import { InputError, celsius } from "../../src/index.js";
import { aluminium, brass, copper, ferriticStainless, lowCarbonSteel, mediumCarbonSteel, silver, specificHeatAt, austeniticStainless, titaniumAlloy } from "../../src/materials/index.js";
import data from "../fixtures/materials/specific-heat-en1993.json" with { type: "json" };

describe("specificHeatAt", () => {
  it("follows EN 1993-1-2 eq. (3.2) for carbon steel (fixture from mpmath, generate.py)", () => {
    for (const c of data.cases) {
      for (const steel of [lowCarbonSteel, mediumCarbonSteel]) {
        const got = specificHeatAt(steel, c.temperature);
        expect(Math.abs(got - c.specificHeat) / c.specificHeat).toBeLessThanOrEqual(data.meta.rtol);
      }
    }
  });

  it("peaks at 5000 J/(kg·K) at 735 °C for carbon steel (EN 1993-1-2 §3.4.1.2)", () => {
    expect(specificHeatAt(lowCarbonSteel, celsius(735))).toBeCloseTo(5000, 9);
    expect(specificHeatAt(lowCarbonSteel, celsius(700))).toBeLessThan(5000);
    expect(specificHeatAt(lowCarbonSteel, celsius(760))).toBeLessThan(5000);
  });

  it("gives 650 J/(kg·K) for carbon steel above 900 °C (EN 1993-1-2)", () => {
    expect(specificHeatAt(mediumCarbonSteel, celsius(1100))).toBe(650);
  });

  it("gives pure copper 356, 385, 397, 417 J/(kg·K) at 200, 300, 400, 600 K (Incropera et al. 7th ed., Table A.1, p. 983)", () => {
    expect(specificHeatAt(copper, 200)).toBe(356); // Incropera Table A.1, p. 983
    expect(specificHeatAt(copper, 300)).toBe(385); // Incropera Table A.1, p. 983
    expect(specificHeatAt(copper, 400)).toBe(397); // Incropera Table A.1, p. 983
    expect(specificHeatAt(copper, 600)).toBe(417); // Incropera Table A.1, p. 983
  });

  it("gives pure aluminium 903 and silver 235 J/(kg·K) at 300 K, cartridge brass 395 at 400 K (Incropera et al. 7th ed., Table A.1)", () => {
    expect(specificHeatAt(aluminium, 300)).toBe(903); // Incropera Table A.1, p. 983
    expect(specificHeatAt(aluminium, 800)).toBe(1146); // Incropera Table A.1, p. 983
    expect(specificHeatAt(silver, 300)).toBe(235); // Incropera Table A.1
    expect(specificHeatAt(brass, 400)).toBe(395); // Incropera Table A.1, p. 983
  });

  it("gives Ti-6Al-4V 526 J/(kg·K) and AISI 430 460 J/(kg·K) near 20 °C (BTI Metals Ti-6Al-4V data sheet at 25 °C; Atlas Steels grade 430, 0–100 °C)", () => {
    expect(specificHeatAt(titaniumAlloy, celsius(20))).toBeCloseTo(526, 9); // BTI Metals, 25 °C
    expect(specificHeatAt(ferriticStainless, celsius(20))).toBeCloseTo(460, 9); // Atlas Steels 430
  });

  it("gives AISI 304 402, 477, 515, 557, 582, 611 J/(kg·K) at 200, 300, 400, 600, 800, 1000 K (Incropera & DeWitt 5th ed., Table A.1, pp. 905 and 907, as transcribed in the FCSys Modelica library, Regions.mo)", () => {
    // Incropera & DeWitt 2002, Table A.1, AISI 304 row, via github.com/kdavies4/FCSys Regions.mo
    const row: [number, number][] = [[200, 402], [300, 477], [400, 515], [600, 557], [800, 582], [1000, 611]];
    for (const [t, cp] of row) expect(specificHeatAt(austeniticStainless, t)).toBe(cp);
  });

  it("gives AISI 304 640 and 682 J/(kg·K) at 1200 and 1500 K (Incropera et al. 7th ed., Table A.1, AISI 304 row, as transcribed in two public heat-transfer scripts)", () => {
    expect(specificHeatAt(austeniticStainless, 1200)).toBe(640); // Incropera et al. 2011, Table A.1, AISI 304
    expect(specificHeatAt(austeniticStainless, 1500)).toBe(682); // Incropera et al. 2011, Table A.1, AISI 304
  });

  it("the carbon-steel peak adds about 101 kJ/kg above a 650 J/(kg·K) baseline over 600–900 °C", () => {
    // trapezoid integral of (c − smooth baseline 650) on a fine grid
    let excess = 0;
    const n = 30000;
    const a = celsius(600);
    const b = celsius(900);
    const h = (b - a) / n;
    for (let i = 0; i < n; i++) {
      const t0 = a + i * h;
      excess += 0.5 * h * (specificHeatAt(lowCarbonSteel, t0) + specificHeatAt(lowCarbonSteel, t0 + h) - 2 * 650);
    }
    // mpmath quad of EN 1993-1-2 eq. (3.2) minus 650 over [600, 735, 900] °C: 101326.025 J/kg
    expect(Math.abs(excess - 101326.025) / 101326.025).toBeLessThan(1e-4);
  });

  it("throws InputError for a non-positive temperature", () => {
    expect(() => specificHeatAt(copper, 0)).toThrow(InputError);
    expect(() => specificHeatAt(undefined as never, 300)).toThrow(InputError);
  });
});
