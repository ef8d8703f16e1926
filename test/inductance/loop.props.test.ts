import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { loopInductance, loopMutualInductance, couplingCoefficient } from "../../src/inductance/index.js";

const logUniform = (lo: number, hi: number) =>
  fc.double({ min: Math.log(lo), max: Math.log(hi), noNaN: true, noDefaultInfinity: true }).map(Math.exp);
const opts = { seed: 1, numRuns: 200 };

describe("loop properties", () => {
  it("M12 = M21 and scaling all lengths by k scales M by k", () => {
    fc.assert(
      fc.property(logUniform(1e-3, 1), logUniform(1e-3, 1), logUniform(1e-6, 10), logUniform(1e-3, 1e3), (a, b, z, k) => {
        const m = loopMutualInductance({ radius1: a, radius2: b, axialDistance: z });
        expect(loopMutualInductance({ radius1: b, radius2: a, axialDistance: z })).toBe(m);
        const mk = loopMutualInductance({ radius1: a * k, radius2: b * k, axialDistance: z * k });
        expect(Math.abs(mk / (k * m) - 1)).toBeLessThan(1e-13);
      }),
      opts,
    );
  });

  it("M falls as the loops move apart and stays positive and finite", () => {
    fc.assert(
      fc.property(logUniform(1e-3, 1), logUniform(1e-3, 1), logUniform(1e-9, 1e4), (a, b, z) => {
        const m = loopMutualInductance({ radius1: a, radius2: b, axialDistance: z });
        expect(m).toBeGreaterThan(0);
        expect(Number.isFinite(m)).toBe(true);
        expect(loopMutualInductance({ radius1: a, radius2: b, axialDistance: z * 1.01 })).toBeLessThanOrEqual(m);
      }),
      opts,
    );
  });

  it("two rings of real wire couple with |k| ≤ 1", () => {
    fc.assert(
      fc.property(logUniform(1e-3, 1), fc.double({ min: 1e-4, max: 0.1, noNaN: true }), fc.double({ min: 0, max: 10, noNaN: true }), (a, wireFraction, gap) => {
        const rho = a * wireFraction;
        const z = 2 * rho * (1 + gap); // wires do not overlap
        const l = loopInductance({ loopRadius: a, wireRadius: rho });
        const m = loopMutualInductance({ radius1: a, radius2: a, axialDistance: z });
        const k = couplingCoefficient(m, l, l);
        expect(k).toBeGreaterThan(0);
        expect(k).toBeLessThanOrEqual(1);
      }),
      opts,
    );
  });

  it("a loop's inductance rises with its radius and falls with wire radius", () => {
    fc.assert(
      fc.property(logUniform(1e-3, 1), fc.double({ min: 1e-5, max: 0.2, noNaN: true }), (a, f) => {
        const l = loopInductance({ loopRadius: a, wireRadius: a * f });
        expect(loopInductance({ loopRadius: a * 1.01, wireRadius: a * f })).toBeGreaterThan(l);
        expect(loopInductance({ loopRadius: a, wireRadius: a * f * 1.01 })).toBeLessThan(l);
      }),
      opts,
    );
  });
});

describe("misaligned loop properties", () => {
  it("M12 = M21 for a lateral offset, and scaling all lengths by k scales M by k", () => {
    fc.assert(
      fc.property(logUniform(0.01, 1), logUniform(0.01, 1), logUniform(1e-3, 1), logUniform(1e-3, 2), logUniform(0.1, 10), (a, b, z, d, k) => {
        const m = loopMutualInductance({ radius1: a, radius2: b, axialDistance: z, lateralOffset: d });
        const swapped = loopMutualInductance({ radius1: b, radius2: a, axialDistance: z, lateralOffset: d });
        const scale = loopMutualInductance({ radius1: a, radius2: b, axialDistance: z });
        expect(Math.abs(swapped - m)).toBeLessThanOrEqual(1e-11 * Math.max(Math.abs(m), scale));
        const mk = loopMutualInductance({ radius1: a * k, radius2: b * k, axialDistance: z * k, lateralOffset: d * k });
        expect(Math.abs(mk - k * m)).toBeLessThanOrEqual(1e-11 * k * Math.max(Math.abs(m), scale));
      }),
      { seed: 1, numRuns: 40 },
    );
  });
});
