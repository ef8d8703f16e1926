/**
 * Safety: magnetic field exposure against reference levels, and cautions for voltage, stored energy and hot surfaces.
 *
 * @module safety
 */
export {};
