import { describe, it } from "vitest";
import fc from "fast-check";
import { barInLongCoil, MU_0, tubeInLongCoil } from "../../src/index.js";
import { logUniform } from "../support/arbitraries.js";

const options = fc.record({
  innerRadius: logUniform(1e-3, 0.5),
  fill: fc.double({ min: 0.05, max: 1, noNaN: true }),
  lengthRatio: logUniform(0.5, 50),
  turns: fc.integer({ min: 1, max: 500 }),
  resistivity: logUniform(1.5e-8, 2e-6),
  relativePermeability: logUniform(1, 500),
  frequency: logUniform(1, 1e7),
  coilResistance: logUniform(1e-6, 10),
  wall: fc.double({ min: 0.01, max: 0.99, noNaN: true }),
});

type O = typeof options extends fc.Arbitrary<infer T> ? T : never;

function bar(o: O) {
  return barInLongCoil({
    coil: { innerRadius: o.innerRadius, length: o.lengthRatio * o.innerRadius, turns: o.turns },
    bar: { radius: o.fill * o.innerRadius, resistivity: o.resistivity, relativePermeability: o.relativePermeability },
    frequency: o.frequency,
    coilResistance: o.coilResistance,
  });
}

describe("barInLongCoil and tubeInLongCoil properties", () => {
  it("reflected resistance is ≥ 0 and finite, efficiency in [0, 1]", () => {
    fc.assert(
      fc.property(options, (o) => {
        const r = bar(o);
        return r.reflectedResistance >= 0 && Number.isFinite(r.inductanceChange) && r.efficiency! >= 0 && r.efficiency! <= 1;
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("a tube's reflected resistance is ≥ 0 and finite over the whole domain", () => {
    fc.assert(
      fc.property(options, (o) => {
        const a2 = o.fill * o.innerRadius;
        const r = tubeInLongCoil({
          coil: { innerRadius: o.innerRadius, length: o.lengthRatio * o.innerRadius, turns: o.turns },
          tube: { outerRadius: a2, innerRadius: o.wall * a2, resistivity: o.resistivity, relativePermeability: o.relativePermeability },
          frequency: o.frequency,
        });
        return r.reflectedResistance >= 0 && Number.isFinite(r.reflectedResistance) && Number.isFinite(r.inductanceChange);
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("as resistivity grows without bound a non-magnetic bar disappears (ΔZ → 0)", () => {
    fc.assert(
      fc.property(options, (o) => {
        const r = bar({ ...o, relativePermeability: 1, resistivity: o.resistivity * 1e12 });
        const ref = o.frequency * 2 * Math.PI * MU_0 * Math.PI * (o.fill * o.innerRadius) ** 2 * (o.turns ** 2 / (o.lengthRatio * o.innerRadius));
        return r.reflectedResistance < 1e-5 * ref && Math.abs(r.reactanceChange) < 1e-5 * ref;
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("as frequency → 0 a non-magnetic bar disappears and a magnetic one adds its magnetostatic inductance", () => {
    fc.assert(
      fc.property(options, (o) => {
        const low = bar({ ...o, frequency: 1e-6 });
        const a = o.fill * o.innerRadius;
        const expected = (MU_0 * Math.PI * a * a * (o.relativePermeability - 1) * o.turns ** 2) / (o.lengthRatio * o.innerRadius);
        const scale = (MU_0 * Math.PI * a * a * o.relativePermeability * o.turns ** 2) / (o.lengthRatio * o.innerRadius);
        return Math.abs(low.inductanceChange - expected) <= 1e-6 * scale;
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("a non-magnetic bar always lowers the inductance (common practice)", () => {
    fc.assert(
      fc.property(options, (o) => bar({ ...o, relativePermeability: 1 }).inductanceChange <= 0),
      { seed: 1, numRuns: 200 },
    );
  });

  it("power per ampere squared scales with turns squared", () => {
    fc.assert(
      fc.property(options, (o) => {
        const a = bar(o).powerPerAmpereSquared;
        const b = bar({ ...o, turns: o.turns * 3 }).powerPerAmpereSquared;
        return Math.abs(b / (9 * a) - 1) < 1e-12;
      }),
      { seed: 1, numRuns: 200 },
    );
  });
});
