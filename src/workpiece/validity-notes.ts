/**
 * Validity notes shared by the workpiece solutions (internal).
 *
 * @packageDocumentation
 */
import type { ValidityNote } from "../core/index.js";

/**
 * The note that a magnetic part is modelled as linear, with one relative permeability.
 *
 * @param relativePermeability - the permeability used [-], > 1 for a magnetic part
 */
export function constantPermeabilityNote(relativePermeability: number): ValidityNote {
  return {
    code: "constant-permeability",
    message:
      "A constant relative permeability is assumed; magnetic steel saturates in strong fields, so use the permeability at the surface field strength.",
    value: relativePermeability,
    limit: 1,
  };
}
