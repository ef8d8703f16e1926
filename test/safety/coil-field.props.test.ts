import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { fieldNearCoil, fieldOnAxis } from "../../src/index.js";
import { logUniform } from "../support/arbitraries.js";

const loop = fc.record({ radius: logUniform(1e-3, 1), position: fc.double({ min: -0.5, max: 0.5, noNaN: true, noDefaultInfinity: true }) });

describe("coil field properties", () => {
  it("mirror symmetry about the loop plane: Bz even, Bρ odd", () => {
    fc.assert(
      fc.property(logUniform(1e-3, 1), logUniform(1e-4, 10), logUniform(1e-4, 10), (a, rho, dz) => {
        fc.pre(Math.abs(rho - a) > 1e-3 * a || dz > 1e-3 * a);
        const up = fieldNearCoil([{ radius: a }], 1, { radialDistance: rho, axialPosition: dz });
        const down = fieldNearCoil([{ radius: a }], 1, { radialDistance: rho, axialPosition: -dz });
        expect(Math.abs(up.axial - down.axial)).toBeLessThanOrEqual(1e-13 * up.magnitude);
        expect(Math.abs(up.radial + down.radial)).toBeLessThanOrEqual(1e-13 * up.magnitude);
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("scaling: all lengths × s ⇒ B × 1/s", () => {
    fc.assert(
      fc.property(loop, logUniform(1e-3, 2), logUniform(0.1, 10), (l, rho, s) => {
        const z = 0.1;
        fc.pre(Math.abs(rho - l.radius) > 1e-3 * l.radius || Math.abs(z - l.position) > 1e-3 * l.radius);
        const b = fieldNearCoil([l], 1, { radialDistance: rho, axialPosition: z });
        const bs = fieldNearCoil([{ radius: l.radius * s, position: l.position * s }], 1, { radialDistance: rho * s, axialPosition: z * s });
        expect(Math.abs(bs.magnitude * s - b.magnitude)).toBeLessThanOrEqual(1e-12 * b.magnitude);
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("on-axis field falls monotonically with distance beyond a solenoid's end", () => {
    fc.assert(
      fc.property(logUniform(0.005, 0.2), logUniform(0.01, 0.5), fc.integer({ min: 1, max: 50 }), logUniform(1e-3, 1), (radius, length, turns, step) => {
        const coil = { kind: "solenoid" as const, radius, length, turns };
        const z = length / 2 + step;
        expect(fieldOnAxis({ coil, current: 1, axialPosition: z + step })).toBeLessThan(fieldOnAxis({ coil, current: 1, axialPosition: z }));
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("linear in current, and superposition of loops", () => {
    fc.assert(
      fc.property(loop, loop, fc.double({ min: -100, max: 100, noNaN: true, noDefaultInfinity: true }), (l1, l2, current) => {
        const point = { radialDistance: 2, axialPosition: 1.5 };
        const both = fieldNearCoil([l1, l2], current, point);
        const one = fieldNearCoil([l1], 1, point);
        const two = fieldNearCoil([l2], 1, point);
        const scale = Math.abs(current) * (one.magnitude + two.magnitude) + 1e-300;
        expect(Math.abs(both.axial - current * (one.axial + two.axial))).toBeLessThanOrEqual(1e-14 * scale);
      }),
      { seed: 1, numRuns: 200 },
    );
  });
});
