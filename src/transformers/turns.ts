/**
 * Transformer turns from volt-seconds, the flux density of least total loss (the core-loss /
 * copper-loss trade-off) and window fill.
 *
 * @packageDocumentation
 */
import { InputError, requireArrayLike, requireInteger, requireKnownKeys, requireObject, requirePositive } from "../core/index.js";
import type { SteinmetzCoefficients } from "../materials/index.js";

const TURNS_FIELDS: readonly string[] = Object.freeze(["voltSeconds", "maxFluxDensity", "effectiveArea"]);
const OPTIMUM_FIELDS: readonly string[] = Object.freeze([
  "voltSeconds", "frequency", "effectiveArea", "effectiveVolume", "windowArea", "meanTurnLength", "fillFactor",
  "resistivity", "totalCurrentRms", "coreLoss", "acFactor", "maxFluxDensity",
]);
const STEINMETZ_FIELDS: readonly string[] = Object.freeze(["k", "alpha", "beta"]);
const FILL_FIELDS: readonly string[] = Object.freeze(["windowArea", "windings"]);
const FILL_WINDING_FIELDS: readonly string[] = Object.freeze(["turns", "copperArea", "conductorArea"]);

/** Options of {@link transformerTurns}. @category Transformers */
export interface TransformerTurnsOptions {
  /** Volt-seconds applied to the primary while the flux moves one way (one half-cycle of a symmetric waveform) λ [V·s], finite and > 0. */
  readonly voltSeconds: number;
  /** Largest allowed peak flux density $\hat B$ [T], finite and > 0 (half the swing). */
  readonly maxFluxDensity: number;
  /** Effective core cross-section $A_e$ [m²], finite and > 0. */
  readonly effectiveArea: number;
}

/** Result of {@link transformerTurns}. @category Transformers */
export interface TransformerTurns {
  /** The fewest whole primary turns that keep the peak flux density at or below the limit. */
  readonly turns: number;
  /** The exact (real) turns at which the peak flux density equals the limit. */
  readonly minimumTurns: number;
  /** Peak flux density with the whole turns [T]. */
  readonly peakFluxDensity: number;
}

/**
 * Fewest primary turns for a flux-density limit, from Faraday's law: volt-seconds λ applied
 * while the flux swings from $-\hat B$ to $+\hat B$ give
 *
 * $$
 * N = \frac{\lambda}{2 \hat B A_e}, \qquad \text{sinusoid: } \lambda = \frac{\sqrt 2\, V_\mathrm{rms}}{\pi f}
 *  \Rightarrow N = \frac{V_\mathrm{rms}}{4.44 f \hat B A_e}
 * $$
 *
 * (for a square wave of amplitude V, λ = V/(2f)); `turns` rounds up to a whole number.
 *
 * Hard domain (throws {@link InputError}): all inputs finite and > 0. Validity: symmetric
 * excitation without DC flux (add the DC bias to the peak yourself), uniform flux over $A_e$
 * (use the minimum area of the path where it is much smaller). Accuracy: exact (≤ 1e-15
 * relative; test against the transformer EMF equation).
 *
 * @param options - {@link TransformerTurnsOptions}: λ [V·s], $\hat B_\mathrm{max}$ [T], $A_e$ [m²]
 * @returns {@link TransformerTurns}: whole turns, exact turns, peak flux density [T]
 * @throws {@link InputError} on bad input
 * @see Faraday's law; the EMF equation $V_\mathrm{rms} = 4.44 f N \hat B A_e$ (common practice, e.g. Erickson & Maksimović 2001, §15.2, section from memory).
 * @example
 * ```ts
 * import { transformerTurns } from "fluxwright";
 * // ±200 V square wave at 200 kHz: λ = 200 V × 2.5 µs; 0.1 T peak on 1 cm²
 * const t = transformerTurns({ voltSeconds: 200 * 2.5e-6, maxFluxDensity: 0.1, effectiveArea: 1e-4 });
 * console.log(t.turns); // 25
 * console.log(t.peakFluxDensity); // ≈ 0.1
 * ```
 * @category Transformers
 */
export function transformerTurns(options: TransformerTurnsOptions): TransformerTurns {
  const where = "transformerTurns";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, TURNS_FIELDS);
  const lambda = requirePositive(where, "voltSeconds", options.voltSeconds, "V·s");
  const limit = requirePositive(where, "maxFluxDensity", options.maxFluxDensity, "T");
  const area = requirePositive(where, "effectiveArea", options.effectiveArea, "m²");
  const minimumTurns = lambda / (2 * limit * area);
  // a hair of tolerance so that an exact quotient (25.000000000000004) does not round up
  const turns = Math.max(1, Math.ceil(minimumTurns * (1 - 1e-12)));
  return { turns, minimumTurns, peakFluxDensity: lambda / (2 * turns * area) };
}

/** Options of {@link transformerFluxOptimum}. @category Transformers */
export interface TransformerFluxOptimumOptions {
  /** Primary volt-seconds per half-cycle λ [V·s], finite and > 0. */
  readonly voltSeconds: number;
  /** Frequency [Hz], finite and > 0. */
  readonly frequency: number;
  /** Effective core cross-section $A_e$ [m²], finite and > 0. */
  readonly effectiveArea: number;
  /** Effective core volume $V_e$ [m³], finite and > 0. */
  readonly effectiveVolume: number;
  /** Winding window area $W_A$ [m²], finite and > 0. */
  readonly windowArea: number;
  /** Mean turn length of the windings $\ell_T$ [m], finite and > 0. */
  readonly meanTurnLength: number;
  /** Copper fill factor $K_u$ of the window [-], in (0, 1]. */
  readonly fillFactor: number;
  /** Conductor resistivity at working temperature [Ω·m], finite and > 0. */
  readonly resistivity: number;
  /**
   * Total RMS winding current referred to the primary $I_\mathrm{tot} = \sum_j (N_j/N_0) I_j$ [A],
   * finite and > 0 (for two balanced windings twice the primary current).
   */
  readonly totalCurrentRms: number;
  /** Steinmetz coefficients of the core material for sinusoidal flux: $p_v = k f^\alpha \hat B^\beta$ [W/m³]. */
  readonly coreLoss: SteinmetzCoefficients;
  /** Ratio of AC to DC copper loss, assumed independent of the turns [-], finite and ≥ 1 (default 1). */
  readonly acFactor?: number;
  /** Saturation or design limit of the peak flux density [T], finite and > 0 (default: none). */
  readonly maxFluxDensity?: number;
}

/** Result of {@link transformerFluxOptimum}. @category Transformers */
export interface TransformerFluxOptimum {
  /** Peak flux density of least total loss, or the limit when that is lower [T]. */
  readonly peakFluxDensity: number;
  /** Primary turns giving that flux density (real; round to whole turns) [-]. */
  readonly turns: number;
  /** Core loss [W]. */
  readonly coreLoss: number;
  /** Copper loss with the window filled [W]. */
  readonly copperLoss: number;
  /** Sum [W]. */
  readonly totalLoss: number;
  /** True when `maxFluxDensity` is below the loss optimum and sets the flux density. */
  readonly limited: boolean;
}

function checkSteinmetz(where: string, value: unknown): SteinmetzCoefficients {
  const c = requireObject(where, "coreLoss", value);
  requireKnownKeys(where, "coreLoss", c, STEINMETZ_FIELDS);
  return {
    k: requirePositive(where, "coreLoss.k", c.k, "W/m³"),
    alpha: requirePositive(where, "coreLoss.alpha", c.alpha, ""),
    beta: requirePositive(where, "coreLoss.beta", c.beta, ""),
  };
}

/**
 * The peak flux density that minimises the sum of core loss and copper loss of a transformer
 * whose window is filled with copper. Fewer turns raise the flux density (core loss
 * $P_\mathrm{fe} = V_e k f^\alpha \hat B^\beta$ rises) and shorten the windings (copper loss
 * falls as $1/\hat B^2$ when the copper area is shared optimally between the windings):
 *
 * $$
 * P_\mathrm{cu} = F_R\,\frac{\rho\,\ell_T N_0^2 I_\mathrm{tot}^2}{K_u W_A}
 *   = F_R\,\frac{\rho\,\ell_T \lambda^2 I_\mathrm{tot}^2}{4 K_u W_A A_e^2 \hat B^2},
 * \qquad
 * \hat B_\mathrm{opt} = \left[\frac{2\,P_\mathrm{cu}(\hat B = 1\,\mathrm{T})}{\beta\, P_\mathrm{fe}(\hat B = 1\,\mathrm{T})}\right]^{1/(\beta + 2)}
 * $$
 *
 * where at the optimum $P_\mathrm{cu} = (\beta/2) P_\mathrm{fe}$. When `maxFluxDensity` is below
 * $\hat B_\mathrm{opt}$, the limit is returned and `limited` is true.
 *
 * Hard domain (throws {@link InputError}): every input finite and > 0, fillFactor ≤ 1,
 * acFactor ≥ 1, Steinmetz k, α, β > 0. Validity: sinusoidal flux (Steinmetz coefficients
 * fitted at the frequency), an AC factor that does not change with the turns (it does with the
 * layer count: check the final design with {@link transformerWindingResistance}), copper at one
 * temperature. Accuracy: exact for the model (the minimum agrees with a direct numerical
 * minimisation of the loss sum to 2e-8 relative, the resolution of that search, in the tests).
 *
 * @param options - {@link TransformerFluxOptimumOptions}
 * @returns {@link TransformerFluxOptimum}: flux density [T], turns, losses [W]
 * @throws {@link InputError} on bad input
 * @see R. W. Erickson, D. Maksimović, Fundamentals of Power Electronics, 2nd ed. (2001), §15.1 "Transformer design: basic constraints" (core loss, copper loss and the loss-minimising flux density).
 * @see W. G. Hurley, W. H. Wölfle, Transformers and Inductors for Power Electronics (Wiley, 2013), ch. 4 (the same optimum, core loss = (2/β) × copper loss; chapter from memory).
 * @example
 * ```ts
 * import { transformerFluxOptimum } from "fluxwright";
 * const o = transformerFluxOptimum({ voltSeconds: 200 * 2.5e-6, frequency: 200e3, effectiveArea: 1e-4,
 *   effectiveVolume: 5e-6, windowArea: 1e-4, meanTurnLength: 0.06, fillFactor: 0.3, resistivity: 2.2e-8,
 *   totalCurrentRms: 6, coreLoss: { k: 3, alpha: 1.4, beta: 2.6 } });
 * console.log(o.peakFluxDensity); // ≈ 0.0944
 * console.log(o.copperLoss / o.coreLoss); // ≈ 1.3
 * ```
 * @category Transformers
 */
export function transformerFluxOptimum(options: TransformerFluxOptimumOptions): TransformerFluxOptimum {
  const where = "transformerFluxOptimum";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, OPTIMUM_FIELDS);
  const lambda = requirePositive(where, "voltSeconds", options.voltSeconds, "V·s");
  const f = requirePositive(where, "frequency", options.frequency, "Hz");
  const area = requirePositive(where, "effectiveArea", options.effectiveArea, "m²");
  const volume = requirePositive(where, "effectiveVolume", options.effectiveVolume, "m³");
  const window = requirePositive(where, "windowArea", options.windowArea, "m²");
  const mlt = requirePositive(where, "meanTurnLength", options.meanTurnLength, "m");
  const ku = requirePositive(where, "fillFactor", options.fillFactor, "");
  if (ku > 1) throw new InputError(where, "fillFactor", ku, "", "a finite number > 0 and ≤ 1");
  const rho = requirePositive(where, "resistivity", options.resistivity, "Ω·m");
  const current = requirePositive(where, "totalCurrentRms", options.totalCurrentRms, "A");
  const s = checkSteinmetz(where, options.coreLoss);
  let acFactor = 1;
  if (options.acFactor !== undefined) {
    acFactor = requirePositive(where, "acFactor", options.acFactor, "");
    if (acFactor < 1) throw new InputError(where, "acFactor", acFactor, "", "a finite number ≥ 1");
  }
  const limit = options.maxFluxDensity === undefined ? Infinity : requirePositive(where, "maxFluxDensity", options.maxFluxDensity, "T");
  const copperAtOne = (acFactor * rho * mlt * lambda * lambda * current * current) / (4 * ku * window * area * area);
  const coreAtOne = volume * s.k * Math.pow(f, s.alpha);
  const optimum = Math.pow((2 * copperAtOne) / (s.beta * coreAtOne), 1 / (s.beta + 2));
  const limited = optimum > limit;
  const b = limited ? limit : optimum;
  const coreLoss = coreAtOne * Math.pow(b, s.beta);
  const copperLoss = copperAtOne / (b * b);
  return { peakFluxDensity: b, turns: lambda / (2 * b * area), coreLoss, copperLoss, totalLoss: coreLoss + copperLoss, limited };
}

/** One winding in {@link windowFill}. @category Transformers */
export interface WindowFillWinding {
  /** Turns, an integer ≥ 1 (count parallel conductors as turns). */
  readonly turns: number;
  /** Copper cross-section of one turn's conductor [m²], finite and > 0. */
  readonly copperArea: number;
  /** Cross-section the conductor occupies, over insulation (e.g. its outer diameter squared) [m²], finite and ≥ copperArea (default copperArea). */
  readonly conductorArea?: number;
}

/** Options of {@link windowFill}. @category Transformers */
export interface WindowFillOptions {
  /** Winding window area [m²], finite and > 0. */
  readonly windowArea: number;
  /** The windings sharing the window, at least one. */
  readonly windings: readonly WindowFillWinding[];
}

/** Result of {@link windowFill}. @category Transformers */
export interface WindowFill {
  /** Copper area over window area $K_u = \sum N_j A_{\mathrm{Cu},j} / W_A$ [-]. */
  readonly copperFill: number;
  /** Conductor (insulated) area over window area [-]; above about 0.6–0.7 a real winding rarely fits (common practice). */
  readonly conductorFill: number;
}

/**
 * Window fill of a set of windings: $K_u = \sum_j N_j A_{\mathrm{Cu},j} / W_A$ and the same
 * with the insulated conductor areas.
 *
 * Hard domain (throws {@link InputError}): windowArea finite and > 0; at least one winding;
 * turns integers ≥ 1; areas finite and > 0 with conductorArea ≥ copperArea. Validity: area
 * bookkeeping only (bobbin, margins, layer tape and the packing of round wire are the
 * designer's; copper fills of 0.25–0.4 are typical of bobbin-wound transformers, common
 * practice). Accuracy: exact.
 *
 * @param options - {@link WindowFillOptions}
 * @returns {@link WindowFill}: copper and conductor fill factors [-]
 * @throws {@link InputError} on bad input
 * @see R. W. Erickson, D. Maksimović, Fundamentals of Power Electronics, 2nd ed. (2001), §14.1.3 (window utilisation $K_u$).
 * @example
 * ```ts
 * import { windowFill } from "fluxwright";
 * const f = windowFill({ windowArea: 1e-4, windings: [{ turns: 20, copperArea: 0.5e-6, conductorArea: 0.8e-6 }, { turns: 5, copperArea: 2e-6 }] });
 * console.log(f.copperFill); // ≈ 0.2
 * console.log(f.conductorFill); // ≈ 0.26
 * ```
 * @category Transformers
 */
export function windowFill(options: WindowFillOptions): WindowFill {
  const where = "windowFill";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, FILL_FIELDS);
  const window = requirePositive(where, "windowArea", options.windowArea, "m²");
  const list = requireArrayLike(where, "windings", options.windings, "", 1);
  let copper = 0;
  let conductor = 0;
  for (let i = 0; i < list.length; i++) {
    const w = requireObject(where, `windings[${i}]`, list[i]);
    requireKnownKeys(where, `windings[${i}]`, w, FILL_WINDING_FIELDS);
    const turns = requireInteger(where, `windings[${i}].turns`, w.turns, 1);
    const cu = requirePositive(where, `windings[${i}].copperArea`, w.copperArea, "m²");
    const outer = w.conductorArea === undefined ? cu : requirePositive(where, `windings[${i}].conductorArea`, w.conductorArea, "m²");
    if (outer < cu) throw new InputError(where, `windings[${i}].conductorArea`, outer, "m²", `≥ copperArea = ${cu}`);
    copper += turns * cu;
    conductor += turns * outer;
  }
  return { copperFill: copper / window, conductorFill: conductor / window };
}
