import { describe, expect, it } from "vitest";
import {
  capacitorElement,
  cAdd,
  cDiv,
  complex,
  inductorElement,
  InputError,
  lccNetwork,
  lclNetwork,
  logSpacedFrequencies,
  parallelNetwork,
  parallelTank,
  resistorElement,
  seriesNetwork,
  seriesTank,
  tankImpedance,
  tankImpedanceSweep,
} from "../../src/index.js";

// Outside reference for these checks: the special module's complex arithmetic (cAdd, cDiv),
// composed here by hand from the textbook impedance rules (Alexander & Sadiku 5th ed., §9.6–9.7).
const zL = (w: number, L: number, R = 0) => complex(R, w * L);
const zC = (w: number, C: number, R = 0) => complex(R, -1 / (w * C));
const par = (a: { re: number; im: number }, b: { re: number; im: number }) =>
  cDiv(complex(1, 0), cAdd(cDiv(complex(1, 0), a), cDiv(complex(1, 0), b)));

function close(a: { re: number; im: number }, b: { re: number; im: number }, rtol = 1e-12): void {
  const scale = Math.hypot(b.re, b.im);
  expect(Math.hypot(a.re - b.re, a.im - b.im)).toBeLessThanOrEqual(rtol * scale);
}

describe("tankImpedance", () => {
  it("gives R + jωL for a coil and R − j/(ωC) for a capacitor", () => {
    close(tankImpedance(inductorElement(1e-3, 2), 1000), complex(2, 2 * Math.PI));
    close(tankImpedance(capacitorElement(1e-6, 0.1), 1000), complex(0.1, -1 / (2 * Math.PI * 1e-3)));
    expect(tankImpedance(resistorElement(8), 1000)).toEqual({ re: 8, im: 0 });
  });

  it("matches the hand-composed impedance of an LCL network", () => {
    const net = lclNetwork({ seriesInductance: 10e-6, seriesResistance: 0.02, inductance: 12e-6, capacitance: 1.5e-6, coilResistance: 0.05 });
    for (const f of [1e3, 30e3, 37.5e3, 50e3, 1e6]) {
      const w = 2 * Math.PI * f;
      close(tankImpedance(net, f), cAdd(zL(w, 10e-6, 0.02), par(zC(w, 1.5e-6), zL(w, 12e-6, 0.05))));
    }
  });

  it("matches the hand-composed impedance of an LCC network with a resistive or a coil load", () => {
    for (const load of [resistorElement(50), inductorElement(20e-6, 0.3)]) {
      const net = lccNetwork({ seriesInductance: 100e-6, seriesCapacitance: 100e-9, parallelCapacitance: 47e-9, load });
      for (const f of [10e3, 50e3, 71e3, 200e3]) {
        const w = 2 * Math.PI * f;
        const zLoad = load.kind === "resistor" ? complex(50, 0) : zL(w, 20e-6, 0.3);
        close(tankImpedance(net, f), cAdd(cAdd(zL(w, 100e-6), zC(w, 100e-9)), par(zC(w, 47e-9), zLoad)));
      }
    }
  });

  it("accepts seriesTank and parallelTank results", () => {
    const p = parallelTank({ inductance: 1e-6, capacitance: 2e-6, coilResistance: 0.01 });
    const z = tankImpedance(p, p.zeroPhaseFrequency as number);
    expect(z.re).toBeCloseTo(50, 9); // dynamic resistance L/(RC)
    expect(Math.abs(z.im)).toBeLessThan(1e-9 * 50);
    const s = seriesTank({ inductance: 1e-3, capacitance: 1e-6, resistance: 3 });
    expect(tankImpedance(s, s.undampedFrequency).re).toBeCloseTo(3, 12);
  });

  it("treats a shorted branch as a short and an open branch as adding no admittance", () => {
    expect(tankImpedance(parallelNetwork(resistorElement(0), inductorElement(1e-3)), 1e3)).toEqual({ re: 0, im: 0 });
    // A lossless parallel LC in series with a resistor, off resonance: finite.
    const net = seriesNetwork(resistorElement(1), parallelNetwork(capacitorElement(1e-6), inductorElement(1e-3)));
    expect(Number.isFinite(tankImpedance(net, 1e3).im)).toBe(true);
  });

  it("throws InputError for an open circuit (lossless parallel LC exactly at resonance), never Infinity", () => {
    // L = C = 1 and f = 1/(2π): ω = 1 exactly in floating point, so the admittances ±j cancel exactly.
    const net = parallelNetwork(capacitorElement(1), inductorElement(1));
    expect(2 * Math.PI * (1 / (2 * Math.PI))).toBe(1);
    expect(() => tankImpedance(net, 1 / (2 * Math.PI))).toThrow(/finite/);
    expect(() => tankImpedanceSweep(net, [0.1, 1 / (2 * Math.PI)])).toThrow(/frequencies\[1\]/);
    expect(() => tankImpedance(parallelNetwork(capacitorElement(1e-6)), 0)).toThrow(InputError);
  });

  it("throws InputError for malformed networks and bad frequencies", () => {
    expect(() => tankImpedance({ kind: "wire" } as never, 1)).toThrow(InputError);
    expect(() => tankImpedance({ kind: "series", elements: [] } as never, 1)).toThrow(/elements/);
    expect(() => tankImpedance({ kind: "inductor", inductance: -1, resistance: 0 } as never, 1)).toThrow(/inductance/);
    expect(() => tankImpedance(resistorElement(1), -5)).toThrow(InputError);
    expect(() => tankImpedance(resistorElement(1), NaN)).toThrow(InputError);
    expect(() => resistorElement(-1)).toThrow(InputError);
    expect(() => inductorElement(0)).toThrow(InputError);
    expect(() => capacitorElement(1e-6, -1)).toThrow(InputError);
    expect(() => seriesNetwork()).toThrow(InputError);
    expect(() => parallelNetwork({} as never)).toThrow(InputError);
    expect(() => lclNetwork({ seriesInductance: 0, inductance: 1, capacitance: 1, coilResistance: 0 })).toThrow(InputError);
    expect(() => lccNetwork({ seriesInductance: 1, seriesCapacitance: 1, parallelCapacitance: 1, load: null as never })).toThrow(InputError);
  });
});

describe("tankImpedanceSweep", () => {
  it("equals tankImpedance point by point", () => {
    const tank = parallelTank({ inductance: 1e-6, capacitance: 2e-6, coilResistance: 0.01 });
    const f = logSpacedFrequencies(1e4, 1e6, 101);
    const z = tankImpedanceSweep(tank, f);
    for (let k = 0; k < f.length; k++) {
      const one = tankImpedance(tank, f[k] as number);
      expect(z.re[k]).toBe(one.re);
      expect(z.im[k]).toBe(one.im);
    }
  });

  it("names the index of a bad frequency", () => {
    expect(() => tankImpedanceSweep(resistorElement(1), [1, 2, -3])).toThrow(/frequencies\[2\]/);
    expect(() => tankImpedanceSweep(resistorElement(1), null as never)).toThrow(InputError);
  });
});

describe("logSpacedFrequencies", () => {
  it("hits both ends and spaces points geometrically", () => {
    expect(Array.from(logSpacedFrequencies(10, 1000, 3))).toEqual([10, 100, 1000]);
    const f = logSpacedFrequencies(1, 1e6, 61);
    expect(f[60]).toBe(1e6);
    expect((f[31] as number) / (f[30] as number)).toBeCloseTo(Math.pow(10, 0.1), 12);
  });
  it("throws InputError for bad arguments", () => {
    expect(() => logSpacedFrequencies(0, 1, 3)).toThrow(InputError);
    expect(() => logSpacedFrequencies(1, 10, 1)).toThrow(InputError);
    expect(() => logSpacedFrequencies(1, 10, 2.5)).toThrow(InputError);
  });
});
