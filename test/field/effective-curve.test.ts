import { describe, it, expect } from "vitest";
import { effectiveCurve, fundamentalFluxDensity } from "../../src/field/effective-curve.js";
import { MU_0 } from "../../src/units/index.js";

// Outside references: the definition of the fundamental, B₁ = (2/π)∫₀^π B(Ĥ sin θ) sin θ dθ,
// integrated here by a brute-force midpoint rule (2·10⁵ points, written in the test); the
// limiting step B–H curve of Agarwal (1959) and MacLean (1954), whose square-wave flux density
// of amplitude B_s has the fundamental 4B_s/π (Fourier series of a square wave).

const curve = [
  [200, 0.5],
  [400, 0.9],
  [800, 1.2],
  [1600, 1.4],
  [4000, 1.55],
  [10000, 1.7],
  [30000, 1.85],
  [100000, 2.0],
] as const;
const h = Float64Array.from([0, ...curve.map((p) => p[0])]);
const b = Float64Array.from([0, ...curve.map((p) => p[1])]);

function staticB(H: number): number {
  if (H >= 100000) return 2.0 + MU_0 * (H - 100000);
  for (let k = 1; k < h.length; k++) {
    if (H <= h[k]!) return b[k - 1]! + ((b[k]! - b[k - 1]!) * (H - h[k - 1]!)) / (h[k]! - h[k - 1]!);
  }
  return Number.NaN;
}

function bruteFundamental(Hpeak: number, points = 200_000): number {
  let s = 0;
  for (let i = 0; i < points; i++) {
    const th = ((i + 0.5) * Math.PI) / points;
    s += staticB(Hpeak * Math.sin(th)) * Math.sin(th);
  }
  return (2 / Math.PI) * s * (Math.PI / points);
}

describe("effective curve of the field solver (first harmonic of B under sinusoidal H)", () => {
  it("matches the brute-force fundamental of the definition within 1e-7 relative from 10 A/m to 1 MA/m", () => {
    for (const H of [10, 150, 200, 333, 800, 2500, 12000, 1e5, 3e5, 1e6]) {
      expect(Math.abs(fundamentalFluxDensity(h, b, H) / bruteFundamental(H) - 1)).toBeLessThan(1e-7);
    }
  });

  it("below the first point the curve is linear: μ_eff equals the initial permeability exactly", () => {
    const c = effectiveCurve(curve.map(([fieldStrength, fluxDensity]) => ({ fieldStrength, fluxDensity })));
    const muInitial = 0.5 / (MU_0 * 200);
    expect(Math.abs(1 / c.reluctivityAtField(50) / muInitial - 1)).toBeLessThan(1e-9);
    expect(Math.abs(c.maxRelativePermeability / muInitial - 1)).toBeLessThan(1e-9);
  });

  it("a near-step curve (B_s = 1.6 T reached at 1 A/m) gives the square-wave fundamental 4B_s/π plus μ0Ĥ (Agarwal 1959, MacLean 1954)", () => {
    const step = effectiveCurve([
      { fieldStrength: 1, fluxDensity: 1.6 },
      { fieldStrength: 2, fluxDensity: 1.6 + MU_0 },
    ]);
    for (const H of [1e4, 1e5, 1e6]) {
      const b1 = (MU_0 * H) / step.reluctivityAtField(H);
      const exact = (4 / Math.PI) * 1.6 + MU_0 * H;
      // the ramp over the first 1 A/m changes the fundamental by about (1/Ĥ)² relative
      expect(Math.abs(b1 / exact - 1)).toBeLessThan(2e-4);
    }
  });

  it("the B-based and H-based reluctivities are inverse readings of one table (within the table's 1e-4 interpolation)", () => {
    const c = effectiveCurve(curve.map(([fieldStrength, fluxDensity]) => ({ fieldStrength, fluxDensity })));
    for (const H of [300, 3000, 30000, 300000]) {
      const nu = c.reluctivityAtField(H);
      const B = (MU_0 * H) / nu;
      expect(Math.abs(c.relativeReluctivity(B) / nu - 1)).toBeLessThan(1e-4);
    }
  });
});
