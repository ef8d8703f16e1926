import { describe, it, expect } from "vitest";
import { readFileSync } from "node:fs";
import { solveAxisymmetricField } from "../../src/index.js";
import type { AxisymmetricFieldCoil, FieldRegion } from "../../src/index.js";

// Outside reference: test/fixtures/field-saturation/saturation.json, an independent
// finite-element solution (gmsh + scikit-fem, generate.py beside it) of a saturating steel billet
// (r 8 mm × 60 mm, ρ 2e-7 Ω·m, the fixture's B–H curve) in four copper tube turns at 1 kA RMS and
// 10 kHz, with the same idealisation this solver states (first-harmonic effective permeability
// per element). Two reference meshes differ by `uncertainty` (0.2 %).

interface BilletCase {
  id: string;
  frequency: number;
  coils: AxisymmetricFieldCoil[];
  regions: FieldRegion[];
  results: { resistance: number; inductance: number; coilLosses: number; barLosses: number };
  uncertainty: number;
}
const fixture = JSON.parse(readFileSync(new URL("../fixtures/field-saturation/saturation.json", import.meta.url), "utf8")) as { cases: BilletCase[] };
const rel = (a: number, b: number): number => Math.abs(a / b - 1);

describe("saturating billet against the scikit-fem fixture", () => {
  for (const c of fixture.cases) {
    it(`${c.id}: R, L and the billet's loss at accuracy 3e-3`, () => {
      const r = solveAxisymmetricField({ frequency: c.frequency, coils: c.coils, regions: c.regions, accuracy: 3e-3 });
      expect(r.saturation.converged).toBe(true);
      const coil = r.coils.coil!;
      // measured: R +0.57 %, L −0.07 %, billet loss +0.68 % (the estimate reads 0.11 %: for
      // saturating steel it under-reads, as docs/field.md states)
      expect(rel(coil.resistance, c.results.resistance)).toBeLessThan(0.01 + c.uncertainty);
      expect(rel(coil.inductance, c.results.inductance)).toBeLessThan(0.003 + c.uncertainty);
      expect(rel(r.regions.bar!.losses, c.results.barLosses)).toBeLessThan(0.012 + c.uncertainty);
    }, 120_000);
  }
});
