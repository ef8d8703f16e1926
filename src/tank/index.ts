/**
 * Resonant tanks and inverter operating points: series, parallel, LCL and LCC networks, stresses and capacitor banks.
 *
 * @module tank
 */
export {};
