import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { inductiveLink, InputError, maximumLinkEfficiency, optimalLoadResistance, type InductiveLink, type InductiveLinkOptions } from "../../src/index.js";
import { logUniform } from "../support/arbitraries.js";
import { uniform } from "../support/seeded.js";

/** The sum of every number in a link result: finite exactly when each of them is. */
function resultSum(r: InductiveLink): number {
  let sum = r.efficiency + r.outputPower + r.inputPower + r.inputImpedance.re + Math.abs(r.inputImpedance.im) + r.inputCurrentRms;
  sum += r.primaryCurrentRms + r.secondaryCurrentRms + r.loadVoltageRms + r.couplingCoefficient;
  for (const c of r.capacitors) sum += c.capacitance + c.voltageRms + c.currentRms;
  return sum;
}

const COMPENSATIONS = ["series-series", "series-parallel", "parallel-series", "parallel-parallel", "lcc-series", "double-lcc"] as const;

describe("inductive link properties", () => {
  it("efficiency lies in (0, 1], power is conserved, and no link beats the kQ limit", () => {
    fc.assert(
      fc.property(
        logUniform(1e-6, 1e-3), logUniform(1e-6, 1e-3), fc.double({ min: 0.01, max: 0.9, noNaN: true }), logUniform(1e-3, 1), logUniform(1e-3, 1),
        logUniform(1e4, 1e7), logUniform(0.1, 1e3), fc.constantFrom("series-series", "series-parallel", "parallel-series", "parallel-parallel" as const),
        (l1, l2, k, r1, r2, f, rl, compensation) => {
          const link = inductiveLink({ primaryInductance: l1, secondaryInductance: l2, mutualInductance: k * Math.sqrt(l1 * l2), primaryResistance: r1, secondaryResistance: r2, frequency: f, compensation, loadResistance: rl, sourceVoltage: 1 });
          expect(link.efficiency).toBeGreaterThan(0);
          expect(link.efficiency).toBeLessThanOrEqual(1);
          const losses = link.primaryCurrentRms ** 2 * r1 + link.secondaryCurrentRms ** 2 * r2;
          expect(Math.abs(link.inputPower - link.outputPower - losses)).toBeLessThanOrEqual(1e-9 * link.inputPower);
          const w = 2 * Math.PI * f;
          const limit = maximumLinkEfficiency({ couplingCoefficient: k, primaryQuality: (w * l1) / r1, secondaryQuality: (w * l2) / r2 });
          expect(link.efficiency).toBeLessThanOrEqual(limit * (1 + 1e-9));
        },
      ),
      { seed: 18, numRuns: 300 },
    );
  });

  it("every result is finite over the whole box the fast path takes, its corners included (36 000 seeded links)", () => {
    // the box written in inductiveLink's fast path: 1 pH ≤ L ≤ 1 kH, k ≥ 1e-6, R ≤ 1 MΩ, 1 mHz ≤ f ≤ 1 THz,
    // 1 nΩ ≤ R_L ≤ 1 TΩ, 1 nV ≤ V ≤ 1 GV, 1e-9 ≤ L_f/L ≤ 1 − 1e-9; each draw an end of its range
    // (80 % of the time in the first half of the draws) or a log-uniform value inside it
    const next = uniform(61140);
    const box: Record<string, [number, number]> = {
      l1: [1e-12, 1e3], l2: [1e-12, 1e3], k: [1e-6, 0.999999], r1: [1e-300, 1e6], r2: [1e-300, 1e6], f: [1e-3, 1e12],
      rl: [1e-9, 1e12], v: [1e-9, 1e9], x1: [1e-9, 0.999999999], x2: [1e-9, 0.999999999],
    };
    let finite = 0;
    let refused = 0;
    for (let t = 0; t < 36000; t++) {
      const compensation = COMPENSATIONS[t % 6] ?? "series-series";
      const corners = t < 18000 && next() < 0.8;
      const draw = (key: string): number => {
        const [lo, hi] = box[key] ?? [1, 1];
        if (key.startsWith("r") && key !== "rl" && next() < 0.2) return 0;
        return corners ? (next() < 0.5 ? lo : hi) : lo * (hi / lo) ** next();
      };
      const p = Object.fromEntries(Object.keys(box).map((key) => [key, draw(key)])) as Record<string, number>;
      const l1 = p.l1 ?? 1;
      const l2 = p.l2 ?? 1;
      const options: InductiveLinkOptions = {
        primaryInductance: l1, secondaryInductance: l2, mutualInductance: (p.k ?? 0.5) * Math.sqrt(l1 * l2), primaryResistance: p.r1 ?? 0,
        secondaryResistance: p.r2 ?? 0, frequency: p.f ?? 1, compensation, loadResistance: p.rl ?? 1, sourceVoltage: p.v ?? 1,
        ...(compensation === "lcc-series" || compensation === "double-lcc" ? { primaryFilterInductance: (p.x1 ?? 0.5) * l1 } : {}),
        ...(compensation === "double-lcc" ? { secondaryFilterInductance: (p.x2 ?? 0.5) * l2 } : {}),
      };
      try {
        expect(resultSum(inductiveLink(options))).toBeLessThan(Infinity);
        finite++;
      } catch (error) {
        // the only refusal inside the box: a primary branch that is capacitive, so no default C₁
        if (!(error instanceof InputError) || !/branch is capacitive/.test(error.message)) throw error;
        refused++;
      }
    }
    expect(finite + refused).toBe(36000);
    expect(refused).toBeLessThan(0.02 * 36000); // 310 at this seed, nearly all at corners
  });

  it("refuses inputs whose results leave the double range instead of returning Infinity or NaN", () => {
    const base = { primaryInductance: 24e-6, secondaryInductance: 12e-6, mutualInductance: 4e-6, primaryResistance: 0.1, secondaryResistance: 0.08, frequency: 140e3, loadResistance: 5, sourceVoltage: 10 };
    const lcc = { primaryFilterInductance: 6e-6, secondaryFilterInductance: 3e-6 };
    // 1e-300 Hz: the default capacitors 1/(ω²L) overflow; 1e300 V: the powers overflow; 1e-300 V: the powers underflow to 0/0
    expect(() => inductiveLink({ ...base, compensation: "series-series", frequency: 1e-300 })).toThrow(/double-precision range/);
    expect(() => inductiveLink({ ...base, compensation: "double-lcc", ...lcc, sourceVoltage: 1e300 })).toThrow(/double-precision range/);
    expect(() => inductiveLink({ ...base, compensation: "parallel-series", sourceVoltage: 1e-300 })).toThrow(/double-precision range/);
    // outside the fast path's box but within the double range: answered, through the checked path
    const far = inductiveLink({ ...base, compensation: "series-series", frequency: 2e12 });
    expect(resultSum(far)).toBeLessThan(Infinity);
    expect(far.efficiency).toBeGreaterThan(0);
  });

  it("the kQ limit rises with k and with each Q, and the optimal load scales with R₂", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 0.8, noNaN: true }), logUniform(1, 1e3), logUniform(1, 1e3), logUniform(1e-3, 10), (k, q1, q2, r2) => {
        const a = maximumLinkEfficiency({ couplingCoefficient: k, primaryQuality: q1, secondaryQuality: q2 });
        expect(maximumLinkEfficiency({ couplingCoefficient: k * 1.1, primaryQuality: q1, secondaryQuality: q2 })).toBeGreaterThan(a);
        expect(maximumLinkEfficiency({ couplingCoefficient: k, primaryQuality: q1 * 1.1, secondaryQuality: q2 })).toBeGreaterThan(a);
        const r = optimalLoadResistance({ couplingCoefficient: k, primaryQuality: q1, secondaryQuality: q2, secondaryResistance: r2 });
        expect(Math.abs(optimalLoadResistance({ couplingCoefficient: k, primaryQuality: q1, secondaryQuality: q2, secondaryResistance: 2 * r2 }) / r - 2)).toBeLessThanOrEqual(1e-12);
      }),
      { seed: 18, numRuns: 200 },
    );
  });
});

describe("pad properties", () => {
  it("padMutualInductance is symmetric in the two pads and scales with length", async () => {
    const { padMutualInductance } = await import("../../src/index.js");
    fc.assert(
      fc.property(fc.double({ min: 0.02, max: 0.2, noNaN: true }), fc.double({ min: 1.2, max: 3, noNaN: true }), fc.double({ min: 0.01, max: 0.2, noNaN: true }), fc.double({ min: 0, max: 0.3, noNaN: true }), fc.double({ min: 0.5, max: 5, noNaN: true }), (inner, ratio, z, d, k) => {
        const p1 = { innerRadius: inner, outerRadius: inner * ratio, turns: 3 };
        const p2 = { innerRadius: inner * 0.8, outerRadius: inner * ratio * 0.9, turns: 2 };
        const m = padMutualInductance({ pad1: p1, pad2: p2, axialDistance: z, lateralOffset: d }).mutualInductance;
        const swapped = padMutualInductance({ pad1: p2, pad2: p1, axialDistance: z, lateralOffset: d }).mutualInductance;
        const coaxial = padMutualInductance({ pad1: p1, pad2: p2, axialDistance: z }).mutualInductance;
        expect(Math.abs(swapped - m)).toBeLessThanOrEqual(1e-10 * coaxial);
        const scaled = padMutualInductance({
          pad1: { innerRadius: p1.innerRadius * k, outerRadius: p1.outerRadius * k, turns: 3 },
          pad2: { innerRadius: p2.innerRadius * k, outerRadius: p2.outerRadius * k, turns: 2 },
          axialDistance: z * k, lateralOffset: d * k,
        }).mutualInductance;
        expect(Math.abs(scaled - k * m)).toBeLessThanOrEqual(1e-10 * k * coaxial);
      }),
      { seed: 18, numRuns: 25 },
    );
  });
});

describe("splitting properties", () => {
  it("seriesSeriesSplitting: no split below the critical coupling, three frequencies above it, and f₀ always among them", async () => {
    const { seriesSeriesSplitting } = await import("../../src/index.js");
    fc.assert(
      fc.property(logUniform(1e-6, 1e-3), logUniform(1e-6, 1e-3), fc.double({ min: 0.01, max: 0.95, noNaN: true }), logUniform(0.01, 1), logUniform(0.5, 100), logUniform(1e3, 1e7), (l1, l2, k, r2, rl, f0) => {
        const s = seriesSeriesSplitting({ primaryInductance: l1, secondaryInductance: l2, mutualInductance: k * Math.sqrt(l1 * l2), secondaryResistance: r2, loadResistance: rl, resonantFrequency: f0 });
        expect(s.zeroPhaseFrequencies).toContain(f0);
        expect(s.zeroPhaseFrequencies.length).toBe(s.split ? 3 : 1);
        expect(s.split).toBe(k > s.criticalCoupling);
        expect(s.criticalCoupling).toBeLessThanOrEqual(1);
      }),
      { seed: 18, numRuns: 300 },
    );
  });
});

describe("lccSplitting properties", () => {
  it("impedance scaling (all L and R ×s) and frequency scaling (f₀ ×a, L ÷a) leave k_c unchanged and scale the frequencies by a", async () => {
    const { lccSplitting } = await import("../../src/index.js");
    fc.assert(
      fc.property(fc.double({ min: 0.2, max: 5, noNaN: true }), fc.double({ min: 0.2, max: 5, noNaN: true }), fc.double({ min: 0.05, max: 0.6, noNaN: true }), fc.boolean(), (s, a, k, double) => {
        const make = (zs: number, fa: number) => lccSplitting({
          compensation: double ? "double-lcc" : "lcc-series", primaryInductance: (zs * 60e-6) / fa, secondaryInductance: (zs * 40e-6) / fa,
          mutualInductance: (zs * k * Math.sqrt(60e-6 * 40e-6)) / fa, primaryFilterInductance: (zs * 10e-6) / fa,
          ...(double ? { secondaryFilterInductance: (zs * 8e-6) / fa } : {}),
          primaryResistance: zs * 0.05, secondaryResistance: zs * 0.05, loadResistance: zs * 5, resonantFrequency: fa * 100e3,
        });
        const one = make(1, 1);
        const two = make(s, a);
        expect(Math.abs(two.criticalCoupling - one.criticalCoupling)).toBeLessThanOrEqual(1e-9);
        expect(two.zeroPhaseFrequencies.length).toBe(one.zeroPhaseFrequencies.length);
        two.zeroPhaseFrequencies.forEach((f, i) => { expect(Math.abs(f / (a * one.zeroPhaseFrequencies[i]!) - 1)).toBeLessThanOrEqual(1e-8); });
      }),
      { seed: 18, numRuns: 30 },
    );
  });

  it("below k_c the weakly coupled count of zero-phase frequencies holds; just above it a pair is born", async () => {
    const { lccSplitting } = await import("../../src/index.js");
    fc.assert(
      fc.property(fc.double({ min: 1, max: 20, noNaN: true }), fc.double({ min: 5e-6, max: 20e-6, noNaN: true }), fc.boolean(), (rl, lf1, double) => {
        const at = (k: number) => lccSplitting({
          compensation: double ? "double-lcc" : "lcc-series", primaryInductance: 60e-6, secondaryInductance: 40e-6, mutualInductance: k * Math.sqrt(60e-6 * 40e-6),
          primaryFilterInductance: lf1, ...(double ? { secondaryFilterInductance: 8e-6 } : {}), primaryResistance: 0.05, secondaryResistance: 0.05,
          loadResistance: rl, resonantFrequency: 100e3,
        });
        const kc = at(0.1).criticalCoupling;
        if (kc >= 0.99) return;
        expect(at(kc * (1 - 1e-6)).zeroPhaseFrequencies.length).toBe(at(0.1).weakCouplingCount);
        expect(at(kc * (1 + 1e-6)).zeroPhaseFrequencies.length).toBeGreaterThan(at(0.1).weakCouplingCount);
      }),
      { seed: 18, numRuns: 20 },
    );
  });
});
