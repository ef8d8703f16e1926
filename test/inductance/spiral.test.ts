import { describe, it, expect } from "vitest";
import { InputError, MU_0 } from "../../src/index.js";
import {
  solenoidInductance,
  loopInductance,
  loopMutualInductance,
  spiralCoilInductance,
  spiralCoilInductanceMohan,
  spiralCoilInductanceWheeler,
} from "../../src/inductance/index.js";

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

describe("spiralCoilInductance", () => {
  it("is the sum of the turns' self-inductances and all pair mutual inductances", () => {
    // definition (Grover 1946, ch. 11): rings summed; mutual terms from Maxwell's formula
    const inner = 0.02;
    const outer = 0.05;
    const n = 7;
    const d = 0.002;
    let sum = 0;
    for (let i = 0; i < n; i++) {
      const ri = inner + ((outer - inner) * i) / (n - 1);
      sum += loopInductance({ loopRadius: ri, wireRadius: d / 2 });
      for (let j = 0; j < n; j++) {
        if (j !== i) sum += loopMutualInductance({ radius1: ri, radius2: inner + ((outer - inner) * j) / (n - 1), axialDistance: 0 });
      }
    }
    expect(rel(spiralCoilInductance({ innerRadius: inner, outerRadius: outer, turns: n, wireDiameter: d }), sum)).toBeLessThan(1e-13);
  });

  it("for one turn equals the loop inductance", () => {
    expect(spiralCoilInductance({ innerRadius: 0.05, outerRadius: 0.05, turns: 1, wireDiameter: 0.002 })).toBe(
      loopInductance({ loopRadius: 0.05, wireRadius: 0.001 }),
    );
  });

  it("agrees with Wheeler's and Mohan's current-sheet approximations within a few per cent for a close-wound pancake", () => {
    // Wheeler 1928 eq. (3) and Mohan et al. 1999 Table II; a dense 30-turn spiral of fine wire
    const g = { innerRadius: 0.03, outerRadius: 0.09, turns: 30, wireDiameter: 0.0019 };
    const exact = spiralCoilInductance(g);
    expect(rel(spiralCoilInductanceWheeler(g), exact)).toBeLessThan(0.05);
    expect(rel(spiralCoilInductanceMohan(g), exact)).toBeLessThan(0.05);
  });

  it("Wheeler's spiral formula uses a²N²/(8a + 11c) µH in inches and Mohan's the circular-spiral coefficients", () => {
    // Wheeler 1928 eq. (3): a = 2 in, c = 1 in (N = 10, pitch 0.1 in) -> 400/27 µH
    const g = { innerRadius: 0.0254 * 1.55, outerRadius: 0.0254 * 2.45, turns: 10 };
    expect(rel(spiralCoilInductanceWheeler(g), 400e-6 / 27)).toBeLessThan(1e-13);
    // Mohan et al. 1999 eq. (3), c1 = 1, c2 = 2.46, c3 = 0, c4 = 0.2; fill ratio rho = c/(2a) = 0.25
    expect(rel(spiralCoilInductanceMohan(g), MU_0 * 100 * 0.0508 * (Math.log(2.46 / 0.25) + 0.2 * 0.0625))).toBeLessThan(1e-13);
  });

  it("throws InputError for bad dimensions, fractional turns and overlapping turns", () => {
    const ok = { innerRadius: 0.02, outerRadius: 0.05, turns: 7, wireDiameter: 0.002 };
    const bad: [object, string][] = [
      [{ ...ok, innerRadius: 0 }, "innerRadius"], [{ ...ok, outerRadius: 0.01 }, "outerRadius"], [{ ...ok, turns: 7.5 }, "turns"],
      [{ ...ok, turns: 0 }, "turns"], [{ ...ok, wireDiameter: 0.006 }, "wireDiameter"], [{ ...ok, wireDiameter: NaN }, "wireDiameter"],
      [{ ...ok, turns: 1 }, "outerRadius"],
    ];
    for (const [o, p] of bad) {
      let caught: unknown;
      try {
        spiralCoilInductance(o as never);
      } catch (e) {
        caught = e;
      }
      expect(caught).toBeInstanceOf(InputError);
      expect((caught as InputError).parameter).toBe(p);
    }
    expect(() => spiralCoilInductanceWheeler({ innerRadius: 0.02, outerRadius: 0.02, turns: 1 })).toThrow(InputError);
    expect(() => spiralCoilInductanceMohan({ innerRadius: 0.02, outerRadius: 0.05, turns: 3, wireDiameter: 0.02 })).toThrow(InputError);
  });
});

describe("geometric limits compare with a relative tolerance", () => {
  it("accepts touching turns whose computed pitch rounds below the wire (15 mm, 15 turns at 2 mm pitch, 2 mm wire)", () => {
    // (0.043 − 0.015) / 14 = 0.0019999999999999996 in binary floating point (IEEE 754 rounding, checked by hand)
    expect((0.043 - 0.015) / 14).toBeLessThan(0.002);
    const touching = spiralCoilInductance({ innerRadius: 0.015, outerRadius: 0.015 + 14 * 0.002, turns: 15, wireDiameter: 0.002 });
    const apart = spiralCoilInductance({ innerRadius: 0.015, outerRadius: 0.015 + 14 * 0.002, turns: 15, wireDiameter: 0.0019 });
    expect(touching).toBeGreaterThan(0);
    // a thicker wire has a smaller self-inductance per ring (Rosa's GMD correction), so touching < apart
    expect(touching).toBeLessThan(apart);
    expect(() => spiralCoilInductance({ innerRadius: 0.015, outerRadius: 0.043, turns: 15, wireDiameter: 0.00201 })).toThrow(InputError);
  });

  it("solenoid: touching turns when length / turns rounds below the wire (0.3 m / 3 turns of 0.1 m)", () => {
    expect(0.3 / 3).toBeLessThan(0.1); // 0.09999999999999999 (IEEE 754 rounding)
    expect(solenoidInductance({ radius: 0.2, length: 0.3, turns: 3, wireDiameter: 0.1 })).toBeGreaterThan(0);
  });
});
