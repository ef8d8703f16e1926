/**
 * Core loss of the ferrite matching transformer of a billet heater fed by a phase-shifted full
 * bridge: trapezoidal flux with zero-voltage intervals, by the iGSE, compared with a sinusoid
 * of the same peak; then a Steinmetz fit from loss points. The ferrite coefficients are
 * INVENTED example numbers, not a real material.
 *
 * Run: npx tsx docs/examples/coreloss-bridge-transformer.ts
 */
import {
  coreLossPower,
  fitSteinmetz,
  fluxWaveformFromVoltage,
  igseCoefficient,
  igseLoss,
  inventedExampleFerrite,
  steinmetzLoss,
  steinmetzTemperatureFactor,
  toroidCoreGeometry,
} from "../../src/index.js";

function expectClose(name: string, value: number, expected: number, rtol: number): void {
  console.log(`${name} = ${value.toPrecision(6)}`);
  if (!(Math.abs(value / expected - 1) <= rtol)) throw new Error(`${name}: got ${value}, expected ${expected}`);
}

const ferrite = inventedExampleFerrite; // invented example coefficients
const core = toroidCoreGeometry({ innerDiameter: 24e-3, outerDiameter: 40e-3, height: 16e-3 });
const turns = 80; // primary
const frequency = 50e3;
const period = 1 / frequency;
const duty = 0.7; // fraction of each half period with voltage applied
const bridgeVoltage = 300;

// ±300 V with zero-voltage intervals: +V for D·T/2, 0, −V for D·T/2, 0
const on = (duty * period) / 2;
const flux = fluxWaveformFromVoltage({
  time: [0, on, period / 2, period / 2 + on, period],
  voltage: [bridgeVoltage, 0, -bridgeVoltage, 0],
  turns,
  coreArea: core.effectiveArea,
});
const swing = (bridgeVoltage * on) / (turns * core.effectiveArea);
const peak = swing / 2;
expectClose("peak flux density [T]", Math.max(...flux.fluxDensity), peak, 1e-12);

const c = ferrite.steinmetz;
const pIgse = igseLoss({ ...c, period, flux });
// closed form for the trapezoid: two ramps of ΔB in D·T/2 each, holds add nothing
const closed = (igseCoefficient(c) * swing ** (c.beta - c.alpha) * 2 * swing ** c.alpha * on ** (1 - c.alpha)) / period;
expectClose("iGSE loss density [W/m³]", pIgse, closed, 1e-12);

const pSine = steinmetzLoss({ ...c, frequency, fluxDensityPeak: peak });
console.log(`same peak as a sinusoid: ${pSine.toPrecision(6)} W/m³ (trapezoid/sinusoid = ${(pIgse / pSine).toFixed(3)})`);
if (!(pIgse > pSine)) throw new Error("the steeper ramps of the trapezoid must lose more than the sinusoid");

const hot = steinmetzTemperatureFactor(ferrite.temperatureTerm ?? { referenceTemperature: 373.15, linear: 0, quadratic: 0 }, 353.15);
const watts = coreLossPower({ lossDensity: pIgse * hot, effectiveVolume: core.effectiveVolume });
expectClose("core loss at 80 °C [W]", watts, closed * hot * core.effectiveVolume, 1e-12);

// fit Steinmetz coefficients back from loss points (here generated from the same invented set)
const points = [];
for (const f of [25e3, 50e3, 100e3, 200e3]) {
  for (const b of [0.05, 0.1, 0.2]) points.push({ frequency: f, fluxDensityPeak: b, lossDensity: steinmetzLoss({ ...c, frequency: f, fluxDensityPeak: b }) });
}
const fit = fitSteinmetz(points);
expectClose("fitted alpha", fit.alpha, c.alpha, 1e-9);
expectClose("fitted beta", fit.beta, c.beta, 1e-9);
