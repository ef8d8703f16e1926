/**
 * The gap model of {@link gappedInductor}: reading the core, the fringing factor (none,
 * McLyman's, or Mühlethaler's 2-D reluctance ratios), the gap's fit in the window, and the
 * notes when the gap leaves the range checked against the field solution.
 *
 * @packageDocumentation
 */
import { InputError, requireKnownKeys, requireObject, requireOneOf, requirePositive } from "../core/index.js";
import type { ValidityNote } from "../core/index.js";
import type { GappedCore } from "./gapped-inductor.js";

export const CORE_FIELDS: readonly string[] = Object.freeze([
  "effectiveArea",
  "effectivePathLength",
  "relativePermeability",
  "gapArea",
  "legShape",
  "legWidth",
  "legDepth",
  "windowHeight",
  "saturationFluxDensity",
]);
export const FRINGING = ["none", "mclyman", "muhlethaler"] as const;
export const LEG_SHAPES = ["rectangular", "round"] as const;

/** Largest gap, as a fraction of the leg width or window height, inside the checked range. */
export const CHECKED_GAP_TO_LEG = 0.18;
export const CHECKED_GAP_TO_WINDOW = 0.23;
export const NO_NOTES: readonly ValidityNote[] = Object.freeze([]);
/** A gap model's name. */
export type Fringing = (typeof FRINGING)[number];

/** Checked core fields, shared by the forward and inverse functions. */
export interface CoreData {
  area: number;
  length: number;
  mur: number;
  gapArea: number;
  round: boolean;
  legWidth: number;
  legDepth: number;
  window: number;
  bsat: number;
}

/** Reads and checks the core fields the gap model `fringing` needs. */
export function readCore(where: string, core: unknown, fringing: Fringing): CoreData {
  requireObject(where, "core", core);
  requireKnownKeys(where, "core", core as object, CORE_FIELDS);
  const c = core as GappedCore;
  const area = requirePositive(where, "core.effectiveArea", c.effectiveArea, "m²");
  const length = requirePositive(where, "core.effectivePathLength", c.effectivePathLength, "m");
  const mur = requirePositive(where, "core.relativePermeability", c.relativePermeability, "");
  if (!(mur >= 1)) throw new InputError(where, "core.relativePermeability", mur, "", "a finite number ≥ 1");
  const gapArea = c.gapArea === undefined ? area : requirePositive(where, "core.gapArea", c.gapArea, "m²");
  const round = c.legShape === undefined ? false : requireOneOf(where, "core.legShape", c.legShape, LEG_SHAPES) === "round";
  let legWidth = NaN;
  let legDepth = NaN;
  let window = NaN;
  if (fringing === "muhlethaler") {
    legWidth = requirePositive(where, "core.legWidth", c.legWidth, "m");
    legDepth = round ? legWidth : requirePositive(where, "core.legDepth", c.legDepth, "m");
  } else {
    if (c.legWidth !== undefined) requirePositive(where, "core.legWidth", c.legWidth, "m");
    if (c.legDepth !== undefined) requirePositive(where, "core.legDepth", c.legDepth, "m");
  }
  if (fringing !== "none") window = requirePositive(where, "core.windowHeight", c.windowHeight, "m");
  else if (c.windowHeight !== undefined) requirePositive(where, "core.windowHeight", c.windowHeight, "m");
  const bsat = c.saturationFluxDensity === undefined ? NaN : requirePositive(where, "core.saturationFluxDensity", c.saturationFluxDensity, "T");
  return { area, length, mur, gapArea, round, legWidth, legDepth, window, bsat };
}

/** One direction's 2-D reluctance ratio σ ≤ 1 of Mühlethaler's gap model (leg width w). */
export function sigma(w: number, g: number, h: number): number {
  const ideal = w / g;
  return ideal / (ideal + (2 / Math.PI) * (1 + Math.log((Math.PI * h) / (2 * g))));
}

/** Fringing factor F ≥ 1 of the gap model (F = 1 with no gap). */
export function fringingFactorOf(fringing: Fringing, d: CoreData, g: number): number {
  return fringingFactorScalar(fringing, d.gapArea, d.legWidth, d.legDepth, d.window, g);
}

export function fringingFactorScalar(
  fringing: string,
  gapArea: number,
  legWidth: number,
  legDepth: number,
  window: number,
  g: number,
): number {
  if (g === 0 || fringing === "none") return 1;
  if (fringing === "mclyman") return 1 + (g / Math.sqrt(gapArea)) * Math.log((2 * window) / g);
  const h = (window - g) / 2;
  return 1 / (sigma(legWidth, g, h) * sigma(legDepth, g, h));
}

/** Throws InputError unless the gap fits the path and, with fringing, half the window. */
export function requireGapFits(where: string, name: string, g: number, d: CoreData, fringing: Fringing): void {
  if (!(g < d.length)) throw new InputError(where, name, g, "m", `a finite number < core.effectivePathLength (${d.length})`);
  if (fringing !== "none" && !(g < d.window / 2)) {
    throw new InputError(where, name, g, "m", `a finite number < core.windowHeight / 2 (${d.window / 2}) for the fringing model`);
  }
}

/** Notes for a gap beyond the checked range of the fringing model. */
export function notesFor(fringing: Fringing, d: CoreData, g: number): readonly ValidityNote[] {
  if (fringing === "none" || g === 0) return NO_NOTES;
  const leg = fringing === "muhlethaler" ? Math.min(d.legWidth, d.legDepth) : Math.sqrt(d.gapArea);
  const notes: ValidityNote[] = [];
  if (g > CHECKED_GAP_TO_LEG * leg) {
    notes.push({
      code: "gap-beyond-checked-range",
      message: `gap / leg width ${(g / leg).toFixed(3)} exceeds ${CHECKED_GAP_TO_LEG}, the largest checked against the field solution; fringing may be off by more than stated`,
      value: g / leg,
      limit: CHECKED_GAP_TO_LEG,
    });
  }
  if (g > CHECKED_GAP_TO_WINDOW * d.window) {
    notes.push({
      code: "gap-large-for-window",
      message: `gap / window height ${(g / d.window).toFixed(3)} exceeds ${CHECKED_GAP_TO_WINDOW}: the fringing field fills the window`,
      value: g / d.window,
      limit: CHECKED_GAP_TO_WINDOW,
    });
  }
  return notes;
}
