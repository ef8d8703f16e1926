import { bench, describe } from "vitest";
import {
  capacitorBank,
  currentFedParallelInverter,
  frequencyForPower,
  lclNetwork,
  logSpacedFrequencies,
  parallelTank,
  seriesInverter,
  seriesTank,
  tankImpedance,
  tankImpedanceSweep,
  tankStresses,
  tankToleranceAnalysis,
} from "../../src/index.js";

// Inputs prepared beforehand: log-uniform over the documented domains, fixed pseudo-random sequence.
const N = 4096;
let seed = 7;
const random = (): number => (seed = (seed * 1103515245 + 12345) >>> 0) / 4294967296;
const logUniform = (lo: number, hi: number): number => lo * (hi / lo) ** random();
const L = Float64Array.from({ length: N }, () => logUniform(1e-7, 1e-2));
const C = Float64Array.from({ length: N }, () => logUniform(1e-9, 1e-4));
// Resistance as a fraction of √(L/C) in [1e-3, 0.5]: resonant tanks with Q from 2 to 1000.
const R = Float64Array.from({ length: N }, (_, k) => logUniform(1e-3, 0.5) * Math.sqrt((L[k] as number) / (C[k] as number)));
const ratio = Float64Array.from({ length: N }, () => logUniform(0.5, 2));
const series = Array.from({ length: N }, (_, k) => seriesTank({ inductance: L[k] as number, capacitance: C[k] as number, resistance: R[k] as number }));
const parallel = Array.from({ length: N }, (_, k) => parallelTank({ inductance: L[k] as number, capacitance: C[k] as number, coilResistance: R[k] as number }));
const lcl = Array.from({ length: N }, (_, k) => lclNetwork({ seriesInductance: L[k] as number, inductance: L[k] as number, capacitance: C[k] as number, coilResistance: R[k] as number }));
const sweepFrequencies = logSpacedFrequencies(1e3, 1e6, 1000);
let i = 0;
let sink = 0;
const check = (v: number): void => {
  if (Number.isNaN(v)) throw new Error("NaN in benchmark");
  sink += v;
};
const next = (): number => (i = (i + 1) & (N - 1));

describe("tank", () => {
  bench("seriesTank", () => {
    const k = next();
    check(seriesTank({ inductance: L[k] as number, capacitance: C[k] as number, resistance: R[k] as number }).qualityFactor);
  }, { time: 300 });
  bench("parallelTank", () => {
    const k = next();
    check(parallelTank({ inductance: L[k] as number, capacitance: C[k] as number, coilResistance: R[k] as number }).dynamicResistance);
  }, { time: 300 });
  bench("tankImpedance, parallel tank", () => {
    const k = next();
    const t = parallel[k]!;
    check(tankImpedance(t, t.undampedFrequency * (ratio[k] as number)).re);
  }, { time: 300 });
  bench("tankImpedance, LCL network", () => {
    const k = next();
    check(tankImpedance(lcl[k]!, (series[k]!.undampedFrequency) * (ratio[k] as number)).im);
  }, { time: 300 });
  bench("tankImpedanceSweep, 1000 points", () => {
    const k = next();
    check(tankImpedanceSweep(parallel[k]!, sweepFrequencies).re[500] as number);
  }, { time: 300 });
  bench("tankStresses, series tank", () => {
    const k = next();
    const t = series[k]!;
    check(tankStresses(t, { frequency: t.undampedFrequency * (ratio[k] as number), voltageRms: 100 }).storedEnergyPeak);
  }, { time: 300 });
  bench("currentFedParallelInverter", () => {
    const k = next();
    check(currentFedParallelInverter({ supplyVoltage: 24, inductance: L[k] as number, capacitance: C[k] as number, coilResistance: R[k] as number }).supplyCurrent);
  }, { time: 300 });
  bench("seriesInverter", () => {
    const k = next();
    check(seriesInverter({ supplyVoltage: 325, bridge: "half", inductance: L[k] as number, capacitance: C[k] as number, resistance: R[k] as number, switchingFrequency: series[k]!.undampedFrequency * (ratio[k] as number) }).power);
  }, { time: 300 });
  bench("frequencyForPower", () => {
    const k = next();
    const pMax = (650 / Math.PI) ** 2 / (2 * (R[k] as number));
    check(frequencyForPower({ supplyVoltage: 325, bridge: "half", inductance: L[k] as number, capacitance: C[k] as number, resistance: R[k] as number, power: pMax * 0.5 }));
  }, { time: 300 });
  bench("capacitorBank, E24, up to 64 units", () => {
    const k = next();
    check(capacitorBank({ capacitance: 1e-8 * 100 ** (((ratio[k] as number) - 0.5) / 1.5), voltageRms: 600, currentRms: 200, frequency: 50e3, series: "E24", unitVoltageRmsRating: 400, unitCurrentRmsRating: 50, minUnitCapacitance: 1e-10 }).capacitance);
  }, { time: 300 });
  bench("tankToleranceAnalysis, 1e6 samples", () => {
    check(tankToleranceAnalysis({ inductance: 10e-6, capacitance: 1e-6, resistance: 0.1, inductanceTolerance: 0.05, capacitanceTolerance: 0.1, resistanceTolerance: 0.1, capacitanceTemperatureCoefficient: -150e-6, temperatureChangeMax: 40, samples: 1_000_000, seed: next() }).frequency.p50);
  }, { time: 300, iterations: 3 });
});

export { sink };
