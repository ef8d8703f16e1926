/**
 * An inductor from its specification and a core: turns, gap, flux, core loss from the real
 * current waveform (iGSE), winding loss with the harmonics of the current (Dowell / litz),
 * temperature rise and cautions. The types live in `inductor-design-types.ts`, the current
 * waveform in `inductor-current.ts`, the winding conductor in `inductor-winding.ts`.
 *
 * @packageDocumentation
 */
import {
  requireInRange,
  requireInteger,
  requireKnownKeys,
  requireNonNegative,
  requireObject,
  requireOneOf,
  requirePositive,
  InputError,
} from "../core/index.js";
import type { Caution, ValidityNote } from "../core/index.js";
import { DEFER_TO_CODES } from "../core/index.js";
import { igseLoss, steinmetzTemperatureFactor } from "../coreloss/index.js";
import type { CoreMaterial } from "../materials/index.js";
import { MU_0, toCelsius } from "../units/index.js";
import { gapLengthForInductance, gappedInductor } from "./gapped-inductor.js";
import type { GappedCore } from "./gapped-inductor.js";
import { currentSpectrum, HARMONICS, readCurrent } from "./inductor-current.js";
import type { CurrentSummary, Waveform } from "./inductor-current.js";
import type { InductorDesign, InductorDesignOptions } from "./inductor-design-types.js";
import { conductorResistivity, harmonicAcFactor, readConductor } from "./inductor-winding.js";
import type { WindingConductor } from "./inductor-winding.js";
import { componentTemperatureRise } from "./temperature-rise.js";

export type { InductorDesignOptions, InductorDesign, TriangularCurrent, SampledCurrent, InductorConductor } from "./inductor-design-types.js";

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
const CORE_FIELDS: readonly string[] = Object.freeze([
  "c1", "c2", "effectiveArea", "effectivePathLength", "effectiveVolume", "minimumArea", "windowArea", "windowHeight",
  "windowWidth", "meanTurnLength", "surfaceArea", "legArea", "legShape", "legWidth", "legDepth",
]);

/** The checked numbers of an inductor specification, before the conductor and the gap. */
interface Specification {
  readonly inductance: number;
  readonly frequency: number;
  readonly period: number;
  readonly ambient: number;
  readonly wave: Waveform;
  readonly area: number;
  readonly volume: number;
  readonly windowArea: number;
  readonly windowHeight: number;
  readonly windowWidth: number;
  readonly meanTurn: number;
  readonly surfaceArea: number;
  readonly minimumArea: number;
  readonly material: CoreMaterial;
  readonly mur: number;
  readonly bsat: number;
  readonly fringing: "none" | "mclyman" | "muhlethaler";
  readonly ratio: number;
  readonly maxFill: number;
  readonly clearance: number;
  readonly emissivity: number;
  readonly maxSurface: number;
}

/** Reads and checks the options other than the conductor, in the order the errors are reported. */
function readSpecification(where: string, options: InductorDesignOptions): Specification {
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
  return {
    inductance, frequency, period, ambient, wave, area, volume, windowArea, windowHeight, windowWidth, meanTurn, surfaceArea, minimumArea,
    material, mur, bsat, fringing, ratio, maxFill, clearance, emissivity, maxSurface,
  };
}

/** Turns, gap and the resulting magnetic circuit. */
interface MagneticDesign {
  readonly turns: number;
  readonly gap: number;
  readonly magnetic: ReturnType<typeof gappedInductor>;
  /** Flux density per ampere of winding current [T/A]. */
  readonly perAmp: number;
}

/**
 * The core of the gap model, the turns (given, or the fewest for the flux limit and the
 * inductance) and the gap that gives the inductance; validity notes are appended to `validity`.
 */
function turnsAndGap(where: string, options: InductorDesignOptions, spec: Specification, peak: number, validity: ValidityNote[]): MagneticDesign {
  const { inductance, area, mur, bsat, windowHeight, ratio, minimumArea, fringing } = spec;
  const core = options.core;
  const gapCore: GappedCore = {
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
  if (ungapped > inductance) {
    gap = gapLengthForInductance({ core: gapCore, turns, inductance, fringing });
  } else {
    validity.push({ code: "no-gap-needed", message: `the ungapped core gives only ${ungapped.toExponential(3)} H with ${turns} turns; no gap`, value: ungapped, limit: inductance });
  }
  const magnetic = gappedInductor({ core: gapCore, turns, gapLength: gap, fringing, current: peak });
  for (const note of magnetic.validity) validity.push(note);
  const totalReluctance = magnetic.coreReluctance + magnetic.gapReluctance;
  const perAmp = turns / (totalReluctance * area); // T per A
  return { turns, gap, magnetic, perAmp };
}

/** Losses and surface temperature once they agree. */
interface ThermalState {
  temperature: number;
  coreLoss: number;
  windingLoss: number;
  dcResistance: number;
  rippleAcFactor: number;
  rise: { temperatureRise: number; surfaceTemperature: number; cautions: readonly Caution[]; validity: readonly ValidityNote[] };
}

/**
 * Iterates losses and surface temperature to agreement: the copper resistivity and the
 * Steinmetz temperature term follow the surface temperature (at most 30 rounds, to 1e-7 K).
 */
function lossesAndTemperature(
  spec: Specification,
  conductor: WindingConductor,
  layout: { readonly turns: number; readonly layers: number; readonly turnsPerLayer: number; readonly windingLength: number },
  spectrum: CurrentSummary,
  harmonicRms: Float64Array,
  lossDensity20: number,
): ThermalState {
  const { ambient, frequency, material, volume, surfaceArea, emissivity } = spec;
  const state: ThermalState = {
    temperature: ambient, coreLoss: 0, windingLoss: 0, dcResistance: 0, rippleAcFactor: 1,
    rise: { temperatureRise: 0, surfaceTemperature: ambient, cautions: [] as readonly Caution[], validity: [] as readonly ValidityNote[] },
  };
  const convectionHeight = Math.sqrt(surfaceArea / 6);
  for (let iteration = 0; iteration < 30; iteration++) {
    const rho = conductorResistivity(conductor, state.temperature);
    state.dcResistance = (rho * layout.windingLength) / conductor.copperArea;
    let acPower = 0;
    let acSquares = 0;
    let lastFactor = 1;
    for (let h = 1; h <= HARMONICS; h++) {
      const ih = harmonicRms[h - 1]!;
      if (!(ih > 0)) continue;
      const factor = harmonicAcFactor(conductor, layout, spec.windowHeight, h * frequency, rho);
      acPower += factor * ih * ih;
      acSquares += ih * ih;
      lastFactor = factor;
    }
    const acTotal = Math.max(0, spectrum.rms * spectrum.rms - spectrum.average * spectrum.average);
    const rest = Math.max(0, acTotal - acSquares);
    acPower += lastFactor * rest;
    state.rippleAcFactor = acTotal > 0 ? acPower / acTotal : 1;
    state.windingLoss = state.dcResistance * (spectrum.average * spectrum.average + acPower);
    const tempFactor = material.temperatureTerm === undefined ? 1 : steinmetzTemperatureFactor(material.temperatureTerm, state.temperature);
    state.coreLoss = lossDensity20 * tempFactor * volume;
    state.rise = componentTemperatureRise({ power: state.coreLoss + state.windingLoss, ambientTemperature: ambient, surfaceArea, height: convectionHeight, emissivity });
    const next = state.rise.surfaceTemperature;
    if (Math.abs(next - state.temperature) < 1e-7) {
      state.temperature = next;
      break;
    }
    state.temperature = next;
  }
  return state;
}

function caution(code: string, severity: Caution["severity"], message: string, value: number, limit: number, unit: string, source: string): Caution {
  return { code, severity, message: `${message} ${DEFER_TO_CODES}`, value, limit, unit, source };
}

/** Saturation, window, fringing and hot-spot cautions; material-fit notes appended to `validity`. */
function designCautions(
  spec: Specification,
  design: { readonly peakFlux: number; readonly peakFluxNarrowest: number; readonly windowFill: number; readonly build: number; readonly gap: number; readonly temperature: number },
  validity: ValidityNote[],
): Caution[] {
  const { bsat, ratio, maxFill, windowWidth, clearance, maxSurface, material, frequency } = spec;
  const { peakFlux, peakFluxNarrowest, windowFill, build, gap, temperature } = design;
  const cautions: Caution[] = [];
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
    cautions.push(caution("winding-hot-spot", "warning", `the surface reaches ${toCelsius(temperature).toFixed(0)} °C; the inside of the winding and the core centre run hotter than the surface.`, temperature, maxSurface, "K", "common practice"));
  }
  if (peakFlux > material.fluxDensityRange.max || frequency < material.frequencyRange.min || frequency > material.frequencyRange.max) {
    validity.push({ code: "outside-material-fit", message: "flux density or frequency outside the range the Steinmetz coefficients were fitted over: the core loss is an extrapolation" });
  }
  if (temperature > material.temperatureRange.max) {
    validity.push({ code: "core-above-fitted-temperature", message: "core temperature above the material's fitted range", value: temperature, limit: material.temperatureRange.max });
  }
  return cautions;
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
  const spec = readSpecification(where, options);
  const conductor = readConductor(where, options.conductor, spec.windowHeight);

  // Current.
  const harmonicRms = new Float64Array(HARMONICS);
  const spectrum = currentSpectrum(spec.wave, harmonicRms);
  const peak = Math.max(Math.abs(spectrum.max), Math.abs(spectrum.min));
  if (!(peak > 0)) throw new InputError(where, "current", options.current, "A", "a waveform that is not zero everywhere");

  // Turns and gap.
  const validity: ValidityNote[] = [];
  const { turns, gap, magnetic, perAmp } = turnsAndGap(where, options, spec, peak, validity);
  const peakFlux = peak * perAmp;
  const peakFluxNarrowest = (peakFlux * spec.area) / spec.minimumArea;
  const swing = (spectrum.max - spectrum.min) * perAmp;

  // Winding layout.
  const { windowHeight } = spec;
  const turnsPerLayer = conductor.kind === "foil" ? 1 : Math.floor(windowHeight / conductor.height);
  if (turnsPerLayer < 1) {
    throw new InputError(where, "conductor.outerDiameter", conductor.height, "m", `≤ core.windowHeight (${windowHeight}) so that one turn fits`);
  }
  const layers = Math.ceil(turns / turnsPerLayer);
  const build = layers * conductor.buildPerLayer;
  const windowFill = (turns * (conductor.kind === "foil" ? conductor.buildPerLayer * windowHeight : conductor.height * conductor.height)) / spec.windowArea;
  const windingLength = turns * spec.meanTurn;

  // Flux waveform for the iGSE (the flux follows the current; its mean does not matter to the iGSE).
  const { wave, material, period, ambient } = spec;
  const n = wave.time.length;
  const flux = { time: wave.time, fluxDensity: new Float64Array(n) };
  for (let k = 0; k < n; k++) flux.fluxDensity[k] = wave.current[k]! * perAmp;
  const st = material.steinmetz;
  const lossDensity20 = swing > 0 ? igseLoss({ k: st.k, alpha: st.alpha, beta: st.beta, period, flux }) : 0;

  // Losses and temperature, iterated.
  const thermal = lossesAndTemperature(spec, conductor, { turns, layers, turnsPerLayer, windingLength }, spectrum, harmonicRms, lossDensity20);
  const { temperature, coreLoss, windingLoss, rise } = thermal;

  // Cautions and validity.
  const cautions: Caution[] = [...rise.cautions];
  for (const note of rise.validity) validity.push(note);
  cautions.push(...designCautions(spec, { peakFlux, peakFluxNarrowest, windowFill, build, gap, temperature }, validity));
  return {
    turns,
    gapLength: gap,
    inductance: magnetic.inductance,
    fringingFactor: magnetic.fringingFactor,
    peakFluxDensity: peakFlux,
    fluxDensitySwing: swing,
    saturationCurrent: magnetic.saturationCurrent ?? spec.bsat / perAmp,
    currentPeak: peak,
    currentRms: spectrum.rms,
    currentAverage: spectrum.average,
    currentRipple: spectrum.max - spectrum.min,
    layers,
    turnsPerLayer,
    windowFill,
    dcResistance: thermal.dcResistance,
    rippleAcFactor: thermal.rippleAcFactor,
    coreLoss,
    windingLoss,
    totalLoss: coreLoss + windingLoss,
    temperatureRise: temperature - ambient,
    surfaceTemperature: temperature,
    cautions,
    validity,
  };
}
