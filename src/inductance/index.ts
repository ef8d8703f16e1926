/**
 * Coil inductance: single-layer solenoids, multilayer coils, flat spirals, circular loops, mutual inductance and coupling.
 *
 * @module inductance
 */
export {};
