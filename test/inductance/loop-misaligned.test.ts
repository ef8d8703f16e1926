import { describe, expect, it } from "vitest";
import { InputError, loopMutualInductance, MU_0, type LoopMutualInductanceOptions } from "../../src/index.js";
import fixture from "../fixtures/links/misaligned-loops.json" with { type: "json" };

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

describe("loopMutualInductance with a lateral offset or tilt", () => {
  for (const c of fixture.cases) {
    const i = c.input;
    it(`matches the Neumann double integral at offset ${i.lateralOffset} m, tilt ${i.tilt} rad (a ${i.radius1}, b ${i.radius2}, z ${i.axialDistance})`, () => {
      // fixture: direct Neumann double integral (periodic trapezoidal rule, mpmath cross-check),
      // test/fixtures/links/generate_misaligned.py
      const m = loopMutualInductance(i);
      expect(rel(m, c.expected.mutualOverMu0 * MU_0)).toBeLessThanOrEqual(fixture.meta.rtol);
      if ("mpmathCheck" in c.expected) expect(rel(c.expected.mutualOverMu0, c.expected.mpmathCheck)).toBeLessThanOrEqual(1e-11);
    });
  }

  it("with zero offset and tilt gives the coaxial value exactly", () => {
    const coaxial = loopMutualInductance({ radius1: 0.1, radius2: 0.07, axialDistance: 0.03 });
    expect(loopMutualInductance({ radius1: 0.1, radius2: 0.07, axialDistance: 0.03, lateralOffset: 0, tilt: 0 })).toBe(coaxial);
  });

  it("tends to the coaxial value as the offset and the tilt shrink", () => {
    const coaxial = loopMutualInductance({ radius1: 0.1, radius2: 0.07, axialDistance: 0.03 });
    expect(rel(loopMutualInductance({ radius1: 0.1, radius2: 0.07, axialDistance: 0.03, lateralOffset: 1e-9 }), coaxial)).toBeLessThanOrEqual(1e-12);
    expect(rel(loopMutualInductance({ radius1: 0.1, radius2: 0.07, axialDistance: 0.03, tilt: 1e-9 }), coaxial)).toBeLessThanOrEqual(1e-12);
  });

  it("is zero for a centred filament tilted to a right angle (no flux by symmetry)", () => {
    const m = loopMutualInductance({ radius1: 0.1, radius2: 0.05, axialDistance: 0.1, tilt: Math.PI / 2 });
    expect(Math.abs(m)).toBeLessThanOrEqual(1e-14 * loopMutualInductance({ radius1: 0.1, radius2: 0.05, axialDistance: 0.1 }));
  });

  it("reverses sign when filament 2 is flipped (tilt π)", () => {
    const m = loopMutualInductance({ radius1: 0.1, radius2: 0.08, axialDistance: 0.04, lateralOffset: 0.03 });
    expect(rel(loopMutualInductance({ radius1: 0.1, radius2: 0.08, axialDistance: 0.04, lateralOffset: 0.03, tilt: Math.PI }), -m)).toBeLessThanOrEqual(1e-12);
  });

  it("throws InputError for a negative offset, a tilt beyond ±π and an unknown key", () => {
    expect(() => loopMutualInductance({ radius1: 0.1, radius2: 0.1, axialDistance: 0.1, lateralOffset: -0.01 })).toThrow(InputError);
    expect(() => loopMutualInductance({ radius1: 0.1, radius2: 0.1, axialDistance: 0.1, tilt: 4 })).toThrow(InputError);
    expect(() => loopMutualInductance({ radius1: 0.1, radius2: 0.1, axialDistance: 0.1, offset: 0.01 } as unknown as LoopMutualInductanceOptions)).toThrow(/offset/);
  });

});
