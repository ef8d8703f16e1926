/**
 * The input and result types of {@link inductorDesign}: the current waveform, the winding
 * conductor, the options and the designed inductor.
 *
 * @packageDocumentation
 */
import type { Caution, ValidityNote } from "../core/index.js";
import type { CoreMaterial } from "../materials/index.js";
import type { CoreShape } from "./shapes.js";

/**
 * DC plus a triangular ripple: the current of a converter's inductor in continuous conduction.
 *
 * @category Cores
 */
export interface TriangularCurrent {
  /** Discriminant: DC plus a triangular ripple. */
  readonly kind: "triangular";
  /** Average (DC) current [A], finite (any sign). */
  readonly average: number;
  /** Peak-to-peak ripple [A], ≥ 0. */
  readonly ripple: number;
  /** Fraction of the period during which the current rises [-], 0 < D < 1. */
  readonly dutyCycle: number;
}

/**
 * Any continuous piecewise-linear current over one period (times from 0 to 1/frequency).
 *
 * @category Cores
 */
export interface SampledCurrent {
  /** Discriminant: a sampled piecewise-linear waveform. */
  readonly kind: "samples";
  /** Times [s]: first 0, last the period, strictly increasing (2 … 10 000 points). */
  readonly time: readonly number[];
  /** Current at each time [A]; the last equals the first (the waveform closes). */
  readonly current: readonly number[];
}

/**
 * The winding conductor.
 *
 * @category Cores
 */
export type InductorConductor =
  | {
      /** Discriminant: solid round wire. */
      readonly kind: "round";
      /** Bare copper diameter [m], > 0. */
      readonly diameter: number;
      /** Diameter over the insulation [m], ≥ diameter (default 1.07 × diameter, common practice for enamelled wire). */
      readonly outerDiameter?: number;
      /** Resistivity at 20 °C [Ω·m], > 0 (default annealed copper); scaled with copper's temperature coefficient. */
      readonly resistivity?: number;
    }
  | {
      /** Discriminant: litz wire. */
      readonly kind: "litz";
      /** Number of strands, integer ≥ 1. */
      readonly strands: number;
      /** Bare strand diameter [m], > 0. */
      readonly strandDiameter: number;
      /** Diameter of the finished bundle [m], > 0. */
      readonly outerDiameter: number;
      /** Resistivity at 20 °C [Ω·m], > 0 (default annealed copper). */
      readonly resistivity?: number;
    }
  | {
      /** Discriminant: foil, one turn per layer. */
      readonly kind: "foil";
      /** Foil thickness [m], > 0; the foil spans the window height, one turn per layer. */
      readonly thickness: number;
      /** Insulation between layers [m], ≥ 0 (default 50 µm). */
      readonly insulationThickness?: number;
      /** Resistivity at 20 °C [Ω·m], > 0 (default annealed copper). */
      readonly resistivity?: number;
    };

/**
 * Options of {@link inductorDesign}.
 *
 * @category Cores
 */
export interface InductorDesignOptions {
  /** Wanted inductance [H], > 0. */
  readonly inductance: number;
  /** The current waveform over one period. */
  readonly current: TriangularCurrent | SampledCurrent;
  /** Repetition frequency of the waveform [Hz], > 0. */
  readonly frequency: number;
  /** The core shape, e.g. from {@link eCore} or {@link potCore}. */
  readonly core: CoreShape;
  /** The core material (Steinmetz coefficients, μr, saturation). */
  readonly material: CoreMaterial;
  /** The winding conductor. */
  readonly conductor: InductorConductor;
  /** Ambient temperature [K], > 0. */
  readonly ambientTemperature: number;
  /** Gap model (default `"muhlethaler"`), see {@link gappedInductor}. */
  readonly fringing?: "none" | "mclyman" | "muhlethaler";
  /** Turns, integer ≥ 1 (default: the fewest that keep the peak flux below the limit). */
  readonly turns?: number;
  /** Peak flux density limit as a fraction of saturation [-], 0 … 1 (default 0.8, common practice). */
  readonly maxFluxDensityRatio?: number;
  /** Largest copper-plus-insulation fraction of the window [-], 0 … 1 (default 0.5, common practice for a bobbin). */
  readonly maxWindowFill?: number;
  /** Distance from the gapped leg to the first layer [m], ≥ 0 (default 0.5 mm, a bobbin wall). */
  readonly windingClearance?: number;
  /** Surface emissivity [-], 0 … 1 (default 0.9). */
  readonly emissivity?: number;
  /** Surface temperature above which a hot-spot caution is raised [K] (default 373.15, 100 °C). */
  readonly maxSurfaceTemperature?: number;
}

/**
 * A designed inductor.
 *
 * @category Cores
 */
export interface InductorDesign {
  /** Turns [-]. */
  readonly turns: number;
  /** Gap length in the winding leg [m]. */
  readonly gapLength: number;
  /** Inductance reached [H] (the wanted one, unless the turns alone already exceed it with no gap). */
  readonly inductance: number;
  /** Fringing factor of the gap [-]. */
  readonly fringingFactor: number;
  /** Peak flux density at the peak current [T]. */
  readonly peakFluxDensity: number;
  /** Peak-to-peak flux-density swing [T]. */
  readonly fluxDensitySwing: number;
  /** Current at saturation [A]. */
  readonly saturationCurrent: number;
  /** Peak current [A]. */
  readonly currentPeak: number;
  /** RMS current [A]. */
  readonly currentRms: number;
  /** Average (DC) current [A]. */
  readonly currentAverage: number;
  /** Peak-to-peak current [A]. */
  readonly currentRipple: number;
  /** Number of winding layers [-]. */
  readonly layers: number;
  /** Turns in a full layer [-]. */
  readonly turnsPerLayer: number;
  /** Fraction of the window area the winding fills [-]. */
  readonly windowFill: number;
  /** DC resistance of the winding at its temperature [Ω]. */
  readonly dcResistance: number;
  /** Loss-weighted AC factor of the ripple harmonics, $\sum F_R(n f) I_n^2 / \sum I_n^2$ [-]. */
  readonly rippleAcFactor: number;
  /** Core loss (iGSE over the real flux waveform, at the core temperature) [W]. */
  readonly coreLoss: number;
  /** Winding loss, DC plus harmonics [W]. */
  readonly windingLoss: number;
  /** Total loss [W]. */
  readonly totalLoss: number;
  /** Surface temperature rise above ambient [K]. */
  readonly temperatureRise: number;
  /** Surface temperature [K]. */
  readonly surfaceTemperature: number;
  /** Saturation, window, fringing, hot-spot and hot-surface cautions. */
  readonly cautions: readonly Caution[];
  /** Model-range notes (gap model, flux and frequency outside the material's fit, 2-D window field). */
  readonly validity: readonly ValidityNote[];
}
