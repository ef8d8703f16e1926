import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { lccFrequencySweep, lccOperatingPoint, lccOperatingPointCapacitiveFilter, parallelResonantOperatingPointCapacitiveFilter } from "../../src/index.js";

const lr = 100e-6;
const c = 25e-9;
const z = Math.sqrt(lr / c);
const fr = 1 / (2 * Math.PI * Math.sqrt(lr * c));
/** R_load for Q = √(L_r/C)/R_ac, R_ac = 8n²R/π² (n = 4, capacitive filter). */
const loadFor = (q: number): number => (Math.PI * Math.PI * z) / (q * 8 * 16);
const base = { bridge: "half" as const, inputVoltage: 400, turnsRatio: 4, resonantInductance: lr };
const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);
const at = (ratio: number, q: number, fn: number, extra: Partial<{ inputVoltage: number }> = {}) => ratio === 0
  ? parallelResonantOperatingPointCapacitiveFilter({ ...base, ...extra, parallelCapacitance: c, switchingFrequency: fn * fr, loadResistance: loadFor(q) })
  : lccOperatingPointCapacitiveFilter({ ...base, ...extra, seriesCapacitance: c, parallelCapacitance: ratio * c, switchingFrequency: fn * fr, loadResistance: loadFor(q) });

describe("capacitive-filter PRC/LCC properties", () => {
  it("conserves power, keeps |v_p| ≤ nV_out and 0 < conduction fraction ≤ 1 over 0 ≤ A ≤ 2, 0.2 ≤ Q ≤ 5, 0.5 ≤ f_n ≤ 2", () => {
    fc.assert(
      fc.property(fc.constantFrom(0, 0.25, 0.5, 1, 2), fc.double({ min: Math.log(0.2), max: Math.log(5), noNaN: true }), fc.double({ min: 0.5, max: 2, noNaN: true }), (ratio, logQ, fn) => {
        const op = at(ratio, Math.exp(logQ), fn);
        expect(rel(op.inputPower, op.outputPower)).toBeLessThanOrEqual(1e-9);
        expect(op.parallelCapacitorVoltagePeak).toBeLessThanOrEqual(4 * op.outputVoltage * (1 + 1e-12));
        expect(op.conductionFraction).toBeGreaterThan(0);
        expect(op.conductionFraction).toBeLessThanOrEqual(1);
        expect(op.rectifierCurrentRms).toBeGreaterThanOrEqual(op.outputCurrent * (1 - 1e-12));
      }),
      { seed: 18, numRuns: 150 },
    );
  });

  it("the gain is independent of the input voltage (the ideal circuit is linear in V_in within each mode)", () => {
    fc.assert(
      fc.property(fc.constantFrom(0, 0.5, 1), fc.double({ min: 0.3, max: 3, noNaN: true }), fc.double({ min: 0.7, max: 1.6, noNaN: true }), fc.double({ min: 12, max: 800, noNaN: true }), (ratio, q, fn, vin) => {
        const a = at(ratio, q, fn);
        const b = at(ratio, q, fn, { inputVoltage: vin });
        expect(rel(b.gain, a.gain)).toBeLessThanOrEqual(1e-9);
        expect(b.conductionMode).toBe(a.conductionMode);
      }),
      { seed: 18, numRuns: 60 },
    );
  });

  it("the gain falls as the frequency rises above the parallel resonance f_r·√(1 + 1/A) (PRC: above f_r)", () => {
    fc.assert(
      fc.property(fc.constantFrom(0, 0.25, 0.5, 1, 2), fc.double({ min: 0.3, max: 3, noNaN: true }), fc.double({ min: 1.02, max: 1.8, noNaN: true }), (ratio, q, k) => {
        const fp = ratio === 0 ? 1 : Math.sqrt(1 + 1 / ratio);
        const fn = fp * k;
        const a = at(ratio, q, fn);
        const b = at(ratio, q, fn * 1.03);
        expect(b.gain).toBeLessThan(a.gain);
        expect(a.zeroVoltageSwitching).toBe(true); // above the tank's resonance the current lags (common practice)
      }),
      { seed: 18, numRuns: 80 },
    );
  });

  it("the LCC tends to the PRC as C_s → ∞ (two solutions agree)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.3, max: 3, noNaN: true }), fc.double({ min: 0.7, max: 1.6, noNaN: true }), (q, fn) => {
        const prc = at(0, q, fn);
        // C_p = c fixed; C_s = 1e7 c: A = 1e-7, the series capacitor's reactance is 1e-7 of C_p's
        const lcc = lccOperatingPointCapacitiveFilter({ ...base, seriesCapacitance: 1e7 * c, parallelCapacitance: c, switchingFrequency: fn * fr, loadResistance: loadFor(q) });
        expect(rel(lcc.gain, prc.gain)).toBeLessThanOrEqual(1e-5);
        expect(lcc.conductionMode).toBe(prc.conductionMode);
      }),
      { seed: 18, numRuns: 40 },
    );
  });

  it("a sweep in random order gives the single-point values (continuation changes only the start)", () => {
    const circuit = { ...base, seriesCapacitance: c, parallelCapacitance: c, loadResistance: 12 };
    fc.assert(
      fc.property(fc.array(fc.double({ min: 0.7 * fr, max: 2.2 * fr, noNaN: true }), { minLength: 2, maxLength: 8 }), fc.constantFrom("inductive", "capacitive"), (frequencies, outputFilter) => {
        const sweep = lccFrequencySweep({ ...circuit, frequencies, outputFilter });
        sweep.points.forEach((p, k) => {
          const fs = frequencies[k] ?? 0;
          const single = outputFilter === "capacitive"
            ? lccOperatingPointCapacitiveFilter({ ...circuit, switchingFrequency: fs })
            : lccOperatingPoint({ ...circuit, switchingFrequency: fs });
          expect(p.solved).toBe(true);
          if (p.solved) expect(rel(p.gain, single.gain)).toBeLessThanOrEqual(1e-9);
        });
      }),
      { seed: 18, numRuns: 20 },
    );
  });
});

describe("capacitive-filter exact steady state over a grid", () => {
  it("converges and conserves power at every point of PRC and A = 0.25 … 2, 0.2 ≤ Q ≤ 5, 0.5 ≤ f_n ≤ 2 (1395 points)", () => {
    let count = 0;
    for (const ratio of [0, 0.25, 0.5, 1, 2]) {
      for (const q of [0.2, 0.3, 0.5, 0.75, 1, 1.5, 2, 3, 5]) {
        for (let k = 0; k <= 30; k++) {
          const op = at(ratio, q, 0.5 + 0.05 * k);
          expect(rel(op.inputPower, op.outputPower)).toBeLessThanOrEqual(1e-9);
          count++;
        }
      }
    }
    expect(count).toBe(1395);
  });
});
