import { describe, expect, it } from "vitest";
import data from "../fixtures/inductance/kernel-boundaries.json" with { type: "json" };
import { loopMutualInductance, nagaokaCoefficient, solenoidInductance } from "../../src/inductance/index.js";
import { MU_0 } from "../../src/units/index.js";

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

describe("inductance kernels across their piece boundaries", () => {
  it("keep Nagaoka's coefficient within 2e-15 of mpmath on both sides of d/l = 1.4919 and across the range", () => {
    // fixture from mpmath ellipk/ellipe, test/fixtures/inductance/kernel-boundaries.py
    expect(data.meta.rtol).toBe(2e-15);
    for (const c of data.nagaoka) expect(rel(nagaokaCoefficient(c.diameterOverLength), c.nagaoka)).toBeLessThanOrEqual(2e-15);
  });

  it("keep Maxwell's mutual inductance within 2e-15 of mpmath on both sides of k² = 0.7 and across the range", () => {
    // fixture from mpmath ellipk/ellipe, test/fixtures/inductance/kernel-boundaries.py
    for (const c of data.mutual) {
      const m = loopMutualInductance({ radius1: c.radius1, radius2: c.radius2, axialDistance: c.axialDistance });
      expect(rel(m, c.mutual)).toBeLessThanOrEqual(2e-15);
    }
  });

  it("give the solenoid's fast path the same value as Nagaoka's coefficient times the long-solenoid formula", () => {
    // identity L = K_N mu0 pi a^2 N^2 / l (Nagaoka 1909), both sides of the piece boundary
    for (const c of data.nagaoka) {
      const a = 0.05;
      const l = (2 * a) / c.diameterOverLength;
      const expected = (c.nagaoka * MU_0 * Math.PI * a * a * 400) / l;
      expect(rel(solenoidInductance({ radius: a, length: l, turns: 20 }), expected)).toBeLessThan(4e-15);
    }
  });
});
