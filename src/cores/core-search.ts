/**
 * Core search: which of a list of cores can carry an inductor specification, ranked by size or
 * loss, with the reasons the others fail.
 *
 * @packageDocumentation
 */
import { InputError, requireKnownKeys, requireObject, requireOneOf, requirePositive } from "../core/index.js";
import type { CoreMaterial } from "../materials/index.js";
import { inductorDesign } from "./inductor-design.js";
import type { InductorDesign, InductorDesignOptions } from "./inductor-design.js";
import type { CoreShape } from "./shapes.js";

const FIELDS: readonly string[] = Object.freeze(["specification", "cores", "rankBy", "maxTemperatureRise"]);
const ENTRY_FIELDS: readonly string[] = Object.freeze(["name", "core", "material"]);
const MAX_CORES = 10_000;
/** Cautions that make a design infeasible. */
const BLOCKING = new Set(["core-saturates", "window-overfull", "winding-hot-spot"]);

/**
 * One candidate core.
 *
 * @category Cores
 */
export interface CoreCandidate {
  /** Your name for it (returned with the result). */
  readonly name: string;
  /** Its shape, e.g. from {@link eCore}. */
  readonly core: CoreShape;
  /** Its material, if not the specification's. */
  readonly material?: CoreMaterial;
}

/**
 * Options of {@link inductorCoreSearch}.
 *
 * @category Cores
 */
export interface InductorCoreSearchOptions {
  /** The inductor specification: {@link InductorDesignOptions} without the core. */
  readonly specification: Omit<InductorDesignOptions, "core">;
  /** The candidates (1 … 10 000). */
  readonly cores: readonly CoreCandidate[];
  /** Order of the feasible ones: smallest effective volume first (`"volume"`, default) or least total loss (`"loss"`). */
  readonly rankBy?: "volume" | "loss";
  /** Largest acceptable surface temperature rise [K], > 0 (default: no limit beyond the hot-spot caution). */
  readonly maxTemperatureRise?: number;
}

/**
 * A feasible candidate.
 *
 * @category Cores
 */
export interface FeasibleCore {
  /** The candidate's name, as given. */
  readonly name: string;
  /** Effective volume [m³]. */
  readonly effectiveVolume: number;
  /** The inductor designed on this core. */
  readonly design: InductorDesign;
}

/**
 * A candidate that fails, with why.
 *
 * @category Cores
 */
export interface RejectedCore {
  /** The candidate's name, as given. */
  readonly name: string;
  /** Plain sentences: the input error, or each blocking caution and limit crossed. */
  readonly reasons: readonly string[];
}

/**
 * Result of {@link inductorCoreSearch}.
 *
 * @category Cores
 */
export interface InductorCoreSearch {
  /** Feasible cores, best first. */
  readonly feasible: readonly FeasibleCore[];
  /** The others, in the order given, with reasons. */
  readonly rejected: readonly RejectedCore[];
}

/**
 * Runs {@link inductorDesign} on every candidate core and keeps those whose design does not
 * saturate, fits the window, stays below the hot-spot surface temperature and (optionally) a
 * temperature-rise limit; ranks them by effective volume or by total loss.
 *
 * $$
 * \text{feasible} \iff \hat B \le B_\mathrm{sat},\ \text{fill} \le \text{fill}_{\max},\ T_s \le T_{s,\max},\ \Delta T \le \Delta T_{\max}
 * $$
 *
 * Hard domain (throws {@link InputError}): bad options or candidates (name, core shape); a
 * candidate whose own design throws is rejected with the error's message, not thrown. Validity
 * and accuracy: those of {@link inductorDesign} for each candidate (the ranking is exact given
 * those numbers).
 *
 * @param options - {@link InductorCoreSearchOptions}
 * @returns {@link InductorCoreSearch}: feasible cores ranked, rejected ones with reasons
 * @throws {@link InputError} on bad options
 * @see {@link inductorDesign} (each candidate's design).
 * @example
 * ```ts
 * import { eCore, inductorCoreSearch, inventedExampleFerrite, celsius } from "fluxwright";
 * const e = (s: number) => eCore({ width: 0.042 * s, height: 0.021 * s, depth: 0.015 * s, windowWidth: 0.03 * s, centreLegWidth: 0.012 * s, windowHeight: 0.015 * s });
 * const r = inductorCoreSearch({
 *   specification: { inductance: 100e-6, frequency: 100e3, material: inventedExampleFerrite, ambientTemperature: celsius(40),
 *     current: { kind: "triangular", average: 5, ripple: 2, dutyCycle: 0.4 },
 *     conductor: { kind: "litz", strands: 105, strandDiameter: 0.1e-3, outerDiameter: 1.4e-3 }, maxFluxDensityRatio: 0.7 },
 *   cores: [{ name: "small", core: e(0.5) }, { name: "medium", core: e(0.8) }, { name: "large", core: e(1) }],
 * });
 * console.log(r.feasible.map((f) => f.name).join(", ")); // medium, large
 * ```
 * @category Cores
 */
export function inductorCoreSearch(options: InductorCoreSearchOptions): InductorCoreSearch {
  const where = "inductorCoreSearch";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, FIELDS);
  requireObject(where, "specification", options.specification);
  if ("core" in options.specification) {
    throw new InputError(where, "specification.core", (options.specification as { core?: unknown }).core, "", "absent (the cores come from `cores`)");
  }
  const rankBy = options.rankBy === undefined ? "volume" : requireOneOf(where, "rankBy", options.rankBy, ["volume", "loss"] as const);
  const maxRise = options.maxTemperatureRise === undefined ? Infinity : requirePositive(where, "maxTemperatureRise", options.maxTemperatureRise, "K");
  const cores: unknown = options.cores;
  if (!Array.isArray(cores) || cores.length < 1 || cores.length > MAX_CORES) {
    throw new InputError(where, "cores", cores, "", `an array of 1 … ${MAX_CORES} candidates { name, core, material? }`);
  }
  const feasible: FeasibleCore[] = [];
  const rejected: RejectedCore[] = [];
  for (let i = 0; i < cores.length; i++) {
    const path = `cores[${i}]`;
    const entry: unknown = cores[i];
    requireObject(where, path, entry);
    requireKnownKeys(where, path, entry as object, ENTRY_FIELDS);
    const candidate = entry as CoreCandidate;
    if (typeof candidate.name !== "string") throw new InputError(where, `${path}.name`, candidate.name, "", "a string");
    requireObject(where, `${path}.core`, candidate.core);
    let design: InductorDesign;
    try {
      design = inductorDesign({
        ...options.specification,
        core: candidate.core,
        ...(candidate.material === undefined ? {} : { material: candidate.material }),
      });
    } catch (error) {
      if (error instanceof InputError) {
        rejected.push({ name: candidate.name, reasons: [error.message] });
        continue;
      }
      throw error;
    }
    const reasons: string[] = [];
    for (const c of design.cautions) if (BLOCKING.has(c.code)) reasons.push(`${c.code}: ${c.message}`);
    if (design.temperatureRise > maxRise) {
      reasons.push(`temperature rise ${design.temperatureRise.toFixed(1)} K exceeds the limit ${maxRise} K`);
    }
    if (reasons.length > 0) rejected.push({ name: candidate.name, reasons });
    else feasible.push({ name: candidate.name, effectiveVolume: candidate.core.effectiveVolume, design });
  }
  feasible.sort((a, b) => (rankBy === "volume" ? a.effectiveVolume - b.effectiveVolume : a.design.totalLoss - b.design.totalLoss));
  return { feasible, rejected };
}
