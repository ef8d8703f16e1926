import { describe, expect, it } from "vitest";
import { InputError, MU_0, slabInTangentialField } from "../../src/index.js";
import diffusion from "../fixtures/workpiece/diffusion.json" with { type: "json" };

const base = { thickness: 0.01, resistivity: 3e-8, relativePermeability: 1, frequency: 1e4, fieldStrengthRms: 1e4 };

describe("slabInTangentialField", () => {
  it("matches the numerical 1-D field-diffusion solution to 1e-12 (fixture diffusion.json, scipy DOP853 shooting)", () => {
    for (const c of diffusion.cases.slab) {
      // choose a slab whose thickness is the fixture's multiple of the skin depth
      const rho = 2e-7;
      const f = 5e3;
      const delta = Math.sqrt((2 * rho) / (2 * Math.PI * f * MU_0 * 10));
      const r = slabInTangentialField({ thickness: c.thicknessOverSkinDepth * delta, resistivity: rho, relativePermeability: 10, frequency: f, fieldStrengthRms: 1 });
      expect(Math.abs(r.p - c.p)).toBeLessThanOrEqual(1e-12 * Math.hypot(c.p, c.q));
      expect(Math.abs(r.q - c.q)).toBeLessThanOrEqual(1e-12 * Math.hypot(c.p, c.q));
    }
  });

  it("a thick slab takes the half-space power rho/delta H^2 per face (Stoll 1974, ch. 2)", () => {
    const r = slabInTangentialField({ ...base, thickness: 1 });
    const delta = Math.sqrt((2 * 3e-8) / (2 * Math.PI * 1e4 * MU_0));
    expect(r.powerPerArea / ((3e-8 / delta) * 1e8)).toBeCloseTo(1, 14);
    expect(slabInTangentialField({ ...base, thickness: Infinity }).p).toBe(1);
  });

  it("peaks at p = 1.0903 for thickness = pi skin depths (closed-form maximum, checked with numpy in the generator's conventions)", () => {
    const delta = Math.sqrt((2 * 3e-8) / (2 * Math.PI * 1e4 * MU_0));
    const r = slabInTangentialField({ ...base, thickness: Math.PI * delta });
    expect(r.p).toBeCloseTo(1.090331, 5);
  });

  it("has no cancellation for very thin slabs: p = (d/delta)^3/6 (series limit)", () => {
    const delta = Math.sqrt((2 * 3e-8) / (2 * Math.PI * 1e4 * MU_0));
    const r = slabInTangentialField({ ...base, thickness: 1e-6 * delta });
    expect(r.p / (1e-18 / 6)).toBeCloseTo(1, 10);
    expect(r.q / 1e-6).toBeCloseTo(1, 10);
  });

  it("adds a constant-permeability note for magnetic slabs only", () => {
    expect(slabInTangentialField(base).validity).toHaveLength(0);
    expect(slabInTangentialField({ ...base, relativePermeability: 100 }).validity[0]?.code).toBe("constant-permeability");
  });

  it("throws InputError for bad input", () => {
    const bad: Record<string, unknown>[] = [
      { thickness: 0 },
      { thickness: -1 },
      { thickness: Number.NaN },
      { resistivity: 0 },
      { resistivity: Infinity },
      { relativePermeability: 0.5 },
      { relativePermeability: Number.NaN },
      { frequency: 0 },
      { fieldStrengthRms: -1 },
      { fieldStrengthRms: "1" },
    ];
    for (const b of bad) {
      expect(() => slabInTangentialField({ ...base, ...b })).toThrow(InputError);
    }
    expect(() => slabInTangentialField(null as never)).toThrow(InputError);
  });
});
