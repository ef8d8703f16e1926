import { describe, it, expect } from "vitest";
import fc from "fast-check";
import { nagaokaCoefficient, solenoidInductance } from "../../src/inductance/index.js";
import { logUniform } from "../support/arbitraries.js";

const opts = { seed: 1, numRuns: 200 };

describe("solenoid properties", () => {
  it("L is proportional to turns squared at fixed geometry", () => {
    fc.assert(
      fc.property(logUniform(1e-3, 1), logUniform(1e-4, 10), logUniform(1, 1e4), (radius, length, turns) => {
        const l1 = solenoidInductance({ radius, length, turns });
        const l2 = solenoidInductance({ radius, length, turns: 2 * turns });
        expect(Math.abs(l2 / l1 - 4)).toBeLessThan(1e-13);
      }),
      opts,
    );
  });

  it("scaling all lengths by k scales L by k", () => {
    fc.assert(
      fc.property(logUniform(1e-3, 1), logUniform(1e-4, 10), logUniform(1e-3, 1e3), (radius, length, k) => {
        const l1 = solenoidInductance({ radius, length, turns: 7 });
        const l2 = solenoidInductance({ radius: radius * k, length: length * k, turns: 7 });
        expect(Math.abs(l2 / (k * l1) - 1)).toBeLessThan(1e-12);
      }),
      opts,
    );
  });

  it("L rises with radius and falls with length", () => {
    fc.assert(
      fc.property(logUniform(1e-3, 1), logUniform(1e-4, 10), (radius, length) => {
        const l = solenoidInductance({ radius, length, turns: 5 });
        expect(solenoidInductance({ radius: radius * 1.001, length, turns: 5 })).toBeGreaterThan(l);
        expect(solenoidInductance({ radius, length: length * 1.001, turns: 5 })).toBeLessThan(l);
      }),
      opts,
    );
  });

  it("Nagaoka's coefficient lies in (0, 1), falls with d/l and tends to 1 - 4x/(3π) for long coils", () => {
    fc.assert(
      fc.property(logUniform(1e-9, 1e9), (x) => {
        const k = nagaokaCoefficient(x);
        expect(k).toBeGreaterThan(0);
        expect(k).toBeLessThan(1);
        expect(nagaokaCoefficient(x * 1.01)).toBeLessThan(k);
        if (x < 1e-4) expect(Math.abs(k - (1 - (4 * x) / (3 * Math.PI)))).toBeLessThan(x * x);
      }),
      opts,
    );
  });

  it("matches the short-coil asymptote (2/π)(l/d)[ln(4d/l) − 1/2] as d/l grows", () => {
    // Lorenz/Rayleigh short-coil expansion; relative remainder O((l/d)^2 ln(d/l))
    fc.assert(
      fc.property(logUniform(1e3, 1e200), (x) => {
        const asym = (2 / (Math.PI * x)) * (Math.log(4 * x) - 0.5);
        expect(Math.abs(nagaokaCoefficient(x) / asym - 1)).toBeLessThan((10 * Math.log(x)) / (x * x) + 1e-14);
      }),
      opts,
    );
  });

  it("the round-wire correction is small for thin wire on a large radius", () => {
    fc.assert(
      fc.property(logUniform(0.01, 1), fc.integer({ min: 2, max: 500 }), fc.double({ min: 0.3, max: 1, noNaN: true }), (radius, turns, fill) => {
        const pitch = radius / 200;
        const sheet = solenoidInductance({ radius, length: turns * pitch, turns });
        const wire = solenoidInductance({ radius, length: turns * pitch, turns, wireDiameter: fill * pitch });
        expect(Math.abs(wire / sheet - 1)).toBeLessThan(0.15);
      }),
      opts,
    );
  });
});
