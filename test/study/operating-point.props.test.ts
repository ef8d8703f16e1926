import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { InputError, readHeaterDescription, studyHeater } from "../../src/index.js";
import { coilProperties, heaterOperatingPoint } from "../../src/study/operating-point.js";
import type { HeaterOperatingPoint } from "../../src/study/operating-point.js";
import { loadExample, mutate } from "./cases.js";

// Invariants of the operating point against part temperature, for every example design in
// docs/examples: the solved point is a continuous function of temperature (no jumps, through
// Curie included), the same whether it is solved afresh or continued from a neighbour, and the
// power curve and settle temperature do not depend on the heat-up target.
const designs = ["study-bearing-race.json", "study-forging-bar.json", "study-plate-warmer.json"] as const;

const solve = (d: ReturnType<typeof readHeaterDescription>, kelvin: number, props: ReturnType<typeof coilProperties>, start: HeaterOperatingPoint | null = null): HeaterOperatingPoint | null => {
  try {
    return heaterOperatingPoint(d, kelvin, true, props, start);
  } catch (error) {
    if (!(error instanceof InputError)) throw error;
    return null; // a temperature the design cannot run at (tested in study-heater.props.test.ts)
  }
};

describe("the operating point against part temperature (property tests, example designs)", () => {
  for (const name of designs) {
    it(`${name}: continuous in temperature, and continuation agrees with a fresh solve`, { timeout: 300_000 }, () => {
      const d = readHeaterDescription(loadExample(name));
      const props = coilProperties(d);
      let checked = 0;
      fc.assert(
        fc.property(fc.double({ min: 20, max: 1000, noNaN: true }), (celsius) => {
          const kelvin = celsius + 273.15;
          const a = solve(d, kelvin, props);
          if (a === null) return true;
          // a step of 1 mK: any jump (a model switching branch, a table edge) shows as a change far
          // above the local slope; the largest slope on these designs (through Curie) is ~1 %/K
          const b = solve(d, kelvin + 1e-3, props, a);
          const fresh = solve(d, kelvin + 1e-3, props);
          if (b === null || fresh === null) return false;
          checked++;
          const dp = Math.abs(b.losses.part / a.losses.part - 1);
          const df = Math.abs(b.frequency / a.frequency - 1);
          // continuation and a fresh solve land on the same point (the fixed point is unique here)
          const path = Math.abs(b.losses.part / fresh.losses.part - 1);
          return dp < 1e-3 && df < 1e-4 && path < 1e-6;
        }),
        { seed: 11, numRuns: 12 },
      );
      expect(checked).toBeGreaterThanOrEqual(8);
    });

    it(`${name}: the power curve and the settle temperature do not depend on the target`, { timeout: 300_000 }, () => {
      const base = loadExample(name);
      const options = { impedanceSweep: false } as const;
      let checked = 0;
      fc.assert(
        fc.property(fc.double({ min: 40, max: 300, noNaN: true }), fc.double({ min: 50, max: 700, noNaN: true }), (low, extra) => {
          const run = (celsius: number) => {
            try {
              return studyHeater(mutate(base, "part.targetTemperature", `${celsius} °C`), options);
            } catch (error) {
              if (!(error instanceof InputError)) throw error;
              return null;
            }
          };
          const a = run(low);
          const b = run(low + extra);
          if (a === null || b === null || a.heatUp === null || b.heatUp === null || a.temperatureScan === null || b.temperatureScan === null) return true;
          checked++;
          const same = (x: readonly number[], y: readonly number[]) => x.length === y.length && x.every((v, i) => Math.abs(v - (y[i] ?? Number.NaN)) <= 1e-9 * Math.abs(v));
          const ta = a.heatUp.steadyStateTemperature;
          const tb = b.heatUp.steadyStateTemperature;
          return (
            same(a.heatUp.powerCurveRange, b.heatUp.powerCurveRange) &&
            same(a.temperatureScan.temperatures, b.temperatureScan.temperatures) &&
            same(a.temperatureScan.partPowers, b.temperatureScan.partPowers) &&
            (ta === null ? tb === null : tb !== null && Math.abs(ta - tb) <= 1e-9 * ta)
          );
        }),
        { seed: 12, numRuns: 3 },
      );
      expect(checked).toBeGreaterThanOrEqual(2);
    });
  }
});
