/**
 * A two-winding transformer from a specification and a core: turns, layer stack, losses by
 * place, leakage inductance and temperature rise.
 *
 * @packageDocumentation
 */
import type { Caution, ValidityNote } from "../core/index.js";
import {
  InputError,
  requireArrayLike,
  requireInteger,
  requireKnownKeys,
  requireNonNegative,
  requireObject,
  requireOneOf,
  requirePositive,
  voltageCaution,
} from "../core/index.js";
import { componentTemperatureRise } from "../cores/index.js";
import type { ComponentTemperatureRise } from "../cores/index.js";
import { igseLoss, steinmetzLoss, triangularFluxWaveform } from "../coreloss/index.js";
import type { SteinmetzCoefficients } from "../materials/index.js";
import type { TransformerCandidate, TransformerDesign, TransformerDesignOptions, TransformerLosses } from "./design-types.js";
import { checkConductor, stackResistance } from "./winding-resistance.js";
import type { Layer } from "./winding-resistance.js";

export type {
  TransformerCore,
  TransformerTurnCounts,
  TransformerThermal,
  TransformerDesignWinding,
  TransformerDesignOptions,
  TransformerCandidate,
  TransformerLosses,
  TransformerDesign,
} from "./design-types.js";

const FIELDS: readonly string[] = Object.freeze([
  "frequency", "voltSeconds", "voltageWaveform", "primaryCurrentRms", "secondaryCurrentRms", "turnsRatio", "turns",
  "core", "coreLoss", "maxFluxDensity", "primary", "secondary", "sections", "layerInsulation", "sectionInsulation",
  "resistivity", "ambientTemperature", "thermal",
]);
/** A core description, or any core shape of `fluxwright/cores` (its other fields are accepted and unused). */
const CORE_FIELDS: readonly string[] = Object.freeze([
  "effectiveArea", "effectiveVolume", "windowHeight", "windowWidth", "meanTurnLength",
  "c1", "c2", "effectivePathLength", "minimumArea", "windowArea", "surfaceArea", "legArea", "legShape", "legWidth", "legDepth",
]);
const TURNS_FIELDS: readonly string[] = Object.freeze(["primary", "secondary"]);
const WINDING_FIELDS: readonly string[] = Object.freeze(["conductor"]);
const STEINMETZ_FIELDS: readonly string[] = Object.freeze(["k", "alpha", "beta"]);
const THERMAL_FIELDS: readonly string[] = Object.freeze(["thermalResistance", "surfaceArea", "height", "emissivity", "air"]);
const WAVEFORMS = ["square", "sinusoidal"] as const;
/** Largest secondary turn count the search tries. */
const MAX_SEARCH_TURNS = 1000;

interface Stack {
  layers: Layer[];
  spacers: Float64Array;
  build: number;
}

/** Splits `total` turns into `parts` near-equal whole numbers (the first ones take the extra). */
function split(total: number, parts: number, index: number): number {
  const base = Math.floor(total / parts);
  return base + (index < total - base * parts ? 1 : 0);
}

function buildStack(
  turns: [number, number],
  sections: readonly (0 | 1)[],
  perLayer: [number, number],
  template: [Layer, Layer],
  layerInsulation: number,
  sectionInsulation: number,
): Stack | null {
  const counts: [number, number] = [0, 0];
  for (const s of sections) counts[s]++;
  const seen: [number, number] = [0, 0];
  const layers: Layer[] = [];
  const gaps: number[] = [];
  let build = 0;
  for (let s = 0; s < sections.length; s++) {
    const w = sections[s] as 0 | 1;
    const sectionTurns = split(turns[w], counts[w], seen[w]);
    seen[w]++;
    if (sectionTurns === 0) return null;
    let left = sectionTurns;
    let first = true;
    while (left > 0) {
      const t = Math.min(perLayer[w], left);
      left -= t;
      if (layers.length > 0) {
        const gap = first ? sectionInsulation : layerInsulation;
        gaps.push(gap);
        build += gap;
      }
      first = false;
      layers.push({ ...template[w], turns: t });
      build += template[w].build;
    }
  }
  return { layers, spacers: Float64Array.from(gaps), build };
}

/** The checked specification: every number, the section order and one layer template per winding. */
interface Specification {
  readonly frequency: number;
  readonly lambda: number;
  readonly waveform: (typeof WAVEFORMS)[number];
  readonly i0: number;
  readonly i1Given: number | null;
  readonly ratio: number;
  readonly area: number;
  readonly volume: number;
  readonly breadth: number;
  readonly width: number;
  readonly steinmetz: SteinmetzCoefficients;
  readonly bMax: number;
  readonly resistivity: number;
  readonly ambient: number;
  readonly layerInsulation: number;
  readonly sectionInsulation: number;
  readonly sections: readonly (0 | 1)[];
  readonly perLayer: [number, number];
  readonly template: [Layer, Layer];
  readonly thermal: object;
}

/** Reads and checks the options (all but `turns`), in the order the errors are reported. */
function readSpecification(where: string, options: TransformerDesignOptions): Specification {
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, FIELDS);
  const frequency = requirePositive(where, "frequency", options.frequency, "Hz");
  const lambda = requirePositive(where, "voltSeconds", options.voltSeconds, "V·s");
  const waveform = options.voltageWaveform === undefined ? "square" : requireOneOf(where, "voltageWaveform", options.voltageWaveform, WAVEFORMS);
  const i0 = requirePositive(where, "primaryCurrentRms", options.primaryCurrentRms, "A");
  const i1Given = options.secondaryCurrentRms === undefined ? null : requirePositive(where, "secondaryCurrentRms", options.secondaryCurrentRms, "A");
  const ratio = requirePositive(where, "turnsRatio", options.turnsRatio, "");
  const core = requireObject(where, "core", options.core);
  requireKnownKeys(where, "core", core, CORE_FIELDS);
  const area = requirePositive(where, "core.effectiveArea", core.effectiveArea, "m²");
  const volume = requirePositive(where, "core.effectiveVolume", core.effectiveVolume, "m³");
  const breadth = requirePositive(where, "core.windowHeight", core.windowHeight, "m");
  const width = requirePositive(where, "core.windowWidth", core.windowWidth, "m");
  const mlt = requirePositive(where, "core.meanTurnLength", core.meanTurnLength, "m");
  const sc = requireObject(where, "coreLoss", options.coreLoss);
  requireKnownKeys(where, "coreLoss", sc, STEINMETZ_FIELDS);
  const steinmetz: SteinmetzCoefficients = {
    k: requirePositive(where, "coreLoss.k", sc.k, "W/m³"),
    alpha: requirePositive(where, "coreLoss.alpha", sc.alpha, ""),
    beta: requirePositive(where, "coreLoss.beta", sc.beta, ""),
  };
  const bMax = requirePositive(where, "maxFluxDensity", options.maxFluxDensity, "T");
  const resistivity = requirePositive(where, "resistivity", options.resistivity, "Ω·m");
  const ambient = requirePositive(where, "ambientTemperature", options.ambientTemperature, "K");
  const layerInsulation = options.layerInsulation === undefined ? 0 : requireNonNegative(where, "layerInsulation", options.layerInsulation, "m");
  const sectionInsulation = options.sectionInsulation === undefined ? 0 : requireNonNegative(where, "sectionInsulation", options.sectionInsulation, "m");
  let sections: (0 | 1)[] = [0, 1];
  if (options.sections !== undefined) {
    const list = requireArrayLike(where, "sections", options.sections, "", 2);
    sections = [];
    for (let i = 0; i < list.length; i++) {
      const s = requireInteger(where, `sections[${i}]`, list[i], 0);
      if (s > 1) throw new InputError(where, `sections[${i}]`, s, "", "0 (primary) or 1 (secondary)");
      sections.push(s as 0 | 1);
    }
    if (!sections.includes(0) || !sections.includes(1)) throw new InputError(where, "sections", list.length, "", "sections of both windings");
  }
  const templates: Layer[] = [];
  const perLayer: [number, number] = [1, 1];
  for (const [w, name] of [[0, "primary"], [1, "secondary"]] as const) {
    const winding = requireObject(where, name, options[name]);
    requireKnownKeys(where, name, winding, WINDING_FIELDS);
    const layer = checkConductor(where, `${name}.conductor`, `${name}.conductor`, winding.conductor, 1, w, breadth, mlt);
    templates.push(layer);
    perLayer[w] = layer.kind === "foil" ? 1 : Math.max(1, Math.floor((breadth * (1 + 1e-12)) / layer.build));
  }
  const template = templates as [Layer, Layer];
  const thermal = requireObject(where, "thermal", options.thermal);
  requireKnownKeys(where, "thermal", thermal, THERMAL_FIELDS);
  return {
    frequency, lambda, waveform, i0, i1Given, ratio, area, volume, breadth, width, steinmetz, bMax, resistivity, ambient,
    layerInsulation, sectionInsulation, sections, perLayer, template, thermal,
  };
}

/** One wound candidate: its resistances and leakage, peak flux density and losses by place. */
interface Evaluation {
  readonly r: ReturnType<typeof stackResistance>;
  readonly b: number;
  readonly losses: TransformerLosses;
}

/** The chosen turns, their stack and its evaluation. */
interface Choice {
  readonly n0: number;
  readonly n1: number;
  readonly stack: Stack;
  readonly e: Evaluation;
}

/** Resistances, flux density and losses of `n0`:`n1` turns wound as `stack`. */
function evaluate(spec: Specification, n0: number, n1: number, stack: Stack): Evaluation {
  const { frequency, resistivity, breadth, lambda, area, i0, i1Given, waveform, volume, steinmetz } = spec;
  const coreLossAt = (b: number): number => {
    if (waveform === "sinusoidal") return volume * steinmetzLoss({ ...steinmetz, frequency, peakFluxDensity: b });
    const flux = triangularFluxWaveform({ peakFluxDensity: b, frequency });
    return volume * igseLoss({ ...steinmetz, period: flux.period, flux });
  };
  const r = stackResistance({ frequency, resistivity, breadth }, stack.layers, stack.spacers, [n0, n1]);
  const b = lambda / (2 * n0 * area);
  const i1 = i1Given ?? (i0 * n0) / n1;
  const core = coreLossAt(b);
  const p0 = i0 * i0 * r.windings[0].acResistance;
  const p1 = i1 * i1 * r.windings[1].acResistance;
  return { r, b, losses: { core, primaryCopper: p0, secondaryCopper: p1, total: core + p0 + p1 } };
}

/** The turns the caller fixed, wound and evaluated (one feasible candidate). */
function fixedTurns(where: string, turns: unknown, spec: Specification, candidates: TransformerCandidate[]): Choice {
  const { sections, perLayer, template, layerInsulation, sectionInsulation } = spec;
  const t = requireObject(where, "turns", turns);
  requireKnownKeys(where, "turns", t, TURNS_FIELDS);
  const n0 = requireInteger(where, "turns.primary", t.primary, 1);
  const n1 = requireInteger(where, "turns.secondary", t.secondary, 1);
  const stack = buildStack([n0, n1], sections, perLayer, template, layerInsulation, sectionInsulation);
  if (stack === null) throw new InputError(where, "sections", sections.length, "", `no more sections of a winding than its turns (${n0} primary, ${n1} secondary)`);
  const e = evaluate(spec, n0, n1, stack);
  candidates.push({ primaryTurns: n0, secondaryTurns: n1, peakFluxDensity: e.b, totalLoss: e.losses.total, rejected: null });
  return { n0, n1, stack, e };
}

/**
 * Secondary turns 1, 2, … with the primary at the ratio: candidates over the flux limit are
 * rejected, the search stops at the first that does not fit the window, the least loss wins.
 */
function searchTurns(where: string, spec: Specification, candidates: TransformerCandidate[]): Choice {
  const { ratio, lambda, area, width, bMax, sections, perLayer, template, layerInsulation, sectionInsulation } = spec;
  let best: Choice | null = null;
  for (let n1 = 1; n1 <= MAX_SEARCH_TURNS; n1++) {
    const n0 = Math.max(1, Math.round(ratio * n1));
    const b = lambda / (2 * n0 * area);
    const stack = buildStack([n0, n1], sections, perLayer, template, layerInsulation, sectionInsulation);
    if (stack === null) continue;
    if (stack.build > width * (1 + 1e-12)) {
      candidates.push({ primaryTurns: n0, secondaryTurns: n1, peakFluxDensity: b, totalLoss: null, rejected: "window" });
      break;
    }
    if (b > bMax * (1 + 1e-12)) {
      candidates.push({ primaryTurns: n0, secondaryTurns: n1, peakFluxDensity: b, totalLoss: null, rejected: "flux-density" });
      continue;
    }
    const e = evaluate(spec, n0, n1, stack);
    candidates.push({ primaryTurns: n0, secondaryTurns: n1, peakFluxDensity: b, totalLoss: e.losses.total, rejected: null });
    if (best === null || e.losses.total < best.e.losses.total) best = { n0, n1, stack, e };
  }
  if (best === null) {
    const last = candidates[candidates.length - 1];
    const why = last === undefined ? "no candidate" : `at ${last.primaryTurns}:${last.secondaryTurns} turns the peak flux density is ${last.peakFluxDensity.toPrecision(3)} T and the layers ${last.rejected === "window" ? "do not fit the window width" : "fit"}`;
    throw new InputError(where, "core", null, "", `a core and conductors that meet maxFluxDensity with windings that fit the window (${why})`);
  }
  return best;
}

/**
 * Designs a two-winding transformer on a given core: chooses the turns (or takes them), winds
 * the layers section by section, and predicts the losses by place, the leakage inductance and
 * the temperature rise. The search tries secondary turns $N_1 = 1, 2, \dots$ with
 * $N_0 = \mathrm{round}(a N_1)$, rejects those whose peak flux density
 * $\hat B = \lambda/(2 N_0 A_e)$ exceeds the limit or whose layers do not fit the window
 * width, and keeps the one of least total loss
 *
 * $$
 * P = V_e\, p_v(\hat B) + I_0^2 R_{\mathrm{ac},0} + I_1^2 R_{\mathrm{ac},1}
 * $$
 *
 * (the core-loss / copper-loss trade-off of {@link transformerFluxOptimum} with the real
 * windings). Each section is wound as full layers of as many turns as fit across the window
 * height and a last partial layer; the resistances and the leakage come from
 * {@link transformerWindingResistance} on that stack, the core loss from Steinmetz
 * (sinusoidal) or iGSE on the triangular flux of a square voltage ({@link igseLoss}), the
 * temperature from {@link componentTemperatureRise}.
 *
 * Hard domain (throws {@link InputError}): every number finite and > 0 where stated (≥ 0 for
 * insulation); conductors as in {@link transformerWindingResistance} that fit at least one
 * turn across the window height; sections containing both windings; fixed turns integers ≥ 1;
 * and a specification that some candidate meets (otherwise the error says why the others
 * failed). Validity: every model it composes (notes collected in `validity`); one mean turn
 * length for all layers; the resistivity at the working temperature (not iterated with the
 * temperature rise); sinusoidal winding currents; magnetising current neglected in the
 * winding loss. Accuracy: the composition adds no approximation of its own beyond those; each
 * part's accuracy is stated on that part (per-layer Dowell: exact in 1-D, 1e-10 against the
 * finite-difference fixture; leakage: 0.05 % against the pot-core finite-element fixture with
 * full-height layers).
 *
 * @param options - {@link TransformerDesignOptions}
 * @returns {@link TransformerDesign}
 * @throws {@link InputError} on bad input or when no candidate meets the specification
 * @see R. W. Erickson, D. Maksimović, Fundamentals of Power Electronics, 2nd ed. (2001), ch. 15 "Transformer Design", §15.1 (the flux density that minimises core plus copper loss).
 * @see P. L. Dowell, Proc. IEE 113(8), 1387–1394 (1966) (winding loss per layer).
 * @example
 * ```ts
 * import { transformerDesign } from "fluxwright";
 * const d = transformerDesign({ frequency: 200e3, voltSeconds: 200 * 2.5e-6, primaryCurrentRms: 2, turnsRatio: 8,
 *   core: { effectiveArea: 1e-4, effectiveVolume: 5e-6, windowHeight: 12e-3, windowWidth: 5e-3, meanTurnLength: 0.06 },
 *   coreLoss: { k: 3, alpha: 1.4, beta: 2.6 }, maxFluxDensity: 0.15,
 *   primary: { conductor: { kind: "litz", construction: { strands: 60, strandDiameter: 0.08e-3 } } },
 *   secondary: { conductor: { kind: "foil", thickness: 0.2e-3, width: 11e-3 } },
 *   sections: [0, 1, 0], layerInsulation: 0.05e-3, sectionInsulation: 0.2e-3,
 *   resistivity: 2.2e-8, ambientTemperature: 313.15, thermal: { thermalResistance: 20 } });
 * console.log(d.turns); // { primary: 24, secondary: 3 }
 * ```
 * @category Transformers
 */
export function transformerDesign(options: TransformerDesignOptions): TransformerDesign {
  const where = "transformerDesign";
  const spec = readSpecification(where, options);
  const { frequency, lambda, waveform, bMax, width, ambient, thermal } = spec;
  const candidates: TransformerCandidate[] = [];
  const best = options.turns !== undefined ? fixedTurns(where, options.turns, spec, candidates) : searchTurns(where, spec, candidates);
  const { n0, n1, stack, e } = best;
  let temperature: ComponentTemperatureRise;
  try {
    temperature = componentTemperatureRise({ ...thermal, power: e.losses.total, ambientTemperature: ambient });
  } catch (error) {
    if (error instanceof InputError) throw new InputError(where, `thermal.${error.parameter}`, error.value, error.unit, error.expected);
    throw error;
  }
  const cautions: Caution[] = [...temperature.cautions];
  const primaryPeak = waveform === "square" ? 2 * lambda * frequency : Math.PI * lambda * frequency;
  const primaryRms = waveform === "square" ? primaryPeak : primaryPeak / Math.SQRT2;
  const v0 = voltageCaution({ voltage: primaryRms, waveform: "ac", location: "transformer primary" });
  if (v0 !== null) cautions.push(v0);
  if (e.b > bMax * (1 + 1e-12)) {
    cautions.push({
      code: "flux-density-above-limit",
      severity: "warning",
      message: "The peak flux density with the given turns exceeds maxFluxDensity: near saturation the magnetising current and the core loss rise steeply. Consult local codes and licensed practice.",
      value: e.b,
      limit: bMax,
      unit: "T",
      source: "the design's own limit",
    });
  }
  const validity: ValidityNote[] = [...e.r.validity, ...temperature.validity];
  if (stack.build > width * (1 + 1e-12)) {
    validity.push({ code: "window-overfull", message: "The layers are thicker than the window width: the given turns do not fit as wound.", value: stack.build, limit: width });
  }
  return {
    turns: { primary: n0, secondary: n1 },
    peakFluxDensity: e.b,
    losses: e.losses,
    windings: e.r.windings,
    layers: e.r.layers,
    build: stack.build,
    leakageInductance: e.r.leakageInductance,
    temperature,
    candidates,
    cautions,
    validity,
  };
}
