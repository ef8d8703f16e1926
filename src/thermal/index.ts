/**
 * Heat-up of the part: lumped and 1-D conduction models, time to temperature.
 *
 * @module thermal
 */
export {};
