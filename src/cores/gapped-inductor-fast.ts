/**
 * The fast path of {@link gappedInductor}: ordinary valid input checked inline with constant
 * comparisons, nothing allocated but the result.
 *
 * @packageDocumentation
 */
import { MU_0 } from "../units/index.js";
import { CHECKED_GAP_TO_LEG, CHECKED_GAP_TO_WINDOW, NO_NOTES, fringingFactorScalar } from "./gap-model.js";
import type { GappedCore, GappedInductor, GappedInductorOptions } from "./gapped-inductor.js";

/** True when every field of the options is a known one (constant comparisons: a few ns). */
function optionFieldsKnown(options: object): boolean {
  for (const key in options) {
    if (key !== "core" && key !== "turns" && key !== "gapLength" && key !== "fringing" && key !== "current") return false;
  }
  return true;
}

/** True when every field of the core is a known one. */
function coreFieldsKnown(core: object): boolean {
  for (const key in core) {
    if (
      key !== "effectiveArea" &&
      key !== "effectivePathLength" &&
      key !== "relativePermeability" &&
      key !== "gapArea" &&
      key !== "legShape" &&
      key !== "legWidth" &&
      key !== "legDepth" &&
      key !== "windowHeight" &&
      key !== "saturationFluxDensity"
    ) {
      return false;
    }
  }
  return true;
}

/**
 * The fast path of {@link gappedInductor} for ordinary valid input (checked inline, nothing
 * allocated but the result); `null` sends the call to the checked path, which throws or agrees.
 */
export function gappedInductorFast(options: GappedInductorOptions): GappedInductor | null {
  const core = options.core as GappedCore | null | undefined;
  if (typeof core !== "object" || core === null) return null;
  const fringing = options.fringing;
  const turns = options.turns;
  const g = options.gapLength;
  const area = core.effectiveArea;
  const length = core.effectivePathLength;
  const mur = core.relativePermeability;
  const gapAreaIn = core.gapArea;
  const legShape = core.legShape;
  const legWidth = core.legWidth;
  const legDepthIn = core.legDepth;
  const window = core.windowHeight;
  const bsat = core.saturationFluxDensity;
  const current = options.current;
  if (
    typeof area !== "number" || !(area > 0 && area < Infinity) ||
    typeof length !== "number" || !(length > 0 && length < Infinity) ||
    typeof mur !== "number" || !(mur >= 1 && mur < Infinity) ||
    typeof turns !== "number" || !(turns >= 1 && turns <= Number.MAX_SAFE_INTEGER) || Math.floor(turns) !== turns ||
    typeof g !== "number" || !(g >= 0 && g < length)
  ) {
    return null;
  }
  const gapArea = gapAreaIn === undefined ? area : gapAreaIn;
  if (typeof gapArea !== "number" || !(gapArea > 0 && gapArea < Infinity)) return null;
  if (current !== undefined && (typeof current !== "number" || !(current >= 0 && current < Infinity))) return null;
  if (bsat !== undefined && (typeof bsat !== "number" || !(bsat > 0 && bsat < Infinity))) return null;
  if (legShape !== undefined && legShape !== "rectangular" && legShape !== "round") return null;
  let w = NaN;
  let dep = NaN;
  if (fringing === "muhlethaler") {
    if (typeof legWidth !== "number" || !(legWidth > 0 && legWidth < Infinity)) return null;
    w = legWidth;
    if (legShape === "round") dep = legWidth;
    else if (typeof legDepthIn === "number" && legDepthIn > 0 && legDepthIn < Infinity) dep = legDepthIn;
    else return null;
  } else if (fringing !== "mclyman" && fringing !== "none") {
    return null;
  } else if (legWidth !== undefined || legDepthIn !== undefined) {
    return null;
  }
  if (fringing === "none") {
    if (window !== undefined) return null;
  } else if (typeof window !== "number" || !(window > 0 && window < Infinity) || !(g < window / 2)) {
    return null;
  }
  if (!optionFieldsKnown(options) || !coreFieldsKnown(core)) return null;
  const win = window === undefined ? NaN : window;
  const coreReluctance = (length - g) / (MU_0 * mur * area);
  const f = fringingFactorScalar(fringing, gapArea, w, dep, win, g);
  const gapReluctance = g / (MU_0 * gapArea * f);
  const total = coreReluctance + gapReluctance;
  if (fringing !== "none" && g > 0) {
    const leg = fringing === "muhlethaler" ? Math.min(w, dep) : Math.sqrt(gapArea);
    if (g > CHECKED_GAP_TO_LEG * leg || g > CHECKED_GAP_TO_WINDOW * win) return null;
  }
  return {
    inductance: (turns * turns) / total,
    gapReluctance,
    coreReluctance,
    fringingFactor: f,
    peakFluxDensity: current === undefined ? null : (turns * current) / (total * area),
    saturationCurrent: bsat === undefined ? null : (bsat * area * total) / turns,
    validity: NO_NOTES,
  };
}
