/**
 * The heater study: one description of a design in, every number a designer needs out.
 *
 * @module study
 */
export {};
