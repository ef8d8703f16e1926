/**
 * LLC converter design: turns ratio, resonant tank and magnetising inductance from the input
 * range, the output and the resonant frequency, checked at every corner with the exact steady
 * state.
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
import { brentRoot } from "../special/index.js";
import { E12, E24, E96 } from "../tank/e-series.js";
import { llcGainKernel } from "./fha.js";
import { llcOperatingPoint, type LlcOperatingPoint } from "./llc-operating-point.js";

/**
 * Options of {@link llcDesign}.
 *
 * @category Converters
 */
export interface LlcDesignOptions {
  /** DC input voltage range [V]: 0 < min ≤ nominal ≤ max. The converter runs at f_r at the nominal input. */
  readonly inputVoltage: {
    /** Lowest input [V], > 0. */
    readonly min: number;
    /** Nominal input [V] (gain 1, switching at f_r). */
    readonly nominal: number;
    /** Highest input [V]. */
    readonly max: number;
  };
  /** Regulated output voltage [V], > 0. */
  readonly outputVoltage: number;
  /** Full-load output power [W], > 0. */
  readonly outputPower: number;
  /** Resonant frequency f_r of L_r and C_r [Hz], > 0 (kept exactly after the capacitor is picked). */
  readonly resonantFrequency: number;
  /** `"half"` (tank driven with ±V_in/2) or `"full"` (±V_in). */
  readonly bridge: "half" | "full";
  /** L_n = L_m/L_r, 3 ≤ L_n ≤ 10; default 6. */
  readonly inductanceRatio?: number;
  /** Required ratio of the first-harmonic peak gain to the largest gain needed (at the lowest input, full load), 1 ≤ margin ≤ 2; default 1.1. */
  readonly gainMargin?: number;
  /** Light-load corner as a fraction of full power, 0.05 ≤ fraction < 1; default 0.2. */
  readonly lightLoadFraction?: number;
  /** E-series the resonant capacitor is picked from (the nearest value at or above the ideal one); default `"E24"`. */
  readonly capacitorSeries?: "E12" | "E24" | "E96";
  /** Rectifier (sets the diode voltage only): default `"full-bridge"`. */
  readonly rectifier?: "centre-tap" | "full-bridge";
  /** Dead time [s], ≥ 0: with switchCapacitance, the ZVS test at each corner. */
  readonly deadTime?: number;
  /** Output capacitance of one switch [F], ≥ 0. */
  readonly switchCapacitance?: number;
}

/**
 * One corner of the operating range of an {@link llcDesign}.
 *
 * @category Converters
 */
export interface LlcDesignCorner {
  /** Input voltage [V]. */
  readonly inputVoltage: number;
  /** Load as a fraction of full power. */
  readonly loadFraction: number;
  /** Load resistance [Ω]. */
  readonly loadResistance: number;
  /** Gain needed for the output voltage, M = nV_out/V_b. */
  readonly requiredGain: number;
  /** Switching frequency that gives the output voltage [Hz], from the exact steady state (the first-harmonic one when the exact solve did not settle, see `method`). */
  readonly switchingFrequency: number;
  /** f_s/f_r. */
  readonly normalisedFrequency: number;
  /** The first-harmonic estimate of the same frequency [Hz] (null when the FHA gain cannot reach the required gain). */
  readonly switchingFrequencyFirstHarmonic: number | null;
  /** `"exact"` (the piecewise-linear steady state) or `"first-harmonic"` (the exact solve did not settle). */
  readonly method: "exact" | "first-harmonic";
  /** The exact operating point at the switching frequency (null when `method` is "first-harmonic"). */
  readonly operatingPoint: LlcOperatingPoint | null;
  /** Zero-voltage switching at this corner (exact point; the FHA current at turn-off otherwise). */
  readonly zeroVoltageSwitching: boolean;
}

/**
 * The result of {@link llcDesign}.
 *
 * @category Converters
 */
export interface LlcDesign {
  /** Transformer turns ratio n = primary/secondary turns (gain 1 at the nominal input). */
  readonly turnsRatio: number;
  /** Resonant inductance L_r [H] (leakage included). */
  readonly resonantInductance: number;
  /** Resonant capacitance C_r [F], an E-series value. */
  readonly resonantCapacitance: number;
  /** Magnetising inductance L_m [H]. */
  readonly magnetisingInductance: number;
  /** Resonant frequency 1/(2π√(L_rC_r)) [Hz] (equals the requested one). */
  readonly resonantFrequency: number;
  /** L_n = L_m/L_r. */
  readonly inductanceRatio: number;
  /** Full-load Q = √(L_r/C_r)/R_ac with the picked capacitor. */
  readonly qualityFactor: number;
  /** Full-load resistance V_out²/P [Ω]. */
  readonly loadResistance: number;
  /** First-harmonic peak gain at full load over the largest gain needed (≥ the requested margin unless a caution says otherwise). */
  readonly gainMargin: number;
  /** Normalised frequency of the first-harmonic peak gain at full load (the lower edge of the inductive region). */
  readonly peakGainFrequency: number;
  /** Switching-frequency range over all corners [Hz]. */
  readonly frequencyRange: {
    /** Lowest switching frequency [Hz]. */
    readonly min: number;
    /** Highest switching frequency [Hz]. */
    readonly max: number;
  };
  /** Every corner: (min, nominal, max input) × (full, light load). */
  readonly corners: readonly LlcDesignCorner[];
  /** Zero-voltage switching at every corner. */
  readonly zeroVoltageSwitching: boolean;
  /** Hazards and shortfalls (input voltage, capacitor voltage, hard switching, uncovered range). */
  readonly cautions: readonly Caution[];
  /** Notes where the design leaves the domain the exact solver was checked on. */
  readonly validity: readonly ValidityNote[];
}

const KEYS = [
  "inputVoltage", "outputVoltage", "outputPower", "resonantFrequency", "bridge", "inductanceRatio", "gainMargin",
  "lightLoadFraction", "capacitorSeries", "rectifier", "deadTime", "switchCapacitance",
] as const;
const RANGE_KEYS = ["min", "nominal", "max"] as const;
const GOLDEN = (Math.sqrt(5) - 1) / 2;
/** Normalised switching frequency above which a corner gets a caution. */
const FAR_ABOVE = 2;

/** First-harmonic peak gain over f_n in (1/√(1+L_n), 1] at (L_n, Q), and where it lies (golden-section search). */
function llcPeakGain(ln: number, q: number): { gain: number; frequency: number } {
  let a = 1 / Math.sqrt(1 + ln);
  let b = 1;
  let c = b - GOLDEN * (b - a);
  let d = a + GOLDEN * (b - a);
  let gc = llcGainKernel(ln, q, c);
  let gd = llcGainKernel(ln, q, d);
  for (let k = 0; k < 80 && b - a > 1e-12; k++) {
    if (gc > gd) {
      b = d;
      d = c;
      gd = gc;
      c = b - GOLDEN * (b - a);
      gc = llcGainKernel(ln, q, c);
    } else {
      a = c;
      c = d;
      gc = gd;
      d = a + GOLDEN * (b - a);
      gd = llcGainKernel(ln, q, d);
    }
  }
  const frequency = 0.5 * (a + b);
  return { gain: llcGainKernel(ln, q, frequency), frequency };
}

/** The smallest value of the series (×10^k) at or above x. */
function seriesAtOrAbove(x: number, series: readonly number[]): number {
  const decade = Math.pow(10, Math.floor(Math.log10(x)));
  for (const scale of [decade, 10 * decade]) {
    for (const v of series) {
      const value = Number((v * scale).toPrecision(3)); // the series' own digits, without binary residue
      if (value >= x * (1 - 1e-12)) return value;
    }
  }
  return 10 * decade;
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

  const share = bridge === "half" ? 0.5 : 1;
  const n = (share * vNom) / vOut;
  const mMax = vNom / vMin;
  const rLoad = (vOut * vOut) / power;
  const rac = (8 * n * n * rLoad) / (Math.PI * Math.PI);
  const cautions: Caution[] = [];
  const validity: ValidityNote[] = [];

  // the largest Q whose FHA peak gain reaches margin · M_max (peak gain falls as Q rises)
  const needed = margin * mMax;
  let qDesign: number;
  if (llcPeakGain(ln, 1).gain >= needed) {
    qDesign = 1;
  } else {
    let lo = Math.log(1e-4);
    let hi = 0;
    for (let k = 0; k < 100 && hi - lo > 1e-13; k++) {
      const mid = 0.5 * (lo + hi);
      if (llcPeakGain(ln, Math.exp(mid)).gain >= needed) lo = mid;
      else hi = mid;
    }
    qDesign = Math.exp(lo);
  }
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

  const corners: LlcDesignCorner[] = [];
  const uncovered: string[] = [];
  const hard: string[] = [];
  let capacitorPeak = 0;
  for (const fraction of [1, light]) {
    const qCorner = q * fraction;
    const peakCorner = llcPeakGain(ln, qCorner);
    for (const vin of [vMin, vNom, vMax]) {
      const required = (n * vOut) / (share * vin);
      const rCorner = rLoad / fraction;
      const label = `${vin} V, ${Math.round(fraction * 100)} % load`;
      // FHA frequency on the falling (inductive) branch: above its peak the gain falls towards 0
      let fnFha = Infinity;
      if (required <= peakCorner.gain) {
        let b = 1;
        while (llcGainKernel(ln, qCorner, b) > required && b < 1e6) b *= 2;
        if (b < 1e6) fnFha = brentRoot((x) => llcGainKernel(ln, qCorner, x) - required, peakCorner.frequency, b);
      }
      const exact = exactCorner(bridge, vin, n, lr, cr, lm, fr, rCorner, required, fnFha === Infinity ? (required > 1 ? peakCorner.frequency : 1.5) : fnFha, peakCorner.frequency, rectifier, deadTime, switchCapacitance);
      let corner: LlcDesignCorner;
      if (exact !== null) {
        corner = {
          inputVoltage: vin, loadFraction: fraction, loadResistance: rCorner, requiredGain: required,
          switchingFrequency: exact.normalisedFrequency * fr, normalisedFrequency: exact.normalisedFrequency,
          switchingFrequencyFirstHarmonic: fnFha === Infinity ? null : fnFha * fr, method: "exact", operatingPoint: exact,
          zeroVoltageSwitching: exact.zeroVoltageSwitching,
        };
        capacitorPeak = Math.max(capacitorPeak, exact.capacitorVoltagePeak);
      } else if (fnFha < Infinity) {
        const fhaPoint = fhaTurnOff(ln, qCorner, fnFha);
        corner = {
          inputVoltage: vin, loadFraction: fraction, loadResistance: rCorner, requiredGain: required,
          switchingFrequency: fnFha * fr, normalisedFrequency: fnFha, switchingFrequencyFirstHarmonic: fnFha * fr,
          method: "first-harmonic", operatingPoint: null, zeroVoltageSwitching: fhaPoint > 0,
        };
        validity.push({ code: "corner-first-harmonic", message: `At ${label} the exact steady state did not settle on the required gain; the corner uses the first-harmonic frequency (error up to about 16 %).` });
      } else {
        uncovered.push(label);
        continue;
      }
      if (!corner.zeroVoltageSwitching) hard.push(label);
      corners.push(corner);
      const op = corner.operatingPoint;
      if (op !== null && op.validity.length > 0) {
        validity.push({ code: "corner-outside-tested-domain", message: `At ${label} (f_n = ${op.normalisedFrequency.toPrecision(3)}, Q = ${op.qualityFactor.toPrecision(3)}) the exact solver runs outside the domain checked against the time-domain simulation.` });
      }
    }
  }
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
  const dc = voltageCaution({ voltage: vMax, waveform: "dc", location: "converter input" });
  if (dc !== null) cautions.push(dc);
  const ac = voltageCaution({ voltage: capacitorPeak / Math.SQRT2, waveform: "ac", location: "resonant capacitor (AC part, RMS of a sine of the same peak)" });
  if (ac !== null) cautions.push(ac);
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

/** FHA resonant current at the switching instant, normalised (> 0: inductive, helps ZVS). */
function fhaTurnOff(ln: number, q: number, fn: number): number {
  // input impedance (normalised by Z_r): j(fn − 1/fn) + (j fn L_n ∥ 1/q); the current lags the
  // bridge fundamental when the impedance angle is positive, so it is positive at turn-off
  const x = fn * ln;
  const r = 1 / q;
  const d = r * r + x * x;
  const zRe = (r * x * x) / d;
  const zIm = (r * r * x) / d + fn - 1 / fn;
  return zIm / Math.hypot(zRe, zIm);
}

/** The exact corner: the switching frequency whose exact gain equals `required`, or null. */
function exactCorner(
  bridge: "half" | "full", vin: number, n: number, lr: number, cr: number, lm: number, fr: number, rl: number,
  required: number, fnStart: number, fnPeak: number,
  rectifier: "centre-tap" | "full-bridge" | undefined, deadTime: number | undefined, switchCapacitance: number | undefined,
): LlcOperatingPoint | null {
  const point = (fn: number): LlcOperatingPoint | null => {
    try {
      return llcOperatingPoint({
        bridge, inputVoltage: vin, turnsRatio: n, resonantInductance: lr, resonantCapacitance: cr, magnetisingInductance: lm,
        switchingFrequency: fn * fr, loadResistance: rl,
        ...(rectifier === undefined ? {} : { rectifier }),
        ...(deadTime === undefined ? {} : { deadTime }),
        ...(switchCapacitance === undefined ? {} : { switchCapacitance }),
      });
    } catch (e) {
      if (e instanceof InputError) return null; // no settled steady state at this frequency
      throw e;
    }
  };
  const excess = (fn: number): number => {
    const p = point(fn);
    return p === null ? NaN : p.gain - required;
  };
  // bracket on the falling branch: gain above the required one at the lower end
  let lo = Math.max(fnStart / 1.15, fnPeak * 1.0001);
  let hi = fnStart * 1.15;
  let flo = excess(lo);
  let fhi = excess(hi);
  for (let k = 0; k < 12 && !(flo > 0); k++) {
    const next = Math.max(fnPeak * 1.0001, lo / 1.1);
    if (next >= lo) break;
    hi = lo;
    fhi = flo;
    lo = next;
    flo = excess(lo);
  }
  for (let k = 0; k < 12 && !(fhi < 0); k++) {
    lo = hi;
    flo = fhi;
    hi *= 1.25;
    fhi = excess(hi);
  }
  if (!(flo > 0) || !(fhi < 0)) return null;
  let failed = false;
  const root = brentRoot((fn) => {
    const e = excess(fn);
    if (Number.isNaN(e)) {
      failed = true;
      return 0;
    }
    return e;
  }, lo, hi, { tolerance: 1e-13 });
  if (failed) return null;
  const result = point(root);
  if (result === null || !(Math.abs(result.gain - required) <= 1e-9 * required)) return null;
  return result;
}
