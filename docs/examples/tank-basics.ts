/**
 * The basic calls of the tank module, with their results checked against closed forms and
 * the textbook example quoted in docs/tanks.md.
 *
 * Run: npx tsx docs/examples/tank-basics.ts
 */
import {
  capacitorElement,
  inductorElement,
  lclNetwork,
  parallelTank,
  seriesNetwork,
  seriesTank,
  tankImpedance,
  tankStresses,
} from "../../src/index.js";

function expectClose(name: string, value: number, expected: number, rtol: number): void {
  console.log(`${name} = ${value.toPrecision(6)}`);
  if (!(Math.abs(value / expected - 1) <= rtol)) throw new Error(`${name}: got ${value}, expected ${expected}`);
}

// Series tank of Alexander & Sadiku, Fundamentals of Electric Circuits, 5th ed., Example 14.7
// (from memory): R = 2 Ω, L = 1 mH, C = 0.4 µF → ω0 = 50 krad/s, Q = 25, B = 2 krad/s.
const series = seriesTank({ inductance: 1e-3, capacitance: 0.4e-6, resistance: 2 });
expectClose("series ω0 [rad/s]", 2 * Math.PI * series.undampedFrequency, 50e3, 1e-12);
expectClose("series Q", series.qualityFactor, 25, 1e-12);
expectClose("series bandwidth [rad/s]", 2 * Math.PI * series.bandwidth, 2e3, 1e-12);

// A parallel tank: the three resonance definitions differ once the coil has resistance.
const parallel = parallelTank({ inductance: 1.5e-6, capacitance: 2e-6, coilResistance: 0.085 });
console.log(
  `parallel: f0 = ${parallel.undampedFrequency.toFixed(0)} Hz, zero phase = ${parallel.zeroPhaseFrequency?.toFixed(0)} Hz, ` +
    `max |Z| = ${parallel.maxImpedanceFrequency?.toFixed(0)} Hz, Rd = ${parallel.dynamicResistance.toFixed(3)} Ω`,
);
expectClose("dynamic resistance L/(RC) [Ω]", parallel.dynamicResistance, 1.5e-6 / (0.085 * 2e-6), 1e-12);
const z = tankImpedance(parallel, parallel.zeroPhaseFrequency as number);
expectClose("Re Z at zero phase [Ω]", z.re, parallel.dynamicResistance, 1e-9);
if (Math.abs(z.im) > 1e-9) throw new Error("impedance not real at the zero-phase frequency");

// Stresses at 20 V RMS across the tank at its zero-phase frequency.
const s = tankStresses(parallel, { frequency: parallel.zeroPhaseFrequency as number, voltageRms: 20 });
console.log(
  `capacitor ${s.capacitorCurrentRms.toFixed(2)} A RMS, ${s.capacitorReactivePower.toFixed(0)} var; line ${s.driveCurrentRms.toFixed(3)} A; ` +
    `power ${s.power.toFixed(2)} W; stored ${(s.storedEnergyPeak * 1e3).toFixed(3)} mJ`,
);
expectClose("power = coil I²R", s.power, s.coilCurrentRms ** 2 * 0.085, 1e-12);

// The same parallel tank composed by hand, and an LCL network built from the same pieces.
const byHand = seriesNetwork(inductorElement(1e-6), parallel.network);
const lcl = lclNetwork({ seriesInductance: 1e-6, inductance: 1.5e-6, capacitance: 2e-6, coilResistance: 0.085 });
const a = tankImpedance(byHand, 80e3);
const b = tankImpedance(lcl, 80e3);
expectClose("LCL built two ways, Re Z at 80 kHz [Ω]", a.re, b.re, 1e-12);
expectClose("LCL built two ways, Im Z at 80 kHz [Ω]", a.im, b.im, 1e-12);
const esr = tankImpedance(capacitorElement(2e-6, 0.004), 80e3);
expectClose("capacitor ESR shows in Re Z [Ω]", esr.re, 0.004, 1e-12);
