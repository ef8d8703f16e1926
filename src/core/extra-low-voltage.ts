/**
 * The extra-low-voltage limits of IEC 61140 and the caution for a voltage above them. It lives
 * in `core` because several modules (tank, safety, study) raise the same caution, with one code.
 *
 * @packageDocumentation
 */
import { DEFER_TO_CODES } from "./caution.js";
import type { Caution } from "./caution.js";
import { InputError } from "./input-error.js";
import { requireFinite, requireObject, requireOneOf, requireKnownKeys } from "./validate.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const VOLTAGE_CAUTION_FIELDS: readonly string[] = Object.freeze(["voltage", "waveform", "location"]);

/**
 * Extra-low-voltage limits of IEC 61140 [V]: 50 V AC (RMS) and 120 V ripple-free DC.
 *
 * @see IEC 61140:2016, Protection against electric shock — Common aspects for installation and
 *   equipment (extra-low voltage: voltage band I of IEC 60449; clause numbers not quoted, the
 *   limits are the well-known ones).
 * @example
 * ```ts
 * import { EXTRA_LOW_VOLTAGE_LIMITS } from "fluxwright";
 * console.log(EXTRA_LOW_VOLTAGE_LIMITS.acRms, EXTRA_LOW_VOLTAGE_LIMITS.rippleFreeDc); // 50 120
 * ```
 * @category Cautions
 */
export const EXTRA_LOW_VOLTAGE_LIMITS: {
  /** AC limit, RMS [V]. */
  readonly acRms: 50;
  /** Ripple-free DC limit [V]. */
  readonly rippleFreeDc: 120;
} = Object.freeze({
  acRms: 50,
  rippleFreeDc: 120,
});

/**
 * Options of {@link voltageCaution}.
 *
 * @category Cautions
 */
export interface VoltageCautionOptions {
  /** The voltage [V]: the RMS value for `"ac"`, the value for `"dc"`; its magnitude is used. */
  readonly voltage: number;
  /** `"ac"` (compared with 50 V RMS) or `"dc"` (ripple-free DC, compared with 120 V). */
  readonly waveform: "ac" | "dc";
  /** What carries the voltage, for the message, e.g. `"tank capacitor"` (default `"circuit"`). */
  readonly location?: string;
}

/**
 * A caution when a voltage exceeds the extra-low-voltage limit of IEC 61140 (50 V AC RMS,
 * 120 V ripple-free DC): touching such parts can drive a dangerous current through the body.
 * Code `"voltage-above-extra-low"`, severity `"danger"`; `null` at or below the limit.
 *
 * Hard domain (throws {@link InputError}): non-finite voltage; unknown waveform.
 *
 * @param options - voltage, waveform and where it appears
 * @returns the caution, or `null`
 * @throws {@link InputError} on bad input
 * @see IEC 61140:2016 (extra-low voltage limits); {@link EXTRA_LOW_VOLTAGE_LIMITS}.
 * @example
 * ```ts
 * import { voltageCaution } from "fluxwright";
 * console.log(voltageCaution({ voltage: 230, waveform: "ac", location: "tank" })?.code); // voltage-above-extra-low
 * console.log(voltageCaution({ voltage: 24, waveform: "dc" })); // null
 * ```
 * @category Cautions
 */
export function voltageCaution(options: VoltageCautionOptions): Caution | null {
  const where = "voltageCaution";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, VOLTAGE_CAUTION_FIELDS);
  const v = Math.abs(requireFinite(where, "voltage", options.voltage, "V"));
  const waveform = requireOneOf(where, "waveform", options.waveform, ["ac", "dc"] as const);
  const location = optionalText(where, "location", options.location, "circuit");
  return extraLowVoltageCaution(v, waveform, location);
}

/** The constant end of a caution's message after the voltage (built once, not per caution). */
function messageEnd(kind: string, limit: number): string {
  return ` ${kind}, above the extra-low-voltage limit of ${limit} ${kind}: contact can cause a dangerous electric shock. Enclose live parts, discharge capacitors before touching, and use insulated tools. ${DEFER_TO_CODES}`;
}
const AC_MESSAGE_END = messageEnd("V AC (RMS)", EXTRA_LOW_VOLTAGE_LIMITS.acRms);
const DC_MESSAGE_END = messageEnd("V DC", EXTRA_LOW_VOLTAGE_LIMITS.rippleFreeDc);

/**
 * The caution of {@link voltageCaution} on checked arguments (|v| in volts, a known waveform):
 * for library code that has validated its own numbers. Internal: not re-exported from the
 * package root.
 *
 * @param v - the voltage magnitude [V] (RMS for "ac")
 * @param waveform - "ac" or "dc"
 * @param location - what carries the voltage, for the message
 * @returns the caution, or `null` at or below the limit
 */
export function extraLowVoltageCaution(v: number, waveform: "ac" | "dc", location: string): Caution | null {
  const limit = waveform === "ac" ? EXTRA_LOW_VOLTAGE_LIMITS.acRms : EXTRA_LOW_VOLTAGE_LIMITS.rippleFreeDc;
  if (!(v > limit)) return null;
  return cautionAbove(v, limit, voltageMessageStart(location), waveform === "ac" ? AC_MESSAGE_END : DC_MESSAGE_END);
}

/** The caution object for a voltage above `limit`: the one place its fields are written. */
function cautionAbove(v: number, limit: number, start: string, end: string): Caution {
  return {
    code: "voltage-above-extra-low",
    severity: "danger",
    message: start + round(v) + end,
    value: v,
    limit,
    unit: "V",
    source: ELV_SOURCE,
  };
}

/** The source of the extra-low-voltage caution. */
const ELV_SOURCE = "IEC 61140:2016, extra-low voltage limits (50 V AC RMS, 120 V ripple-free DC; voltage band I of IEC 60449)";

/**
 * The start of the message of {@link extraLowVoltageCaution} for a location, up to the voltage
 * ("The tank capacitor reaches "): library code with fixed locations makes it once and passes it
 * to {@link acVoltageCautionAbove}. Internal.
 */
export function voltageMessageStart(location: string): string {
  return "The " + location + " reaches ";
}

/**
 * The AC caution of {@link extraLowVoltageCaution} for a voltage already known to be above
 * 50 V RMS, with the message start made once by {@link voltageMessageStart}: the same caution,
 * one concatenation and no comparison fewer per call. Internal.
 *
 * @param v - the RMS voltage [V], > 50
 * @param start - {@link voltageMessageStart} of the location
 */
export function acVoltageCautionAbove(v: number, start: string): Caution {
  return cautionAbove(v, EXTRA_LOW_VOLTAGE_LIMITS.acRms, start, AC_MESSAGE_END);
}

/** An optional text option, or the fallback when it is absent. */
function optionalText(where: string, parameter: string, value: unknown, fallback: string): string {
  if (value === undefined) return fallback;
  if (typeof value !== "string") throw new InputError(where, parameter, value, "", "a string");
  return value;
}

/** Powers of ten 10^k for k = −3 … 5 (index k + 3), exact doubles for k ≥ 0. */
const SCALE = [1e-3, 1e-2, 1e-1, 1, 10, 100, 1000, 1e4, 1e5];

/** Texts of {@link digitText}, by (k + 3) × 900 + (n − 100), filled on first use. */
const DIGIT_TEXTS: (string | undefined)[] = new Array<string | undefined>(9 * 900).fill(undefined);

/** The digits of n (100 ≤ n ≤ 999) with k decimals (−3 ≤ k ≤ 5), trailing zeros dropped (as the shortest number text does). */
function digitText(n: number, k: number): string {
  if (k <= 0) return String(n * (SCALE[3 - k] ?? 1));
  let digits = n;
  let decimals = k;
  while (decimals > 0 && digits % 10 === 0) {
    digits /= 10;
    decimals--;
  }
  if (decimals === 0) return String(digits);
  const unit = SCALE[decimals + 3] ?? 1;
  const whole = Math.floor(digits / unit);
  const fraction = String(digits - whole * unit);
  return String(whole) + "." + "00000".slice(0, decimals - fraction.length) + fraction;
}

/**
 * Three significant digits, plain notation where sensible: the same text as
 * `String(Number(value.toPrecision(3)))` for 1e-3 ≤ |value| < 1e6 (else `toPrecision(3)`),
 * without the two number–text conversions unless the value lies within 1e-6 of a rounding tie
 * (where the exact decimal rounding of toPrecision decides).
 */
function round(value: number): string {
  if (value === 0) return "0";
  const a = Math.abs(value);
  if (!(a >= 1e-3 && a < 1e6)) return value.toPrecision(3);
  // decimal exponent by comparisons (a log10 costs more than the rest); a wrong guess at an
  // inexact boundary such as 0.1 only sends the value to the toPrecision path below
  const exponent = a >= 100 ? (a >= 1e4 ? (a >= 1e5 ? 5 : 4) : a >= 1000 ? 3 : 2) : a >= 1 ? (a >= 10 ? 1 : 0) : a >= 0.1 ? -1 : a >= 0.01 ? -2 : -3;
  const k = 2 - exponent;
  if (k >= -3 && k <= 5) {
    const scaled = k >= 0 ? a * (SCALE[k + 3] ?? 1) : a / (SCALE[3 - k] ?? 1);
    const n = Math.round(scaled);
    if (n >= 100 && n <= 999 && Math.abs(scaled - Math.floor(scaled) - 0.5) > 1e-6) {
      // the text of (n, k) is made once and kept: at most 9 × 900 short strings
      const slot = (k + 3) * 900 + (n - 100);
      let text = DIGIT_TEXTS[slot];
      if (text === undefined) {
        text = digitText(n, k);
        DIGIT_TEXTS[slot] = text;
      }
      return value < 0 ? "-" + text : text;
    }
  }
  return String(Number(value.toPrecision(3)));
}
