/**
 * The pieces of {@link llcDesign} that work on one design: the first-harmonic peak gain, the
 * capacitor picked from the E-series, and each corner of the input and load range solved for its
 * switching frequency (exact steady state, the first harmonic where that does not settle).
 * Internal.
 *
 * @packageDocumentation
 */
import { InputError, type ValidityNote } from "../core/index.js";
import { brentRoot } from "../special/index.js";
import { llcGainKernel } from "./fha.js";
import { llcOperatingPoint, type LlcOperatingPoint } from "./llc-operating-point.js";
import type { LlcDesignCorner } from "./llc-design-types.js";

const GOLDEN = (Math.sqrt(5) - 1) / 2;
/** First-harmonic peak gain over f_n in (1/√(1+L_n), 1] at (L_n, Q), and where it lies (golden-section search). */
export function llcPeakGain(ln: number, q: number): { gain: number; frequency: number } {
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
export function seriesAtOrAbove(x: number, series: readonly number[]): number {
  const decade = Math.pow(10, Math.floor(Math.log10(x)));
  for (const scale of [decade, 10 * decade]) {
    for (const v of series) {
      const value = Number((v * scale).toPrecision(3)); // the series' own digits, without binary residue
      if (value >= x * (1 - 1e-12)) return value;
    }
  }
  return 10 * decade;
}

/** What a corner's solve needs from the design (the components and the options that reach the operating point). */
export interface CornerDesign {
  readonly bridge: "half" | "full";
  readonly n: number;
  readonly lr: number;
  readonly cr: number;
  readonly lm: number;
  readonly fr: number;
  readonly ln: number;
  readonly vOut: number;
  readonly share: number;
  readonly rectifier: "centre-tap" | "full-bridge" | undefined;
  readonly deadTime: number | undefined;
  readonly switchCapacitance: number | undefined;
}

/**
 * One corner (input `vin`, load `fraction` of full load at quality factor `qCorner`, whose
 * first-harmonic peak is `peakCorner`): the exact switching frequency for the required gain,
 * else the first-harmonic one (with a validity note), else null (the range is not covered).
 * Adds the corner's validity notes to `validity`.
 */
export function solveCorner(
  design: CornerDesign, vin: number, fraction: number, rLoad: number, qCorner: number,
  peakCorner: { gain: number; frequency: number }, label: string, validity: ValidityNote[],
): LlcDesignCorner | null {
  const { bridge, n, lr, cr, lm, fr, ln, vOut, share, rectifier, deadTime, switchCapacitance } = design;
  const required = (n * vOut) / (share * vin);
  const rCorner = rLoad / fraction;
  // FHA frequency on the falling (inductive) branch: above its peak the gain falls towards 0
  let fnFha = Infinity;
  if (required <= peakCorner.gain) {
    let b = 1;
    while (llcGainKernel(ln, qCorner, b) > required && b < 1e6) b *= 2;
    if (b < 1e6) fnFha = brentRoot((x) => llcGainKernel(ln, qCorner, x) - required, peakCorner.frequency, b);
  }
  const exact = exactCorner(bridge, vin, n, lr, cr, lm, fr, rCorner, required, fnFha === Infinity ? (required > 1 ? peakCorner.frequency : 1.5) : fnFha, peakCorner.frequency, rectifier, deadTime, switchCapacitance);
  if (exact !== null) {
    return {
      inputVoltage: vin, loadFraction: fraction, loadResistance: rCorner, requiredGain: required,
      switchingFrequency: exact.normalisedFrequency * fr, normalisedFrequency: exact.normalisedFrequency,
      switchingFrequencyFirstHarmonic: fnFha === Infinity ? null : fnFha * fr, method: "exact", operatingPoint: exact,
      zeroVoltageSwitching: exact.zeroVoltageSwitching,
    };
  }
  if (fnFha < Infinity) {
    const fhaPoint = fhaTurnOff(ln, qCorner, fnFha);
    validity.push({ code: "corner-first-harmonic", message: `At ${label} the exact steady state did not settle on the required gain; the corner uses the first-harmonic frequency (error up to about 16 %).` });
    return {
      inputVoltage: vin, loadFraction: fraction, loadResistance: rCorner, requiredGain: required,
      switchingFrequency: fnFha * fr, normalisedFrequency: fnFha, switchingFrequencyFirstHarmonic: fnFha * fr,
      method: "first-harmonic", operatingPoint: null, zeroVoltageSwitching: fhaPoint > 0,
    };
  }
  return null;
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
