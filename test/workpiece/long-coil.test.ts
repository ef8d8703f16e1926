import { describe, expect, it } from "vitest";
import { barInLongCoil, InputError, MU_0, tubeInLongCoil } from "../../src/index.js";
import diffusion from "../fixtures/workpiece/diffusion.json" with { type: "json" };

const coil = { innerRadius: 0.03, length: 0.3, turns: 20 };
const bar = { radius: 0.02, resistivity: 1.2e-6, relativePermeability: 1 };

function skinDepth(rho: number, f: number, mur: number): number {
  return Math.sqrt((2 * rho) / (2 * Math.PI * f * MU_0 * mur));
}

describe("barInLongCoil", () => {
  it("reflects R = N^2/l 2 pi a (rho/delta) P, with P from the numerical 1-D diffusion solution (fixture diffusion.json)", () => {
    for (const c of diffusion.cases.bar) {
      const rho = 1e-7;
      const f = 2e3;
      const mur = 20;
      const delta = skinDepth(rho, f, mur);
      const radius = c.radiusOverSkinDepth * delta;
      const r = barInLongCoil({ coil: { innerRadius: 1.5 * radius, length: 10 * radius, turns: 7 }, bar: { radius, resistivity: rho, relativePermeability: mur }, frequency: f });
      const expected = ((49 / (10 * radius)) * 2 * Math.PI * radius * (rho / delta)) * c.p;
      expect(Math.abs(r.reflectedResistance / expected - 1)).toBeLessThanOrEqual(1e-12);
      const dx = (49 / (10 * radius)) * (2 * Math.PI * radius * (rho / delta) * c.q - 2 * Math.PI * f * MU_0 * Math.PI * radius * radius);
      expect(Math.abs(r.reactanceChange - dx)).toBeLessThanOrEqual(1e-12 * Math.abs(expected / c.p) * Math.hypot(c.p, c.q));
    }
  });

  it("a magnetic bar at low frequency adds mu0 pi a^2 (mur - 1) N^2/l (magnetostatics of a long coil)", () => {
    const r = barInLongCoil({ coil, bar: { ...bar, relativePermeability: 50, resistivity: 1 }, frequency: 1e-3 });
    const expected = (MU_0 * Math.PI * 0.02 ** 2 * 49 * 400) / 0.3;
    expect(r.inductanceChange / expected).toBeCloseTo(1, 6);
  });

  it("a bar much thicker than the skin depth removes nearly all its cross-section's flux (common practice)", () => {
    const r = barInLongCoil({ coil, bar: { ...bar, resistivity: 1.7e-8 }, frequency: 1e7 });
    expect(r.inductanceChange / -((MU_0 * Math.PI * 0.02 ** 2 * 400) / 0.3)).toBeGreaterThan(0.99);
  });

  it("returns the empty-coil inductance and efficiency only when a coil resistance is given", () => {
    const r = barInLongCoil({ coil, bar, frequency: 1e4 });
    expect(r.efficiency).toBeUndefined();
    expect(r.emptyCoilInductance).toBeCloseTo((MU_0 * Math.PI * 0.03 ** 2 * 400) / 0.3, 15);
    expect(r.powerPerAmpereSquared).toBe(r.reflectedResistance);
  });

  it("notes a short coil (length < 4 inner radii, common practice) and a magnetic bar", () => {
    expect(barInLongCoil({ coil, bar, frequency: 1e4 }).validity).toHaveLength(0);
    const r = barInLongCoil({ coil: { ...coil, length: 0.1 }, bar: { ...bar, relativePermeability: 40 }, frequency: 1e4 });
    expect(r.validity.map((v) => v.code)).toEqual(["short-coil", "constant-permeability"]);
  });

  it("throws InputError for bad input", () => {
    const ok = { coil, bar, frequency: 1e4 };
    const bad: unknown[] = [
      { ...ok, coil: { ...coil, innerRadius: 0 } },
      { ...ok, coil: { ...coil, length: -1 } },
      { ...ok, coil: { ...coil, turns: 0 } },
      { ...ok, coil: { ...coil, turns: 2.5 } },
      { ...ok, bar: { ...bar, radius: 0.031 } },
      { ...ok, bar: { ...bar, radius: Number.NaN } },
      { ...ok, bar: { ...bar, resistivity: 0 } },
      { ...ok, bar: { ...bar, relativePermeability: 0.9 } },
      { ...ok, frequency: 0 },
      { ...ok, coilResistance: -0.1 },
      { ...ok, bar: undefined },
      { ...ok, coil: "coil" },
    ];
    for (const b of bad) expect(() => barInLongCoil(b as never)).toThrow(InputError);
  });
});

describe("tubeInLongCoil", () => {
  it("matches the numerical 1-D diffusion solution with an air bore to 1e-10 (fixture diffusion.json)", () => {
    for (const c of diffusion.cases.tube) {
      const rho = 1e-7;
      const f = 2e3;
      const mur = c.relativePermeability;
      const delta = skinDepth(rho, f, mur);
      const outer = c.outerRadiusOverSkinDepth * delta;
      const r = tubeInLongCoil({
        coil: { innerRadius: 2 * outer, length: 20 * outer, turns: 5 },
        tube: { outerRadius: outer, innerRadius: c.innerOverOuter * outer, resistivity: rho, relativePermeability: mur },
        frequency: f,
      });
      const scale = Math.hypot(c.p, c.q);
      expect(Math.abs(r.p - c.p)).toBeLessThanOrEqual(1e-10 * scale);
      expect(Math.abs(r.q - c.q)).toBeLessThanOrEqual(1e-10 * scale);
    }
  });

  it("a bore of zero radius is the solid bar; a wall many skin depths thick behaves as the bar", () => {
    const t0 = tubeInLongCoil({ coil, tube: { outerRadius: 0.02, innerRadius: 0, resistivity: 1.2e-6, relativePermeability: 1 }, frequency: 1e4 });
    const b = barInLongCoil({ coil, bar, frequency: 1e4 });
    expect(t0.reflectedResistance).toBe(b.reflectedResistance);
    const thick = tubeInLongCoil({ coil, tube: { outerRadius: 0.02, innerRadius: 0.01, resistivity: 1.2e-6, relativePermeability: 1 }, frequency: 1e6 });
    const bb = barInLongCoil({ coil, bar, frequency: 1e6 });
    expect(thick.reflectedResistance / bb.reflectedResistance).toBeCloseTo(1, 10);
  });

  it("throws InputError for bad input", () => {
    const tube = { outerRadius: 0.02, innerRadius: 0.01, resistivity: 1e-7, relativePermeability: 1 };
    expect(() => tubeInLongCoil({ coil, tube: { ...tube, innerRadius: 0.02 }, frequency: 1 })).toThrow(InputError);
    expect(() => tubeInLongCoil({ coil, tube: { ...tube, innerRadius: -0.001 }, frequency: 1 })).toThrow(InputError);
    expect(() => tubeInLongCoil({ coil, tube: { ...tube, outerRadius: 0.04 }, frequency: 1 })).toThrow(InputError);
    expect(() => tubeInLongCoil({ coil, tube, frequency: -1 })).toThrow(InputError);
  });
});
