import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { coaxialCoilMutualInductance } from "../../src/inductance/index.js";
import { fieldNearCoil, fieldOnAxis } from "../../src/safety/index.js";
import { logUniform } from "../support/arbitraries.js";

/** A spiral's numbers: inner radius, radial width, turns. */
const spiral = fc.record({ inner: logUniform(1e-3, 0.2), width: logUniform(1e-3, 0.3), turns: fc.integer({ min: 1, max: 25 }) });
const signed = fc.double({ min: -0.2, max: 0.2, noNaN: true, noDefaultInfinity: true });

describe("coil-geometry family properties", () => {
  it("the former turn-centre spiral and flatSpiral by turn centres are bit-identical in coaxialCoilMutualInductance", () => {
    let ran = 0;
    fc.assert(
      fc.property(spiral, logUniform(1e-3, 0.5), logUniform(1e-4, 0.5), ({ inner, width, turns }, loopRadius, distance) => {
        const outer = turns === 1 ? inner : inner + width;
        const partner = { kind: "loop", radius: loopRadius } as const;
        const former = coaxialCoilMutualInductance({ kind: "spiral", innerRadius: inner, outerRadius: outer, turns }, partner, distance);
        const current = coaxialCoilMutualInductance({ kind: "flatSpiral", innerTurnRadius: inner, outerTurnRadius: outer, turns }, partner, distance);
        expect(current).toBe(former);
        ran++;
      }),
      { seed: 17, numRuns: 150 },
    );
    expect(ran).toBeGreaterThanOrEqual(150);
  });

  it("the former edge spiral and flatSpiral by edges are bit-identical in the field functions", () => {
    let ran = 0;
    fc.assert(
      fc.property(spiral, signed, logUniform(1e-3, 1), signed, ({ inner, width, turns }, position, rho, z) => {
        const outer = inner + width;
        const former = { kind: "spiral", innerRadius: inner, outerRadius: outer, turns, position } as const;
        const current = { kind: "flatSpiral", innerEdgeRadius: inner, outerEdgeRadius: outer, turns, position } as const;
        expect(fieldOnAxis({ coil: current, current: 1, axialPosition: z })).toBe(fieldOnAxis({ coil: former, current: 1, axialPosition: z }));
        if (Math.abs(z - position) > 1e-6) {
          expect(fieldNearCoil(current, 1, { radialDistance: rho, axialPosition: z })).toEqual(fieldNearCoil(former, 1, { radialDistance: rho, axialPosition: z }));
        }
        ran++;
      }),
      { seed: 18, numRuns: 150 },
    );
    expect(ran).toBeGreaterThanOrEqual(150);
  });

  it("moving both coils along the axis together leaves the mutual inductance unchanged (to rounding)", () => {
    fc.assert(
      fc.property(spiral, logUniform(1e-3, 0.5), logUniform(1e-3, 0.5), signed, ({ inner, width, turns }, radius, distance, shift) => {
        const a = { kind: "flatSpiral", innerEdgeRadius: inner, outerEdgeRadius: inner + width, turns } as const;
        const b = { kind: "solenoid", radius, length: 0.01, turns: 5 } as const;
        const m = coaxialCoilMutualInductance(a, b, distance);
        const moved = coaxialCoilMutualInductance({ ...a, position: shift }, { ...b, position: shift }, distance);
        expect(Math.abs(moved - m)).toBeLessThanOrEqual(1e-9 * Math.abs(m));
      }),
      { seed: 19, numRuns: 60 },
    );
  });
});
