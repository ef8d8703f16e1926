/**
 * Conductor, workpiece and core material property sets, each value sourced, with temperature-dependent resistivity and permeability.
 *
 * @module materials
 */
export {};
