import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { encirclingCoilOverRod, InputError, prepareEncirclingCoilOverRod } from "../../src/index.js";

interface RodCase {
  name: string;
  coil: { innerRadius: number; outerRadius: number; length: number; turns: number };
  rod: { radius: number; innerRadius: number; resistivity: number; relativePermeability: number };
  frequency: number;
  resistanceChange: number;
  reactanceChange: number;
}
const fixture = JSON.parse(readFileSync(new URL("../fixtures/workpiece/rod.json", import.meta.url), "utf8")) as { meta: { rtol: number }; cases: RodCase[] };

describe("prepareEncirclingCoilOverRod", () => {
  it("matches the scipy evaluation of the Dodd–Deeds–Luquire integral (fixture test/fixtures/workpiece/rod.json, generate.py)", () => {
    let checked = 0;
    for (const c of fixture.cases) {
      const evaluate = prepareEncirclingCoilOverRod({ coil: c.coil, rod: c.rod.innerRadius > 0 ? { radius: c.rod.radius, innerRadius: c.rod.innerRadius } : { radius: c.rod.radius } });
      const r = evaluate(c.frequency, c.rod.resistivity, c.rod.relativePermeability);
      const scale = Math.hypot(c.resistanceChange, c.reactanceChange);
      expect(Math.abs(r.reflectedResistance - c.resistanceChange) / scale, c.name).toBeLessThanOrEqual(fixture.meta.rtol);
      expect(Math.abs(r.reactanceChange - c.reactanceChange) / scale, c.name).toBeLessThanOrEqual(fixture.meta.rtol);
      checked++;
    }
    expect(checked).toBeGreaterThan(5);
  });

  it("agrees with encirclingCoilOverRod to 1e-7 over bars and tubes, μr 1 … 1000, a/δ 0.3 … 300", () => {
    const geometries = [
      { coil: { innerRadius: 0.022, outerRadius: 0.0225, length: 0.1, turns: 10 }, rod: { radius: 0.012 } },
      { coil: { innerRadius: 0.027, outerRadius: 0.033, length: 0.064, turns: 8 }, rod: { radius: 0.018 } },
      { coil: { innerRadius: 0.0185, outerRadius: 0.0215, length: 0.05, turns: 10 }, rod: { radius: 0.012, innerRadius: 0.01 } },
      { coil: { innerRadius: 0.07, outerRadius: 0.072, length: 0.048, turns: 6 }, rod: { radius: 0.062, innerRadius: 0.05 } },
    ];
    const materials: [number, number, number][] = [
      [1e3, 2e-7, 1],
      [2e4, 2e-7, 600],
      [5e4, 1.1e-6, 1],
      [300, 1e-6, 30],
      [2e5, 7.2e-7, 1],
      [1e4, 2e-7, 1000],
    ];
    for (const g of geometries) {
      const evaluate = prepareEncirclingCoilOverRod(g);
      for (const [f, rho, mur] of materials) {
        const exact = encirclingCoilOverRod({ coil: g.coil, rod: { ...g.rod, resistivity: rho, relativePermeability: mur }, frequency: f });
        const r = evaluate(f, rho, mur);
        const scale = Math.hypot(exact.reflectedResistance, exact.reactanceChange);
        expect(Math.abs(r.reflectedResistance - exact.reflectedResistance) / scale).toBeLessThanOrEqual(1e-7);
        expect(Math.abs(r.reactanceChange - exact.reactanceChange) / scale).toBeLessThanOrEqual(1e-7);
        expect(r.inductanceChange).toBe(r.reactanceChange / (2 * Math.PI * f));
      }
    }
  });

  it("rejects a geometry outside the hard domain and unknown keys with InputError", () => {
    const coil = { innerRadius: 0.02, outerRadius: 0.025, length: 0.05, turns: 10 };
    expect(() => prepareEncirclingCoilOverRod({ coil, rod: { radius: 0.02 } })).toThrow(InputError);
    expect(() => prepareEncirclingCoilOverRod({ coil: { ...coil, outerRadius: 0.01 }, rod: { radius: 0.01 } })).toThrow(/outerRadius/);
    expect(() => prepareEncirclingCoilOverRod({ coil, rod: { radius: 0.01, innerRadius: 0.01 } })).toThrow(/innerRadius/);
    expect(() => prepareEncirclingCoilOverRod({ coil: { ...coil, turns: 1.5 }, rod: { radius: 0.01 } })).toThrow(/turns/);
    expect(() => prepareEncirclingCoilOverRod({ coil, rod: { radius: 0.01, radus: 1 } as never })).toThrow(/did you mean "radius"/);
  });
});
