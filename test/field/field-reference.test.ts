import { describe, it, expect } from "vitest";
import { readFileSync } from "node:fs";
import { solveAxisymmetricField } from "../../src/index.js";
import type { FieldCircle, FieldRectangle } from "../../src/index.js";

// Outside reference: an independent axisymmetric finite-element solution written with scikit-fem
// (gmsh meshes, scipy SuperLU; its own mesh-refinement and outer-boundary studies give the
// `uncertainty` of each value, 2e-4 to 1e-3), test/fixtures/field-reference/generate_batch1.py.
// Scenarios of the shared reference list: solid tube or round-wire turns, 1 A RMS, copper
// 1.75e-8 Ω·m, around a bar or over a plate.

interface Values {
  resistance: number;
  inductance: number;
  partLosses?: number;
}
interface Fixture {
  cases: {
    id: string;
    name: string;
    coil: { resistivity: number };
    part: { resistivity: number; relativePermeability: number };
    geometry: { turnShapes: FieldCircle[]; partRegion: FieldRectangle };
    results: { frequency: number; empty: Values; loaded: Values & { partLosses: number }; reflectedResistance: number; inductanceChange: number }[];
  }[];
}

const fixture = JSON.parse(readFileSync(new URL("../fixtures/field-reference/batch1.json", import.meta.url), "utf8")) as Fixture;
const rel = (a: number, b: number): number => Math.abs(a / b - 1);

describe("solveAxisymmetricField against the scikit-fem reference (batch 1)", () => {
  for (const c of fixture.cases) {
    for (const r of c.results) {
      it(`${c.id} (${c.name}) at ${r.frequency / 1e3} kHz: R, L empty and loaded, ΔR, part losses within 0.5 %`, () => {
        const coil = { name: "coil", current: 1, resistivity: c.coil.resistivity, model: "solid" as const, turns: c.geometry.turnShapes };
        const part = { name: "part", shape: c.geometry.partRegion, resistivity: c.part.resistivity, relativePermeability: c.part.relativePermeability };
        const loaded = solveAxisymmetricField({ frequency: r.frequency, coils: [coil], regions: [part], accuracy: 3e-3 });
        const empty = solveAxisymmetricField({ frequency: r.frequency, coils: [coil], accuracy: 3e-3 });
        const L = loaded.coils.coil!;
        const E = empty.coils.coil!;
        expect(rel(E.resistance, r.empty.resistance)).toBeLessThan(5e-3);
        expect(rel(E.inductance, r.empty.inductance)).toBeLessThan(5e-3);
        expect(rel(L.resistance, r.loaded.resistance)).toBeLessThan(5e-3);
        expect(rel(L.inductance, r.loaded.inductance)).toBeLessThan(5e-3);
        expect(rel(loaded.regions.part!.losses, r.loaded.partLosses)).toBeLessThan(5e-3);
        expect(rel(L.resistance - E.resistance, r.reflectedResistance)).toBeLessThan(5e-3);
        // ΔL can be a small difference of large numbers: compared against the loaded inductance
        expect(Math.abs(L.inductance - E.inductance - r.inductanceChange)).toBeLessThan(5e-3 * r.loaded.inductance);
      }, 300_000);
    }
  }
});
