/**
 * Conductor resistance: DC resistance, skin depth, round-wire skin effect, Dowell layered windings, litz wire and copper tube.
 *
 * @module conductors
 */
export {};
