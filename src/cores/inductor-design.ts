/**
 * An inductor from its specification and a core: turns, gap, flux, core loss from the real
 * current waveform (iGSE), winding loss with the harmonics of the current (Dowell / litz),
 * temperature rise and cautions.
 *
 * @packageDocumentation
 */
import {
  InputError,
  requireFinite,
  requireInRange,
  requireInteger,
  requireKnownKeys,
  requireNonNegative,
  requireObject,
  requireOneOf,
  requirePositive,
} from "../core/index.js";
import type { Caution, ValidityNote } from "../core/index.js";
import { DEFER_TO_CODES } from "../core/index.js";
import { dowellFactor, litzWindingAcRatio, roundWireWindingAcRatio } from "../conductors/index.js";
import { igseLoss, steinmetzTemperatureFactor } from "../coreloss/index.js";
import type { CoreMaterial } from "../materials/index.js";
import { ANNEALED_COPPER_RESISTIVITY, ANNEALED_COPPER_TEMPERATURE_COEFFICIENT, MU_0 } from "../units/index.js";
import { gapLengthForInductance, gappedInductor } from "./gapped-inductor.js";
import type { CoreShape } from "./shapes.js";
import { componentTemperatureRise } from "./temperature-rise.js";

const FIELDS: readonly string[] = Object.freeze([
  "inductance",
  "current",
  "frequency",
  "core",
  "material",
  "conductor",
  "ambientTemperature",
  "fringing",
  "turns",
  "maxFluxDensityRatio",
  "maxWindowFill",
  "windingClearance",
  "emissivity",
  "maxSurfaceTemperature",
]);
const TRIANGULAR_FIELDS: readonly string[] = Object.freeze(["kind", "average", "ripple", "dutyCycle"]);
const SAMPLED_FIELDS: readonly string[] = Object.freeze(["kind", "time", "current"]);
const ROUND_FIELDS: readonly string[] = Object.freeze(["kind", "diameter", "outerDiameter", "resistivity"]);
const LITZ_FIELDS: readonly string[] = Object.freeze(["kind", "strands", "strandDiameter", "outerDiameter", "resistivity"]);
const FOIL_FIELDS: readonly string[] = Object.freeze(["kind", "thickness", "insulationThickness", "resistivity"]);
const CORE_FIELDS: readonly string[] = Object.freeze([
  "c1", "c2", "effectiveArea", "effectivePathLength", "effectiveVolume", "minimumArea", "windowArea", "windowHeight",
  "windowWidth", "meanTurnLength", "surfaceArea", "legArea", "legShape", "legWidth", "legDepth",
]);

/** Harmonics of the current given their own AC resistance factor (the rest share the last one's). */
const HARMONICS = 40;
/** Reference temperature of the conductor resistivity [K] (20 °C). */
const REFERENCE_TEMPERATURE = 293.15;
/** Most samples of a sampled current waveform. */
const MAX_SAMPLES = 10_000;

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

interface Waveform {
  time: Float64Array;
  current: Float64Array;
}

function readCurrent(where: string, current: unknown, period: number): Waveform {
  requireObject(where, "current", current);
  const kind = requireOneOf(where, "current.kind", (current as { kind?: unknown }).kind, ["triangular", "samples"] as const);
  if (kind === "triangular") {
    requireKnownKeys(where, "current", current as object, TRIANGULAR_FIELDS);
    const c = current as TriangularCurrent;
    const average = requireFinite(where, "current.average", c.average, "A");
    const ripple = requireNonNegative(where, "current.ripple", c.ripple, "A");
    const d = requireInRange(where, "current.dutyCycle", c.dutyCycle, "", 0, 1, "()");
    return {
      time: Float64Array.of(0, d * period, period),
      current: Float64Array.of(average - ripple / 2, average + ripple / 2, average - ripple / 2),
    };
  }
  requireKnownKeys(where, "current", current as object, SAMPLED_FIELDS);
  const c = current as SampledCurrent;
  const t = c.time as unknown;
  const i = c.current as unknown;
  if (!Array.isArray(t) || t.length < 2 || t.length > MAX_SAMPLES) {
    throw new InputError(where, "current.time", t, "s", `an array of 2 … ${MAX_SAMPLES} times`);
  }
  if (!Array.isArray(i) || i.length !== t.length) {
    throw new InputError(where, "current.current", i, "A", `an array as long as current.time (${t.length})`);
  }
  const n = t.length;
  const time = new Float64Array(n);
  const cur = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    time[k] = requireFinite(where, `current.time[${k}]`, t[k], "s");
    cur[k] = requireFinite(where, `current.current[${k}]`, i[k], "A");
    if (k > 0 && !(time[k]! > time[k - 1]!)) throw new InputError(where, `current.time[${k}]`, t[k], "s", "greater than the time before it");
  }
  if (time[0] !== 0) throw new InputError(where, "current.time[0]", time[0], "s", "0");
  if (Math.abs(time[n - 1]! - period) > 1e-9 * period) {
    throw new InputError(where, `current.time[${n - 1}]`, time[n - 1], "s", `the period 1/frequency = ${period}`);
  }
  time[n - 1] = period;
  let big = 0;
  for (let k = 0; k < n; k++) big = Math.max(big, Math.abs(cur[k]!));
  if (Math.abs(cur[n - 1]! - cur[0]!) > 1e-9 * big) {
    throw new InputError(where, `current.current[${n - 1}]`, cur[n - 1], "A", `equal to current.current[0] (${cur[0]}): an inductor current is continuous`);
  }
  cur[n - 1] = cur[0]!;
  return { time, current: cur };
}


/** Average, RMS, extremes and harmonic RMS values (1 … HARMONICS) of a piecewise-linear current. */
function currentSpectrum(w: Waveform, harmonicRms: Float64Array): { average: number; rms: number; max: number; min: number } {
  const { time, current } = w;
  const n = time.length;
  const period = time[n - 1]!;
  let mean = 0;
  let square = 0;
  let max = -Infinity;
  let min = Infinity;
  for (let k = 0; k < n - 1; k++) {
    const dt = time[k + 1]! - time[k]!;
    const a = current[k]!;
    const b = current[k + 1]!;
    mean += ((a + b) / 2) * dt;
    square += ((a * a + a * b + b * b) / 3) * dt;
    max = Math.max(max, a);
    min = Math.min(min, a);
  }
  // Fourier coefficients from the jumps of the slope: c_n = −(1/(T ω_n²)) Σ Δs_k e^{−jω_n t_k}.
  for (let h = 1; h <= HARMONICS; h++) {
    const omega = (2 * Math.PI * h) / period;
    let re = 0;
    let im = 0;
    for (let k = 0; k < n - 1; k++) {
      const slope = (current[k + 1]! - current[k]!) / (time[k + 1]! - time[k]!);
      const kPrev = k === 0 ? n - 2 : k - 1;
      const slopePrev = (current[kPrev + 1]! - current[kPrev]!) / (time[kPrev + 1]! - time[kPrev]!);
      const jump = slope - slopePrev;
      re += jump * Math.cos(omega * time[k]!);
      im -= jump * Math.sin(omega * time[k]!);
    }
    const magnitude = Math.hypot(re, im) / (period * omega * omega);
    harmonicRms[h - 1] = Math.SQRT2 * magnitude;
  }
  return { average: mean / period, rms: Math.sqrt(square / period), max, min };
}

function caution(code: string, severity: Caution["severity"], message: string, value: number, limit: number, unit: string, source: string): Caution {
  return { code, severity, message: `${message} ${DEFER_TO_CODES}`, value, limit, unit, source };
}

/**
 * Designs an inductor on a given core: the fewest turns that keep the peak flux density below a
 * fraction of saturation, the gap that then gives the inductance (with the gap's fringing), the
 * core loss of the real flux waveform by the iGSE and the winding loss of every harmonic of the
 * current by Dowell's layer model (round wire through its equivalent foil, foil directly) or
 * Sullivan's litz model, and the temperature rise by {@link componentTemperatureRise}; losses
 * and temperature are iterated to agreement (copper resistivity and the Steinmetz temperature
 * term follow the surface temperature).
 *
 * $$
 * N = \left\lceil \frac{L \hat I}{k_B B_\mathrm{sat} A_\mathrm{min}} \right\rceil,\quad
 * B(t) = \frac{N i(t)}{\mathcal R A_e},\quad
 * P_\mathrm{core} = V_e\, F(T)\, \mathrm{iGSE}[B(t)],\quad
 * P_\mathrm{cu} = R_\mathrm{dc}(T)\left[I_0^2 + \sum_{n} F_R(n f)\, I_n^2\right]
 * $$
 *
 * The harmonics $I_n$ (n ≤ 40) come in closed form from the slope changes of the piecewise-linear
 * current; the remaining AC power is charged at $F_R$ of the 40th.
 *
 * Hard domain (throws {@link InputError}): bad numbers or unknown fields anywhere; a current
 * that does not close over the period; an inductance the core cannot reach (see
 * {@link gapLengthForInductance}); more turns than fit one layer per conductor height if
 * `turns` is forced below 1. Validity: a lumped, single-temperature component; Dowell's
 * one-dimensional window field (the gap's fringing field makes the field near the gap
 * two-dimensional: flagged when the winding is closer than three gap lengths); the material's
 * fitted ranges (flagged). Accuracy: each ingredient as stated by its function (gap model 1.7 %
 * on the pot-core field solution; iGSE exact for the waveform given; Dowell's model; surface
 * temperature ±10 % from the convection correlation). The composition is checked end to end
 * against an independent hand calculation with closed forms (turns; the triangle's iGSE; the
 * triangle's Fourier series with Sullivan's litz factor): core loss within 1e-8, winding loss
 * within 1e-4 (the harmonics above the 40th are charged at the 40th's factor), surface
 * temperature within 2e-3 K. A measured prototype or a field solution of the whole component is
 * not part of the checks yet.
 *
 * @param options - {@link InductorDesignOptions}
 * @returns {@link InductorDesign}
 * @throws {@link InputError} on bad input or an unreachable design
 * @see the functions composed: {@link gappedInductor}, {@link igseLoss}, {@link roundWireWindingAcRatio}, {@link litzWindingAcRatio}, {@link dowellFactor}, {@link componentTemperatureRise}; W. G. Hurley et al., IEEE Trans. Power Electron. 15(2) 2000 (winding loss summed over the current's harmonics).
 * @example
 * ```ts
 * import { eCore, inductorDesign, inventedExampleFerrite, celsius } from "fluxwright";
 * const core = eCore({ width: 0.042, height: 0.021, depth: 0.015, windowWidth: 0.03, centreLegWidth: 0.012, windowHeight: 0.015 });
 * const d = inductorDesign({
 *   inductance: 100e-6, frequency: 100e3, core, material: inventedExampleFerrite,
 *   current: { kind: "triangular", average: 5, ripple: 2, dutyCycle: 0.4 },
 *   conductor: { kind: "litz", strands: 105, strandDiameter: 0.1e-3, outerDiameter: 1.4e-3 },
 *   ambientTemperature: celsius(40), maxFluxDensityRatio: 0.7,
 * });
 * console.log(d.turns); // 12
 * console.log((d.gapLength * 1e3).toFixed(2), d.totalLoss.toFixed(2)); // 0.32 0.91
 * ```
 * @category Cores
 */
export function inductorDesign(options: InductorDesignOptions): InductorDesign {
  const where = "inductorDesign";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, FIELDS);
  const inductance = requirePositive(where, "inductance", options.inductance, "H");
  const frequency = requirePositive(where, "frequency", options.frequency, "Hz");
  const period = 1 / frequency;
  const ambient = requirePositive(where, "ambientTemperature", options.ambientTemperature, "K");
  const wave = readCurrent(where, options.current, period);
  requireObject(where, "core", options.core);
  requireKnownKeys(where, "core", options.core, CORE_FIELDS);
  const core = options.core;
  const area = requirePositive(where, "core.effectiveArea", core.effectiveArea, "m²");
  const volume = requirePositive(where, "core.effectiveVolume", core.effectiveVolume, "m³");
  const windowArea = requirePositive(where, "core.windowArea", core.windowArea, "m²");
  const windowHeight = requirePositive(where, "core.windowHeight", core.windowHeight, "m");
  const windowWidth = requirePositive(where, "core.windowWidth", core.windowWidth, "m");
  const meanTurn = requirePositive(where, "core.meanTurnLength", core.meanTurnLength, "m");
  const surfaceArea = requirePositive(where, "core.surfaceArea", core.surfaceArea, "m²");
  const minimumArea = core.minimumArea === undefined ? area : requirePositive(where, "core.minimumArea", core.minimumArea, "m²");
  if (core.c1 !== undefined) requirePositive(where, "core.c1", core.c1, "1/m");
  if (core.c2 !== undefined) requirePositive(where, "core.c2", core.c2, "1/m³");
  requireObject(where, "material", options.material);
  const material = options.material;
  requireObject(where, "material.steinmetz", material.steinmetz);
  const mur = requirePositive(where, "material.relativePermeability", material.relativePermeability, "");
  const bsat = requirePositive(where, "material.saturationFluxDensity", material.saturationFluxDensity, "T");
  const fringing = options.fringing === undefined ? "muhlethaler" : requireOneOf(where, "fringing", options.fringing, ["none", "mclyman", "muhlethaler"] as const);
  const ratio = options.maxFluxDensityRatio === undefined ? 0.8 : requireInRange(where, "maxFluxDensityRatio", options.maxFluxDensityRatio, "", 0, 1, "(]");
  const maxFill = options.maxWindowFill === undefined ? 0.5 : requireInRange(where, "maxWindowFill", options.maxWindowFill, "", 0, 1, "(]");
  const clearance = options.windingClearance === undefined ? 0.5e-3 : requireNonNegative(where, "windingClearance", options.windingClearance, "m");
  const emissivity = options.emissivity === undefined ? 0.9 : requireInRange(where, "emissivity", options.emissivity, "", 0, 1);
  const maxSurface = options.maxSurfaceTemperature === undefined ? 373.15 : requirePositive(where, "maxSurfaceTemperature", options.maxSurfaceTemperature, "K");

  // Conductor.
  requireObject(where, "conductor", options.conductor);
  const conductor = options.conductor;
  requireOneOf(where, "conductor.kind", (conductor as { kind?: unknown }).kind, ["round", "litz", "foil"] as const);
  let copperArea: number;
  let height: number; // conductor height along the window height
  let buildPerLayer: number;
  let strands = 1;
  let strandDiameter = NaN;
  let roundDiameter = NaN;
  let foilThickness = NaN;
  if (conductor.kind === "round") {
    requireKnownKeys(where, "conductor", conductor, ROUND_FIELDS);
    roundDiameter = requirePositive(where, "conductor.diameter", conductor.diameter, "m");
    const outer = conductor.outerDiameter === undefined ? 1.07 * roundDiameter : requirePositive(where, "conductor.outerDiameter", conductor.outerDiameter, "m");
    if (!(outer >= roundDiameter)) throw new InputError(where, "conductor.outerDiameter", outer, "m", `≥ conductor.diameter (${roundDiameter})`);
    copperArea = (Math.PI * roundDiameter * roundDiameter) / 4;
    height = outer;
    buildPerLayer = outer;
  } else if (conductor.kind === "litz") {
    requireKnownKeys(where, "conductor", conductor, LITZ_FIELDS);
    strands = requireInteger(where, "conductor.strands", conductor.strands, 1);
    strandDiameter = requirePositive(where, "conductor.strandDiameter", conductor.strandDiameter, "m");
    const outer = requirePositive(where, "conductor.outerDiameter", conductor.outerDiameter, "m");
    copperArea = (strands * Math.PI * strandDiameter * strandDiameter) / 4;
    if (!(outer * outer >= (strands * strandDiameter * strandDiameter))) {
      throw new InputError(where, "conductor.outerDiameter", outer, "m", `large enough to hold the strands (≥ ${Math.sqrt(strands) * strandDiameter})`);
    }
    height = outer;
    buildPerLayer = outer;
  } else {
    requireKnownKeys(where, "conductor", conductor, FOIL_FIELDS);
    foilThickness = requirePositive(where, "conductor.thickness", conductor.thickness, "m");
    const insulation = conductor.insulationThickness === undefined ? 50e-6 : requireNonNegative(where, "conductor.insulationThickness", conductor.insulationThickness, "m");
    copperArea = foilThickness * windowHeight;
    height = windowHeight;
    buildPerLayer = foilThickness + insulation;
  }
  const rho20 = conductor.resistivity === undefined ? ANNEALED_COPPER_RESISTIVITY : requirePositive(where, "conductor.resistivity", conductor.resistivity, "Ω·m");

  // Current.
  const harmonicRms = new Float64Array(HARMONICS);
  const spectrum = currentSpectrum(wave, harmonicRms);
  const peak = Math.max(Math.abs(spectrum.max), Math.abs(spectrum.min));
  if (!(peak > 0)) throw new InputError(where, "current", options.current, "A", "a waveform that is not zero everywhere");

  // Turns and gap.
  const gapCore = {
    effectiveArea: area,
    effectivePathLength: requirePositive(where, "core.effectivePathLength", core.effectivePathLength, "m"),
    relativePermeability: mur,
    gapArea: requirePositive(where, "core.legArea", core.legArea, "m²"),
    legShape: requireOneOf(where, "core.legShape", core.legShape, ["rectangular", "round"] as const),
    legWidth: requirePositive(where, "core.legWidth", core.legWidth, "m"),
    legDepth: requirePositive(where, "core.legDepth", core.legDepth, "m"),
    windowHeight,
    saturationFluxDensity: bsat,
  };
  const rCoreFull = gapCore.effectivePathLength / (MU_0 * mur * area);
  let turns: number;
  if (options.turns !== undefined) {
    turns = requireInteger(where, "turns", options.turns, 1);
  } else {
    const forFlux = Math.ceil((inductance * peak) / (ratio * bsat * minimumArea) - 1e-9);
    const forInductance = Math.floor(Math.sqrt(inductance * rCoreFull)) + 1;
    turns = Math.max(1, forFlux, forInductance);
  }
  let gap = 0;
  const ungapped = (turns * turns) / rCoreFull;
  const validity: ValidityNote[] = [];
  if (ungapped > inductance) {
    gap = gapLengthForInductance({ core: gapCore, turns, inductance, fringing });
  } else {
    validity.push({ code: "no-gap-needed", message: `the ungapped core gives only ${ungapped.toExponential(3)} H with ${turns} turns; no gap`, value: ungapped, limit: inductance });
  }
  const magnetic = gappedInductor({ core: gapCore, turns, gapLength: gap, fringing, current: peak });
  for (const note of magnetic.validity) validity.push(note);
  const totalReluctance = magnetic.coreReluctance + magnetic.gapReluctance;
  const perAmp = turns / (totalReluctance * area); // T per A
  const peakFlux = peak * perAmp;
  const peakFluxNarrowest = (peakFlux * area) / minimumArea;
  const swing = (spectrum.max - spectrum.min) * perAmp;

  // Winding layout.
  const turnsPerLayer = conductor.kind === "foil" ? 1 : Math.floor(windowHeight / height);
  if (turnsPerLayer < 1) {
    throw new InputError(where, "conductor.outerDiameter", height, "m", `≤ core.windowHeight (${windowHeight}) so that one turn fits`);
  }
  const layers = Math.ceil(turns / turnsPerLayer);
  const build = layers * buildPerLayer;
  const windowFill = (turns * (conductor.kind === "foil" ? buildPerLayer * windowHeight : height * height)) / windowArea;
  const windingLength = turns * meanTurn;

  // Flux waveform for the iGSE (the flux follows the current; its mean does not matter to the iGSE).
  const n = wave.time.length;
  const flux = { time: wave.time, fluxDensity: new Float64Array(n) };
  for (let k = 0; k < n; k++) flux.fluxDensity[k] = wave.current[k]! * perAmp;
  const st = material.steinmetz;
  const lossDensity20 = swing > 0 ? igseLoss({ k: st.k, alpha: st.alpha, beta: st.beta, period, flux }) : 0;

  // Losses and temperature, iterated.
  let temperature = ambient;
  let coreLoss = 0;
  let windingLoss = 0;
  let dcResistance = 0;
  let rippleAcFactor = 1;
  let rise = { temperatureRise: 0, surfaceTemperature: ambient, cautions: [] as readonly Caution[], validity: [] as readonly ValidityNote[] };
  const convectionHeight = Math.sqrt(surfaceArea / 6);
  for (let iteration = 0; iteration < 30; iteration++) {
    const rho = rho20 * (1 + ANNEALED_COPPER_TEMPERATURE_COEFFICIENT * (temperature - REFERENCE_TEMPERATURE));
    dcResistance = (rho * windingLength) / copperArea;
    let acPower = 0;
    let acSquares = 0;
    let lastFactor = 1;
    for (let h = 1; h <= HARMONICS; h++) {
      const ih = harmonicRms[h - 1]!;
      if (!(ih > 0)) continue;
      const f = h * frequency;
      let factor: number;
      if (conductor.kind === "round") {
        factor = roundWireWindingAcRatio({ wireDiameter: roundDiameter, frequency: f, resistivity: rho, layers, turnsPerLayer, windingWidth: Math.max(windowHeight, turnsPerLayer * roundDiameter) });
      } else if (conductor.kind === "litz") {
        factor = litzWindingAcRatio({ strands, strandDiameter, turns, windowBreadth: windowHeight, frequency: f, resistivity: rho });
      } else {
        const delta = Math.sqrt(rho / (Math.PI * f * MU_0));
        factor = dowellFactor({ penetrationRatio: foilThickness / delta, layers });
      }
      acPower += factor * ih * ih;
      acSquares += ih * ih;
      lastFactor = factor;
    }
    const acTotal = Math.max(0, spectrum.rms * spectrum.rms - spectrum.average * spectrum.average);
    const rest = Math.max(0, acTotal - acSquares);
    acPower += lastFactor * rest;
    rippleAcFactor = acTotal > 0 ? acPower / acTotal : 1;
    windingLoss = dcResistance * (spectrum.average * spectrum.average + acPower);
    const tempFactor = material.temperatureTerm === undefined ? 1 : steinmetzTemperatureFactor(material.temperatureTerm, temperature);
    coreLoss = lossDensity20 * tempFactor * volume;
    rise = componentTemperatureRise({ power: coreLoss + windingLoss, ambientTemperature: ambient, surfaceArea, height: convectionHeight, emissivity });
    const next = rise.surfaceTemperature;
    if (Math.abs(next - temperature) < 1e-7) {
      temperature = next;
      break;
    }
    temperature = next;
  }

  // Cautions and validity.
  const cautions: Caution[] = [...rise.cautions];
  for (const note of rise.validity) validity.push(note);
  if (peakFluxNarrowest > bsat) {
    cautions.push(caution("core-saturates", "danger", `peak flux density ${peakFluxNarrowest.toFixed(3)} T in the narrowest section exceeds saturation: the inductance collapses and the current rises steeply.`, peakFluxNarrowest, bsat, "T", "material data"));
  } else if (peakFluxNarrowest > ratio * (1 + 1e-12) * bsat) {
    cautions.push(caution("flux-margin", "warning", `peak flux density ${peakFluxNarrowest.toFixed(3)} T in the narrowest section is above ${ratio} of saturation.`, peakFluxNarrowest, ratio * bsat, "T", "common practice"));
  }
  if (windowFill > maxFill || build > windowWidth) {
    cautions.push(caution("window-overfull", "warning", `the winding needs ${(windowFill * 100).toFixed(0)} % of the window (build ${(build * 1e3).toFixed(2)} mm of ${(windowWidth * 1e3).toFixed(2)} mm): it does not fit.`, windowFill, maxFill, "", "common practice"));
  }
  if (gap > 0 && clearance < 3 * gap) {
    cautions.push(caution("gap-fringing-near-winding", "warning", `the winding is ${(clearance * 1e3).toFixed(2)} mm from a ${(gap * 1e3).toFixed(2)} mm gap (less than three gap lengths): the fringing field adds eddy loss in the nearby turns that the one-dimensional winding model does not include; distribute the gap or keep the winding away.`, clearance, 3 * gap, "m", "common practice"));
  }
  if (temperature > maxSurface) {
    cautions.push(caution("winding-hot-spot", "warning", `the surface reaches ${(temperature - 273.15).toFixed(0)} °C; the inside of the winding and the core centre run hotter than the surface.`, temperature, maxSurface, "K", "common practice"));
  }
  if (peakFlux > material.fluxDensityRange.max || frequency < material.frequencyRange.min || frequency > material.frequencyRange.max) {
    validity.push({ code: "outside-material-fit", message: "flux density or frequency outside the range the Steinmetz coefficients were fitted over: the core loss is an extrapolation" });
  }
  if (temperature > material.temperatureRange.max) {
    validity.push({ code: "core-above-fitted-temperature", message: "core temperature above the material's fitted range", value: temperature, limit: material.temperatureRange.max });
  }
  return {
    turns,
    gapLength: gap,
    inductance: magnetic.inductance,
    fringingFactor: magnetic.fringingFactor,
    peakFluxDensity: peakFlux,
    fluxDensitySwing: swing,
    saturationCurrent: magnetic.saturationCurrent ?? bsat / perAmp,
    currentPeak: peak,
    currentRms: spectrum.rms,
    currentAverage: spectrum.average,
    currentRipple: spectrum.max - spectrum.min,
    layers,
    turnsPerLayer,
    windowFill,
    dcResistance,
    rippleAcFactor,
    coreLoss,
    windingLoss,
    totalLoss: coreLoss + windingLoss,
    temperatureRise: temperature - ambient,
    surfaceTemperature: temperature,
    cautions,
    validity,
  };
}

