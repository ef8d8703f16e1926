import { describe, expect, it } from "vitest";
import { barInLongCoil, InputError, layeredCylinderInLongCoil, tubeInLongCoil } from "../../src/index.js";
import { MU_0 } from "../../src/units/index.js";
import fixture from "../fixtures/layered-cylinder/layered-cylinder.json" with { type: "json" };

const coil = { innerRadius: 0.03, length: 0.3, turns: 20 };
const nn = (coil.turns * coil.turns) / coil.length;

function rel(a: number, b: number): number {
  return Math.abs(a / b - 1);
}

describe("layeredCylinderInLongCoil: independent mpmath solution of the layered problem (fixture layered-cylinder.json, confirmed by a scipy ODE solve)", () => {
  const rtol = fixture.meta.rtol;
  it.each(fixture.cases.map((c) => [c.label, c] as const))("%s", (_label, c) => {
    const r = layeredCylinderInLongCoil({
      coil: c.coil,
      frequency: c.frequency,
      innerRadius: c.innerRadius,
      radii: c.radii,
      resistivities: c.resistivities,
      relativePermeabilities: c.relativePermeabilities,
    });
    expect(rel(r.surfaceImpedance.re, c.surfaceImpedance[0]!)).toBeLessThan(rtol);
    expect(rel(r.surfaceImpedance.im, c.surfaceImpedance[1]!)).toBeLessThan(rtol);
    expect(rel(r.reflectedResistance, c.reflectedResistance)).toBeLessThan(rtol);
    expect(rel(r.reactanceChange, c.reactanceChange)).toBeLessThan(rtol);
    // shell powers: Joule loss by quadrature in the fixture, Poynting flux differences here
    for (let i = 0; i < c.shellPowers.length; i++) {
      expect(Math.abs(r.shellPowers[i]! - c.shellPowers[i]!)).toBeLessThan(rtol * c.reflectedResistance);
    }
    for (let i = 0; i < c.fieldRatios.length; i++) {
      expect(Math.abs(r.fieldRatios[i]! - c.fieldRatios[i]!)).toBeLessThan(rtol);
    }
  });
});

describe("layeredCylinderInLongCoil: equal shells reduce to the uniform exact Bessel solutions", () => {
  const frequencies = [10, 1e3, 1e4, 1e5, 1e6, 1e7];
  for (const f of frequencies) {
    for (const shells of [1, 7, 200]) {
      for (const mur of [1, 40]) {
        it(`bar: barInLongCoil within 1e-12 (f = ${f} Hz, ${shells} shells, μr = ${mur})`, () => {
          const radius = 0.02;
          const radii = Array.from({ length: shells }, (_, i) => (radius * (i + 1)) / shells);
          const ref = barInLongCoil({ coil, bar: { radius, resistivity: 1.2e-6, relativePermeability: mur }, frequency: f });
          const r = layeredCylinderInLongCoil({
            coil,
            frequency: f,
            radii,
            resistivities: radii.map(() => 1.2e-6),
            relativePermeabilities: radii.map(() => mur),
          });
          expect(rel(r.reflectedResistance, ref.reflectedResistance)).toBeLessThan(1e-12);
          // ΔL is a small difference at low frequency: measured against the part's own flux term
          const scale = mur * MU_0 * Math.PI * radius * radius * nn;
          expect(Math.abs(r.inductanceChange - ref.inductanceChange)).toBeLessThan(1e-12 * scale);
          expect(r.emptyCoilInductance).toBe(ref.emptyCoilInductance);
          const sum = r.shellPowers.reduce((a, b) => a + b, 0);
          expect(rel(sum, r.reflectedResistance)).toBeLessThan(1e-12);
          expect(r.fieldRatios[shells]).toBe(1);
        });
        it(`tube: tubeInLongCoil within 1e-12 (f = ${f} Hz, ${shells} shells, μr = ${mur})`, () => {
          const radii = Array.from({ length: shells }, (_, i) => 0.015 + (0.005 * (i + 1)) / shells);
          const ref = tubeInLongCoil({
            coil,
            tube: { outerRadius: 0.02, innerRadius: 0.015, resistivity: 1.2e-6, relativePermeability: mur },
            frequency: f,
          });
          const r = layeredCylinderInLongCoil({
            coil,
            frequency: f,
            innerRadius: 0.015,
            radii,
            resistivities: radii.map(() => 1.2e-6),
            relativePermeabilities: radii.map(() => mur),
          });
          expect(rel(r.reflectedResistance, ref.reflectedResistance)).toBeLessThan(1e-12);
          const scale = mur * MU_0 * Math.PI * 0.02 * 0.02 * nn;
          expect(Math.abs(r.inductanceChange - ref.inductanceChange)).toBeLessThan(1e-12 * scale);
        });
      }
    }
  }
  it("a bar thousands of skin depths thick stays finite (radius/δ ≈ 2000, scaled Bessel functions)", () => {
    const ref = barInLongCoil({ coil, bar: { radius: 0.02, resistivity: 1.7e-8, relativePermeability: 100 }, frequency: 1e6 });
    const r = layeredCylinderInLongCoil({ coil, frequency: 1e6, radii: [0.01, 0.02], resistivities: [1.7e-8, 1.7e-8], relativePermeabilities: [100, 100] });
    expect(ref.ratio).toBeGreaterThan(1000);
    expect(rel(r.reflectedResistance, ref.reflectedResistance)).toBeLessThan(1e-12);
    expect(r.fieldRatios[0]).toBe(0); // underflows, as the true value (e^{-2000})
  });
});

describe("layeredCylinderInLongCoil: the TSDoc example", () => {
  it("forging bar with a hot rim", () => {
    const r = layeredCylinderInLongCoil({
      coil,
      frequency: 1e4,
      radii: [0.018, 0.02],
      resistivities: [6e-7, 1.15e-6],
      relativePermeabilities: [30, 1],
    });
    expect(r.reflectedResistance.toPrecision(4)).toBe("0.06551");
    expect((r.shellPowers[1]! / r.reflectedResistance).toFixed(3)).toBe("0.755");
  });
});

describe("layeredCylinderInLongCoil: input errors", () => {
  const base = { coil, frequency: 1e4, radii: [0.01, 0.02], resistivities: [1e-6, 1e-6], relativePermeabilities: [1, 1] };
  it("rejects an unknown option key, naming the nearest", () => {
    expect(() => layeredCylinderInLongCoil({ ...base, frequncy: 5 } as never)).toThrow(/did you mean "frequency"/);
    expect(() => layeredCylinderInLongCoil({ ...base, coil: { ...coil, turn: 3 } } as never)).toThrow(InputError);
  });
  it("rejects radii not increasing, a bore at or beyond the first radius, a part wider than the bore of the coil", () => {
    expect(() => layeredCylinderInLongCoil({ ...base, radii: [0.02, 0.01] })).toThrow(InputError);
    expect(() => layeredCylinderInLongCoil({ ...base, innerRadius: 0.01 })).toThrow(InputError);
    expect(() => layeredCylinderInLongCoil({ ...base, radii: [0.01, 0.04] })).toThrow(InputError);
  });
  it("rejects arrays of unequal length, empty arrays, μr < 1 and ρ ≤ 0", () => {
    expect(() => layeredCylinderInLongCoil({ ...base, resistivities: [1e-6] })).toThrow(InputError);
    expect(() => layeredCylinderInLongCoil({ ...base, radii: [], resistivities: [], relativePermeabilities: [] })).toThrow(InputError);
    expect(() => layeredCylinderInLongCoil({ ...base, relativePermeabilities: [1, 0.5] })).toThrow(InputError);
    expect(() => layeredCylinderInLongCoil({ ...base, resistivities: [1e-6, 0] })).toThrow(InputError);
    expect(() => layeredCylinderInLongCoil({ ...base, radii: "x" } as never)).toThrow(InputError);
  });
});
