/**
 * Mutual inductance of two flat spiral pads with a lateral offset, optionally over a ferrite or
 * aluminium backing plate (method of images).
 *
 * @packageDocumentation
 */
import {
  InputError,
  requireInRange,
  requireInteger,
  requireKnownKeys,
  requireNonNegative,
  requireObject,
  requireOneOf,
  requirePositive,
  type ValidityNote,
} from "../core/index.js";
import { loopMutualInductance } from "../inductance/index.js";

/**
 * A flat spiral pad: `turns` circular turns at evenly spaced radii from `innerRadius` to
 * `outerRadius` (wire centres), all in one plane.
 *
 * @category Inductive links
 */
export interface SpiralPad {
  /** Radius of the innermost turn [m], > 0. */
  readonly innerRadius: number;
  /** Radius of the outermost turn [m], ≥ innerRadius (equal only for one turn). */
  readonly outerRadius: number;
  /** Number of turns, an integer from 1 to 200. */
  readonly turns: number;
}

/**
 * A backing plate behind pad 1 (on the side away from pad 2), parallel to it.
 *
 * @category Inductive links
 */
export interface PadBackingPlate {
  /** `"ferrite"`: a permeable half-space (image current (µr − 1)/(µr + 1)); `"aluminium"`: a perfect conductor at frequencies where the skin depth is far below its thickness (image current −1). */
  readonly material: "ferrite" | "aluminium";
  /** Gap between pad 1's plane and the plate surface [m], > 0. */
  readonly gap: number;
  /** Relative permeability of a ferrite plate, > 1; default 2000. Not used for aluminium. */
  readonly relativePermeability?: number;
}

/**
 * Options of {@link padMutualInductance}.
 *
 * @category Inductive links
 */
export interface PadMutualInductanceOptions {
  /** The first (e.g. transmitting) pad. */
  readonly pad1: SpiralPad;
  /** The second pad, parallel to the first. */
  readonly pad2: SpiralPad;
  /** Distance between the pads' planes [m], > 0. */
  readonly axialDistance: number;
  /** Offset of pad 2's centre from pad 1's axis [m], ≥ 0; default 0. */
  readonly lateralOffset?: number;
  /** A backing plate behind pad 1; default none. */
  readonly backingPlate?: PadBackingPlate;
}

/**
 * The result of {@link padMutualInductance}.
 *
 * @category Inductive links
 */
export interface PadMutualInductance {
  /** Mutual inductance of the two pads [H] (with the plate's image when a plate is given). */
  readonly mutualInductance: number;
  /** The part of it from pad 1's own turns (no plate) [H]. */
  readonly direct: number;
  /** The part from the plate's image of pad 1 [H] (0 without a plate). */
  readonly image: number;
  /** The image current coefficient used: (µr − 1)/(µr + 1), −1 for aluminium, 0 without a plate. */
  readonly imageCoefficient: number;
  /** Notes on where the image model stops being valid. */
  readonly validity: readonly ValidityNote[];
}

const KEYS = ["pad1", "pad2", "axialDistance", "lateralOffset", "backingPlate"] as const;
const PAD_KEYS = ["innerRadius", "outerRadius", "turns"] as const;
const PLATE_KEYS = ["material", "gap", "relativePermeability"] as const;

function readPad(where: string, name: string, pad: SpiralPad): { inner: number; outer: number; turns: number } {
  requireObject(where, name, pad);
  requireKnownKeys(where, name, pad, PAD_KEYS);
  const inner = requirePositive(where, `${name}.innerRadius`, pad.innerRadius, "m");
  const outer = requirePositive(where, `${name}.outerRadius`, pad.outerRadius, "m");
  const turns = requireInteger(where, `${name}.turns`, pad.turns, 1);
  if (turns > 200) throw new InputError(where, `${name}.turns`, turns, "", "an integer from 1 to 200");
  if (turns === 1 ? outer !== inner : !(outer > inner)) {
    throw new InputError(where, `${name}.outerRadius`, outer, "m", turns === 1 ? `equal to innerRadius (${inner}) for one turn` : `greater than innerRadius (${inner})`);
  }
  return { inner, outer, turns };
}

/**
 * Mutual inductance of two parallel flat spiral pads whose centres are offset sideways, as the
 * sum over turn pairs of the mutual inductances of circular filaments
 * ({@link loopMutualInductance} with `lateralOffset`):
 * $$ M = \sum_{i=1}^{N_1}\sum_{j=1}^{N_2} M_\mathrm{loop}(r_{1i}, r_{2j}, z, d) $$
 * with the turns at evenly spaced radii. A backing plate behind pad 1 at gap $g$ is represented by
 * pad 1's mirror image at $2g$ below pad 1, carrying $\kappa$ times its current:
 * $$ M = \sum_{i,j} \big[M_\mathrm{loop}(r_{1i}, r_{2j}, z, d) + \kappa\,M_\mathrm{loop}(r_{1i}, r_{2j}, z + 2g, d)\big],\qquad
 * \kappa = \frac{\mu_r - 1}{\mu_r + 1}\ \text{(ferrite)},\quad \kappa = -1\ \text{(aluminium)} $$
 *
 * @param options - {@link PadMutualInductanceOptions} (m)
 * @returns the {@link PadMutualInductance} (H)
 * @throws {@link InputError} for non-finite or out-of-range values, pads with outerRadius ≤
 *   innerRadius (more than one turn), more than 200 turns, an unknown key or material
 * @remarks Accuracy of the turn-pair sum (and of the image sum for the model it represents):
 * ≤ 1e-11 relative vs the same sums of direct Neumann double integrals (fixture
 * test/fixtures/links/misaligned-loops.json, `pads`). The pads are filament models: each turn a
 * circle at its wire centre (error of order (wire radius / turn pitch)² for round wire; a real
 * spiral's radial pitch is ignored). The image is exact only for an infinite plate of a
 * linear material: a ferrite plate thick and wide enough to act as a half-space (it lies well
 * beyond the pads' outer radius and is not saturated), and an aluminium plate many skin depths
 * thick at the operating frequency (the eddy-current image; at DC aluminium has no effect). A
 * finite plate couples less: the result is an upper bound of the plate's effect, not
 * measured here against a field solution; `validity` always says so when a plate is given, and
 * flags a ferrite with µr below 10. About 0.1 ms per offset turn pair (and per image pair).
 * @see F. W. Grover, Inductance Calculations (1946), ch. 13 (circular filaments with parallel
 *   axes); K. J. Binns, P. J. Lawrenson, C. W. Trowbridge, The Analytical and Numerical Solution
 *   of Electric and Magnetic Fields (Wiley 1992), ch. 3 (images in a permeable plane; from memory).
 * @example
 * ```ts
 * import { padMutualInductance } from "fluxwright";
 * const pads = padMutualInductance({
 *   pad1: { innerRadius: 0.05, outerRadius: 0.09, turns: 3 }, pad2: { innerRadius: 0.04, outerRadius: 0.08, turns: 2 },
 *   axialDistance: 0.03, lateralOffset: 0.04,
 * });
 * console.log(pads.mutualInductance.toExponential(4)); // ≈ 2.8660e-7
 * ```
 * @category Inductive links
 */
export function padMutualInductance(options: PadMutualInductanceOptions): PadMutualInductance {
  const where = "padMutualInductance";
  requireObject(where, "options", options);
  requireKnownKeys(where, "options", options, KEYS);
  const p1 = readPad(where, "pad1", options.pad1);
  const p2 = readPad(where, "pad2", options.pad2);
  const z = requirePositive(where, "axialDistance", options.axialDistance, "m");
  const d = options.lateralOffset === undefined ? 0 : requireNonNegative(where, "lateralOffset", options.lateralOffset, "m");
  let kappa = 0;
  let gap = 0;
  const validity: ValidityNote[] = [];
  if (options.backingPlate !== undefined) {
    const plate = options.backingPlate;
    requireObject(where, "backingPlate", plate);
    requireKnownKeys(where, "backingPlate", plate, PLATE_KEYS);
    const material = requireOneOf(where, "backingPlate.material", plate.material, ["ferrite", "aluminium"] as const);
    gap = requirePositive(where, "backingPlate.gap", plate.gap, "m");
    if (material === "ferrite") {
      const mu = plate.relativePermeability === undefined ? 2000 : requireInRange(where, "backingPlate.relativePermeability", plate.relativePermeability, "", 1, Infinity, "()");
      kappa = (mu - 1) / (mu + 1);
      if (mu < 10) validity.push({ code: "low-permeability-plate", message: `A plate of µr = ${mu} gives an image of ${kappa.toFixed(3)}: the half-space assumption (thickness ≫ pad size) matters most there.` });
    } else {
      if (plate.relativePermeability !== undefined) {
        throw new InputError(where, "backingPlate.relativePermeability", plate.relativePermeability, "", "absent for an aluminium plate (a conductor's image is −1)");
      }
      kappa = -1;
    }
    validity.push({
      code: "infinite-plate",
      message: "The backing plate is modelled as an infinite half-space (method of images): a real plate of finite size and thickness couples less, so the plate's effect here is an upper bound. Aluminium is treated as a perfect conductor (thickness ≫ skin depth).",
    });
  }
  let direct = 0;
  let image = 0;
  for (let i = 0; i < p1.turns; i++) {
    const a = p1.turns === 1 ? p1.inner : p1.inner + ((p1.outer - p1.inner) * i) / (p1.turns - 1);
    for (let j = 0; j < p2.turns; j++) {
      const b = p2.turns === 1 ? p2.inner : p2.inner + ((p2.outer - p2.inner) * j) / (p2.turns - 1);
      direct += d === 0 ? loopMutualInductance({ radius1: a, radius2: b, axialDistance: z }) : loopMutualInductance({ radius1: a, radius2: b, axialDistance: z, lateralOffset: d });
      if (kappa !== 0) {
        const zi = z + 2 * gap;
        image += d === 0 ? loopMutualInductance({ radius1: a, radius2: b, axialDistance: zi }) : loopMutualInductance({ radius1: a, radius2: b, axialDistance: zi, lateralOffset: d });
      }
    }
  }
  return { mutualInductance: direct + kappa * image, direct, image: kappa * image, imageCoefficient: kappa, validity };
}
