import { describe, expect, it } from "vitest";
import { readHeaterDescription, solveAxisymmetricField, studyHeater } from "../../src/index.js";
import { SHORT_PART_ERROR, studyPartCoupling } from "../../src/study/operating-point.js";
import { MU_0 } from "../../src/units/index.js";
import { loadExample } from "./cases.js";

// A magnetic part shorter than the coil, measured against a better method: the library's
// axisymmetric field solver (itself within 1e-3 of an independent scikit-fem solution,
// test/fixtures/field-reference), every turn a solid tube, the part's μr and ρ fixed. The study
// scales the long part's exact coupling by the surface-impedance end-effect factor; its stated
// error (SHORT_PART_ERROR, measured over a grid by scripts/measurements/short-magnetic-part.ts)
// is what these points must meet. The field solver's own accuracy setting (3e-3) is on top.
const rhoCopper = 1.75e-8 * (1 + 0.0039 * 15); // copper at 35 °C (the example's coil temperature), handbook coefficient, from memory
const turns = Array.from({ length: 6 }, (_, i) => ({ kind: "circle" as const, r: 0.075, z: -0.024 + (i + 0.5) * 0.008, radius: 0.003, innerRadius: 0.002 }));
const coil = { name: "coil", current: 1, turns, resistivity: rhoCopper, model: "solid" as const };

function fieldChange(frequency: number, region: { rMin: number; rMax: number; zMin: number; zMax: number }, resistivity: number, relativePermeability: number): { dR: number; dL: number; L0: number } {
  const empty = solveAxisymmetricField({ frequency, coils: [coil], regions: [], accuracy: 3e-3 }).coils["coil"];
  const part = { name: "part", shape: { kind: "rectangle" as const, ...region }, resistivity, relativePermeability };
  const full = solveAxisymmetricField({ frequency, coils: [coil], regions: [part], accuracy: 3e-3 }).coils["coil"];
  return { dR: (full?.resistance ?? 0) - (empty?.resistance ?? 0), dL: (full?.inductance ?? 0) - (empty?.inductance ?? 0), L0: empty?.inductance ?? 1 };
}

describe("studyHeater: a magnetic part shorter than the coil against the field solver", () => {
  it("the bearing-race ring (0.63 × the coil length, μr ≈ 150, 140 skin depths thick) within the thick-section bound", () => {
    const s = studyHeater(loadExample("study-bearing-race.json"), { heatUp: false, temperatureScan: false, impedanceSweep: false });
    const o = s.operating;
    const f = fieldChange(o.frequency, { rMin: 0.05, rMax: 0.062, zMin: -0.015, zMax: 0.015 }, o.partResistivity, o.partRelativePermeability);
    const bound = SHORT_PART_ERROR.thick;
    expect(Math.abs(o.reflectedResistance / f.dR - 1)).toBeLessThan(bound.resistance);
    expect(Math.abs(o.inductanceChange - f.dL) / f.L0).toBeLessThan(bound.inductance);
    // the empty coil's own inductance is right (the model the study uses for the coil)
    expect(Math.abs(o.coilInductance / f.L0 - 1)).toBeLessThan(0.01);
    // and the validity note states the bound that applies
    expect(o.validity.find((n) => n.code === "part-shorter-than-coil")?.message).toContain(`${bound.resistance * 100} %`);
  }, 60_000);

  it("a steel bar 0.35 × the coil length, μr 80, 40 skin depths in radius, within the general bound", () => {
    const frequency = 37_000;
    const relativePermeability = 80;
    const delta = 0.03 / 40;
    const resistivity = Math.PI * frequency * MU_0 * relativePermeability * delta * delta;
    const base = loadExample("study-bearing-race.json");
    const d = readHeaterDescription({ ...base, part: { shape: "bar", radius: "30 mm", length: `${0.35 * 48} mm`, material: "lowCarbonSteel", startTemperature: "20 °C", targetTemperature: "120 °C" } });
    const study = studyPartCoupling(d, frequency, resistivity, relativePermeability);
    const f = fieldChange(frequency, { rMin: 0, rMax: 0.03, zMin: -0.0084, zMax: 0.0084 }, resistivity, relativePermeability);
    const bound = SHORT_PART_ERROR.general;
    expect(Math.abs(study.reflectedResistance / f.dR - 1)).toBeLessThan(bound.resistance);
    expect(Math.abs(study.inductanceChange - f.dL) / f.L0).toBeLessThan(bound.inductance);
  }, 60_000);
});
