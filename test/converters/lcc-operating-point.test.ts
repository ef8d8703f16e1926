import { describe, expect, it } from "vitest";
import { InputError, lccGain, lccOperatingPoint, parallelResonantGain, parallelResonantOperatingPoint } from "../../src/index.js";
import fixture from "../fixtures/converters/prc-lcc-steady-state.json" with { type: "json" };

interface Case {
  input: {
    bridge: "half" | "full"; inputVoltage: number; turnsRatio: number; resonantInductance: number; seriesCapacitance: number | null;
    parallelCapacitance: number; switchingFrequency: number; loadResistance: number;
  };
  expected: {
    gain: number; outputVoltage: number; resonantCurrentRms: number; resonantCurrentPeak: number; seriesCapacitorVoltagePeak: number;
    parallelCapacitorVoltagePeak: number; parallelCapacitorVoltageRms: number; currentAtHalfPeriod: number; inputPower: number;
    clampedFraction: number; sequence: string;
  };
}

function solve(c: Case["input"]) {
  const { seriesCapacitance, bridge, inputVoltage, turnsRatio, resonantInductance, parallelCapacitance, switchingFrequency, loadResistance } = c;
  const rest = { bridge, inputVoltage, turnsRatio, resonantInductance, parallelCapacitance, switchingFrequency, loadResistance };
  return seriesCapacitance === null ? parallelResonantOperatingPoint(rest) : lccOperatingPoint({ ...rest, seriesCapacitance });
}

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

const base = { bridge: "half" as const, inputVoltage: 400, turnsRatio: 4, resonantInductance: 100e-6, parallelCapacitance: 25e-9 };
const zp = Math.sqrt(100e-6 / 25e-9);
const fr = 1 / (2 * Math.PI * Math.sqrt(100e-6 * 25e-9));
/** Load resistance for a quality factor Q = √(L_r/C)/R_ac, R_ac = π²n²R/8 (n = 4). */
const loadFor = (q: number): number => (8 * zp) / (q * Math.PI * Math.PI * 16);

describe("parallelResonantOperatingPoint / lccOperatingPoint (exact steady state, inductive output filter)", () => {
  const tol = fixture.meta.rtol; // 1e-6
  for (const c of fixture.cases as Case[]) {
    const i = c.input;
    it(`matches the time-domain simulation: ${i.seriesCapacitance === null ? "PRC" : `LCC A = ${(i.parallelCapacitance / i.seriesCapacitance).toFixed(2)}`}, f = ${i.switchingFrequency.toFixed(0)} Hz, R = ${i.loadResistance.toPrecision(4)} Ω`, () => {
      const op = solve(i);
      const e = c.expected;
      // fixture from scipy, test/fixtures/converters/generate_prc_lcc.py (shooting on a matrix-exponential simulation)
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
      expect(Math.abs(op.clampedFraction - e.clampedFraction)).toBeLessThanOrEqual(tol);
      expect(op.conductionMode).toBe(e.sequence);
    });
  }

  it("the fixture covers both kinds of rectifier mode: continuous (NP, PN) and clamped (NZP, ZPZ, ZPNZ)", () => {
    const modes = new Set((fixture.cases as Case[]).map((c) => c.expected.sequence));
    expect(modes.has("NP")).toBe(true);
    expect([...modes].some((s) => s.includes("Z"))).toBe(true);
  });

  it("conserves power: input power equals output power (lossless ideal circuit)", () => {
    for (const c of fixture.cases as Case[]) {
      const op = solve(c.input);
      expect(rel(op.inputPower, op.outputPower)).toBeLessThanOrEqual(1e-9);
    }
  });

  it("its first-harmonic gain is parallelResonantGain / lccGain for the same circuit", () => {
    for (const c of fixture.cases as Case[]) {
      const op = solve(c.input);
      const g = c.input.seriesCapacitance === null
        ? parallelResonantGain({ qualityFactor: op.qualityFactor, normalisedFrequency: op.normalisedFrequency })
        : lccGain({ qualityFactor: op.qualityFactor, normalisedFrequency: op.normalisedFrequency, capacitanceRatio: op.capacitanceRatio });
      expect(rel(op.firstHarmonic.gain, g)).toBeLessThanOrEqual(1e-12);
    }
  });

  it("PRC agrees with the first-harmonic gain near resonance (within 1.2 % for |f_n − 1| ≤ 0.02, 3.1 % for ≤ 0.05, 6.4 % for ≤ 0.1; 0.2 ≤ Q ≤ 1)", () => {
    for (const [band, bound] of [[0.02, 0.012], [0.05, 0.031], [0.1, 0.064]] as const) {
      for (const q of [0.2, 0.35, 0.5, 0.75, 1]) {
        for (let i = -4; i <= 4; i++) {
          const fn = 1 + (band * i) / 4;
          const op = parallelResonantOperatingPoint({ ...base, switchingFrequency: fn * fr, loadResistance: loadFor(q) });
          expect(rel(op.firstHarmonic.gain, op.gain)).toBeLessThanOrEqual(bound);
        }
      }
    }
  });

  it("PRC at f_n = 1 in the continuous mode: exact gain 1/ζ = 8/(π²Q), the FHA value (Steigerwald 1988: the PRC is a current source at resonance)", () => {
    for (const q of [0.2, 0.5, 1]) {
      const op = parallelResonantOperatingPoint({ ...base, switchingFrequency: fr, loadResistance: loadFor(q) });
      expect(op.conductionMode).toBe("NP");
      expect(rel(op.gain, 8 / (Math.PI * Math.PI * q))).toBeLessThanOrEqual(1e-9);
    }
  });

  it("LCC against the first-harmonic gain: within 4.5 % for A = 2 and 1.7 % for A = 1 at f_n = 1.1, up to 22 % over 0.25 ≤ A ≤ 2, 1 ≤ f_n ≤ 1.6 (0.2 ≤ Q ≤ 1)", () => {
    for (const ratio of [0.25, 0.5, 1, 2]) {
      for (const fn of [1, 1.1, 1.2, 1.3, 1.4, 1.5, 1.6]) {
        for (const q of [0.2, 0.35, 0.5, 0.75, 1]) {
          const op = lccOperatingPoint({ ...base, seriesCapacitance: 25e-9, parallelCapacitance: ratio * 25e-9, switchingFrequency: fn * fr, loadResistance: loadFor(q) });
          const err = rel(op.firstHarmonic.gain, op.gain);
          expect(err).toBeLessThanOrEqual(0.22);
          if (ratio === 2) expect(err).toBeLessThanOrEqual(0.045);
          if (ratio === 1 && fn === 1.1) expect(err).toBeLessThanOrEqual(0.017);
        }
      }
    }
  });

  it("the documented examples (values also checked by npm run examples)", () => {
    const prc = parallelResonantOperatingPoint({ ...base, switchingFrequency: 110e3, loadResistance: 12 });
    expect(prc.conductionMode).toBe("NP");
    expect(prc.outputVoltage.toFixed(3)).toBe("112.346");
    expect(prc.firstHarmonic.outputVoltage.toFixed(3)).toBe("115.626");
    expect(prc.validity).toHaveLength(0);
    const lcc = lccOperatingPoint({ ...base, seriesCapacitance: 25e-9, switchingFrequency: 150e3, loadResistance: 12 });
    expect(lcc.conductionMode).toBe("NP");
    expect(lcc.outputVoltage.toFixed(3)).toBe("127.756");
    expect(lcc.firstHarmonic.outputVoltage.toFixed(3)).toBe("130.448");
    expect(lcc.zeroVoltageSwitching).toBe(true);
  });

  it("cautions for voltages above extra-low voltage and for capacitive (hard) switching", () => {
    const op = parallelResonantOperatingPoint({ ...base, switchingFrequency: 110e3, loadResistance: 12 });
    expect(op.cautions.length).toBeGreaterThan(0);
    // an LCC at light load below its parallel resonance f_r·√(1 + 1/A) = f_r·√(1 + C_s/C_p) draws capacitive current (Steigerwald 1988)
    const low = lccOperatingPoint({ ...base, seriesCapacitance: 25e-9, switchingFrequency: 120e3, loadResistance: 20 });
    expect(low.turnOffCurrent).toBeLessThan(0);
    expect(low.zeroVoltageSwitching).toBe(false);
    expect(low.cautions.some((c) => c.code === "hard-switching")).toBe(true);
  });

  it("reports leaving the tested domain in validity, not by throwing", () => {
    const op = parallelResonantOperatingPoint({ ...base, switchingFrequency: 2.5 * fr, loadResistance: loadFor(0.5) });
    expect(op.validity.some((v) => v.code === "outside-tested-domain")).toBe(true);
  });

  it("throws InputError on bad input and unknown keys", () => {
    expect(() => parallelResonantOperatingPoint({ ...base, switchingFrequency: 0, loadResistance: 20 })).toThrow(InputError);
    expect(() => lccOperatingPoint({ ...base, seriesCapacitance: -1, switchingFrequency: 1e5, loadResistance: 20 })).toThrow(InputError);
    expect(() => parallelResonantOperatingPoint({ ...base, switchingFrequency: 1e5, loadResistance: 20, seriesCapacitance: 1e-9 } as never)).toThrow(InputError);
    expect(() => parallelResonantOperatingPoint({ ...base, bridge: "quarter", switchingFrequency: 1e5, loadResistance: 20 } as never)).toThrow(InputError);
  });
});
