import { describe, expect, it } from "vitest";
import { besselI0Scaled, besselI1Scaled, besselK0Scaled, besselK1Scaled } from "../../src/special/index.js";
import { prepareWorkCoil } from "../../src/index.js";
import { rodReflectionScaled, rodReflectionScaledFrom, tubeSurfaceRatio } from "../../src/workpiece/encircling-coil.js";
import { MU_0 } from "../../src/units/index.js";

// The coil-impedance model's part coefficients keep the material-independent Bessel factors
// per kernel and take a thick tube wall as a solid rod. These checks hold the speed-ups to the
// stated tolerances: bit-identical for the cached factors, 1e-13 relative for the thick wall.

/** The tube's reflection coefficient through the full wall formula (no thick-wall shortcut). */
function tubeReflectionFull(alpha: number, a: number, a1: number, kk: number, mur: number): [number, number] {
  const b2 = alpha * alpha;
  const rr = Math.hypot(b2, kk);
  const bRe = Math.sqrt(0.5 * (rr + b2));
  const bIm = kk / (2 * bRe);
  const rAir = (alpha * besselI0Scaled(alpha * a1)) / besselI1Scaled(alpha * a1);
  const [rRe, rIm] = tubeSurfaceRatio(bRe, bIm, a, a1, mur, rAir);
  const x = alpha * a;
  const nRe = alpha * besselI0Scaled(x) - rRe * besselI1Scaled(x);
  const nIm = -rIm * besselI1Scaled(x);
  const dRe = alpha * besselK0Scaled(x) + rRe * besselK1Scaled(x);
  const dIm = rIm * besselK1Scaled(x);
  const dd = dRe * dRe + dIm * dIm;
  return [(nRe * dRe + nIm * dIm) / dd, (nIm * dRe - nRe * dIm) / dd];
}

describe("part kernel: cached Bessel factors and the thick-wall shortcut", () => {
  it("rodReflectionScaledFrom with precomputed factors equals rodReflectionScaled bit for bit", () => {
    const a = 0.03;
    const out1 = new Float64Array(2);
    const out2 = new Float64Array(2);
    for (const a1 of [0, 0.01, 0.029]) {
      for (const alpha of [0.3, 7, 120, 2500]) {
        for (const [kk, mur] of [[40, 1], [5e4, 100], [3e7, 600]] as const) {
          rodReflectionScaled(alpha, a, a1, kk, mur, out1);
          const x = alpha * a;
          const bore = a1 > 0 ? (alpha * besselI0Scaled(alpha * a1)) / besselI1Scaled(alpha * a1) : 0;
          rodReflectionScaledFrom(alpha, a, a1, kk, mur, besselI0Scaled(x), besselI1Scaled(x), besselK0Scaled(x), besselK1Scaled(x), bore, out2);
          expect(out2[0]).toBe(out1[0]);
          expect(out2[1]).toBe(out1[1]);
        }
      }
    }
  });

  it("a tube wall with 2·Re β·(a − a1) > 40 reflects as the full wall formula within 1e-13", () => {
    const a = 0.062;
    const a1 = 0.05;
    const out = new Float64Array(2);
    let worst = 0;
    let count = 0;
    // steel ring at 1–100 kHz (μr 20–600): walls from just past the threshold to thousands of δ
    for (const mur of [20, 100, 600]) {
      for (const f of [1e3, 1e4, 1e5]) {
        const kk = (2 * Math.PI * f * MU_0 * mur) / 2e-7;
        for (const alpha of [0.5, 20, 300, 4000]) {
          const bRe = Math.sqrt(0.5 * (Math.hypot(alpha * alpha, kk) + alpha * alpha));
          if (2 * bRe * (a - a1) <= 40) continue;
          count++;
          rodReflectionScaled(alpha, a, a1, kk, mur, out);
          const [re, im] = tubeReflectionFull(alpha, a, a1, kk, mur);
          worst = Math.max(worst, Math.hypot(out[0]! - re, out[1]! - im) / Math.hypot(re, im));
        }
      }
    }
    expect(count).toBeGreaterThan(20);
    expect(worst).toBeLessThan(1e-13);
  });

  it("the reduced model gives the same impedance on repeated and interleaved evaluations (work arrays reused)", () => {
    const coil = { shape: "solenoid" as const, radius: 0.075, length: 0.048, turns: 6, conductor: { kind: "tube" as const, outerDiameter: 0.006, wallThickness: 0.001 }, resistivity: 1.8e-8 };
    const part = { shape: "tube" as const, radius: 0.062, innerRadius: 0.05, length: 0.1, resistivity: 2e-7, relativePermeability: 100 };
    const reduced = prepareWorkCoil({ coil, frequency: 80e3, refinement: 0.5 }).reduce({ part, minFrequency: 16e3, maxFrequency: 128e3 });
    const first = reduced.impedance(37e3, 2e-7, 150);
    const other = reduced.impedance(52e3, 9e-7, 1);
    const again = reduced.impedance(37e3, 2e-7, 150);
    expect(again).toEqual(first);
    expect(other.reflectedResistance).not.toBe(first.reflectedResistance);
  }, 30_000);
});
