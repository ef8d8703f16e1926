import { describe, expect, it } from "vitest";
import { InputError, optimizeHeater, studyHeater } from "../../src/index.js";
import type { HeaterDescription } from "../../src/index.js";

/** The base heater of the studyHeater @example (48 V battery, 6-turn tube coil, steel ring). */
function heater(): HeaterDescription & Record<string, unknown> {
  return {
    supply: { kind: "battery", voltage: "48 V", internalResistance: "40 mΩ" },
    inverter: { kind: "current-fed-parallel", chokeInductance: "100 µH", switchOnResistance: "8 mΩ" },
    coil: { shape: "solenoid", radius: "75 mm", length: "48 mm", turns: 6, conductor: { kind: "tube", outerDiameter: "6 mm", wallThickness: "1 mm" } },
    capacitor: { capacitance: "4 µF" },
    part: { shape: "ring", material: "lowCarbonSteel", outerRadius: "62 mm", innerRadius: "50 mm", height: "30 mm", targetTemperature: "120 °C" },
  };
}
const QUICK = { temperatureScan: false, impedanceSweep: false } as const;

function thrown(fn: () => unknown): unknown {
  try {
    fn();
  } catch (e) {
    return e;
  }
  return undefined;
}

describe("studyHeater options", () => {
  it("throws InputError when options is null, a number or a string (null was a TypeError, the others were ignored)", () => {
    for (const bad of [null, 42, "quick"]) {
      const e = thrown(() => studyHeater(heater(), bad as never));
      expect(e).toBeInstanceOf(InputError);
      expect((e as InputError).parameter).toBe("options");
    }
  });

  it("throws InputError naming options.heatUpPoints for NaN, ±Infinity, text, non-integers and counts below 4", () => {
    // before: NaN surfaced as an error from an internal lumpedHeatUp call, Infinity did not
    // return (an endless temperature grid), and "8", 2.5, 0 or -3 were silently coerced or clamped
    for (const bad of [Number.NaN, Infinity, -Infinity, "8", 2.5, 3, 0, -3]) {
      const e = thrown(() => studyHeater(heater(), { ...QUICK, heatUpPoints: bad as number }));
      expect(e).toBeInstanceOf(InputError);
      expect((e as InputError).parameter).toBe("options.heatUpPoints");
    }
  });

  it("accepts an integer heatUpPoints ≥ 4 and gives the same heat-up as before", () => {
    const a = studyHeater(heater(), { ...QUICK, heatUpPoints: 4 });
    const b = studyHeater(heater(), { ...QUICK, heatUpPoints: 8 });
    expect(a.timeToTarget).not.toBeNull();
    // two grids, one answer to a few parts in 1e4 (the grid only sets the interpolation points)
    expect(Math.abs((a.timeToTarget as number) / (b.timeToTarget as number) - 1)).toBeLessThan(1e-3);
  });
});

describe("optimizeHeater options", () => {
  const goal = { targetPower: "1 kW", limits: { minFrequency: "20 kHz" }, keep: 3 };

  it("throws InputError when options is null, a number or a string (null was a TypeError)", () => {
    for (const bad of [null, 42, "progress"]) {
      const e = thrown(() => optimizeHeater(heater(), goal, bad as never));
      expect(e).toBeInstanceOf(InputError);
      expect((e as InputError).parameter).toBe("options");
    }
  });

  it("throws InputError when onProgress is given but is not a function (was a TypeError mid-search)", () => {
    const e = thrown(() => optimizeHeater(heater(), goal, { onProgress: 1 as never }));
    expect(e).toBeInstanceOf(InputError);
    expect((e as InputError).parameter).toBe("options.onProgress");
  });
});
