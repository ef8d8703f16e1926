import { describe, expect, it } from "vitest";
import { celsius, eCore, inductorCoreSearch, inductorDesign, InputError, inventedExampleFerrite } from "../../src/index.js";

const e = (s: number) =>
  eCore({ width: 0.042 * s, height: 0.021 * s, depth: 0.015 * s, windowWidth: 0.03 * s, centreLegWidth: 0.012 * s, windowHeight: 0.015 * s });
const specification = {
  inductance: 100e-6,
  frequency: 100e3,
  material: inventedExampleFerrite,
  ambientTemperature: celsius(40),
  current: { kind: "triangular" as const, average: 5, ripple: 2, dutyCycle: 0.4 },
  conductor: { kind: "litz" as const, strands: 105, strandDiameter: 0.1e-3, outerDiameter: 1.4e-3 },
  maxFluxDensityRatio: 0.7,
};

describe("inductorCoreSearch", () => {
  it("rejects a core whose window cannot hold the turns (hand computation of the fill) and ranks the rest by volume", () => {
    const small = e(0.5);
    const r = inductorCoreSearch({ specification, cores: [{ name: "large", core: e(1) }, { name: "small", core: small }, { name: "medium", core: e(0.8) }] });
    expect(r.feasible.map((f) => f.name)).toEqual(["medium", "large"]);
    // Hand: N = ceil(L Î/(0.7 Bsat A_min)) turns of 1.4 mm litz, fill = N·(1.4 mm)²/window area > 0.5.
    const n = Math.ceil((100e-6 * 6) / (0.7 * 0.4 * small.minimumArea));
    expect((n * 1.4e-3 ** 2) / small.windowArea).toBeGreaterThan(0.5);
    expect(r.rejected.map((x) => x.name)).toEqual(["small"]);
    expect(r.rejected[0]!.reasons[0]).toMatch(/window-overfull/);
  });

  it("ranks by loss when asked, and applies a temperature-rise limit", () => {
    const cores = [{ name: "medium", core: e(0.8) }, { name: "large", core: e(1) }, { name: "xl", core: e(1.3) }];
    const r = inductorCoreSearch({ specification, cores, rankBy: "loss" });
    const losses = r.feasible.map((f) => f.design.totalLoss);
    expect([...losses].sort((a, b) => a - b)).toEqual(losses);
    const medium = inductorDesign({ ...specification, core: e(0.8) });
    const limited = inductorCoreSearch({ specification, cores, maxTemperatureRise: medium.temperatureRise * 0.99 });
    expect(limited.rejected.map((x) => x.name)).toContain("medium");
  });

  it("reports a candidate whose design throws as a reason, and rejects bad options", () => {
    const r = inductorCoreSearch({ specification: { ...specification, inductance: 1 }, cores: [{ name: "large", core: e(1) }] });
    expect(r.feasible).toHaveLength(0);
    expect(r.rejected[0]!.reasons[0]).toMatch(/inductance/);
    expect(() => inductorCoreSearch({ specification, cores: [] })).toThrow(InputError);
    expect(() => inductorCoreSearch({ specification, cores: [{ name: "x", core: e(1) }], rankBy: "price" as never })).toThrow(InputError);
  });
});
