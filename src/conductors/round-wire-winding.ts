/**
 * AC resistance factor of a multilayer winding of round wire: Dowell's model with the
 * equivalent-foil and porosity treatment.
 *
 * @packageDocumentation
 */
import { InputError, requireInteger, requireKnownKeys, requireObject, requirePositive } from "../core/index.js";
import { renamedOption } from "../core/renamed.js";
import { MU_0 } from "../units/index.js";
import { dowellFactorKernel } from "./dowell.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const WINDING_FIELDS: readonly string[] = Object.freeze(["wireDiameter", "frequency", "resistivity", "layers", "turnsPerLayer", "windowBreadth", "windingWidth"]);

/** (π/4)^{3/4}: the equal-area square's side and porosity folded into one factor. */
const EQUIVALENT_FOIL_FACTOR = Math.pow(Math.PI / 4, 0.75);

/** Options of {@link roundWireWindingAcRatio} and {@link roundWireWindingAcRatioFerreira}. @category Conductors */
export interface RoundWireWindingOptions {
  /** Diameter of the bare copper of the wire [m], finite and > 0. */
  readonly wireDiameter: number;
  /** Frequency of the sinusoidal current [Hz], finite and > 0. */
  readonly frequency: number;
  /** Resistivity of the conductor [Ω·m], finite and > 0. */
  readonly resistivity: number;
  /** Number of layers m in the winding portion (from zero field to maximum field), an integer ≥ 1. */
  readonly layers: number;
  /** Turns in each layer $N_l$, an integer ≥ 1. */
  readonly turnsPerLayer: number;
  /**
   * Breadth of the winding window the layer spans (along the field) [m], finite, > 0 and
   * ≥ turnsPerLayer · wireDiameter (the wires must fit side by side).
   */
  readonly windowBreadth: number;
}

/**
 * {@link RoundWireWindingOptions} given with the former name `windingWidth` for `windowBreadth`.
 *
 * @deprecated Give `windowBreadth` instead of `windingWidth`; accepted until 1.0.
 * @category Conductors
 */
export type RoundWireWindingOptionsWithWidth = Omit<RoundWireWindingOptions, "windowBreadth"> & {
  /**
   * Breadth of the winding window [m].
   *
   * @deprecated Use `windowBreadth`.
   */
  readonly windingWidth: number;
};

/** Checked winding inputs. @internal */
export interface CheckedWinding {
  diameter: number;
  frequency: number;
  resistivity: number;
  layers: number;
  turnsPerLayer: number;
  width: number;
}

/**
 * Checks the options shared by the round-wire winding models.
 * @internal
 */
// eslint-disable-next-line @typescript-eslint/no-deprecated -- the former name is accepted until 1.0
export function checkWinding(where: string, options: RoundWireWindingOptions | RoundWireWindingOptionsWithWidth): CheckedWinding {
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, WINDING_FIELDS);
  const diameter = requirePositive(where, "wireDiameter", options.wireDiameter, "m");
  const frequency = requirePositive(where, "frequency", options.frequency, "Hz");
  const resistivity = requirePositive(where, "resistivity", options.resistivity, "Ω·m");
  const layers = requireInteger(where, "layers", options.layers, 1);
  const turnsPerLayer = requireInteger(where, "turnsPerLayer", options.turnsPerLayer, 1);
  const breadthName = "windingWidth" in options && !("windowBreadth" in options) ? "windingWidth" : "windowBreadth";
  const width = requirePositive(where, breadthName, renamedOption(where, "", options, "windowBreadth", "windingWidth"), "m");
  if (turnsPerLayer * diameter > width * (1 + 1e-12)) {
    throw new InputError(where, breadthName, width, "m", `≥ turnsPerLayer · wireDiameter = ${turnsPerLayer * diameter}`);
  }
  return { diameter, frequency, resistivity, layers, turnsPerLayer, width };
}

/**
 * Dowell's AC-to-DC resistance ratio of a round-wire winding, through the usual textbook
 * equivalent foil. Each round wire of diameter d becomes a square conductor of equal area,
 * side $a = d\sqrt{\pi}/2$; the squares of one layer become a foil of thickness a whose
 * conductivity is reduced by the porosity (layer copper factor) $\eta = N_l a / w$, measured
 * with the square's side. The penetration ratio is
 *
 * $$
 * \Delta = \frac{a}{\delta}\sqrt{\eta} = \left(\frac{\pi}{4}\right)^{3/4} \frac{d}{\delta} \sqrt{\frac{d\,N_l}{w}},
 * \qquad \delta = \sqrt{\frac{\rho}{\pi f \mu_0}}
 * $$
 *
 * and the result is {@link dowellFactor}(Δ, m), relative to the DC resistance of the round
 * wire (the square has the same area).
 *
 * Hard domain (throws {@link InputError}): all inputs finite and > 0, layers and
 * turnsPerLayer integers ≥ 1, windowBreadth ≥ turnsPerLayer · wireDiameter. Validity: a
 * one-dimensional field (layers fill the window breadth, e.g. a transformer or an inductor
 * with a gapless core window), closely wound layers, d ≲ 1.5 δ. Against
 * {@link roundWireWindingAcRatioFerreira} (same inputs, porosity 0.9) it agrees within 4 % for
 * d ≤ 1.5 δ, differs by 6–7 % at d = 2 δ and by 15–100 % at 3–5 δ in multilayer windings;
 * beyond about 2 δ neither 1-D model is reliable for closely packed multilayer round-wire
 * windings (the field around each wire is two-dimensional), and the designer should avoid
 * that region anyway (use thinner wire or litz).
 *
 * Accuracy: the formula is evaluated to ≤ 1e-14 relative (see {@link dowellFactor}); as a
 * model, see validity.
 *
 * @param options - {@link RoundWireWindingOptions}
 * @returns $R_\mathrm{ac}/R_\mathrm{dc}$ [-], ≥ 1
 * @throws {@link InputError} on non-finite, non-positive or inconsistent inputs
 * @see P. L. Dowell, Proc. IEE 113(8), 1387–1394 (1966) (round conductors as equivalent square/foil conductors with a space factor).
 * @see W. G. Hurley, E. Gath, J. G. Breslin, "Optimizing the AC resistance of multilayer transformer windings with arbitrary current waveforms", IEEE Trans. Power Electron. 15(2), 369–376 (2000) (Δ with porosity).
 * @example
 * ```ts
 * import { roundWireWindingAcRatio } from "fluxwright";
 * // 4 layers of 12 turns of 0.5 mm copper across 8 mm, 100 kHz
 * const options = { wireDiameter: 0.5e-3, frequency: 100e3, resistivity: 1.7241e-8,
 *   layers: 4, turnsPerLayer: 12, windowBreadth: 8e-3 };
 * console.log(roundWireWindingAcRatio(options)); // ≈ 12.543
 * ```
 * @category Conductors
 */
// eslint-disable-next-line @typescript-eslint/no-deprecated -- the former name windingWidth is accepted until 1.0
export function roundWireWindingAcRatio(options: RoundWireWindingOptions | RoundWireWindingOptionsWithWidth): number {
  const w = checkWinding("roundWireWindingAcRatio", options);
  const delta = Math.sqrt(w.resistivity / (Math.PI * w.frequency * MU_0));
  const penetration = EQUIVALENT_FOIL_FACTOR * (w.diameter / delta) * Math.sqrt((w.diameter * w.turnsPerLayer) / w.width);
  return dowellFactorKernel(penetration, w.layers);
}

