/**
 * The core-loss / winding-loss trade-off of an inductor on a given core: {@link inductorDesign}
 * repeated over a range of turn counts, with the turn count of least total loss among those that
 * meet the flux limit and fit the window.
 *
 * @packageDocumentation
 */
import { InputError, requireInteger, requireKnownKeys, requireObject } from "../core/index.js";
import { MU_0 } from "../units/index.js";
import { inductorDesign } from "./inductor-design.js";
import type { InductorDesign, InductorDesignOptions } from "./inductor-design.js";

const FIELDS: readonly string[] = Object.freeze(["design", "minTurns", "maxTurns"]);
/** Most turn counts one sweep evaluates (each is one inductorDesign). */
const MAX_POINTS = 400;
/** Cautions that make a turn count unusable. */
const BLOCKING = new Set(["core-saturates", "flux-margin", "window-overfull"]);

/**
 * Options of {@link inductorTurnsSweep}.
 *
 * @category Cores
 */
export interface InductorTurnsSweepOptions {
  /** The inductor's specification, as for {@link inductorDesign} (its `turns`, if any, is replaced at each point). */
  readonly design: InductorDesignOptions;
  /** Fewest turns swept, integer ≥ 1 (default: half the design's turns, but no fewer than the ungapped core needs for the inductance). */
  readonly minTurns?: number;
  /** Most turns swept, integer ≥ minTurns, at most minTurns + 399 (default: three times the design's turns, widened while the least loss sits at the end). */
  readonly maxTurns?: number;
}

/**
 * One swept turn count.
 *
 * @category Cores
 */
export interface InductorSweepPoint {
  /** Turns [-]. */
  readonly turns: number;
  /** The design at these turns (its own cautions and validity notes included). */
  readonly design: InductorDesign;
  /** Peak flux density in the narrowest section [T]. */
  readonly peakFluxDensityNarrowest: number;
  /** True when the point reaches the inductance, meets the flux limit and fits the window (no `core-saturates`, `flux-margin` or `window-overfull` caution). */
  readonly usable: boolean;
}

/**
 * Result of {@link inductorTurnsSweep}.
 *
 * @category Cores
 */
export interface InductorTurnsSweep {
  /** The design with the routine's own choice of turns (the fewest that meet the flux limit). */
  readonly design: InductorDesign;
  /** Every turn count that could be designed, in increasing order. */
  readonly points: readonly InductorSweepPoint[];
  /** Turn counts of the range that could not be designed, with the reason (e.g. the gap would be longer than the window allows). */
  readonly skipped: readonly {
    /** The turn count [-]. */
    readonly turns: number;
    /** Why it could not be designed. */
    readonly reason: string;
  }[];
  /** The usable point of least total loss, `null` when no point is usable. */
  readonly leastLoss: InductorSweepPoint | null;
  /**
   * True when the least loss lies at an end of the range that could move (the upper end, or a
   * given lower end above 1 turn): the true optimum may lie outside; widen the range. A default
   * upper end is widened (doubled, up to 400 points) until the least loss lies inside it.
   */
  readonly leastLossAtRangeEnd: boolean;
}

/**
 * Sweeps the turn count of an inductor on a given core and finds the turns of least total loss:
 * each point is a full {@link inductorDesign} with `turns` fixed (the gap then follows from the
 * inductance), so fewer turns mean a higher flux density and core loss and more turns a longer,
 * more resistive winding with more layers.
 *
 * $$
 * N^\ast = \arg\min_{N \in [N_\mathrm{min}, N_\mathrm{max}],\ \text{usable}} \bigl(P_\mathrm{core}(N) + P_\mathrm{cu}(N)\bigr)
 * $$
 *
 * A point is usable when it reaches the inductance (too few turns cannot, even without a gap:
 * `inductorDesign` then notes `no-gap-needed`), its peak flux density in the narrowest section
 * stays within the flux limit and its winding fits the window. For a DC inductor with small ripple the optimum is
 * usually the fewest usable turns (what {@link inductorDesign} picks); with a large ripple the
 * core loss moves it to more turns.
 *
 * Hard domain (throws {@link InputError}): `design` as {@link inductorDesign} (it is designed
 * once with its own turns first); `minTurns`, `maxTurns` not integers ≥ 1, `maxTurns < minTurns`
 * or more than 400 points. Turn counts whose design throws (a gap longer than the window or
 * the path allows) are listed in `skipped`, not thrown. Validity and accuracy: those of
 * {@link inductorDesign} at each point; the minimum is exact over the integers swept (each
 * point is evaluated, no interpolation). Cost: one {@link inductorDesign} per point, at most 400 points.
 *
 * @param options - {@link InductorTurnsSweepOptions}
 * @returns {@link InductorTurnsSweep}
 * @throws {@link InputError} on bad input
 * @see {@link inductorDesign}; R. W. Erickson, D. Maksimović, Fundamentals of Power Electronics, 2nd ed. (2001), ch. 15 "Transformer Design", §15.1 (the core-loss / copper-loss optimum).
 * @example
 * ```ts
 * import { eCore, inductorTurnsSweep, inventedExampleFerrite, celsius } from "fluxwright";
 * const core = eCore({ width: 0.042, height: 0.021, depth: 0.015, windowWidth: 0.03, centreLegWidth: 0.012, windowHeight: 0.015 });
 * const s = inductorTurnsSweep({ design: {
 *   inductance: 100e-6, frequency: 100e3, core, material: inventedExampleFerrite,
 *   current: { kind: "triangular", average: 5, ripple: 2, dutyCycle: 0.4 },
 *   conductor: { kind: "litz", strands: 105, strandDiameter: 0.1e-3, outerDiameter: 1.4e-3 },
 *   ambientTemperature: celsius(40), maxFluxDensityRatio: 0.7 } });
 * console.log(s.design.turns, s.leastLoss?.turns); // 12 13
 * ```
 * @category Cores
 */
export function inductorTurnsSweep(options: InductorTurnsSweepOptions): InductorTurnsSweep {
  const where = "inductorTurnsSweep";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, FIELDS);
  requireObject(where, "design", options.design);
  const base = options.design;
  const design = inductorDesign(base);
  const core = base.core;
  // Fewest turns the ungapped core reaches the inductance with (inductorDesign's own bound).
  const coreReluctance = core.effectivePathLength / (MU_0 * base.material.relativePermeability * core.effectiveArea);
  const reachable = Math.floor(Math.sqrt(base.inductance * coreReluctance)) + 1;
  const minTurns = options.minTurns === undefined ? Math.max(1, reachable, Math.ceil(design.turns / 2)) : requireInteger(where, "minTurns", options.minTurns, 1);
  let maxTurns: number;
  if (options.maxTurns === undefined) {
    maxTurns = Math.max(minTurns, Math.min(3 * design.turns, minTurns + MAX_POINTS - 1));
  } else {
    maxTurns = requireInteger(where, "maxTurns", options.maxTurns, minTurns);
    if (maxTurns - minTurns + 1 > MAX_POINTS) throw new InputError(where, "maxTurns", maxTurns, "", `at most minTurns + ${MAX_POINTS - 1} (${minTurns + MAX_POINTS - 1}): one design per point`);
  }
  const points: InductorSweepPoint[] = [];
  const skipped: { turns: number; reason: string }[] = [];
  let leastLoss: InductorSweepPoint | null = null;
  const narrowest = core.minimumArea > 0 ? core.effectiveArea / core.minimumArea : 1;
  const last = minTurns + MAX_POINTS - 1;
  let n = minTurns;
  for (;;) {
    for (; n <= maxTurns; n++) {
      let d: InductorDesign;
      try {
        d = inductorDesign({ ...base, turns: n });
      } catch (e) {
        if (e instanceof InputError) {
          skipped.push({ turns: n, reason: e.message });
          continue;
        }
        throw e;
      }
      const usable = d.inductance >= base.inductance * (1 - 1e-9) && !d.cautions.some((c) => BLOCKING.has(c.code));
      const point: InductorSweepPoint = { turns: n, design: d, peakFluxDensityNarrowest: d.peakFluxDensity * narrowest, usable };
      points.push(point);
      if (usable && (leastLoss === null || d.totalLoss < leastLoss.design.totalLoss)) leastLoss = point;
    }
    // A default range is widened while the least loss sits at its upper end.
    if (options.maxTurns !== undefined || leastLoss?.turns !== maxTurns || maxTurns >= last) break;
    maxTurns = Math.min(last, 2 * maxTurns);
  }
  const leastLossAtRangeEnd = leastLoss !== null && (leastLoss.turns === maxTurns || (leastLoss.turns === minTurns && minTurns > 1 && options.minTurns !== undefined));
  return { design, points, skipped, leastLoss, leastLossAtRangeEnd };
}
