/**
 * The study's operating point against the axisymmetric finite-element solutions of the reference
 * scenarios (fixture test/fixtures/field-reference/batch1.json, generated with scikit-fem by
 * test/fixtures/field-reference/generate_batch1.py; every turn a solid conductor of its real
 * section), with the part's properties fixed (a material set of constant resistivity and
 * permeability), against the targets: frequency within 1 % and part power within 3 %.
 *
 * For each scenario and fixture frequency f_k the capacitor is chosen so that the field
 * solution's loaded coil (R, L at f_k) has its zero-phase frequency at f_k:
 * C = L/(R² + ω²L²). The reference operating point is then f_k, and the ideal current-fed
 * push-pull inverter (first harmonic, infinite choke; Kazimierczuk & Czarkowski, Resonant Power
 * Converters, 2nd ed., current-driven class D — from memory) draws P = π²V²/(2R_d) with
 * R_d = (R² + ω²L²)/R, of which the part takes the share partLoss/R. The study solves its own
 * coil model at its own frequency; only its coil and coupling differ from the reference.
 */
import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { copper, lowCarbonSteel, readHeaterDescription } from "../../src/index.js";
import type { ConductiveMaterial } from "../../src/index.js";
import { STUDY_FIELD_REFERENCE_TOLERANCE, coilProperties, heaterOperatingPoint } from "../../src/study/operating-point.js";

interface Result {
  frequency: number;
  loaded: { inductance: number; resistance: number; partLosses: number };
  uncertainty: { partLosses: number };
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
    resistivity: number;
    conductor: { kind: "tube"; outerDiameter: number; wallThickness: number } | { kind: "round"; diameter: number };
  };
  part: { shape: "bar" | "tube" | "plate"; radius: number; innerRadius?: number; length?: number; thickness?: number; gap?: number; resistivity: number; relativePermeability: number };
  results: Result[];
}
const fixture = JSON.parse(readFileSync(new URL("../fixtures/field-reference/batch1.json", import.meta.url), "utf8")) as { cases: Case[] };

/** A material set of constant resistivity and (below its Curie point, at any field) constant permeability. */
function fixedMaterial(base: ConductiveMaterial, resistivity: number, relativePermeability: number): ConductiveMaterial {
  const fixed = { ...base, id: "fixed", name: "fixed-property test material", resistivity20: resistivity, temperatureCoefficient: 0, resistivity: { kind: "linear" as const, source: "test" } };
  if (relativePermeability === 1) {
    const rest: Record<string, unknown> = { ...fixed };
    delete rest.curieTemperature;
    delete rest.permeability;
    return { ...(rest as unknown as ConductiveMaterial), magnetic: false };
  }
  const permeability = { ...(lowCarbonSteel.permeability as NonNullable<ConductiveMaterial["permeability"]>), initialRelativePermeability: relativePermeability, saturationFluxDensity: 1e9, transitionWidth: 1 };
  return { ...fixed, magnetic: true, curieTemperature: 1000, permeability };
}

const VOLTAGE = 12;
const PART_TEMPERATURE = 300;

function describeScenario(c: Case, capacitance: number): unknown {
  const material = fixedMaterial(copper, c.coil.resistivity, 1);
  const conductor = c.coil.conductor.kind === "tube" ? { ...c.coil.conductor, material } : { kind: "solid", diameter: c.coil.conductor.diameter, material };
  const base = {
    supply: { kind: "dc-bus", voltage: VOLTAGE, internalResistance: 0 },
    inverter: { kind: "current-fed-parallel", chokeInductance: 1, switchOnResistance: 0 },
    capacitor: { capacitance, dissipationFactor: 0 },
  };
  const partMaterial = fixedMaterial(c.part.relativePermeability > 1 ? lowCarbonSteel : copper, c.part.resistivity, c.part.relativePermeability);
  const common = { material: partMaterial, startTemperature: PART_TEMPERATURE, targetTemperature: PART_TEMPERATURE + 10 };
  if (c.coil.shape === "solenoid") {
    const coil = { shape: "solenoid", radius: c.coil.radius, length: c.coil.length, turns: c.coil.turns, conductor };
    const part =
      c.part.shape === "tube"
        ? { shape: "tube", outerRadius: c.part.radius, wallThickness: c.part.radius - (c.part.innerRadius ?? 0), length: c.part.length, ...common }
        : { shape: "bar", radius: c.part.radius, length: c.part.length, ...common };
    return { ...base, coil, part };
  }
  const outer = (c.coil.innerRadius ?? 0) + (c.coil.turns - 1) * (c.coil.pitch ?? 0);
  const coil = { shape: "pancake", innerRadius: c.coil.innerRadius, outerRadius: outer, turns: c.coil.turns, liftOff: c.part.gap, conductor };
  const part = { shape: "plate", length: 2 * c.part.radius, width: 2 * c.part.radius, thickness: c.part.thickness, ...common };
  return { ...base, coil, part };
}

describe("the study's operating point against the field solution at fixed part properties (scikit-fem fixture)", () => {
  for (const c of fixture.cases) {
    const tolerance = STUDY_FIELD_REFERENCE_TOLERANCE[c.id];
    for (const r of c.results) {
      it(`scenario ${c.id} at ${r.frequency} Hz: frequency within ${tolerance?.frequency}, part power within ${tolerance?.power}`, { timeout: 120_000 }, () => {
        expect(tolerance).toBeDefined();
        const omega = 2 * Math.PI * r.frequency;
        const { resistance: R, inductance: L, partLosses } = r.loaded;
        const capacitance = L / (R * R + omega * omega * L * L);
        const d = readHeaterDescription(describeScenario(c, capacitance));
        const p = heaterOperatingPoint(d, PART_TEMPERATURE, true, coilProperties(d));
        // the permeability held fixed at the fixture's value (the material set's saturation is out of reach)
        expect(Math.abs(p.partRelativePermeability / c.part.relativePermeability - 1)).toBeLessThan(1e-6);
        const dynamicResistance = (R * R + omega * omega * L * L) / R;
        const referencePower = ((Math.PI * Math.PI * VOLTAGE * VOLTAGE) / (2 * dynamicResistance)) * (partLosses / R);
        const frequencyError = p.frequency / r.frequency - 1;
        const powerError = p.losses.part / referencePower - 1;
        if (process.env.FLUXWRIGHT_PRINT_FEM === "1") console.log(c.id, r.frequency, frequencyError.toExponential(2), powerError.toExponential(2));
        expect(Math.abs(frequencyError)).toBeLessThanOrEqual(tolerance?.frequency ?? 0);
        expect(Math.abs(powerError)).toBeLessThanOrEqual((tolerance?.power ?? 0) + r.uncertainty.partLosses);
      });
    }
  }
});
