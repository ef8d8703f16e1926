/**
 * AC resistance of the two windings of a transformer from the magnetomotive-force (MMF)
 * diagram of its layer stack, Dowell's layer formula applied to every layer with its own
 * surface fields: interleaved sections, partial layers, round wire, foil and litz.
 *
 * @packageDocumentation
 */
import type { ValidityNote } from "../core/index.js";
import { InputError, requireInteger, requireKnownKeys, requireObject, requireOneOf, requirePositive } from "../core/index.js";
import { MU_0 } from "../units/index.js";
import { dowellLayerKernel } from "../conductors/dowell.js";
import { litzGeometry } from "../conductors/litz.js";
import type { LitzConstruction } from "../conductors/litz.js";
import { wireProximityFactorKernel, wireSkinFactorKernel } from "../conductors/round-wire-kernels.js";
import { checkLayerWindings, checkSpacers, mmfFaces, mmfSquareIntegral } from "./stack.js";

const FIELDS: readonly string[] = Object.freeze(["frequency", "resistivity", "windowBreadth", "meanTurnLength", "layers", "spacers"]);
const LAYER_FIELDS: readonly string[] = Object.freeze(["winding", "turns", "conductor", "meanTurnLength"]);
const ROUND_FIELDS: readonly string[] = Object.freeze(["kind", "diameter", "outerDiameter"]);
const FOIL_FIELDS: readonly string[] = Object.freeze(["kind", "thickness", "width"]);
const LITZ_FIELDS: readonly string[] = Object.freeze(["kind", "construction"]);
const KINDS = ["round", "foil", "litz"] as const;

/** (π/4)^{3/4}: Dowell's equal-area square and its porosity folded into one factor. */
const EQUIVALENT_FOIL_FACTOR = Math.pow(Math.PI / 4, 0.75);

/** A layer of round wire: `turns` wires side by side across the window breadth. @category Transformers */
export interface RoundLayerConductor {
  /** Round wire. */
  readonly kind: "round";
  /** Diameter of the bare copper [m], finite and > 0. */
  readonly diameter: number;
  /** Diameter over the insulation [m], finite and ≥ diameter (default: diameter); the layer's build across the window. */
  readonly outerDiameter?: number;
}

/** A layer of foil: one turn of foil per layer. @category Transformers */
export interface FoilLayerConductor {
  /** Foil (or strip). */
  readonly kind: "foil";
  /** Foil thickness [m], finite and > 0: the layer's build across the window. */
  readonly thickness: number;
  /** Foil width along the window breadth [m], finite, > 0 and ≤ the breadth (default: the breadth). */
  readonly width?: number;
}

/** A layer of litz wire: `turns` bundles side by side across the window breadth. @category Transformers */
export interface LitzLayerConductor {
  /** Litz wire. */
  readonly kind: "litz";
  /** The litz construction (see {@link litzGeometry}); its outer diameter is the layer's build. */
  readonly construction: LitzConstruction;
}

/** The conductor of one layer. @category Transformers */
export type LayerConductor = RoundLayerConductor | FoilLayerConductor | LitzLayerConductor;

/** One layer of the stack, in order across the window build. @category Transformers */
export interface WindingLayer {
  /** 0 for the primary, 1 for the secondary. */
  readonly winding: 0 | 1;
  /** Turns in this layer, an integer ≥ 1 (exactly 1 for foil). A layer with fewer turns than fit is a partial layer. */
  readonly turns: number;
  /** What the layer is wound with. */
  readonly conductor: LayerConductor;
  /** Mean turn length of this layer [m], finite and > 0 (default: the stack's `meanTurnLength`). */
  readonly meanTurnLength?: number;
}

/** Options of {@link transformerWindingResistance}. @category Transformers */
export interface TransformerWindingResistanceOptions {
  /** Frequency of the sinusoidal winding currents [Hz], finite and > 0. */
  readonly frequency: number;
  /** Resistivity of the conductor metal at its working temperature [Ω·m], finite and > 0. */
  readonly resistivity: number;
  /** Breadth b of the winding window along the layers [m], finite and > 0. */
  readonly windowBreadth: number;
  /** Mean length of one turn [m], finite and > 0 (layers may override it). */
  readonly meanTurnLength: number;
  /** The layers in order across the window, at least one of each winding. */
  readonly layers: readonly WindingLayer[];
  /** Gaps between consecutive layers' builds [m], each finite and ≥ 0: one fewer than the layers. */
  readonly spacers: readonly number[];
}

/** Resistance of one winding. @category Transformers */
export interface WindingResistance {
  /** Turns of the winding (sum over its layers). */
  readonly turns: number;
  /** DC resistance [Ω]. */
  readonly dcResistance: number;
  /** AC resistance at the frequency [Ω]: the winding's eddy loss over its RMS current squared. */
  readonly acResistance: number;
  /** $R_\mathrm{ac}/R_\mathrm{dc}$ [-], ≥ 1. */
  readonly acFactor: number;
}

/** One layer's share of the result. @category Transformers */
export interface LayerResistance {
  /** 0 primary, 1 secondary. */
  readonly winding: 0 | 1;
  /** Position of the layer's first face across the build, from the first layer's face [m]. */
  readonly position: number;
  /** Build of the layer [m]. */
  readonly thickness: number;
  /** MMF at the first face per ampere of primary current [A·turn/A]. */
  readonly mmfStart: number;
  /** MMF at the second face per ampere of primary current [A·turn/A]. */
  readonly mmfEnd: number;
  /** DC resistance of the layer's turns [Ω]. */
  readonly dcResistance: number;
  /** The layer's own $R_\mathrm{ac}/R_\mathrm{dc}$ [-]. */
  readonly acFactor: number;
}

/** Result of {@link transformerWindingResistance}. @category Transformers */
export interface TransformerWindingResistance {
  /** Primary (index 0) and secondary (index 1). */
  readonly windings: readonly [WindingResistance, WindingResistance];
  /** Each layer, in stack order. */
  readonly layers: readonly LayerResistance[];
  /** Both windings' AC resistances referred to the primary, $R_0 + R_1 (N_0/N_1)^2$ [Ω]. */
  readonly acResistanceReferred: number;
  /** Leakage inductance of the same stack referred to the primary [H]: {@link leakageInductance} with the layers' builds as thicknesses, their turns, and the turns-weighted mean of the layers' turn lengths. */
  readonly leakageInductance: number;
  /** Where the one-dimensional model is stretched. */
  readonly validity: readonly ValidityNote[];
}

/** Checked layer. @internal */
export interface Layer {
  winding: 0 | 1;
  turns: number;
  kind: (typeof KINDS)[number];
  build: number;
  copperArea: number;
  layFactor: number;
  meanTurnLength: number;
  /** round: bare diameter; foil: thickness; litz: strand diameter */
  size: number;
  /** foil: width; round: unused; litz: strands */
  extra: number;
  /** litz bundle-internal proximity term */
  bundleTerm: number;
}

function checkLayer(where: string, i: number, layer: Record<string, unknown>, w: 0 | 1, breadth: number, defaultLength: number): Layer {
  requireKnownKeys(where, `layers[${i}]`, layer, LAYER_FIELDS);
  const turns = requireInteger(where, `layers[${i}].turns`, layer.turns, 1);
  const length = layer.meanTurnLength === undefined ? defaultLength : requirePositive(where, `layers[${i}].meanTurnLength`, layer.meanTurnLength, "m");
  return checkConductor(where, `layers[${i}].conductor`, `layers[${i}].turns`, layer.conductor, turns, w, breadth, length);
}

/**
 * Checks a layer conductor and returns the checked layer.
 * @internal
 */
export function checkConductor(where: string, path: string, turnsPath: string, conductor: unknown, turns: number, w: 0 | 1, breadth: number, length: number): Layer {
  const c = requireObject(where, path, conductor);
  const kind = requireOneOf(where, `${path}.kind`, c.kind, KINDS);
  if (kind === "round") {
    requireKnownKeys(where, path, c, ROUND_FIELDS);
    const d = requirePositive(where, `${path}.diameter`, c.diameter, "m");
    const outer = c.outerDiameter === undefined ? d : requirePositive(where, `${path}.outerDiameter`, c.outerDiameter, "m");
    if (outer < d) throw new InputError(where, `${path}.outerDiameter`, outer, "m", `≥ diameter = ${d}`);
    if (turns * outer > breadth * (1 + 1e-12)) {
      throw new InputError(where, turnsPath, turns, "", `turns · outerDiameter ≤ windowBreadth (at most ${Math.floor(breadth / outer)})`);
    }
    return { winding: w, turns, kind, build: outer, copperArea: (Math.PI * d * d) / 4, layFactor: 1, meanTurnLength: length, size: d, extra: 0, bundleTerm: 0 };
  }
  if (kind === "foil") {
    requireKnownKeys(where, path, c, FOIL_FIELDS);
    if (turns !== 1) throw new InputError(where, turnsPath, turns, "", "1 for a foil layer (one turn per layer)");
    const h = requirePositive(where, `${path}.thickness`, c.thickness, "m");
    const width = c.width === undefined ? breadth : requirePositive(where, `${path}.width`, c.width, "m");
    if (width > breadth * (1 + 1e-12)) throw new InputError(where, `${path}.width`, width, "m", `≤ windowBreadth = ${breadth}`);
    return { winding: w, turns, kind, build: h, copperArea: h * width, layFactor: 1, meanTurnLength: length, size: h, extra: width, bundleTerm: 0 };
  }
  requireKnownKeys(where, path, c, LITZ_FIELDS);
  const construction = c.construction as LitzConstruction;
  // litzGeometry checks the construction; its errors name litzGeometry's fields
  let g;
  try {
    g = litzGeometry(construction);
  } catch (e) {
    if (e instanceof InputError) throw new InputError(where, `${path}.${e.parameter}`, e.value, e.unit, e.expected);
    throw e;
  }
  if (turns * g.outerDiameter > breadth * (1 + 1e-12)) {
    throw new InputError(where, turnsPath, turns, "", `turns · litz outer diameter ≤ windowBreadth (at most ${Math.floor(breadth / g.outerDiameter)})`);
  }
  const n = construction.strands;
  const ds = construction.strandDiameter;
  const rb = g.bundleDiameter / 2;
  const bundleTerm = (n * (n - 1) * ds * ds) / (16 * Math.PI * rb * rb);
  return { winding: w, turns, kind, build: g.outerDiameter, copperArea: g.copperArea, layFactor: g.layFactor, meanTurnLength: length, size: ds, extra: n, bundleTerm };
}

/**
 * AC resistance of each winding of a two-winding transformer from the MMF diagram of its layer
 * stack and Dowell's one-dimensional layer solution applied to every layer with its own
 * surface fields. With the MMF $F_a$ and $F_c$ (signed, balancing windings
 * $N_0 I_0 = N_1 I_1$) at the two faces of a foil-like layer, the layer's loss over its DC
 * loss is
 *
 * $$
 * F_R = \Delta\left[\varsigma_1(\Delta) + \frac{2 F_a F_c}{(F_c - F_a)^2}\,\varsigma_2(\Delta)\right],
 * \quad \varsigma_1 = \frac{\sinh 2\Delta + \sin 2\Delta}{\cosh 2\Delta - \cos 2\Delta},
 * \quad \varsigma_2 = \frac{\sinh \Delta - \sin \Delta}{\cosh \Delta + \cos \Delta}
 * $$
 *
 * which for the k-th layer of a portion that starts at zero MMF is Dowell's $\Delta[\varsigma_1 + 2k(k-1)\varsigma_2]$
 * (their mean over k = 1…m is {@link dowellFactor}); where the MMF changes sign inside a layer
 * (interleaved sections) the weight is negative and the layer loses less than in isolation.
 * The penetration ratio is Δ = h/δ for foil of thickness h (scaled by √(width/b) for foil
 * narrower than the window), and for round wire Dowell's equivalent square foil with the
 * layer's porosity, $\Delta = (\pi/4)^{3/4} (d/\delta)\sqrt{N_l d/b}$ (a partial layer with
 * fewer turns $N_l$ has a smaller porosity). A litz layer has no layer-level screening: each
 * strand sees the mean square of the linearly varying layer field plus the bundle's own field,
 * $F_R = F(q) + g(q)\left[\frac{n(n-1)d_s^2}{16\pi r_b^2} + \frac{\pi n^2 d_s^2 N_w^2}{6 b^2}(f_a^2 + f_a f_c + f_c^2)\right]$
 * (as {@link litzAcRatio}, with $f = F/(N_0 I_0)$ and $N_w$ the layer's winding's turns). A
 * winding's AC resistance is the sum of its layers' DC resistance times $F_R$; the DC
 * resistance of a layer is $\rho\, N_l \ell_T \lambda / A_\mathrm{Cu}$.
 *
 * Hard domain (throws {@link InputError}): frequency, resistivity, windowBreadth,
 * meanTurnLength finite and > 0; each layer's winding 0 or 1 (both present), turns an integer
 * ≥ 1 (1 for foil), wires that fit across the breadth, a valid litz construction; spacers
 * finite, ≥ 0, one fewer than the layers. Validity (reported in `validity`): one-dimensional
 * field (layers spanning the window, no gap fringing near the winding), sinusoidal currents,
 * round wire up to about 2 δ (beyond that Dowell's equivalent foil and the 2-D field around
 * each wire disagree, see {@link roundWireWindingAcRatio}), litz strands below about 2 δ.
 *
 * Accuracy: for foil stacks the per-layer formula is exact in the 1-D model; against an
 * independent 1-D finite-difference solution of the field in every layer (fixture
 * test/fixtures/transformers/stack-1d.json: interleaved, partial and narrow-foil stacks,
 * Δ = 0.1 … 10) the winding resistances agree within 1e-10 relative (worst seen 1.3e-11). For
 * round wire and litz the model's own error applies (see validity).
 *
 * @param options - {@link TransformerWindingResistanceOptions}
 * @returns {@link TransformerWindingResistance}
 * @throws {@link InputError} on bad input
 * @see P. L. Dowell, "Effects of eddy currents in transformer windings", Proc. IEE 113(8), 1387–1394 (1966) (layer solution, porosity).
 * @see R. W. Erickson, D. Maksimović, Fundamentals of Power Electronics, 2nd ed. (2001), §13.4.3 (the per-layer loss with surface MMFs; interleaving; section and equation recalled from memory, not checked).
 * @see J. A. Ferreira, "Improved analytical modeling of conductive losses in magnetic components", IEEE Trans. Power Electron. 9(1), 127–131 (1994) (skin and proximity terms).
 * @example
 * ```ts
 * import { transformerWindingResistance } from "fluxwright";
 * // P–S–P interleave: 8 + 8 primary turns of 0.4 mm wire around a 4-turn foil secondary, 100 kHz
 * const wire = { kind: "round", diameter: 0.4e-3, outerDiameter: 0.45e-3 } as const;
 * const foil = { kind: "foil", thickness: 0.1e-3 } as const;
 * const r = transformerWindingResistance({ frequency: 100e3, resistivity: 1.72e-8, windowBreadth: 8e-3, meanTurnLength: 0.05,
 *   layers: [{ winding: 0, turns: 8, conductor: wire }, { winding: 1, turns: 1, conductor: foil }, { winding: 1, turns: 1, conductor: foil },
 *     { winding: 1, turns: 1, conductor: foil }, { winding: 1, turns: 1, conductor: foil }, { winding: 0, turns: 8, conductor: wire }],
 *   spacers: [0.1e-3, 0.03e-3, 0.03e-3, 0.03e-3, 0.1e-3] });
 * console.log(r.windings[0].acFactor); // ≈ 1.0894
 * console.log(r.windings[1].acFactor); // ≈ 1.0222
 * ```
 * @category Transformers
 */
export function transformerWindingResistance(options: TransformerWindingResistanceOptions): TransformerWindingResistance {
  const where = "transformerWindingResistance";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, FIELDS);
  const frequency = requirePositive(where, "frequency", options.frequency, "Hz");
  const resistivity = requirePositive(where, "resistivity", options.resistivity, "Ω·m");
  const breadth = requirePositive(where, "windowBreadth", options.windowBreadth, "m");
  const meanTurnLength = requirePositive(where, "meanTurnLength", options.meanTurnLength, "m");
  const { list, winding } = checkLayerWindings(where, options.layers);
  const n = list.length;
  const layers: Layer[] = [];
  const windingTurns: [number, number] = [0, 0];
  for (let i = 0; i < n; i++) {
    const w = (winding[i] ?? 0) as 0 | 1;
    const layer = checkLayer(where, i, list[i] ?? {}, w, breadth, meanTurnLength);
    layers.push(layer);
    windingTurns[w] += layer.turns;
  }
  const spacers = checkSpacers(where, options.spacers, n);
  return stackResistance({ frequency, resistivity, breadth }, layers, spacers, windingTurns);
}

/**
 * Resistance and leakage of a checked stack.
 * @internal
 */
export function stackResistance(
  o: { frequency: number; resistivity: number; breadth: number },
  layers: readonly Layer[],
  spacers: Float64Array,
  windingTurns: [number, number],
): TransformerWindingResistance {
  const n = layers.length;
  const winding = new Uint8Array(n);
  const share = new Float64Array(n);
  const thickness = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const l = layers[i] as Layer;
    winding[i] = l.winding;
    share[i] = l.turns / windingTurns[l.winding];
    thickness[i] = l.build;
  }
  const start = new Float64Array(n);
  const end = new Float64Array(n);
  mmfFaces(winding, share, start, end);
  const delta = Math.sqrt(o.resistivity / (Math.PI * o.frequency * MU_0));
  const dc: [number, number] = [0, 0];
  const ac: [number, number] = [0, 0];
  const out: LayerResistance[] = [];
  const validity: ValidityNote[] = [];
  let maxWireRatio = 0;
  let maxStrandRatio = 0;
  let narrowFoil = 1;
  let position = 0;
  const n0 = windingTurns[0];
  for (let i = 0; i < n; i++) {
    const l = layers[i] as Layer;
    const a = start[i] ?? 0;
    const c = end[i] ?? 0;
    const rdc = (o.resistivity * l.turns * l.meanTurnLength * l.layFactor) / l.copperArea;
    let factor: number;
    if (l.kind === "litz") {
      const q = l.size / (Math.SQRT2 * delta);
      maxStrandRatio = Math.max(maxStrandRatio, l.size / delta);
      const nw = windingTurns[l.winding];
      const strands = l.extra;
      const external = ((Math.PI * strands * strands * l.size * l.size * nw * nw) / (6 * o.breadth * o.breadth)) * (a * a + a * c + c * c);
      factor = wireSkinFactorKernel(q) + wireProximityFactorKernel(q) * (l.bundleTerm + external);
    } else {
      let penetration: number;
      if (l.kind === "foil") {
        penetration = (l.size / delta) * Math.sqrt(l.extra / o.breadth);
        narrowFoil = Math.min(narrowFoil, l.extra / o.breadth);
      } else {
        penetration = EQUIVALENT_FOIL_FACTOR * (l.size / delta) * Math.sqrt((l.size * l.turns) / o.breadth);
        maxWireRatio = Math.max(maxWireRatio, l.size / delta);
      }
      const span = c - a;
      factor = dowellLayerKernel(penetration, (2 * a * c) / (span * span));
    }
    dc[l.winding] += rdc;
    ac[l.winding] += rdc * factor;
    out.push({ winding: l.winding, position, thickness: l.build, mmfStart: a * n0, mmfEnd: c * n0, dcResistance: rdc, acFactor: factor });
    position += l.build + (i < n - 1 ? (spacers[i] ?? 0) : 0);
  }
  if (maxWireRatio > 2) {
    validity.push({ code: "round-wire-thick", message: "Round wire thicker than about 2 skin depths: Dowell's equivalent foil is unreliable for closely wound multilayer round wire; use thinner wire, litz or foil.", value: maxWireRatio, limit: 2 });
  }
  if (maxStrandRatio > 2) {
    validity.push({ code: "litz-strand-thick", message: "Litz strands thicker than about 2 skin depths: neighbouring strands screen each other and the loss is overstated.", value: maxStrandRatio, limit: 2 });
  }
  if (narrowFoil < 0.9) {
    validity.push({ code: "narrow-foil", message: "Foil narrower than 90 % of the window breadth: the field near the foil edges is two-dimensional and edge currents add loss that the porosity-scaled 1-D model misses.", value: narrowFoil, limit: 0.9 });
  }
  const meanTurn = layers.reduce((s, l) => s + l.meanTurnLength * l.turns, 0) / (windingTurns[0] + windingTurns[1]);
  const leakage = ((MU_0 * n0 * n0 * meanTurn) / o.breadth) * mmfSquareIntegral(thickness, spacers, start, end);
  const ratio = windingTurns[0] / windingTurns[1];
  const w0: WindingResistance = { turns: windingTurns[0], dcResistance: dc[0], acResistance: ac[0], acFactor: ac[0] / dc[0] };
  const w1: WindingResistance = { turns: windingTurns[1], dcResistance: dc[1], acResistance: ac[1], acFactor: ac[1] / dc[1] };
  return { windings: [w0, w1], layers: out, acResistanceReferred: ac[0] + ac[1] * ratio * ratio, leakageInductance: leakage, validity };
}
