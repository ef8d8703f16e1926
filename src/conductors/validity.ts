/**
 * Validity checks of the winding models: where an input leaves the range in which a model is
 * trustworthy. Leaving it is not an error (the models still compute); these return notes.
 *
 * @packageDocumentation
 */
import { requireKnownKeys, requireObject, type ValidityNote } from "../core/index.js";
import { MU_0 } from "../units/index.js";
import type { RoundWireWindingOptions, RoundWireWindingOptionsWithWidth } from "./round-wire-winding.js";
import { renamedOption } from "../core/renamed.js";
import type { LitzWindingAcRatioOptions } from "./litz-sullivan.js";
import { roundWireWindingAcRatio } from "./round-wire-winding.js";
import { litzWindingAcRatio } from "./litz-sullivan.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const LITZ_WINDING_FIELDS: readonly string[] = Object.freeze(["strands", "strandDiameter", "turns", "windowBreadth", "frequency", "resistivity", "fieldFactor"]);

/** Accepted fields (misspelt ones are rejected, not ignored). */
const WINDING_FIELDS: readonly string[] = Object.freeze(["wireDiameter", "frequency", "resistivity", "layers", "turnsPerLayer", "windowBreadth", "windingWidth"]);

function skin(resistivity: number, frequency: number): number {
  return Math.sqrt(resistivity / (Math.PI * frequency * MU_0));
}

/**
 * Validity notes for {@link roundWireWindingAcRatio} and {@link roundWireWindingAcRatioFerreira}
 * with these inputs (an empty array when both are inside their ranges):
 *
 * - `"wire-thick-for-1d-models"` when d > 1.5 δ and there are two or more layers: the two 1-D
 *   models differ by more than 4 % there (6–7 % at 2 δ, 15–100 % at 3–5 δ) and neither is
 *   reliable for closely packed round wire;
 * - `"loose-layer"` when the porosity $N_l d / w$ is below 0.5: the layer no longer acts as a
 *   foil, and the 1-D field assumption weakens.
 *
 * Hard domain (throws {@link InputError}): as {@link roundWireWindingAcRatio}.
 * Accuracy: the thresholds are the ones stated (and tested) in the models' documentation.
 *
 * @param options - {@link RoundWireWindingOptions}
 * @returns the notes (possibly empty)
 * @throws {@link InputError} on bad input
 * @see {@link roundWireWindingAcRatio}, {@link roundWireWindingAcRatioFerreira} for the sources.
 * @example
 * ```ts
 * import { roundWireWindingValidity } from "fluxwright";
 * const notes = roundWireWindingValidity({ wireDiameter: 1e-3, frequency: 100e3, resistivity: 1.7241e-8,
 *   layers: 4, turnsPerLayer: 8, windowBreadth: 10e-3 });
 * console.log(notes.map((n) => n.code)); // [ 'wire-thick-for-1d-models' ]
 * ```
 * @category Conductors
 */
// eslint-disable-next-line @typescript-eslint/no-deprecated -- the former name windingWidth is accepted until 1.0
export function roundWireWindingValidity(options: RoundWireWindingOptions | RoundWireWindingOptionsWithWidth): ValidityNote[] {
  requireObject("roundWireWindingValidity", "options", options);
  requireKnownKeys("roundWireWindingValidity", "", options, WINDING_FIELDS);
  roundWireWindingAcRatio(options); // validates the inputs
  const notes: ValidityNote[] = [];
  const ratio = options.wireDiameter / skin(options.resistivity, options.frequency);
  if (ratio > 1.5 && options.layers >= 2) {
    notes.push({
      code: "wire-thick-for-1d-models",
      message: `wire diameter is ${ratio.toPrecision(3)} skin depths; above 1.5 the 1-D winding models disagree by more than 4 % and a 2-D field solution (or thinner wire, or litz) is needed`,
      value: ratio,
      limit: 1.5,
    });
  }
  const porosity = (options.turnsPerLayer * options.wireDiameter) / (renamedOption("roundWireWindingValidity", "", options, "windowBreadth", "windingWidth") as number);
  if (porosity < 0.5) {
    notes.push({
      code: "loose-layer",
      message: `layer porosity N·d/w = ${porosity.toPrecision(3)} is below 0.5: the layer is far from a foil and the 1-D field assumption is weak`,
      value: porosity,
      limit: 0.5,
    });
  }
  return notes;
}

/**
 * Validity notes for {@link litzWindingAcRatio} with these inputs (an empty array when inside
 * its range):
 *
 * - `"strand-thick-for-low-frequency-model"` when the strand diameter exceeds the skin depth:
 *   the low-frequency proximity term is then more than 0.7 % high (11 % at 2 δ); use
 *   {@link litzAcRatio}, which has the exact strand functions.
 *
 * Hard domain (throws {@link InputError}): as {@link litzWindingAcRatio}.
 * Accuracy: the threshold is the one stated (and tested) in {@link litzWindingAcRatio}.
 *
 * @param options - {@link LitzWindingAcRatioOptions}
 * @returns the notes (possibly empty)
 * @throws {@link InputError} on bad input
 * @see {@link litzWindingAcRatio} for the source.
 * @example
 * ```ts
 * import { litzWindingValidity } from "fluxwright";
 * const notes = litzWindingValidity({ strands: 100, strandDiameter: 0.1e-3, turns: 20, windowBreadth: 20e-3,
 *   frequency: 100e3, resistivity: 1.7241e-8 });
 * console.log(notes.length); // 0
 * ```
 * @category Conductors
 */
export function litzWindingValidity(options: LitzWindingAcRatioOptions): ValidityNote[] {
  requireObject("litzWindingValidity", "options", options);
  requireKnownKeys("litzWindingValidity", "", options, LITZ_WINDING_FIELDS);
  litzWindingAcRatio(options); // validates the inputs
  const ratio = options.strandDiameter / skin(options.resistivity, options.frequency);
  if (ratio <= 1) return [];
  return [
    {
      code: "strand-thick-for-low-frequency-model",
      message: `strand diameter is ${ratio.toPrecision(3)} skin depths; the low-frequency proximity term overstates the loss (11 % at 2 δ): use litzAcRatio`,
      value: ratio,
      limit: 1,
    },
  ];
}
