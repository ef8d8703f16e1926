/**
 * Resonant tanks and inverter operating points: series, parallel, LCL and LCC networks, stresses and capacitor banks.
 *
 * Import from `fluxwright/tank` (or from `fluxwright`, which re-exports every module).
 *
 * @document ../../docs/tanks.md
 * @module fluxwright/tank
 */
export * from "./network.js";
export * from "./series-tank.js";
export * from "./parallel-tank.js";
export * from "./tank-stresses.js";
export * from "./current-fed-inverter.js";
export * from "./series-inverter.js";
export * from "./e-series.js";
export * from "./capacitor-bank.js";
export * from "./tolerance-analysis.js";
export * from "./inverter-with-source.js";
