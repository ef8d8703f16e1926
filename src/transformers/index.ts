/**
 * Transformers: leakage inductance and winding AC resistance from the magnetomotive-force
 * diagram of the layer stack (any interleaving; round wire, foil and litz), turns from
 * volt-seconds, the flux density of least total loss, window fill, and a whole design.
 *
 * @module transformers
 */
export * from "./leakage.js";
export * from "./winding-resistance.js";
