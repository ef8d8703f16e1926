import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { barInLongCoil, encirclingCoilOverRod, InputError } from "../../src/index.js";
import rod from "../fixtures/workpiece/rod.json" with { type: "json" };

const coil = { innerRadius: 0.02, outerRadius: 0.025, length: 0.05, turns: 10 };
const aluminiumRod = { radius: 0.015, resistivity: 3e-8, relativePermeability: 1 };

describe("encirclingCoilOverRod", () => {
  it("matches an independent scipy evaluation of the Dodd, Deeds & Luquire (1969) integral to 1e-7 of |ΔZ| (fixture rod.json)", () => {
    for (const c of rod.cases) {
      const r = encirclingCoilOverRod({ coil: c.coil, rod: c.rod, frequency: c.frequency });
      const scale = Math.hypot(c.resistanceChange, c.reactanceChange);
      expect(Math.abs(r.reflectedResistance - c.resistanceChange)).toBeLessThanOrEqual(1e-7 * scale);
      expect(Math.abs(r.reactanceChange - c.reactanceChange)).toBeLessThanOrEqual(1e-7 * scale);
    }
  });

  it("gives an aluminium rod a positive reflected resistance and a negative inductance change (eddy currents oppose the field)", () => {
    const r = encirclingCoilOverRod({ coil, rod: aluminiumRod, frequency: 1e3 });
    expect(r.reflectedResistance > 0 && r.inductanceChange < 0).toBe(true);
  });

  it("tends to the long-coil solution (barInLongCoil) as the coil gets long: within 5 % (non-magnetic) at 40 radii, closer than at 10 radii", () => {
    for (const f of [50, 1e3, 1e4]) {
      for (const mur of [1, 30]) {
        const bar = { radius: 0.015, resistivity: 2e-7, relativePermeability: mur };
        const deviation = (length: number) => {
          const a = encirclingCoilOverRod({ coil: { innerRadius: 0.02, outerRadius: 0.0201, length, turns: 200 }, rod: bar, frequency: f });
          const b = barInLongCoil({ coil: { innerRadius: 0.02, length, turns: 200 }, bar, frequency: f });
          return Math.max(Math.abs(a.reflectedResistance / b.reflectedResistance - 1), Math.abs(a.reactanceChange / b.reactanceChange - 1));
        };
        const long = deviation(0.8);
        expect(long).toBeLessThan(deviation(0.2));
        if (mur === 1) expect(long).toBeLessThan(0.05);
      }
    }
  });

  it("reflected resistance ≥ 0 over random rods, tubes and coils", () => {
    const lu = (lo: number, hi: number) => fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true, noDefaultInfinity: true }).map(Math.exp);
    fc.assert(
      fc.property(lu(0.2, 0.95), fc.double({ min: 0, max: 0.9, noNaN: true }), lu(1e-8, 1e-6), lu(1, 100), lu(1, 1e5), lu(0.2, 5), (fill, bore, rho, mur, f, lr) => {
        const r = encirclingCoilOverRod({
          coil: { innerRadius: 0.02, outerRadius: 0.024, length: 0.02 * lr, turns: 5 },
          rod: { radius: 0.02 * fill, innerRadius: 0.02 * fill * bore, resistivity: rho, relativePermeability: mur },
          frequency: f,
        });
        return r.reflectedResistance >= 0 && Number.isFinite(r.reactanceChange);
      }),
      { seed: 1, numRuns: 40 },
    );
  });

  it("throws InputError for bad input", () => {
    const ok = { coil, rod: aluminiumRod, frequency: 1e3 };
    const bad: unknown[] = [
      { ...ok, rod: { ...aluminiumRod, radius: 0.02 } },
      { ...ok, rod: { ...aluminiumRod, innerRadius: 0.015 } },
      { ...ok, rod: { ...aluminiumRod, resistivity: 0 } },
      { ...ok, rod: { ...aluminiumRod, relativePermeability: 0.5 } },
      { ...ok, coil: { ...coil, outerRadius: 0.02 } },
      { ...ok, coil: { ...coil, length: 0 } },
      { ...ok, coil: { ...coil, turns: -3 } },
      { ...ok, frequency: Infinity },
    ];
    for (const b of bad) expect(() => encirclingCoilOverRod(b as never)).toThrow(InputError);
  });
});
