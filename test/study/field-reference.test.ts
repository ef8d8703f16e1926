/**
 * The study's part coupling against the axisymmetric finite-element solutions of the reference
 * scenarios (fixture test/fixtures/field-reference/batch1.json, generated with scikit-fem by
 * test/fixtures/field-reference/generate.py; every turn a solid conductor of its real section).
 * The part's properties are fixed (non-magnetic, or μr given), so the study's coupling is compared
 * at the fixture's frequencies: the study's part power at the operating point is I²·R_reflected,
 * compared with the field solution's part losses at 1 A (the field solution's loaded-minus-empty
 * resistance also holds the change of the coil's own losses, which is the coil model's share);
 * ΔL is compared relative to the loaded inductance (the part's share of the frequency error).
 */
import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { readHeaterDescription } from "../../src/index.js";
import { studyPartCoupling } from "../../src/study/operating-point.js";
import {
  CLOSED_FORM_COIL_INDUCTANCE_ERROR,
  CLOSED_FORM_FIELD_REFERENCE_TOLERANCE,
  COIL_INDUCTANCE_ERROR,
  FIELD_REFERENCE_TOLERANCE,
  coilProperties,
} from "../../src/study/operating-point.js";

interface Result {
  frequency: number;
  empty: { inductance: number };
  loaded: { inductance: number; partLosses: number };
  reflectedResistance: number;
  inductanceChange: number;
  uncertainty: { partLosses: number; inductanceChange: number };
}
interface Case {
  id: string;
  coil: {
    shape: "solenoid" | "pancake";
    radius?: number;
    length?: number;
    innerRadius?: number;
    pitch?: number;
    turns: number;
    conductor: { kind: "tube"; outerDiameter: number; wallThickness: number } | { kind: "round"; diameter: number };
  };
  part: { shape: "bar" | "tube" | "plate"; radius: number; innerRadius?: number; length?: number; thickness?: number; gap?: number; resistivity: number; relativePermeability: number };
  results: Result[];
}
const fixture = JSON.parse(readFileSync(new URL("../fixtures/field-reference/batch1.json", import.meta.url), "utf8")) as { cases: Case[] };

/** A study description of the scenario (supply, inverter and capacitor do not enter the coupling). */
function describeScenario(c: Case): unknown {
  const conductor = c.coil.conductor.kind === "tube" ? c.coil.conductor : { kind: "solid", diameter: c.coil.conductor.diameter };
  const base = {
    supply: { kind: "dc-bus", voltage: 48, internalResistance: 0 },
    inverter: { kind: "current-fed-parallel", chokeInductance: 1e-4, switchOnResistance: 0 },
    capacitor: { capacitance: 1e-6 },
  };
  const material = "aluminium";
  if (c.coil.shape === "solenoid") {
    const coil = { shape: "solenoid", radius: c.coil.radius, length: c.coil.length, turns: c.coil.turns, conductor };
    const part =
      c.part.shape === "tube"
        ? { shape: "tube", outerRadius: c.part.radius, wallThickness: c.part.radius - (c.part.innerRadius ?? 0), length: c.part.length, material, targetTemperature: 330 }
        : { shape: "bar", radius: c.part.radius, length: c.part.length, material, targetTemperature: 330 };
    return { ...base, coil, part };
  }
  const outer = (c.coil.innerRadius ?? 0) + (c.coil.turns - 1) * (c.coil.pitch ?? 0);
  const coil = { shape: "pancake", innerRadius: c.coil.innerRadius, outerRadius: outer, turns: c.coil.turns, liftOff: c.part.gap, conductor };
  // a plate twice the fixture's radius square: the study models it as infinitely wide either way
  const part = { shape: "plate", length: 2 * c.part.radius, width: 2 * c.part.radius, thickness: c.part.thickness, material, targetTemperature: 330 };
  return { ...base, coil, part };
}

const print = process.env.FLUXWRIGHT_PRINT_FEM === "1";
const tiers = [
  ["cells", FIELD_REFERENCE_TOLERANCE],
  ["closed-form", CLOSED_FORM_FIELD_REFERENCE_TOLERANCE],
] as const;

for (const [tier, tolerances] of tiers) {
  describe(`the study's part coupling (${tier} tier) against the field solution (scikit-fem fixture)`, () => {
    for (const c of fixture.cases) {
      const tolerance = tolerances[c.id];
      for (const r of c.results) {
        it(`scenario ${c.id} at ${r.frequency} Hz: part power within ${tolerance?.resistance} and ΔL within ${tolerance?.inductance} of the loaded inductance`, { timeout: 120_000 }, () => {
          expect(tolerance).toBeDefined();
          const d = readHeaterDescription(describeScenario(c));
          const s = studyPartCoupling(d, r.frequency, c.part.resistivity, c.part.relativePermeability, tier);
          const power = s.reflectedResistance / r.loaded.partLosses - 1;
          const inductance = (s.inductanceChange - r.inductanceChange) / r.loaded.inductance;
          if (print) console.log(tier, c.id, r.frequency, power.toExponential(2), inductance.toExponential(2), (s.emptyInductance / r.empty.inductance - 1).toExponential(2));
          expect(Math.abs(power)).toBeLessThanOrEqual((tolerance?.resistance ?? 0) + r.uncertainty.partLosses);
          expect(Math.abs(inductance)).toBeLessThanOrEqual(tolerance?.inductance ?? 0);
        });
      }
    }
  });
}

describe("the empty coil's inductance against the field solution", () => {
  it(`cells tier: within COIL_INDUCTANCE_ERROR (${COIL_INDUCTANCE_ERROR}) at every fixture frequency`, { timeout: 120_000 }, () => {
    let checked = 0;
    for (const c of fixture.cases) {
      const d = readHeaterDescription(describeScenario(c));
      for (const r of c.results) {
        const L0 = studyPartCoupling(d, r.frequency, c.part.resistivity, c.part.relativePermeability, "cells").emptyInductance;
        expect(Math.abs(L0 / r.empty.inductance - 1)).toBeLessThanOrEqual(COIL_INDUCTANCE_ERROR);
        checked++;
      }
    }
    expect(checked).toBeGreaterThan(0);
  });
  it(`closed-form tier (solenoids): reads high by at most CLOSED_FORM_COIL_INDUCTANCE_ERROR (${CLOSED_FORM_COIL_INDUCTANCE_ERROR})`, () => {
    let checked = 0;
    for (const c of fixture.cases) {
      if (c.coil.shape !== "solenoid") continue;
      const d = readHeaterDescription(describeScenario(c));
      const L0 = coilProperties(d, "closed-form").inductance;
      for (const r of c.results) {
        expect(Math.abs(L0 / r.empty.inductance - 1)).toBeLessThanOrEqual(CLOSED_FORM_COIL_INDUCTANCE_ERROR);
        checked++;
      }
    }
    expect(checked).toBeGreaterThan(0);
  });
});
