/**
 * Transformers: leakage inductance and winding AC resistance from the magnetomotive-force
 * diagram of the layer stack (any interleaving; round wire, foil and litz), turns from
 * volt-seconds, the flux density of least total loss, window fill, and a whole design.
 *
 * Import from `fluxwright/transformers` (or from `fluxwright`, which re-exports every module).
 *
 * @document ../../docs/transformers.md
 * @module fluxwright/transformers
 */
export { leakageInductance } from "./leakage.js";
export type { LeakageLayer, LeakageInductanceOptions } from "./leakage.js";
export { transformerWindingResistance } from "./winding-resistance.js";
export type {
  RoundLayerConductor,
  FoilLayerConductor,
  LitzLayerConductor,
  LayerConductor,
  WindingLayer,
  TransformerWindingResistanceOptions,
  WindingResistance,
  LayerResistance,
  TransformerWindingResistance,
} from "./winding-resistance.js";
export * from "./turns.js";
export { transformerDesign } from "./design.js";
export type {
  TransformerCore,
  TransformerTurnCounts,
  TransformerThermal,
  TransformerDesignWinding,
  TransformerDesignOptions,
  TransformerCandidate,
  TransformerLosses,
  TransformerDesign,
} from "./design.js";
