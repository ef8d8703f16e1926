import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { componentTemperatureRise, eCore, effectiveCoreParameters, potCore, toroidCore, uCore } from "../../src/index.js";

const SEED = 19019;
const logU = (lo: number, hi: number): fc.Arbitrary<number> =>
  fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true, noDefaultInfinity: true }).map(Math.exp);
const frac = fc.double({ min: 0.05, max: 0.95, noNaN: true, noDefaultInfinity: true });
const rel = (a: number, b: number): number => Math.abs(a / b - 1);

describe("core geometry properties", () => {
  it("effective area lies between the smallest and largest section; l_e·A_e = V_e", () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(logU(1e-4, 1), logU(1e-8, 1e-2)), { minLength: 1, maxLength: 8 }), (raw) => {
        const p = effectiveCoreParameters({ sections: raw.map(([length, area]) => ({ length, area })) });
        const areas = raw.map((r) => r[1]);
        expect(p.effectiveArea).toBeGreaterThanOrEqual(Math.min(...areas) * (1 - 1e-12));
        expect(p.effectiveArea).toBeLessThanOrEqual(Math.max(...areas) * (1 + 1e-12));
        expect(rel(p.effectivePathLength * p.effectiveArea, p.effectiveVolume)).toBeLessThan(1e-12);
      }),
      { seed: SEED, numRuns: 200 },
    );
  });

  it("scaling every length by k scales l_e by k, A_e and the window by k², C1 by 1/k (E, U, pot, toroid)", () => {
    fc.assert(
      fc.property(logU(1e-3, 0.1), logU(0.1, 10), frac, frac, frac, (a, k, f1, f2, f3) => {
        const e = { width: a, height: a * 0.5, depth: a * 0.4, windowWidth: a * (0.5 + 0.4 * f1), centreLegWidth: 0, windowHeight: a * 0.5 * f2 };
        const eDims = { ...e, centreLegWidth: e.windowWidth * f3 };
        const scaled = Object.fromEntries(Object.entries(eDims).map(([key, v]) => [key, v * k])) as typeof eDims;
        const s1 = eCore(eDims);
        const s2 = eCore(scaled);
        expect(rel(s2.effectivePathLength, k * s1.effectivePathLength)).toBeLessThan(1e-12);
        expect(rel(s2.effectiveArea, k * k * s1.effectiveArea)).toBeLessThan(1e-12);
        expect(rel(s2.windowArea, k * k * s1.windowArea)).toBeLessThan(1e-12);
        expect(rel(s2.c1, s1.c1 / k)).toBeLessThan(1e-12);
        const pot = { outerDiameter: a, windowOuterDiameter: a * (0.6 + 0.3 * f1), postDiameter: a * 0.5 * f2, height: a * 0.4, windowHeight: a * 0.4 * f3 };
        const p1 = potCore(pot);
        const p2 = potCore(Object.fromEntries(Object.entries(pot).map(([key, v]) => [key, v * k])) as typeof pot);
        expect(rel(p2.effectiveVolume, k ** 3 * p1.effectiveVolume)).toBeLessThan(1e-12);
        const u = { width: a, height: a * 0.6, depth: a * 0.3, legWidth: a * 0.45 * f1, windowHeight: a * 0.6 * f2 };
        const u1 = uCore(u);
        const u2 = uCore(Object.fromEntries(Object.entries(u).map(([key, v]) => [key, v * k])) as typeof u);
        expect(rel(u2.meanTurnLength, k * u1.meanTurnLength)).toBeLessThan(1e-12);
      }),
      { seed: SEED, numRuns: 200 },
    );
  });

  it("a toroid's l_e lies between its inner and outer circumference", () => {
    fc.assert(
      fc.property(logU(1e-3, 1), logU(1e-9, 100), logU(1e-3, 1), (d1, extra, h) => {
        const t = toroidCore({ innerDiameter: d1, outerDiameter: d1 * (1 + extra), height: h });
        expect(t.effectivePathLength).toBeGreaterThanOrEqual(Math.PI * d1 * (1 - 1e-12));
        expect(t.effectivePathLength).toBeLessThanOrEqual(Math.PI * d1 * (1 + extra) * (1 + 1e-12));
      }),
      { seed: SEED, numRuns: 300 },
    );
  });

  it("the temperature rise grows with the loss and falls with the surface", () => {
    fc.assert(
      fc.property(logU(1e-3, 100), logU(1e-4, 0.1), logU(0.005, 0.3), (p, area, h) => {
        const base = { ambientTemperature: 300, surfaceArea: area, height: h };
        const t1 = componentTemperatureRise({ ...base, power: p });
        const t2 = componentTemperatureRise({ ...base, power: 1.5 * p });
        const t3 = componentTemperatureRise({ ...base, power: p, surfaceArea: 1.5 * area });
        expect(t2.temperatureRise).toBeGreaterThan(t1.temperatureRise);
        expect(t3.temperatureRise).toBeLessThan(t1.temperatureRise);
      }),
      { seed: SEED, numRuns: 200 },
    );
  });
});
