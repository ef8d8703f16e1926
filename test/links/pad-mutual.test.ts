import { describe, expect, it } from "vitest";
import { InputError, loopMutualInductance, MU_0, padMutualInductance, type PadMutualInductanceOptions } from "../../src/index.js";
import fixture from "../fixtures/links/misaligned-loops.json" with { type: "json" };

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

describe("padMutualInductance", () => {
  for (const c of fixture.pads) {
    const i = c.input;
    it(`matches turn-pair sums of Neumann integrals (offset ${i.lateralOffset} m, image ${i.imageCoefficient.toFixed(3)})`, () => {
      const plate = i.imageCoefficient === 0 ? {} : i.imageCoefficient === -1
        ? { backingPlate: { material: "aluminium" as const, gap: i.plateGap } }
        : { backingPlate: { material: "ferrite" as const, gap: i.plateGap, relativePermeability: 1000 } };
      const r = padMutualInductance({ pad1: i.pad1, pad2: i.pad2, axialDistance: i.axialDistance, lateralOffset: i.lateralOffset, ...plate });
      // fixture: direct Neumann double integrals summed over turn pairs, test/fixtures/links/generate_misaligned.py
      expect(rel(r.mutualInductance, c.expected.mutualOverMu0 * MU_0)).toBeLessThanOrEqual(fixture.meta.rtol);
      expect(r.imageCoefficient).toBeCloseTo(i.imageCoefficient, 14);
      if (i.imageCoefficient !== 0) expect(r.validity.map((v) => v.code)).toContain("infinite-plate");
    });
  }

  it("reduces to the coaxial loop sum without an offset, and to one loop for one-turn pads", () => {
    const one = padMutualInductance({ pad1: { innerRadius: 0.1, outerRadius: 0.1, turns: 1 }, pad2: { innerRadius: 0.08, outerRadius: 0.08, turns: 1 }, axialDistance: 0.05 });
    expect(one.mutualInductance).toBe(loopMutualInductance({ radius1: 0.1, radius2: 0.08, axialDistance: 0.05 }));
  });

  it("a ferrite plate raises and an aluminium plate lowers the coupling", () => {
    const base: PadMutualInductanceOptions = { pad1: { innerRadius: 0.05, outerRadius: 0.15, turns: 8 }, pad2: { innerRadius: 0.05, outerRadius: 0.15, turns: 8 }, axialDistance: 0.1, lateralOffset: 0.05 };
    const bare = padMutualInductance(base).mutualInductance;
    expect(padMutualInductance({ ...base, backingPlate: { material: "ferrite", gap: 0.005 } }).mutualInductance).toBeGreaterThan(bare);
    expect(padMutualInductance({ ...base, backingPlate: { material: "aluminium", gap: 0.005 } }).mutualInductance).toBeLessThan(bare);
  });

  it("throws InputError for bad pads, plates and unknown keys", () => {
    const base: PadMutualInductanceOptions = { pad1: { innerRadius: 0.05, outerRadius: 0.09, turns: 3 }, pad2: { innerRadius: 0.04, outerRadius: 0.08, turns: 2 }, axialDistance: 0.03 };
    expect(() => padMutualInductance({ ...base, pad1: { innerRadius: 0.09, outerRadius: 0.05, turns: 3 } })).toThrow(InputError);
    expect(() => padMutualInductance({ ...base, pad2: { innerRadius: 0.04, outerRadius: 0.08, turns: 2.5 } })).toThrow(InputError);
    expect(() => padMutualInductance({ ...base, backingPlate: { material: "aluminium", gap: 0.01, relativePermeability: 1 } })).toThrow(InputError);
    expect(() => padMutualInductance({ ...base, backingPlate: { material: "ferrite", gap: 0.01, relativePermeability: 1 } })).toThrow(InputError);
    expect(() => padMutualInductance({ ...base, backingPlate: { material: "steel" as "ferrite", gap: 0.01 } })).toThrow(InputError);
    expect(() => padMutualInductance({ ...base, offset: 0.01 } as unknown as PadMutualInductanceOptions)).toThrow(/offset/);
  });

});
