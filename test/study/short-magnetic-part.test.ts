import { describe, expect, it } from "vitest";
import { solveAxisymmetricField, studyHeater } from "../../src/index.js";
import { loadExample } from "./cases.js";

// The study's stated error for a magnetic part shorter than the coil, measured against a better
// method: the axisymmetric field solver (itself within 1e-3 of an independent scikit-fem solution,
// test/fixtures/field-reference), with every turn a solid tube and the ring's μr and ρ held at the
// study's operating-point values. The validity note says "about 49 % high" (reflected resistance)
// and "9 % high" (ΔL); this test keeps that statement true.
describe("studyHeater: a magnetic ring shorter than the coil against the field solver", () => {
  it("reflected resistance ≈ 1.49× and ΔL ≈ 1.09× the field solution (bearing-race example)", () => {
    const s = studyHeater(loadExample("study-bearing-race.json"), { heatUp: false, temperatureScan: false, impedanceSweep: false });
    const o = s.operating;
    const rhoCu = 1.75e-8 * (1 + 0.0039 * 15); // copper at 35 °C (the example's coil temperature), handbook coefficient, from memory
    const turns = Array.from({ length: 6 }, (_, i) => ({ kind: "circle" as const, r: 0.075, z: -0.024 + (i + 0.5) * 0.008, radius: 0.003, innerRadius: 0.002 }));
    const coil = { name: "coil", current: 1, turns, resistivity: rhoCu, model: "solid" as const };
    const ring = { name: "ring", shape: { kind: "rectangle" as const, rMin: 0.05, rMax: 0.062, zMin: -0.015, zMax: 0.015 }, resistivity: o.partResistivity, relativePermeability: o.partRelativePermeability };
    const empty = solveAxisymmetricField({ frequency: o.frequency, coils: [coil], regions: [], accuracy: 3e-3 }).coils["coil"];
    const full = solveAxisymmetricField({ frequency: o.frequency, coils: [coil], regions: [ring], accuracy: 3e-3 }).coils["coil"];
    const dR = (full?.resistance ?? 0) - (empty?.resistance ?? 0);
    const dL = (full?.inductance ?? 0) - (empty?.inductance ?? 0);
    expect(o.reflectedResistance / dR).toBeGreaterThan(1.4);
    expect(o.reflectedResistance / dR).toBeLessThan(1.58);
    expect(o.inductanceChange / dL).toBeGreaterThan(1.0);
    expect(o.inductanceChange / dL).toBeLessThan(1.18);
    // the empty coil's own inductance is right (the model the study uses for the coil)
    expect(Math.abs(o.coilInductance / (empty?.inductance ?? 1) - 1)).toBeLessThan(0.01);
  }, 120_000);
});
