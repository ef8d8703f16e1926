import { describe, expect, it } from "vitest";
import { InputError, lccGain, llcGain, parallelResonantGain, seriesResonantGain } from "../../src/index.js";

/** Independent phasor evaluation of a voltage divider Z_load/(Z_series + Z_load), plain arithmetic. */
function divider(sr: number, si: number, lr: number, li: number): number {
  const dr = sr + lr;
  const di = si + li;
  return Math.hypot(lr, li) / Math.hypot(dr, di);
}
/** a ∥ b for complex a = (ar, ai), b = (br, bi). */
function parallel(ar: number, ai: number, br: number, bi: number): [number, number] {
  const nr = ar * br - ai * bi;
  const ni = ar * bi + ai * br;
  const dr = ar + br;
  const di = ai + bi;
  const d = dr * dr + di * di;
  return [(nr * dr + ni * di) / d, (ni * dr - nr * di) / d];
}

describe("first-harmonic gains", () => {
  it("llcGain equals the divider L_r C_r : (L_m ∥ R_ac) solved as a phasor network", () => {
    for (const ln of [2, 5, 10]) for (const q of [0.1, 0.5, 2]) for (const fn of [0.3, 0.8, 1, 1.4, 3]) {
      const [pr, pi] = parallel(0, fn * ln, 1 / q, 0); // L_m = L_n L_r → normalised reactance f_n L_n; R_ac = 1/Q
      expect(Math.abs(llcGain({ inductanceRatio: ln, qualityFactor: q, normalisedFrequency: fn }) / divider(0, fn - 1 / fn, pr, pi) - 1)).toBeLessThanOrEqual(1e-13);
    }
  });

  it("llcGain is 1 at resonance for every load, the load-independent point of the LLC (Yang, Lee et al. 2002, from memory)", () => {
    for (const q of [0.05, 0.3, 1, 5]) expect(llcGain({ inductanceRatio: 5, qualityFactor: q, normalisedFrequency: 1 })).toBeCloseTo(1, 15);
  });

  it("seriesResonantGain is the LLC gain with L_n → ∞ and the classic 1/√(1 + Q²(f_n − 1/f_n)²) (Steigerwald 1988)", () => {
    for (const fn of [0.5, 1, 1.3]) {
      const src = seriesResonantGain({ qualityFactor: 0.8, normalisedFrequency: fn });
      expect(Math.abs(src - 1 / Math.sqrt(1 + 0.64 * (fn - 1 / fn) ** 2))).toBeLessThanOrEqual(1e-15);
      expect(Math.abs(llcGain({ inductanceRatio: 1e12, qualityFactor: 0.8, normalisedFrequency: fn }) - src)).toBeLessThanOrEqual(1e-9);
    }
  });

  it("parallelResonantGain: at resonance (8/π²)·R_ac/Z_0 (Steigerwald 1988, PRC gain Q_p at f_0; from memory)", () => {
    expect(parallelResonantGain({ qualityFactor: 0.25, normalisedFrequency: 1 })).toBeCloseTo((8 / Math.PI ** 2) * 4, 13);
  });

  it("lccGain equals the phasor divider L C_s : (C_p ∥ R_ac) times 8/π², and tends to the PRC form as C_s → ∞", () => {
    for (const a of [0.3, 1, 3]) for (const fn of [0.7, 1, 1.5]) {
      const q = 0.9;
      // normalised by √(L/C_s): C_p reactance −1/(f_n A), R_ac = 1/Q
      const [pr, pi] = parallel(0, -1 / (fn * a), 1 / q, 0);
      const expected = (8 / Math.PI ** 2) * divider(0, fn - 1 / fn, pr, pi);
      expect(Math.abs(lccGain({ qualityFactor: q, normalisedFrequency: fn, capacitanceRatio: a }) / expected - 1)).toBeLessThanOrEqual(1e-13);
    }
    // C_s → ∞ with C_p fixed: A = C_p/C_s → 0 while the normalisation follows C_p (f_n = f_n,p/√A, Q = Q_p·√A)
    const a = 1e-8;
    const qPrc = 0.7;
    const fnPrc = 1.1;
    const lcc = lccGain({ qualityFactor: qPrc * Math.sqrt(a), normalisedFrequency: fnPrc / Math.sqrt(a), capacitanceRatio: a });
    expect(Math.abs(lcc / parallelResonantGain({ qualityFactor: qPrc, normalisedFrequency: fnPrc }) - 1)).toBeLessThanOrEqual(1e-6);
  });

  it("rejects bad input and unknown keys", () => {
    expect(() => llcGain({ inductanceRatio: 0, qualityFactor: 1, normalisedFrequency: 1 })).toThrow(InputError);
    expect(() => llcGain({ inductanceRatio: 5, qualityFactor: 1, normalisedFrequency: 1, extra: 1 } as never)).toThrow(InputError);
    expect(() => lccGain({ qualityFactor: 1, normalisedFrequency: 1, capacitanceRatio: -1 })).toThrow(InputError);
  });
});
