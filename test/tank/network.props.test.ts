import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  capacitorElement,
  inductorElement,
  parallelNetwork,
  resistorElement,
  seriesNetwork,
  tankImpedance,
  type TankNetwork,
} from "../../src/index.js";
import { logUniform, settings } from "./arbitraries.js";

const leaf: fc.Arbitrary<TankNetwork> = fc.oneof(
  logUniform(1e-3, 1e3).map((r) => resistorElement(r)),
  fc.tuple(logUniform(1e-7, 1e-2), logUniform(1e-4, 10)).map(([l, r]) => inductorElement(l, r)),
  fc.tuple(logUniform(1e-9, 1e-4), logUniform(1e-4, 10)).map(([c, r]) => capacitorElement(c, r)),
);
const network: fc.Arbitrary<TankNetwork> = fc.letrec<{ net: TankNetwork }>((tie) => ({
  net: fc.oneof(
    { depthSize: "small", withCrossShrink: true },
    leaf,
    fc.array(tie("net"), { minLength: 1, maxLength: 3 }).map((parts) => seriesNetwork(...parts)),
    fc.array(tie("net"), { minLength: 1, maxLength: 3 }).map((parts) => parallelNetwork(...parts)),
  ),
})).net;
const frequency = logUniform(10, 1e7);

describe("tankImpedance properties", () => {
  it("is passive: every lossy network has Re Z ≥ 0", () => {
    fc.assert(
      fc.property(network, frequency, (net, f) => {
        const z = tankImpedance(net, f);
        expect(z.re).toBeGreaterThanOrEqual(-1e-12 * Math.hypot(z.re, z.im));
        expect(Number.isFinite(z.im)).toBe(true);
      }),
      settings,
    );
  });

  it("does not depend on the order of series or parallel parts", () => {
    fc.assert(
      fc.property(network, network, frequency, (a, b, f) => {
        for (const [x, y] of [
          [seriesNetwork(a, b), seriesNetwork(b, a)],
          [parallelNetwork(a, b), parallelNetwork(b, a)],
        ] as const) {
          const zx = tankImpedance(x, f);
          const zy = tankImpedance(y, f);
          expect(Math.hypot(zx.re - zy.re, zx.im - zy.im)).toBeLessThanOrEqual(1e-12 * Math.hypot(zx.re, zx.im) + 1e-300);
        }
      }),
      settings,
    );
  });

  it("halves the impedance of a network placed in parallel with an identical copy", () => {
    fc.assert(
      fc.property(network, frequency, (a, f) => {
        const z = tankImpedance(a, f);
        const half = tankImpedance(parallelNetwork(a, a), f);
        expect(Math.hypot(half.re - z.re / 2, half.im - z.im / 2)).toBeLessThanOrEqual(1e-12 * Math.hypot(z.re, z.im));
      }),
      settings,
    );
  });
});
