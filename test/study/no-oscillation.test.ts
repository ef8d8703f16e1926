import { describe, expect, it } from "vitest";
import { readHeaterDescription, studyHeater } from "../../src/index.js";
import type { HeaterDescription } from "../../src/index.js";
import { NoOscillationError, coilProperties, heaterOperatingPoint } from "../../src/study/operating-point.js";
import { loadExample, mutate } from "./cases.js";

// The bearing race on one turn with 300 mF: above the Curie point the steel's resistivity keeps
// rising, the loaded coil branch's resistance rises with it and crosses √(L/C), where a
// current-fed parallel tank has no zero-phase frequency (circuit theory: the branch R + jωL in
// parallel with C has Im Y = 0 at ω² = 1/(LC) − R²/L², which exists only while R < √(L/C)).
const d = mutate(mutate(loadExample("study-bearing-race.json"), "coil.turns", 1), "capacitor.capacitance", "300 mF") as unknown as HeaterDescription;
const study = studyHeater(d, { temperatureScan: false, impedanceSweep: false, radialHeatUp: false });
const band = study.heatUp?.unsolvedBands[0];

describe("studyHeater: a tank that cannot oscillate is a caution, not only a note", () => {
  it("reports the band as unsolved by no oscillation, and a danger caution naming it", () => {
    expect(band?.noOscillation).toBe(true);
    const c = study.cautions.find((x) => x.code === "tank-cannot-oscillate");
    expect(c?.severity).toBe("danger");
    expect(c?.value).toBe(band?.from);
    expect(study.validity.map((v) => v.code)).toContain("no-operating-point");
    // the band starts where the steel loses its permeability (within a few kelvin of the Curie
    // point, where μr has fallen towards 1) and runs to the top of the solved range
    expect(Math.abs((band?.from ?? 0) - (study.description.part.material.curieTemperature ?? Infinity))).toBeLessThan(5);
    expect(band?.to).toBe(study.heatUp?.powerCurveRange[1]);
  });

  it("just below the band the branch resistance approaches √(L/C) and the frequency obeys ω² = 1/(LC) − R²/L²", () => {
    const r = readHeaterDescription(d);
    const props = coilProperties(r);
    const from = band?.from ?? Number.NaN;
    // bisection reference: the last temperature that solves, within 0.5 K of the band's start
    let lo = r.part.startTemperature;
    let hi = from;
    for (let k = 0; k < 40 && hi - lo > 0.5; k++) {
      const mid = 0.5 * (lo + hi);
      try {
        heaterOperatingPoint(r, mid, true, props);
        lo = mid;
      } catch (e) {
        if (!(e instanceof NoOscillationError)) throw e;
        hi = mid;
      }
    }
    expect(from - lo).toBeLessThan(20); // the study's adaptive grid found the edge to within its spacing
    const p = heaterOperatingPoint(r, lo, true, props);
    const C = r.capacitor.capacitance;
    const limit = Math.sqrt(p.inductance / C);
    expect(p.tankResistance).toBeLessThan(limit);
    expect(p.tankResistance / limit).toBeGreaterThan(0.8);
    const omega2 = 1 / (p.inductance * C) - (p.tankResistance / p.inductance) ** 2;
    expect(Math.abs(2 * Math.PI * p.frequency - Math.sqrt(omega2)) / Math.sqrt(omega2)).toBeLessThan(0.02);
  });
});
