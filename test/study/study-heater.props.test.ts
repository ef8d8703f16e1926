import { describe, it } from "vitest";
import fc from "fast-check";
import { studyHeater } from "../../src/index.js";
import type { HeaterDescription, HeaterStudy } from "../../src/index.js";
import { loadExample, mutate } from "./cases.js";

const race = loadExample("study-bearing-race.json");
const quick = { heatUp: false, temperatureScan: false, impedanceSweep: false } as const;
const study = (d: unknown, options: object = quick): HeaterStudy | null => {
  try {
    return studyHeater(d as HeaterDescription, options);
  } catch {
    return null; // a design the inverter cannot run is reported by an InputError (tested elsewhere)
  }
};

describe("studyHeater invariants (property tests, bearing-race family)", () => {
  it("every loss is ≥ 0 and the efficiency lies in (0, 1)", () => {
    fc.assert(
      fc.property(fc.integer({ min: 3, max: 8 }), fc.double({ min: 1.5e-6, max: 1.5e-5, noNaN: true }), fc.double({ min: 20, max: 200, noNaN: true }), (turns, capacitance, targetC) => {
        let d = mutate(race, "coil.turns", turns);
        d = mutate(d, "capacitor.capacitance", capacitance);
        d = mutate(d, "part.targetTemperature", `${targetC + 20} °C`);
        const s = study(d);
        if (s === null) return true;
        for (const p of [s.emptyCoil, s.operating, s.atTarget]) {
          if (p === null) continue;
          if (Object.values(p.losses).some((w) => !(w >= 0))) return false;
          if (p.withPart && !(p.efficiency > 0 && p.efficiency < 1)) return false;
        }
        return true;
      }),
      { seed: 1, numRuns: 25 },
    );
  });

  it("more supply voltage delivers more power into the part (current-fed inverter)", () => {
    fc.assert(
      fc.property(fc.double({ min: 12, max: 60, noNaN: true }), fc.double({ min: 1.05, max: 2, noNaN: true }), (v, factor) => {
        const a = study(mutate(race, "supply.voltage", v));
        const b = study(mutate(race, "supply.voltage", v * factor));
        if (a === null || b === null) return true;
        return b.operating.losses.part > a.operating.losses.part;
      }),
      { seed: 1, numRuns: 20 },
    );
  });

  it("the empty coil runs close to 1/(2π√(LC)) when its Q is high (zero-phase ≈ undamped)", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 2e-5, noNaN: true }), (capacitance) => {
        const s = study(mutate(race, "capacitor.capacitance", capacitance));
        if (s === null) return true;
        const undamped = 1 / (2 * Math.PI * Math.sqrt(s.coil.inductance * capacitance));
        const q = s.emptyCoil.qualityFactor;
        // zero-phase frequency of a series-R coil: f0·√(1 − 1/Q²)
        return q < 10 || Math.abs(s.emptyCoil.frequency / undamped - 1) < 1 / (q * q);
      }),
      { seed: 1, numRuns: 20 },
    );
  });

  it("a higher target temperature takes longer to reach", () => {
    fc.assert(
      fc.property(fc.double({ min: 60, max: 300, noNaN: true }), fc.double({ min: 10, max: 100, noNaN: true }), (target, extra) => {
        const a = study(mutate(race, "part.targetTemperature", `${target} °C`), { temperatureScan: false, impedanceSweep: false });
        const b = study(mutate(race, "part.targetTemperature", `${target + extra} °C`), { temperatureScan: false, impedanceSweep: false });
        const ta = a?.timeToTarget ?? null;
        const tb = b?.timeToTarget ?? null;
        if (ta === null || tb === null) return true;
        return tb > ta;
      }),
      { seed: 1, numRuns: 15 },
    );
  });
});
