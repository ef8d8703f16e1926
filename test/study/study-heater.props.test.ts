import { afterAll, describe, expect, it } from "vitest";
import fc from "fast-check";
import { InputError, readHeaterDescription, studyHeater } from "../../src/index.js";
import type { HeaterDescription, HeaterStudy } from "../../src/index.js";
import { NoOscillationError, coilProperties, heaterOperatingPoint } from "../../src/study/operating-point.js";
import { loadExample, mutate } from "./cases.js";

const race = loadExample("study-bearing-race.json");
const forging = loadExample("study-forging-bar.json");
const quick = { heatUp: false, temperatureScan: false, impedanceSweep: false } as const;
/** Runs that reached their assertion, per property: each property must reach most of its runs. */
const reached = new Map<string, number>();
let current = "";
const study = (d: unknown, options: object = quick): HeaterStudy | null => {
  try {
    const s = studyHeater(d as HeaterDescription, options);
    reached.set(current, (reached.get(current) ?? 0) + 1);
    return s;
  } catch (e) {
    if (!(e instanceof InputError)) throw e;
    return null; // a design the inverter cannot run is reported by an InputError (tested elsewhere)
  }
};
const minimumReached: Record<string, number> = {};
afterAll(() => {
  for (const [name, minimum] of Object.entries(minimumReached)) expect(reached.get(name) ?? 0, name).toBeGreaterThanOrEqual(minimum);
});
const property = (name: string, minimum: number): void => {
  current = name;
  minimumReached[name] = minimum;
};

describe("studyHeater invariants (property tests, bearing-race family)", () => {
  it("every loss is ≥ 0 and the efficiency lies in (0, 1)", () => {
    property("losses", 20);
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
    property("voltage", 30);
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
    property("empty", 15);
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 2e-5, noNaN: true }), (capacitance) => {
        const s = study(mutate(race, "capacitor.capacitance", capacitance));
        if (s === null) return true;
        // the coil's own inductance at the operating frequency (coil-impedance model)
        const undamped = 1 / (2 * Math.PI * Math.sqrt(s.emptyCoil.coilInductance * capacitance));
        const q = s.emptyCoil.qualityFactor;
        // zero-phase frequency of a series-R coil: f0·√(1 − 1/Q²)
        return q < 10 || Math.abs(s.emptyCoil.frequency / undamped - 1) < 1 / (q * q);
      }),
      { seed: 1, numRuns: 20 },
    );
  });

  it("a higher target temperature takes longer to reach", { timeout: 300_000 }, () => {
    property("target", 20);
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

  it("the settle temperature does not depend on the target (forging-bar family)", { timeout: 300_000 }, () => {
    property("settle", 8);
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 1.2e-5, noNaN: true }), fc.double({ min: 60, max: 400, noNaN: true }), fc.double({ min: 500, max: 1000, noNaN: true }), (capacitance, low, high) => {
        const base = mutate(forging, "capacitor.capacitance", capacitance);
        const options = { temperatureScan: false, impedanceSweep: false };
        const a = study(mutate(base, "part.targetTemperature", `${low} °C`), options);
        const b = study(mutate(base, "part.targetTemperature", `${high} °C`), options);
        if (a === null || b === null) return true;
        const ta = a.heatUp?.steadyStateTemperature ?? null;
        const tb = b.heatUp?.steadyStateTemperature ?? null;
        if (ta === null || tb === null) return ta === tb;
        return Math.abs(ta - tb) <= 1e-6 * ta;
      }),
      { seed: 3, numRuns: 6 },
    );
  });

  it("continuation finds an operating point at every temperature between two that solve, unless the tank genuinely cannot oscillate", () => {
    let checked = 0;
    fc.assert(
      fc.property(fc.double({ min: 2e-6, max: 1.5e-5, noNaN: true }), fc.double({ min: 20, max: 1000, noNaN: true }), fc.double({ min: 20, max: 1000, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), (capacitance, t1, t2, u) => {
        const d = readHeaterDescription(mutate(forging, "capacitor.capacitance", capacitance));
        const props = coilProperties(d);
        const at = (c: number) => {
          try {
            return heaterOperatingPoint(d, c + 273.15, true, props);
          } catch (e) {
            if (e instanceof NoOscillationError) return "no-oscillation";
            if (!(e instanceof InputError)) throw e;
            return null;
          }
        };
        const a = at(Math.min(t1, t2));
        const b = at(Math.max(t1, t2));
        if (a === null || b === null || typeof a === "string" || typeof b === "string") return true;
        const middle = at(Math.min(t1, t2) + u * Math.abs(t2 - t1));
        checked++;
        // the no-oscillation verdict comes from a scan of every field from 1e-6 to 1e6 times the
        // empty-coil field (each with its own frequency fixed point): a genuine failure, not a stall
        return middle !== null;
      }),
      { seed: 4, numRuns: 40 },
    );
    expect(checked).toBeGreaterThanOrEqual(30);
  });
});
