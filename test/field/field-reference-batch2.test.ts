import { describe, it, expect } from "vitest";
import { readFileSync } from "node:fs";
import { solveAxisymmetricField } from "../../src/index.js";
import type { AxisymmetricFieldCoil, FieldRegion } from "../../src/index.js";

// Outside reference: the independent scikit-fem solution of geometries no closed form covers
// (a billet shorter than its coil, rings over and inside a pancake, a pancake with a ferrite
// concentrator, a stranded solenoid), test/fixtures/field-reference/generate_batch2.py; its own
// refinement studies give uncertainties of 2e-4 to 1e-3 on these energies.

interface Batch2 {
  cases: {
    id: string;
    frequency: number;
    coils: AxisymmetricFieldCoil[];
    regions: FieldRegion[];
    results: {
      empty: { resistance: number; inductance: number };
      loaded: { resistance: number; inductance: number; coilLosses: number };
      regions: Record<string, { losses: number }>;
    };
  }[];
}

const fixture = JSON.parse(readFileSync(new URL("../fixtures/field-reference/batch2.json", import.meta.url), "utf8")) as Batch2;
const rel = (a: number, b: number): number => Math.abs(a / b - 1);

describe("solveAxisymmetricField against the scikit-fem reference (batch 2: no closed form)", () => {
  for (const c of fixture.cases) {
    it(`${c.id}: R, L empty and loaded, coil and region losses within 0.5 %`, () => {
      const loaded = solveAxisymmetricField({ frequency: c.frequency, coils: c.coils, regions: c.regions, accuracy: 3e-3 });
      const empty = solveAxisymmetricField({ frequency: c.frequency, coils: c.coils, accuracy: 3e-3 });
      const L = loaded.coils.coil!;
      const E = empty.coils.coil!;
      expect(rel(E.resistance, c.results.empty.resistance)).toBeLessThan(5e-3);
      expect(rel(E.inductance, c.results.empty.inductance)).toBeLessThan(5e-3);
      expect(rel(L.resistance, c.results.loaded.resistance)).toBeLessThan(5e-3);
      expect(rel(L.inductance, c.results.loaded.inductance)).toBeLessThan(5e-3);
      expect(rel(L.losses, c.results.loaded.coilLosses)).toBeLessThan(5e-3);
      for (const [name, v] of Object.entries(c.results.regions)) {
        if (v.losses === 0) expect(loaded.regions[name]!.losses).toBe(0);
        else expect(rel(loaded.regions[name]!.losses, v.losses)).toBeLessThan(5e-3);
      }
    }, 300_000);
  }
});
