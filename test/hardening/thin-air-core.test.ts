/**
 * coilOverPlate's air-core inductance for thin windings: the limit h → 0 is the flat current
 * sheet, finite, and reached without the 1/h error growth of the old h·K + J split.
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { coilOverPlate, multilayerCoilInductance } from "../../src/index.js";

interface Case { innerRadius: number; outerRadius: number; height: number; turns: number; airCoreInductance: number }
const fixture = JSON.parse(readFileSync(new URL("../fixtures/workpiece/thin-air-core/thin-air-core.json", import.meta.url), "utf8")) as { meta: { rtol: number }; cases: Case[] };
const plate = { thickness: 0.005, resistivity: 2e-7, relativePermeability: 1 };
const rel = (a: number, b: number): number => Math.abs(a / b - 1);

describe("coilOverPlate air-core inductance of thin windings", () => {
  it("matches the scipy fixture from 10 mm down to 10 nm, and tends to the current-sheet value", () => {
    // fixture: test/fixtures/workpiece/thin-air-core/generate.py (scipy Bessel/Struve quadrature)
    for (const c of fixture.cases) {
      const height = c.height === 0 ? 1e-12 : c.height;
      const r = coilOverPlate({ coil: { innerRadius: c.innerRadius, outerRadius: c.outerRadius, liftOff: 0.01, length: height, turns: c.turns }, plate, frequency: 1e4 });
      expect(rel(r.emptyCoilInductance, c.airCoreInductance)).toBeLessThanOrEqual(fixture.meta.rtol);
    }
  });

  it("agrees with multilayerCoilInductance (Bessel–Struve, its own fixture) for thin windings to 1e-6", () => {
    for (const height of [1e-2, 1e-3, 1e-4, 3e-5]) {
      const coil = { innerRadius: 0.2, outerRadius: 0.3, liftOff: 0.01, length: height, turns: 10 };
      const l0 = coilOverPlate({ coil, plate, frequency: 1e4 }).emptyCoilInductance;
      expect(rel(l0, multilayerCoilInductance({ innerRadius: 0.2, outerRadius: 0.3, length: height, turns: 10 }))).toBeLessThan(1e-6);
    }
  });
});
