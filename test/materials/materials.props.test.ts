import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  conductiveMaterials,
  relativePermeabilityAt,
  resistivityAt,
  specificHeatAt,
  thermalConductivityAt,
} from "../../src/materials/index.js";
import type { ConductiveMaterial, PermeabilityModel } from "../../src/materials/index.js";

const materialIndex = fc.integer({ min: 0, max: conductiveMaterials.length - 1 });
const unit = fc.double({ min: 0, max: 1, noNaN: true, noDefaultInfinity: true });
const logField = fc.double({ min: 0, max: 7, noNaN: true, noDefaultInfinity: true }).map((e) => 10 ** e);
const magnetic = conductiveMaterials.filter((m) => m.magnetic);
const magneticIndex = fc.integer({ min: 0, max: magnetic.length - 1 });

describe("material property invariants", () => {
  it("resistivity does not fall as temperature rises, for every metal", () => {
    fc.assert(
      fc.property(materialIndex, unit, unit, (i, u1, u2) => {
        const m = (conductiveMaterials[i] as ConductiveMaterial);
        const { min, max } = m.temperatureRange;
        const t1 = min + (max - min) * Math.min(u1, u2);
        const t2 = min + (max - min) * Math.max(u1, u2);
        return resistivityAt(m, t2) >= resistivityAt(m, t1);
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("resistivity strictly rises across the documented range, for every metal", () => {
    for (const m of conductiveMaterials) {
      expect(resistivityAt(m, m.temperatureRange.max)).toBeGreaterThan(resistivityAt(m, m.temperatureRange.min));
    }
  });

  it("all properties are positive and finite over the documented range", () => {
    fc.assert(
      fc.property(materialIndex, unit, logField, (i, u, h) => {
        const m = (conductiveMaterials[i] as ConductiveMaterial);
        const t = m.temperatureRange.min + (m.temperatureRange.max - m.temperatureRange.min) * u;
        const values = [
          resistivityAt(m, t),
          specificHeatAt(m, t),
          thermalConductivityAt(m, t),
          relativePermeabilityAt(m, { temperature: t, fieldStrengthPeak: h }),
        ];
        return values.every((v) => Number.isFinite(v) && v > 0);
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("permeability is exactly 1 above the Curie temperature, at any field", () => {
    fc.assert(
      fc.property(magneticIndex, fc.double({ min: 0, max: 2000, noNaN: true, noDefaultInfinity: true }), logField, (i, dt, h) => {
        const m = (magnetic[i] as ConductiveMaterial);
        return relativePermeabilityAt(m, { temperature: (m.curieTemperature as number) + dt, fieldStrengthPeak: h }) === 1;
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("permeability lies between 1 and its low-field bound and does not rise with field or temperature", () => {
    fc.assert(
      fc.property(magneticIndex, unit, unit, logField, logField, (i, u1, u2, h1, h2) => {
        const m = (magnetic[i] as ConductiveMaterial);
        const tc = (m.curieTemperature as number);
        const t1 = 250 + (tc + 50 - 250) * Math.min(u1, u2);
        const t2 = 250 + (tc + 50 - 250) * Math.max(u1, u2);
        const hl = Math.min(h1, h2);
        const hh = Math.max(h1, h2);
        const bound = (m.permeability as PermeabilityModel).initialRelativePermeability;
        const a = relativePermeabilityAt(m, { temperature: t1, fieldStrengthPeak: hl });
        const b = relativePermeabilityAt(m, { temperature: t1, fieldStrengthPeak: hh });
        const c = relativePermeabilityAt(m, { temperature: t2, fieldStrengthPeak: hl });
        return a >= 1 && a <= bound && b <= a && c <= a;
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("permeability is continuous through the start of the Curie transition", () => {
    for (const m of magnetic) {
      const start = (m.curieTemperature as number) - (m.permeability as PermeabilityModel).transitionWidth;
      const below = relativePermeabilityAt(m, { temperature: start - 1e-6, fieldStrengthPeak: 1e4 });
      const above = relativePermeabilityAt(m, { temperature: start + 1e-6, fieldStrengthPeak: 1e4 });
      expect(Math.abs(below - above) / below).toBeLessThan(1e-6);
    }
  });
});
