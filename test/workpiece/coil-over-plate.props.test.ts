import { describe, it } from "vitest";
import fc from "fast-check";
import { coilOverPlate, coilOverPlateTruncatedRegion } from "../../src/index.js";
import { logUniform } from "../support/arbitraries.js";

const cases = fc.record({
  outerRadius: logUniform(2e-3, 0.2),
  innerFraction: fc.double({ min: 0, max: 0.9, noNaN: true }),
  heightRatio: logUniform(0.02, 3),
  liftOffRatio: logUniform(1e-3, 2),
  turns: fc.integer({ min: 1, max: 200 }),
  thicknessRatio: logUniform(1e-3, 10),
  resistivity: logUniform(1.5e-8, 1.5e-6),
  relativePermeability: fc.oneof(fc.constant(1), logUniform(1, 300)),
  frequency: logUniform(1, 1e6),
});
type C = typeof cases extends fc.Arbitrary<infer T> ? T : never;

function run(c: C, patch: Partial<{ resistivity: number; frequency: number; thickness: number; scale: number; liftOff: number }> = {}) {
  const k = patch.scale ?? 1;
  const r2 = c.outerRadius * k;
  return coilOverPlate({
    coil: {
      innerRadius: c.innerFraction * r2,
      outerRadius: r2,
      length: c.heightRatio * r2,
      liftOff: patch.liftOff ?? c.liftOffRatio * r2,
      turns: c.turns,
    },
    plate: {
      thickness: patch.thickness ?? c.thicknessRatio * r2,
      resistivity: (patch.resistivity ?? c.resistivity) * k * k,
      relativePermeability: c.relativePermeability,
    },
    frequency: patch.frequency ?? c.frequency,
  });
}

describe("coilOverPlate properties", () => {
  it("reflected resistance ≥ 0, results finite", () => {
    fc.assert(
      fc.property(cases, (c) => {
        const r = run(c);
        return r.reflectedResistance >= 0 && Number.isFinite(r.reactanceChange) && r.emptyCoilInductance > 0 && Number.isFinite(r.inductance);
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("scaling every length by k and resistivity by k² scales ΔZ and L0 by k (Maxwell's equations are scale-invariant at fixed δ/length)", () => {
    fc.assert(
      fc.property(cases, logUniform(0.1, 10), (c, k) => {
        const a = run(c);
        const b = run(c, { scale: k });
        const dz = Math.hypot(a.reflectedResistance, a.reactanceChange);
        return (
          Math.abs(b.reflectedResistance - k * a.reflectedResistance) <= 1e-6 * k * dz &&
          Math.abs(b.reactanceChange - k * a.reactanceChange) <= 1e-6 * k * dz &&
          Math.abs(b.emptyCoilInductance / (k * a.emptyCoilInductance) - 1) <= 1e-6
        );
      }),
      { seed: 1, numRuns: 100 },
    );
  });

  it("as resistivity grows without bound a non-magnetic plate disappears (ΔZ → 0)", () => {
    fc.assert(
      fc.property(cases, (c) => {
        const nm = { ...c, relativePermeability: 1 };
        const r = run(nm, { resistivity: 1e6 });
        const ref = 2 * Math.PI * c.frequency * r.emptyCoilInductance;
        return Math.hypot(r.reflectedResistance, r.reactanceChange) < 1e-6 * ref;
      }),
      { seed: 1, numRuns: 100 },
    );
  });

  it("as frequency → 0 a non-magnetic plate disappears (ΔL → 0 once the skin depth is 1e4 coil radii)", () => {
    fc.assert(
      fc.property(cases, (c) => {
        const f = c.resistivity / (Math.PI * 4e-7 * Math.PI * (1e4 * c.outerRadius) ** 2);
        const r = run({ ...c, relativePermeability: 1 }, { frequency: f });
        return Math.abs(r.inductanceChange) < 1e-6 * r.emptyCoilInductance && r.reflectedResistance < 1e-6 * 2 * Math.PI * f * r.emptyCoilInductance;
      }),
      { seed: 1, numRuns: 100 },
    );
  });

  it("a non-magnetic plate always lowers the inductance (common practice)", () => {
    fc.assert(
      fc.property(cases, (c) => run({ ...c, relativePermeability: 1 }).inductanceChange < 0),
      { seed: 1, numRuns: 200 },
    );
  });

  it("a plate much thicker than the skin depth behaves as the half-space", () => {
    fc.assert(
      fc.property(cases, (c) => {
        const half = run(c, { thickness: Infinity });
        const thick = run(c, { thickness: 40 * half.skinDepth });
        const dz = Math.hypot(half.reflectedResistance, half.reactanceChange);
        return Math.abs(thick.reflectedResistance - half.reflectedResistance) <= 1e-6 * dz && Math.abs(thick.reactanceChange - half.reactanceChange) <= 1e-6 * dz;
      }),
      { seed: 1, numRuns: 100 },
    );
  });

  it("the coupling weakens as the coil is lifted (|ΔZ| falls with lift-off)", () => {
    fc.assert(
      fc.property(cases, (c) => {
        const near = run(c);
        const far = run(c, { liftOff: c.liftOffRatio * c.outerRadius * 2 + 1e-4 });
        return Math.hypot(far.reflectedResistance, far.reactanceChange) < Math.hypot(near.reflectedResistance, near.reactanceChange);
      }),
      { seed: 1, numRuns: 100 },
    );
  });

  it("the truncated-region series agrees with the Dodd–Deeds quadrature (two methods) to 1e-3 of |ΔZ| over random cases", () => {
    fc.assert(
      fc.property(cases, (c) => {
        const r2 = c.outerRadius;
        const options = {
          coil: { innerRadius: c.innerFraction * r2, outerRadius: r2, length: c.heightRatio * r2, liftOff: c.liftOffRatio * r2, turns: c.turns },
          plate: { thickness: c.thicknessRatio * r2, resistivity: c.resistivity, relativePermeability: c.relativePermeability },
          frequency: c.frequency,
        };
        const a = coilOverPlate(options);
        const b = coilOverPlateTruncatedRegion(options);
        const dz = Math.hypot(a.reflectedResistance, a.reactanceChange);
        return Math.hypot(b.reflectedResistance - a.reflectedResistance, b.reactanceChange - a.reactanceChange) <= 1e-3 * dz;
      }),
      { seed: 1, numRuns: 15 },
    );
  });
});
