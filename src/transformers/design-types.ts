/**
 * The input and result types of {@link transformerDesign}.
 *
 * @packageDocumentation
 */
import type { Caution, ValidityNote } from "../core/index.js";
import type { AirProperties, ComponentTemperatureRise } from "../cores/index.js";
import type { SteinmetzCoefficients } from "../materials/index.js";
import type { LayerConductor, LayerResistance, WindingResistance } from "./winding-resistance.js";

/** The core as the design needs it; a core shape from `fluxwright/cores` (e.g. `potCore(...)`) fits. @category Transformers */
export interface TransformerCore {
  /** Effective cross-section $A_e$ [m²], finite and > 0. */
  readonly effectiveArea: number;
  /** Effective volume $V_e$ [m³], finite and > 0 (core loss). */
  readonly effectiveVolume: number;
  /** Window height: the breadth the layers span [m], finite and > 0. */
  readonly windowHeight: number;
  /** Window width: the build available across the window (less bobbin walls) [m], finite and > 0. */
  readonly windowWidth: number;
  /** Mean turn length of the winding [m], finite and > 0 (used for every layer). */
  readonly meanTurnLength: number;
}

/** Whole turns of the two windings. @category Transformers */
export interface TransformerTurnCounts {
  /** Primary turns $N_0$, an integer ≥ 1. */
  readonly primary: number;
  /** Secondary turns $N_1$, an integer ≥ 1. */
  readonly secondary: number;
}

/**
 * How the heat of {@link transformerDesign} leaves: a thermal resistance alone, or a surface for
 * natural convection and radiation (as {@link componentTemperatureRise}).
 *
 * @category Transformers
 */
export interface TransformerThermal {
  /** Thermal resistance surface-to-ambient [K/W], finite and > 0 (instead of the surface model). */
  readonly thermalResistance?: number;
  /** Outer surface exchanging heat [m²], finite and > 0 (e.g. a core shape's `surfaceArea`). */
  readonly surfaceArea?: number;
  /** Height of the component as it stands (convection length) [m], finite and > 0; with `surfaceArea`. */
  readonly height?: number;
  /** Total hemispherical emissivity [-], 0 … 1 (default as {@link componentTemperatureRise}). */
  readonly emissivity?: number;
  /** Air property override, as {@link componentTemperatureRise}. */
  readonly air?: AirProperties;
}

/** One winding of {@link transformerDesign}. @category Transformers */
export interface TransformerDesignWinding {
  /** The conductor of every layer of this winding (round wire, foil or litz). */
  readonly conductor: LayerConductor;
}

/** Options of {@link transformerDesign}. @category Transformers */
export interface TransformerDesignOptions {
  /** Switching frequency [Hz], finite and > 0. */
  readonly frequency: number;
  /** Primary volt-seconds per half-cycle λ [V·s], finite and > 0 (square wave ±V: V/(2f)). */
  readonly voltSeconds: number;
  /** `"square"` (default: triangular flux, core loss by iGSE) or `"sinusoidal"` (Steinmetz). */
  readonly voltageWaveform?: "square" | "sinusoidal";
  /** Primary RMS current [A], finite and > 0 (treated as sinusoidal at `frequency` for the winding loss). */
  readonly primaryCurrentRms: number;
  /** Secondary RMS current [A], finite and > 0 (default: the primary's times the turns ratio $N_0/N_1$). */
  readonly secondaryCurrentRms?: number;
  /** Wanted turns ratio $N_0/N_1$, finite and > 0; the secondary turns are whole and the primary's the nearest whole number. */
  readonly turnsRatio: number;
  /** Fixed turns (integers ≥ 1) instead of the search; the flux limit then only raises a caution. */
  readonly turns?: TransformerTurnCounts;
  /** The core. */
  readonly core: TransformerCore;
  /** Steinmetz coefficients of the core material, $p_v = k f^\alpha \hat B^\beta$ [W/m³]. */
  readonly coreLoss: SteinmetzCoefficients;
  /** Largest allowed peak flux density [T], finite and > 0. */
  readonly maxFluxDensity: number;
  /** The primary winding. */
  readonly primary: TransformerDesignWinding;
  /** The secondary winding. */
  readonly secondary: TransformerDesignWinding;
  /**
   * Order of the winding sections across the window, 0 primary, 1 secondary (default `[0, 1]`);
   * e.g. `[0, 1, 0]` interleaves a split primary around the secondary. Each winding's turns are
   * shared as evenly as whole turns allow among its sections.
   */
  readonly sections?: readonly (0 | 1)[];
  /** Insulation between layers of one section [m], finite and ≥ 0 (default 0). */
  readonly layerInsulation?: number;
  /** Insulation between sections [m], finite and ≥ 0 (default 0). */
  readonly sectionInsulation?: number;
  /** Conductor resistivity at the working temperature [Ω·m], finite and > 0. */
  readonly resistivity: number;
  /** Ambient temperature [K], finite and > 0. */
  readonly ambientTemperature: number;
  /**
   * How the heat leaves: `{ thermalResistance }` [K/W], or `{ surfaceArea, height, emissivity?, air? }`
   * for natural convection and radiation, as {@link componentTemperatureRise}.
   */
  readonly thermal: TransformerThermal;
}

/** A candidate turn count the search looked at. @category Transformers */
export interface TransformerCandidate {
  /** Primary turns tried. */
  readonly primaryTurns: number;
  /** Secondary turns tried. */
  readonly secondaryTurns: number;
  /** Peak flux density [T]. */
  readonly peakFluxDensity: number;
  /** Total loss [W], `null` when rejected. */
  readonly totalLoss: number | null;
  /** Why it was rejected: `"flux-density"` above the limit, `"window"` the layers do not fit; `null` when feasible. */
  readonly rejected: "flux-density" | "window" | null;
}

/** Losses by place [W]. @category Transformers */
export interface TransformerLosses {
  /** Core loss [W]. */
  readonly core: number;
  /** Primary winding loss $I_0^2 R_{\mathrm{ac},0}$ [W]. */
  readonly primaryCopper: number;
  /** Secondary winding loss $I_1^2 R_{\mathrm{ac},1}$ [W]. */
  readonly secondaryCopper: number;
  /** Sum [W]. */
  readonly total: number;
}

/** Result of {@link transformerDesign}. @category Transformers */
export interface TransformerDesign {
  /** Chosen (or given) whole turns. */
  readonly turns: TransformerTurnCounts;
  /** Peak flux density [T]. */
  readonly peakFluxDensity: number;
  /** Losses by place [W]. */
  readonly losses: TransformerLosses;
  /** Primary and secondary resistances. */
  readonly windings: readonly [WindingResistance, WindingResistance];
  /** The layer stack as wound, with its MMF diagram (per ampere of primary current). */
  readonly layers: readonly LayerResistance[];
  /** Build used across the window [m]. */
  readonly build: number;
  /** Leakage inductance referred to the primary [H]. */
  readonly leakageInductance: number;
  /** Steady temperature of the component's surface and how its heat leaves. */
  readonly temperature: ComponentTemperatureRise;
  /** Every candidate of the search, in order (one entry with fixed turns). */
  readonly candidates: readonly TransformerCandidate[];
  /** Voltage, saturation and hot-surface cautions. */
  readonly cautions: readonly Caution[];
  /** Where the models are stretched. */
  readonly validity: readonly ValidityNote[];
}
