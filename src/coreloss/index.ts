/**
 * Core loss: the Steinmetz family for real waveforms (Steinmetz, iGSE with minor loops),
 * waveform builders, flux density from volt-seconds, coefficient fitting with a temperature
 * term, and effective core dimensions.
 *
 * Import from `fluxwright/coreloss` (or from `fluxwright`, which re-exports every module).
 *
 * @document ../../docs/coreloss.md
 * @module fluxwright/coreloss
 */
export { steinmetzLoss, steinmetzTemperatureFactor } from "./steinmetz.js";
export type { SteinmetzLossOptions } from "./steinmetz.js";
export { igseLoss, igseCoefficient } from "./igse.js";
export type { IgseLossOptions } from "./igse.js";
export type { FluxSamples, FluxPoint, FluxWaveform } from "./waveform-types.js";
export { sinusoidalFluxWaveform, triangularFluxWaveform, trapezoidalFluxWaveform } from "./waveforms.js";
export type { SinusoidalFluxOptions, TriangularFluxOptions, TrapezoidalFluxOptions } from "./waveforms.js";
export { fluxDensityFromVoltSeconds, sinusoidalPeakFluxDensity, fluxWaveformFromVoltage } from "./volt-seconds.js";
export type { VoltSecondsOptions, SinusoidalVoltageOptions, VoltageWaveformOptions } from "./volt-seconds.js";
export { fitSteinmetz } from "./fit-steinmetz.js";
export type { SteinmetzDataPoint, FitSteinmetzOptions, SteinmetzFit } from "./fit-steinmetz.js";
export { toroidCoreGeometry, rodCoreGeometry, coreLossPower } from "./core-geometry.js";
export type { CoreGeometry, ToroidCoreOptions, RodCoreOptions, CoreLossPowerOptions } from "./core-geometry.js";
