import { describe, expect, it } from "vitest";
import {
  InputError, lccFrequencySweep, lccOperatingPoint, lccOperatingPointCapacitiveFilter, parallelResonantOperatingPointCapacitiveFilter,
} from "../../src/index.js";
import fixture from "../fixtures/converters/prc-lcc-capacitive-steady-state.json" with { type: "json" };

interface Case {
  input: {
    bridge: "half" | "full"; inputVoltage: number; turnsRatio: number; resonantInductance: number; seriesCapacitance: number | null;
    parallelCapacitance: number; switchingFrequency: number; loadResistance: number; qualityFactor: number; normalisedFrequency: number;
  };
  expected: {
    gain: number; outputVoltage: number; resonantCurrentRms: number; resonantCurrentPeak: number; seriesCapacitorVoltagePeak: number;
    parallelCapacitorVoltagePeak: number; parallelCapacitorVoltageRms: number; currentAtHalfPeriod: number; inputPower: number;
    outputPower: number; rectifierCurrentRms: number; conductionFraction: number; sequence: string;
  };
}

function solve(c: Case["input"]) {
  const { seriesCapacitance, bridge, inputVoltage, turnsRatio, resonantInductance, parallelCapacitance, switchingFrequency, loadResistance } = c;
  const rest = { bridge, inputVoltage, turnsRatio, resonantInductance, parallelCapacitance, switchingFrequency, loadResistance };
  return seriesCapacitance === null
    ? parallelResonantOperatingPointCapacitiveFilter(rest)
    : lccOperatingPointCapacitiveFilter({ ...rest, seriesCapacitance });
}

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);
const all = [...fixture.cases, ...fixture.modes, ...fixture.sweep] as Case[];

const base = { bridge: "half" as const, inputVoltage: 400, turnsRatio: 4, resonantInductance: 100e-6 };
const cRef = 25e-9;
const zRef = Math.sqrt(100e-6 / cRef);
const fr = 1 / (2 * Math.PI * Math.sqrt(100e-6 * cRef));
/** Load resistance for Q = √(L_r/C)/R_ac with the capacitive-filter R_ac = 8n²R/π² (n = 4). */
const loadFor = (q: number): number => (Math.PI * Math.PI * zRef) / (q * 8 * 16);
const at = (ratio: number, q: number, fn: number) => ratio === 0
  ? parallelResonantOperatingPointCapacitiveFilter({ ...base, parallelCapacitance: cRef, switchingFrequency: fn * fr, loadResistance: loadFor(q) })
  : lccOperatingPointCapacitiveFilter({ ...base, seriesCapacitance: cRef, parallelCapacitance: ratio * cRef, switchingFrequency: fn * fr, loadResistance: loadFor(q) });

describe("parallelResonantOperatingPointCapacitiveFilter / lccOperatingPointCapacitiveFilter (exact steady state)", () => {
  const tol = fixture.meta.rtol; // 1e-6
  for (const c of all) {
    const i = c.input;
    it(`matches the time-domain simulation: ${i.seriesCapacitance === null ? "PRC" : `LCC A = ${(i.parallelCapacitance / i.seriesCapacitance).toFixed(2)}`}, f = ${i.switchingFrequency.toFixed(0)} Hz, R = ${i.loadResistance.toPrecision(4)} Ω`, () => {
      const op = solve(i);
      const e = c.expected;
      // fixture from scipy, test/fixtures/converters/generate_prc_lcc_capacitive.py (shooting on a matrix-exponential simulation)
      expect(rel(op.gain, e.gain)).toBeLessThanOrEqual(tol);
      expect(rel(op.outputVoltage, e.outputVoltage)).toBeLessThanOrEqual(tol);
      expect(rel(op.resonantCurrentRms, e.resonantCurrentRms)).toBeLessThanOrEqual(tol);
      expect(rel(op.resonantCurrentPeak, e.resonantCurrentPeak)).toBeLessThanOrEqual(tol);
      expect(rel(op.parallelCapacitorVoltagePeak, e.parallelCapacitorVoltagePeak)).toBeLessThanOrEqual(tol);
      expect(rel(op.parallelCapacitorVoltageRms, e.parallelCapacitorVoltageRms)).toBeLessThanOrEqual(tol);
      if (i.seriesCapacitance !== null) expect(rel(op.seriesCapacitorVoltagePeak, e.seriesCapacitorVoltagePeak)).toBeLessThanOrEqual(tol);
      else expect(op.seriesCapacitorVoltagePeak).toBe(0);
      expect(Math.abs(op.turnOffCurrent - e.currentAtHalfPeriod)).toBeLessThanOrEqual(tol * e.resonantCurrentPeak);
      expect(rel(op.inputPower, e.inputPower)).toBeLessThanOrEqual(tol);
      expect(rel(op.rectifierCurrentRms, e.rectifierCurrentRms)).toBeLessThanOrEqual(tol);
      expect(Math.abs(op.conductionFraction - e.conductionFraction)).toBeLessThanOrEqual(tol);
      expect(op.conductionMode).toBe(e.sequence);
      expect(op.validity).toHaveLength(0);
    });
  }

  it("the fixture covers the conduction-mode sequences NOP, OPO, ONO, OPONO and PON", () => {
    const modes = new Set(all.map((c) => c.expected.sequence));
    for (const s of ["NOP", "OPO", "ONO", "OPONO", "PON"]) expect(modes.has(s)).toBe(true);
  });

  it("conserves power: input power equals output power (lossless ideal circuit), here and in the simulation", () => {
    for (const c of all) {
      const op = solve(c.input);
      expect(rel(op.inputPower, op.outputPower)).toBeLessThanOrEqual(1e-9);
      expect(rel(c.expected.inputPower, c.expected.outputPower)).toBeLessThanOrEqual(1e-9);
    }
  });

  it("PRC: the RC-load first harmonic is within 2.4 % of the exact gain for 0.8 ≤ f_n ≤ 1.2 and 3.8 % for 0.7 ≤ f_n ≤ 1.6 (0.5 ≤ Q ≤ 3)", () => {
    for (const q of [0.5, 0.75, 1, 1.5, 2, 3]) {
      for (let k = 0; k <= 18; k++) {
        const fn = 0.7 + 0.05 * k;
        const op = at(0, q, fn);
        const err = rel(op.firstHarmonic.gain, op.gain);
        expect(err).toBeLessThanOrEqual(0.038);
        if (fn >= 0.8 - 1e-9 && fn <= 1.2 + 1e-9) expect(err).toBeLessThanOrEqual(0.024);
      }
    }
  });

  it("LCC: the RC-load first harmonic is within 3.5 % for 1 ≤ f_n ≤ 1.6, 6.8 % for 0.8 ≤ f_n ≤ 1.2, 12.1 % for 0.7 ≤ f_n ≤ 1.6 (0.25 ≤ A ≤ 2, 0.5 ≤ Q ≤ 3)", () => {
    for (const ratio of [0.25, 0.5, 1, 2]) {
      for (const q of [0.5, 0.75, 1, 1.5, 2, 3]) {
        for (let k = 0; k <= 18; k++) {
          const fn = 0.7 + 0.05 * k;
          const op = at(ratio, q, fn);
          const err = rel(op.firstHarmonic.gain, op.gain);
          expect(err).toBeLessThanOrEqual(0.121);
          if (fn >= 0.8 - 1e-9 && fn <= 1.2 + 1e-9) expect(err).toBeLessThanOrEqual(0.068);
          if (fn >= 1 - 1e-9) expect(err).toBeLessThanOrEqual(0.035);
        }
      }
    }
  });

  it("the RC load model tends to its limits: φ → 0 and R_e → 8n²R/π² with a negligible C_p; φ → π and C_e → C_p with a huge load resistance", () => {
    // with C_p → 0 the rectifier input is a square wave: R_ac = 8n²R/π² (Steigerwald 1988, series-resonant converter)
    const small = lccOperatingPointCapacitiveFilter({ ...base, seriesCapacitance: cRef, parallelCapacitance: 1e-6 * cRef, switchingFrequency: 1.1 * fr, loadResistance: 10 });
    expect(small.firstHarmonic.nonConductionAngle).toBeLessThan(0.01);
    expect(rel(small.firstHarmonic.equivalentResistance, (8 * 16 * 10) / Math.PI ** 2)).toBeLessThanOrEqual(1e-4);
    // with R → ∞ the rectifier hardly conducts: C_p alone (Ivensky, Kats & Ben-Yaakov 1999: C_e → C_p)
    const open = lccOperatingPointCapacitiveFilter({ ...base, seriesCapacitance: cRef, parallelCapacitance: cRef, switchingFrequency: 1.3 * fr, loadResistance: 1e7 });
    expect(open.firstHarmonic.nonConductionAngle).toBeGreaterThan(Math.PI - 0.01);
    expect(rel(open.firstHarmonic.equivalentCapacitance, cRef)).toBeLessThanOrEqual(1e-5);
  });

  it("the first harmonic's non-conduction angle is near the exact one (1 − conduction fraction) · π at resonance", () => {
    const op = at(0, 1, 1);
    expect(Math.abs(op.firstHarmonic.nonConductionAngle - (1 - op.conductionFraction) * Math.PI)).toBeLessThanOrEqual(0.1);
  });

  it("the output capacitor's ripple current is √(I_rect² − I_out²) and the diode blocks V_out", () => {
    const op = at(1, 1, 1.2);
    expect(op.outputCapacitorCurrentRms).toBeCloseTo(Math.sqrt(op.rectifierCurrentRms ** 2 - op.outputCurrent ** 2), 12);
    expect(op.rectifierCurrentRms).toBeGreaterThan(op.outputCurrent);
    expect(op.diodeVoltagePeak).toBe(op.outputVoltage);
    expect(rel(op.parallelCapacitorVoltagePeak, op.outputVoltage * 4)).toBeLessThanOrEqual(1e-12);
  });

  it("the documented examples (values also checked by npm run examples)", () => {
    const prc = parallelResonantOperatingPointCapacitiveFilter({ ...base, parallelCapacitance: 25e-9, switchingFrequency: 110e3, loadResistance: 12 });
    expect(prc.conductionMode).toBe("NOP");
    expect(prc.outputVoltage.toFixed(3)).toBe("78.274");
    expect(prc.firstHarmonic.outputVoltage.toFixed(3)).toBe("78.936");
    const lcc = lccOperatingPointCapacitiveFilter({ ...base, seriesCapacitance: 25e-9, parallelCapacitance: 25e-9, switchingFrequency: 150e3, loadResistance: 12 });
    expect(lcc.conductionMode).toBe("NOP");
    expect(lcc.outputVoltage.toFixed(3)).toBe("95.931");
    expect(lcc.firstHarmonic.outputVoltage.toFixed(3)).toBe("96.512");
    expect(lcc.zeroVoltageSwitching).toBe(true);
  });

  it("cautions for voltages above extra-low voltage and for capacitive (hard) switching", () => {
    const op = at(1, 1, 1.2);
    expect(op.cautions.some((c) => c.code === "voltage-above-extra-low")).toBe(true);
    // well below resonance at light load the PRC draws leading current (fixture case q = 0.3, f_n = 0.7)
    const low = at(0, 0.3, 0.7);
    expect(low.turnOffCurrent).toBeLessThan(0);
    expect(low.zeroVoltageSwitching).toBe(false);
    expect(low.cautions.some((c) => c.code === "hard-switching")).toBe(true);
  });

  it("reports leaving the tested domain in validity, not by throwing", () => {
    const op = at(0, 1, 2.5);
    expect(op.validity.some((v) => v.code === "outside-tested-domain")).toBe(true);
    expect(rel(op.inputPower, op.outputPower)).toBeLessThanOrEqual(1e-9);
  });

  it("throws InputError on bad input and unknown keys", () => {
    const ok = { ...base, parallelCapacitance: cRef, switchingFrequency: 1e5, loadResistance: 20 };
    expect(() => parallelResonantOperatingPointCapacitiveFilter({ ...ok, switchingFrequency: 0 })).toThrow(InputError);
    expect(() => parallelResonantOperatingPointCapacitiveFilter({ ...ok, loadResistance: Number.NaN })).toThrow(InputError);
    expect(() => lccOperatingPointCapacitiveFilter({ ...ok, seriesCapacitance: -1 })).toThrow(InputError);
    expect(() => parallelResonantOperatingPointCapacitiveFilter({ ...ok, seriesCapacitance: 1e-9 } as never)).toThrow(InputError);
    expect(() => parallelResonantOperatingPointCapacitiveFilter({ ...ok, bridge: "quarter" } as never)).toThrow(InputError);
    expect(() => parallelResonantOperatingPointCapacitiveFilter(null as never)).toThrow(InputError);
  });
});

describe("lccFrequencySweep", () => {
  const circuit = { ...base, seriesCapacitance: 25e-9, parallelCapacitance: 25e-9, loadResistance: 12 };
  const sweepCases = fixture.sweep as Case[];

  it("capacitive filter: every point matches the simulated sweep (fixture group sweep, 105–240 kHz) within 1e-6", () => {
    const sweep = lccFrequencySweep({ ...circuit, frequencies: sweepCases.map((c) => c.input.switchingFrequency), outputFilter: "capacitive" });
    expect(sweep.unsolvedCount).toBe(0);
    sweep.points.forEach((p, k) => {
      const e = (sweepCases[k] as Case).expected;
      expect(p.solved).toBe(true);
      if (!p.solved) return;
      // fixture from scipy, generate_prc_lcc_capacitive.py
      expect(rel(p.gain, e.gain)).toBeLessThanOrEqual(fixture.meta.rtol);
      expect(rel(p.resonantCurrentRms, e.resonantCurrentRms)).toBeLessThanOrEqual(fixture.meta.rtol);
      expect(rel(p.seriesCapacitorVoltagePeak, e.seriesCapacitorVoltagePeak)).toBeLessThanOrEqual(fixture.meta.rtol);
      expect(Math.abs(p.turnOffCurrent - e.currentAtHalfPeriod)).toBeLessThanOrEqual(fixture.meta.rtol * e.resonantCurrentPeak);
      expect(p.zeroVoltageSwitching).toBe(e.currentAtHalfPeriod > 0);
      expect(p.conductionMode).toBe(e.sequence);
    });
  });

  it("continuation gives the single-point values (to 1e-9), in either sweep direction", () => {
    const frequencies = Array.from({ length: 41 }, (_, k) => 90e3 + 4e3 * k);
    for (const list of [frequencies, [...frequencies].reverse()]) {
      for (const outputFilter of ["capacitive", "inductive"] as const) {
        const sweep = lccFrequencySweep({ ...circuit, frequencies: list, outputFilter });
        expect(sweep.unsolvedCount).toBe(0);
        sweep.points.forEach((p, k) => {
          if (!p.solved) throw new Error("unsolved");
          const fs = list[k] ?? 0;
          const single = outputFilter === "capacitive"
            ? lccOperatingPointCapacitiveFilter({ ...circuit, switchingFrequency: fs })
            : lccOperatingPoint({ ...circuit, switchingFrequency: fs });
          expect(rel(p.gain, single.gain)).toBeLessThanOrEqual(1e-9);
          expect(rel(p.resonantCurrentRms, single.resonantCurrentRms)).toBeLessThanOrEqual(1e-9);
          expect(p.conductionMode).toBe(single.conductionMode);
        });
      }
    }
  });

  it("inductive filter: each point, its notes and its cautions are those of lccOperatingPoint", () => {
    // 0.55·f_r and 1.8·f_r lie outside lccOperatingPoint's tested domain (0.6 ≤ f_n ≤ 1.6), the rest inside
    const list = [0.55, 0.8, 1.2, 1.5, 1.8].map((k) => k * fr);
    const sweep = lccFrequencySweep({ ...circuit, frequencies: list });
    let outside = 0;
    const codes = new Set<string>();
    sweep.points.forEach((p, k) => {
      const op = lccOperatingPoint({ ...circuit, switchingFrequency: list[k] ?? 0 });
      if (op.validity.length > 0) outside++;
      for (const c of op.cautions) codes.add(c.code);
      if (!p.solved) throw new Error("unsolved");
      expect(rel(p.gain, op.gain)).toBeLessThanOrEqual(1e-9);
      expect(rel(p.resonantCurrentPeak, op.resonantCurrentPeak)).toBeLessThanOrEqual(1e-9);
      expect(rel(p.parallelCapacitorVoltagePeak, op.parallelCapacitorVoltagePeak)).toBeLessThanOrEqual(1e-9);
      expect(rel(p.seriesCapacitorVoltagePeak, op.seriesCapacitorVoltagePeak)).toBeLessThanOrEqual(1e-9);
      expect(Math.abs(p.turnOffCurrent - op.turnOffCurrent)).toBeLessThanOrEqual(1e-9 * op.resonantCurrentPeak);
      expect(rel(p.outputPower, op.outputPower)).toBeLessThanOrEqual(1e-9);
      expect(p.firstHarmonicGain).toBe(op.firstHarmonic.gain);
      expect(p.normalisedFrequency).toBeCloseTo(op.normalisedFrequency, 12);
    });
    expect(outside).toBe(2);
    expect(sweep.validity.find((v) => v.code === "outside-tested-domain")?.message).toMatch(/^2 of 5 points/);
    expect(new Set(sweep.cautions.map((c) => c.code))).toEqual(codes);
  });

  it("reports points without a steady state as solved: false with a reason, and goes on", () => {
    // at f_n ≈ 0.02 a half period holds more free oscillations than the event-driven propagation follows: no solution of the assumed modes
    for (const outputFilter of ["inductive", "capacitive"] as const) {
      const sweep = lccFrequencySweep({ ...circuit, frequencies: [150e3, 2e3, 150e3], outputFilter });
      const [first, gap, last] = sweep.points;
      expect(first?.solved).toBe(true);
      expect(last?.solved).toBe(true);
      expect(gap?.solved).toBe(false);
      expect(gap !== undefined && !gap.solved ? gap.reason : "").toMatch(/no periodic steady state/);
      expect(gap !== undefined && "gain" in gap).toBe(false);
      expect(sweep.unsolvedCount).toBe(1);
      expect(sweep.validity.some((v) => v.code === "no-steady-state")).toBe(true);
      if (first?.solved === true && last?.solved === true) expect(rel(last.gain, first.gain)).toBeLessThanOrEqual(1e-12);
    }
  });

  it("gathers cautions: each voltage once, at its worst point; hard switching with its span", () => {
    const sweep = lccFrequencySweep({ ...circuit, frequencies: [80e3, 100e3, 150e3, 200e3] });
    const codes = sweep.cautions.map((c) => c.code);
    expect(codes.filter((c) => c === "hard-switching").length).toBeLessThanOrEqual(1);
    const hard = sweep.points.filter((p) => p.solved && !p.zeroVoltageSwitching).length;
    expect(codes.includes("hard-switching")).toBe(hard > 0);
  });

  it("the documented example (value also checked by npm run examples)", () => {
    const sweep = lccFrequencySweep({ ...circuit, frequencies: [120e3, 150e3, 200e3], outputFilter: "capacitive" });
    const p = sweep.points[1];
    expect(p?.solved === true ? p.outputVoltage.toFixed(3) : "none").toBe("95.931");
  });

  it("throws InputError on bad input and unknown keys", () => {
    expect(() => lccFrequencySweep({ ...circuit, frequencies: [] })).toThrow(InputError);
    expect(() => lccFrequencySweep({ ...circuit, frequencies: [1e5, -1] })).toThrow(InputError);
    expect(() => lccFrequencySweep({ ...circuit, frequencies: [1e5], outputFilter: "resistive" } as never)).toThrow(InputError);
    expect(() => lccFrequencySweep({ ...circuit, frequencies: [1e5], switchingFrequency: 1e5 } as never)).toThrow(InputError);
    expect(() => lccFrequencySweep({ ...circuit, frequencies: 1e5 } as never)).toThrow(InputError);
  });
});
