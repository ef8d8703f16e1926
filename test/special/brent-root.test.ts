import { describe, it, expect } from "vitest";
import { brentRoot, InputError } from "../../src/index.js";

describe("brentRoot", () => {
  it("finds the Dottie number, the root of cos x = x (OEIS A003957: 0.73908513321516064165…)", () => {
    expect(brentRoot((t) => Math.cos(t) - t, 0, 1)).toBeCloseTo(0.7390851332151607, 15);
  });

  it("finds √2 as the root of x² − 2 to full precision, with either bracket order (closed form)", () => {
    expect(Math.abs(brentRoot((t) => t * t - 2, 0, 2) - Math.SQRT2)).toBeLessThanOrEqual(4.5e-16);
    expect(Math.abs(brentRoot((t) => t * t - 2, 2, 0) - Math.SQRT2)).toBeLessThanOrEqual(4.5e-16);
  });

  it("finds the omega constant Ω = W(1), the root of x·eˣ = 1 (OEIS A030178: 0.56714329040978387299…)", () => {
    expect(brentRoot((w) => w * Math.exp(w) - 1, 0, 1)).toBeCloseTo(0.5671432904097838, 15);
  });

  it("honours a loose tolerance with fewer evaluations", () => {
    let loose = 0;
    let tight = 0;
    brentRoot((t) => (loose++, Math.exp(t) - 3), 0, 5, { tolerance: 1e-3 });
    brentRoot((t) => (tight++, Math.exp(t) - 3), 0, 5);
    expect(loose).toBeLessThan(tight);
  });

  it("returns an end point that is an exact root", () => {
    expect(brentRoot((t) => t - 1, 1, 3)).toBe(1);
    expect(brentRoot((t) => t - 3, 1, 3)).toBe(3);
  });

  it("locates a jump discontinuity with a sign change", () => {
    const x = brentRoot((t) => (t < 0.3 ? -1 : 1), 0, 1);
    expect(Math.abs(x - 0.3)).toBeLessThan(1e-15);
  });

  it("throws InputError when the bracket has no sign change", () => {
    expect(() => brentRoot((t) => t * t + 1, -1, 1)).toThrow(InputError);
    expect(() => brentRoot((t) => t * t + 1, -1, 1)).toThrow(/changes sign/);
  });

  it("throws InputError for non-finite bounds, NaN values, bad options and an exhausted iteration cap", () => {
    expect(() => brentRoot((t) => t, -Infinity, 1)).toThrow(InputError);
    expect(() => brentRoot((t) => t, -1, NaN)).toThrow(InputError);
    expect(() => brentRoot(() => NaN, -1, 1)).toThrow(InputError);
    expect(() => brentRoot((t) => t, -1, 1, { tolerance: -1 })).toThrow(InputError);
    expect(() => brentRoot((t) => t, -1, 1, { maxIterations: 0 })).toThrow(InputError);
    expect(() => brentRoot((t) => Math.cbrt(t - 0.123), -1, 1, { maxIterations: 2 })).toThrow(/maxIterations/);
  });
});
