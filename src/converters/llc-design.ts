/**
 * LLC converter design: turns ratio, resonant tank and magnetising inductance from the input
 * range, the output and the resonant frequency, checked at every corner with the exact steady
 * state. The types are in `llc-design-types.ts`, the corner solves in `llc-design-corners.ts`.
 *
 * @packageDocumentation
 */
import {
  DEFER_TO_CODES,
  InputError,
  requireInRange,
  requireKnownKeys,
  requireNonNegative,
  requireObject,
  requireOneOf,
  requirePositive,
  voltageCaution,
  type Caution,
  type ValidityNote,
} from "../core/index.js";
import { E12, E24, E96 } from "../tank/e-series.js";
import { llcPeakGain, seriesAtOrAbove, solveCorner, type CornerDesign } from "./llc-design-corners.js";
import type { LlcDesign, LlcDesignCorner, LlcDesignOptions } from "./llc-design-types.js";

export type { LlcDesign, LlcDesignCorner, LlcDesignOptions } from "./llc-design-types.js";

const KEYS = [
  "inputVoltage", "outputVoltage", "outputPower", "resonantFrequency", "bridge", "inductanceRatio", "gainMargin",
  "lightLoadFraction", "capacitorSeries", "rectifier", "deadTime", "switchCapacitance",
] as const;
const RANGE_KEYS = ["min", "nominal", "max"] as const;
/** Normalised switching frequency above which a corner gets a caution. */
const FAR_ABOVE = 2;

/** The checked options of {@link llcDesign}, defaults filled in. */
interface DesignInput {
  readonly vMin: number;
  readonly vNom: number;
  readonly vMax: number;
  readonly vOut: number;
  readonly power: number;
  readonly fr: number;
  readonly bridge: "half" | "full";
  readonly ln: number;
  readonly margin: number;
  readonly light: number;
  readonly seriesName: "E12" | "E24" | "E96";
  readonly rectifier: "centre-tap" | "full-bridge" | undefined;
  readonly deadTime: number | undefined;
  readonly switchCapacitance: number | undefined;
}

/** Reads and checks the options of {@link llcDesign} (each check throws {@link InputError}). */
function readDesignOptions(options: LlcDesignOptions): DesignInput {
  const where = "llcDesign";
  requireObject(where, "options", options);
  requireKnownKeys(where, "options", options, KEYS);
  requireObject(where, "inputVoltage", options.inputVoltage);
  requireKnownKeys(where, "inputVoltage", options.inputVoltage, RANGE_KEYS);
  const vMin = requirePositive(where, "inputVoltage.min", options.inputVoltage.min, "V");
  const vNom = requirePositive(where, "inputVoltage.nominal", options.inputVoltage.nominal, "V");
  const vMax = requirePositive(where, "inputVoltage.max", options.inputVoltage.max, "V");
  if (!(vMin <= vNom)) throw new InputError(where, "inputVoltage.min", vMin, "V", `at most inputVoltage.nominal (${vNom})`);
  if (!(vNom <= vMax)) throw new InputError(where, "inputVoltage.max", vMax, "V", `at least inputVoltage.nominal (${vNom})`);
  const vOut = requirePositive(where, "outputVoltage", options.outputVoltage, "V");
  const power = requirePositive(where, "outputPower", options.outputPower, "W");
  const fr = requirePositive(where, "resonantFrequency", options.resonantFrequency, "Hz");
  const bridge = requireOneOf(where, "bridge", options.bridge, ["half", "full"] as const);
  const ln = options.inductanceRatio === undefined ? 6 : requireInRange(where, "inductanceRatio", options.inductanceRatio, "", 3, 10);
  const margin = options.gainMargin === undefined ? 1.1 : requireInRange(where, "gainMargin", options.gainMargin, "", 1, 2);
  const light = options.lightLoadFraction === undefined ? 0.2 : requireInRange(where, "lightLoadFraction", options.lightLoadFraction, "", 0.05, 1, "[)");
  const seriesName = options.capacitorSeries === undefined ? "E24" : requireOneOf(where, "capacitorSeries", options.capacitorSeries, ["E12", "E24", "E96"] as const);
  const rectifier = options.rectifier === undefined ? undefined : requireOneOf(where, "rectifier", options.rectifier, ["centre-tap", "full-bridge"] as const);
  const deadTime = options.deadTime === undefined ? undefined : requireNonNegative(where, "deadTime", options.deadTime, "s");
  const switchCapacitance = options.switchCapacitance === undefined ? undefined : requireNonNegative(where, "switchCapacitance", options.switchCapacitance, "F");
  return { vMin, vNom, vMax, vOut, power, fr, bridge, ln, margin, light, seriesName, rectifier, deadTime, switchCapacitance };
}

/** The largest full-load Q whose first-harmonic peak gain reaches `needed` (the peak gain falls as Q rises), at most 1. */
function designQuality(ln: number, needed: number): number {
  if (llcPeakGain(ln, 1).gain >= needed) return 1;
  let lo = Math.log(1e-4);
  let hi = 0;
  for (let k = 0; k < 100 && hi - lo > 1e-13; k++) {
    const mid = 0.5 * (lo + hi);
    if (llcPeakGain(ln, Math.exp(mid)).gain >= needed) lo = mid;
    else hi = mid;
  }
  return Math.exp(lo);
}

/** The design-level cautions: margin, uncovered corners, far-above-resonance frequency, hard switching, voltages. */
function designCautions(
  input: DesignInput, gainMargin: number, corners: readonly LlcDesignCorner[], uncovered: readonly string[], hard: readonly string[], capacitorPeak: number,
): Caution[] {
  const margin = input.margin;
  const cautions: Caution[] = [];
  if (gainMargin < margin * (1 - 1e-9)) {
    cautions.push({
      code: "gain-margin-short", severity: "warning",
      message: `The first-harmonic gain margin is ${gainMargin.toFixed(3)}, below the requested ${margin}: even at Q = 1 the peak gain does not reach it.`,
      value: gainMargin, limit: margin, unit: "", source: "common practice (LLC design keeps a peak-gain margin of about 10 % over the lowest-input gain)",
    });
  }
  if (uncovered.length > 0) {
    cautions.push({
      code: "range-not-covered", severity: "warning",
      message: `The output voltage cannot be regulated at ${uncovered.join("; ")}: the gain needed lies above the tank's peak gain, or so far below 1 that no settled steady state was found. Widen the input range assumptions, lower L_n or the quality factor, or add burst mode at light load.`,
      value: uncovered.length, limit: 0, unit: "", source: "first-harmonic gain limits of the LLC converter (Steigerwald 1988; from memory)",
    });
  }
  let fnHighest = 0;
  for (const c of corners) fnHighest = Math.max(fnHighest, c.normalisedFrequency);
  if (fnHighest > FAR_ABOVE) {
    cautions.push({
      code: "frequency-far-above-resonance", severity: "warning",
      message: `Regulating the highest-input corners needs f_s = ${fnHighest.toPrecision(3)} f_r: switching and magnetic losses grow with frequency and the ideal model's error with them. Narrow the input range, lower L_n, or use burst mode at light load.`,
      value: fnHighest, limit: FAR_ABOVE, unit: "", source: "common practice (LLC converters are usually kept within about twice the resonant frequency; from memory)",
    });
  }
  if (hard.length > 0) {
    cautions.push({
      code: "hard-switching", severity: "warning",
      message: `The switches turn on hard at ${hard.join("; ")}. Hard switching heats the switches and, with the reverse recovery of their body diodes, can destroy them. Lower L_m (a smaller L_n) to raise the magnetising current. ${DEFER_TO_CODES}`,
      value: hard.length, limit: 0, unit: "", source: "common practice (resonant converters are run with inductive current at turn-off)",
    });
  }
  const dc = voltageCaution({ voltage: input.vMax, waveform: "dc", location: "converter input" });
  if (dc !== null) cautions.push(dc);
  const ac = voltageCaution({ voltage: capacitorPeak / Math.SQRT2, waveform: "ac", location: "resonant capacitor (AC part, RMS of a sine of the same peak)" });
  if (ac !== null) cautions.push(ac);
  return cautions;
}

/**
 * Designs an LLC resonant converter for an input range: the turns ratio puts the nominal input
 * at resonance ($n = V_{b,\mathrm{nom}}/V_\mathrm{out}$, $V_b = V_\mathrm{in}/2$ half bridge, $V_\mathrm{in}$ full
 * bridge); the largest gain needed is $M_\mathrm{max} = V_{b,\mathrm{nom}}/V_{b,\mathrm{min}}$; the full-load
 * quality factor is the largest for which the first-harmonic peak gain
 * $$ \max_{f_n<1} M(f_n) \;\text{ with }\; M = \Big[\big(1 + \tfrac{1}{L_n} - \tfrac{1}{L_nf_n^2}\big)^2 + Q^2\big(f_n - \tfrac{1}{f_n}\big)^2\Big]^{-1/2} $$
 * reaches $\text{margin}\cdot M_\mathrm{max}$; then $Z_r = QR_\mathrm{ac}$ ($R_\mathrm{ac} = 8n^2R/\pi^2$),
 * $C_r$ is the E-series value at or above $1/(2\pi f_rZ_r)$, $L_r = 1/((2\pi f_r)^2C_r)$ (so $f_r$
 * stays) and $L_m = L_nL_r$. Each corner — minimum, nominal and maximum input at full and at
 * light load — is then solved for the switching frequency that gives the output voltage with
 * the exact piecewise-linear steady state ({@link llcOperatingPoint}), starting from the
 * first-harmonic estimate, and checked for zero-voltage switching.
 *
 * @param options - {@link LlcDesignOptions} (V, W, Hz, s, F)
 * @returns the {@link LlcDesign} (H, F, Hz, Ω)
 * @throws {@link InputError} for non-finite or out-of-range values, min > nominal or
 *   nominal > max, an unknown option key or option value
 * @remarks Accuracy: at every corner solved `"exact"`, the output voltage of the ideal circuit
 * with the returned components at the returned switching frequency is the requested one to
 * 1e-6 relative, checked against an independent time-domain simulation (scipy,
 * test/fixtures/converters/llc-design.json, full-load corners of two designs). The gain margin
 * is a first-harmonic figure: the exact peak gain of the ideal circuit differs from it (FHA
 * error up to 16 % at f_n = 0.8, see {@link llcGain}), so keep the margin ≥ 1.1. Validity:
 * ideal components (no losses, no diode drop: add the diode drop to the output voltage for a
 * first estimate); the light-load corner at fractions below about 0.2 may leave the solver's
 * tested domain (Q < 0.15), which `validity` reports.
 * @see R. L. Steigerwald, IEEE Trans. Power Electron. 3(2), 174–182 (1988) (FHA);
 *   B. Yang, F. C. Lee, A. J. Zhang, G. Huang, APEC 2002 (LLC design at resonance for the
 *   nominal input; from memory).
 * @example
 * ```ts
 * import { llcDesign } from "fluxwright";
 * const design = llcDesign({
 *   inputVoltage: { min: 340, nominal: 390, max: 410 }, outputVoltage: 19.5, outputPower: 65,
 *   resonantFrequency: 100e3, bridge: "half",
 * });
 * console.log(design.turnsRatio.toFixed(3)); // 10.000
 * console.log(design.resonantCapacitance); // 8.2e-9
 * console.log(design.zeroVoltageSwitching); // true
 * ```
 * @category Converters
 */
export function llcDesign(options: LlcDesignOptions): LlcDesign {
  const input = readDesignOptions(options);
  const { vMin, vNom, vMax, vOut, power, fr, bridge, ln, margin, light, seriesName } = input;
  const share = bridge === "half" ? 0.5 : 1;
  const n = (share * vNom) / vOut;
  const mMax = vNom / vMin;
  const rLoad = (vOut * vOut) / power;
  const rac = (8 * n * n * rLoad) / (Math.PI * Math.PI);
  const validity: ValidityNote[] = [];

  const qDesign = designQuality(ln, margin * mMax);
  const omega = 2 * Math.PI * fr;
  const crIdeal = 1 / (omega * qDesign * rac);
  const series = seriesName === "E12" ? E12 : seriesName === "E96" ? E96 : E24;
  const cr = seriesAtOrAbove(crIdeal, series);
  const lr = 1 / (omega * omega * cr);
  const lm = ln * lr;
  const zr = Math.sqrt(lr / cr);
  const q = zr / rac;
  const peak = llcPeakGain(ln, q);
  const gainMargin = peak.gain / mMax;

  const design: CornerDesign = { bridge, n, lr, cr, lm, fr, ln, vOut, share, rectifier: input.rectifier, deadTime: input.deadTime, switchCapacitance: input.switchCapacitance };
  const corners: LlcDesignCorner[] = [];
  const uncovered: string[] = [];
  const hard: string[] = [];
  let capacitorPeak = 0;
  for (const fraction of [1, light]) {
    const qCorner = q * fraction;
    const peakCorner = llcPeakGain(ln, qCorner);
    for (const vin of [vMin, vNom, vMax]) {
      const label = `${vin} V, ${Math.round(fraction * 100)} % load`;
      const corner = solveCorner(design, vin, fraction, rLoad, qCorner, peakCorner, label, validity);
      if (corner === null) {
        uncovered.push(label);
        continue;
      }
      const op = corner.operatingPoint;
      if (op !== null) capacitorPeak = Math.max(capacitorPeak, op.capacitorVoltagePeak);
      if (!corner.zeroVoltageSwitching) hard.push(label);
      corners.push(corner);
      if (op !== null && op.validity.length > 0) {
        validity.push({ code: "corner-outside-tested-domain", message: `At ${label} (f_n = ${op.normalisedFrequency.toPrecision(3)}, Q = ${op.qualityFactor.toPrecision(3)}) the exact solver runs outside the domain checked against the time-domain simulation.` });
      }
    }
  }
  const cautions = designCautions(input, gainMargin, corners, uncovered, hard, capacitorPeak);
  let fMin = Infinity;
  let fMax = 0;
  let zvs = corners.length === 6;
  for (const c of corners) {
    fMin = Math.min(fMin, c.switchingFrequency);
    fMax = Math.max(fMax, c.switchingFrequency);
    zvs = zvs && c.zeroVoltageSwitching;
  }
  return {
    turnsRatio: n,
    resonantInductance: lr,
    resonantCapacitance: cr,
    magnetisingInductance: lm,
    resonantFrequency: 1 / (2 * Math.PI * Math.sqrt(lr * cr)),
    inductanceRatio: ln,
    qualityFactor: q,
    loadResistance: rLoad,
    gainMargin,
    peakGainFrequency: peak.frequency,
    frequencyRange: corners.length > 0 ? { min: fMin, max: fMax } : { min: 0, max: 0 },
    corners,
    zeroVoltageSwitching: zvs,
    cautions,
    validity,
  };
}
