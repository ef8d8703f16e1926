import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { eCore, inductorDesign, inventedExampleFerrite } from "../../src/index.js";

const SEED = 19021;
const core = eCore({ width: 0.042, height: 0.021, depth: 0.015, windowWidth: 0.03, centreLegWidth: 0.012, windowHeight: 0.015 });
const conductor = { kind: "litz" as const, strands: 105, strandDiameter: 0.1e-3, outerDiameter: 1.4e-3 };

describe("inductorDesign properties", () => {
  it("meets the inductance, keeps the flux limit, conserves power, and more ripple costs more core loss", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 40e-6, max: 200e-6, noNaN: true }),
        fc.double({ min: 1, max: 6, noNaN: true }),
        fc.double({ min: 0.2, max: 1.5, noNaN: true }),
        fc.double({ min: 0.15, max: 0.85, noNaN: true }),
        fc.double({ min: 30e3, max: 250e3, noNaN: true }),
        (inductance, average, ripple, dutyCycle, frequency) => {
          const options = {
            inductance, frequency, core, material: inventedExampleFerrite, conductor, ambientTemperature: 313.15,
            current: { kind: "triangular" as const, average, ripple, dutyCycle },
          };
          const d = inductorDesign(options);
          expect(Math.abs(d.inductance / inductance - 1)).toBeLessThan(1e-9);
          expect(d.peakFluxDensity).toBeLessThanOrEqual(0.8 * inventedExampleFerrite.saturationFluxDensity * (1 + 1e-12));
          expect(Math.abs(d.totalLoss - d.coreLoss - d.windingLoss)).toBeLessThan(1e-12 * d.totalLoss + 1e-15);
          expect(d.temperatureRise).toBeGreaterThan(0);
          const more = inductorDesign({ ...options, turns: d.turns, current: { ...options.current, ripple: ripple * 1.3 } });
          expect(more.coreLoss).toBeGreaterThan(d.coreLoss * 0.999);
        },
      ),
      { seed: SEED, numRuns: 60 },
    );
  });
});
