/**
 * The hot-surface caution: contact-burn thresholds of bare metal against contact time, and the
 * caution for a surface above them.
 *
 * @packageDocumentation
 */
import { DEFER_TO_CODES, requireKnownKeys, requireObject, requirePositive } from "../core/index.js";
import type { Caution } from "../core/index.js";
import { ZERO_CELSIUS } from "../units/index.js";
import { optionalText, round } from "./caution-text.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const SURFACE_FIELDS: readonly string[] = Object.freeze(["temperature", "contactTime", "location"]);

/**
 * Contact-burn thresholds for bare (uncoated) metal surfaces against contact time, as points
 * (contact time [s], surface temperature [°C]): 1 s: 65 °C (the lower edge of the 65–70 °C
 * band), 1 min: 51 °C, 10 min: 48 °C, 8 h: 43 °C from the burn-threshold table of EN 563:1994
 * (the predecessor of EN ISO 13732-1), as reproduced in DGUV Vorschrift 79 (BG BAU), §12;
 * 10 s: 55 °C read off the standard's figure (unverified, listed in
 * docs/unverified-values.md). Between points the threshold is interpolated linearly in the
 * logarithm of time.
 */
const BURN_THRESHOLDS: readonly (readonly [number, number])[] = [
  [1, 65],
  [10, 55],
  [60, 51],
  [600, 48],
  [28800, 43],
];

/**
 * The contact-burn threshold of a bare metal surface [K] for a contact time: the surface
 * temperature at which touching it for that long starts to burn the skin.
 *
 * Points for uncoated metals: 1 s: 65 °C (lower edge of the 65–70 °C band), 1 min: 51 °C,
 * 10 min: 48 °C, 8 h: 43 °C (EN 563:1994 table, the predecessor of ISO 13732-1); 10 s:
 * 55 °C read off the standard's figure (unverified); linear in log(time) between them; held
 * at the end values outside 1 s … 8 h. A secondary table attributed to ISO 13732-1 gives the
 * same 51/48/43 °C but 62–65 °C at 1 s for metal: the 1 s value may sit up to 3 °C high
 * against the current standard (see docs/unverified-values.md).
 *
 * Hard domain (throws {@link InputError}): contact time ≤ 0 or non-finite.
 *
 * @param contactTime - duration of skin contact [s], > 0
 * @returns threshold surface temperature [K]
 * @throws {@link InputError} on bad input
 * @see EN 563:1994, Safety of machinery — Temperatures of touchable surfaces, table of burn
 *   thresholds (uncoated metals: 1 s 65–70 °C, 1 min 51 °C, 10 min 48 °C, 8 h 43 °C), as
 *   reproduced in DGUV Vorschrift 79 (BG BAU), §12; its successor ISO 13732-1:2006,
 *   Ergonomics of the thermal environment — Part 1: Hot surfaces (the current reference).
 * @example
 * ```ts
 * import { contactBurnThreshold } from "fluxwright";
 * console.log(contactBurnThreshold(60)); // ≈ 324.15
 * ```
 * @category Cautions
 */
export function contactBurnThreshold(contactTime: number): number {
  const t = requirePositive("contactBurnThreshold", "contactTime", contactTime, "s");
  const first = BURN_THRESHOLDS[0]!;
  const last = BURN_THRESHOLDS[BURN_THRESHOLDS.length - 1]!;
  if (t <= first[0]) return first[1] + ZERO_CELSIUS;
  if (t >= last[0]) return last[1] + ZERO_CELSIUS;
  for (let i = 1; i < BURN_THRESHOLDS.length; i++) {
    const [t1, c1] = BURN_THRESHOLDS[i]!;
    if (t <= t1) {
      const [t0, c0] = BURN_THRESHOLDS[i - 1]!;
      const w = Math.log(t / t0) / Math.log(t1 / t0);
      return c0 + w * (c1 - c0) + ZERO_CELSIUS;
    }
  }
  return last[1] + ZERO_CELSIUS;
}

/**
 * Options of {@link surfaceTemperatureCaution}.
 *
 * @category Cautions
 */
export interface SurfaceTemperatureCautionOptions {
  /** Surface temperature of the part, coil or enclosure [K], > 0. */
  readonly temperature: number;
  /** Contact time to assess [s], > 0 (default 1 s: a brief, accidental touch). */
  readonly contactTime?: number;
  /** What is hot, for the message (default `"part"`). */
  readonly location?: string;
}

/**
 * A caution when a surface is hot enough to burn on contact (ISO 13732-1 thresholds for bare
 * metal, see {@link contactBurnThreshold}):
 * - `"hot-surface-burn"`, `"danger"`: above the 1 s threshold (65 °C): even a brief touch burns;
 * - `"hot-surface-contact"`, `"warning"`: above the threshold for the given `contactTime` only;
 * - `null` otherwise.
 *
 * Hard domain (throws {@link InputError}): temperature or contact time ≤ 0 or non-finite.
 *
 * @param options - temperature, contact time and location
 * @returns the caution, or `null`
 * @throws {@link InputError} on bad input
 * @see EN 563:1994 / ISO 13732-1:2006 burn thresholds, via {@link contactBurnThreshold}.
 * @example
 * ```ts
 * import { surfaceTemperatureCaution, celsius } from "fluxwright";
 * console.log(surfaceTemperatureCaution({ temperature: celsius(200) })?.code); // hot-surface-burn
 * ```
 * @category Cautions
 */
export function surfaceTemperatureCaution(options: SurfaceTemperatureCautionOptions): Caution | null {
  const where = "surfaceTemperatureCaution";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, SURFACE_FIELDS);
  const temperature = requirePositive(where, "temperature", options.temperature, "K");
  const contactTime =
    options.contactTime === undefined ? 1 : requirePositive(where, "contactTime", options.contactTime, "s");
  const location = optionalText(where, "location", options.location, "part");
  const brief = contactBurnThreshold(1);
  const celsiusText = `${round(temperature - ZERO_CELSIUS)} °C`;
  if (temperature > brief) {
    return {
      code: "hot-surface-burn",
      severity: "danger",
      message: `The ${location} reaches ${celsiusText}, above the ${round(brief - ZERO_CELSIUS)} °C at which a one-second touch of bare metal burns the skin. Guard it, mark it hot, and handle it with tools or heat-resistant gloves until it has cooled. ${DEFER_TO_CODES}`,
      value: temperature,
      limit: brief,
      unit: "K",
      source: "EN 563:1994 burn threshold of uncoated metal for 1 s contact, lower edge of 65–70 °C (predecessor of ISO 13732-1:2006)",
    };
  }
  const threshold = contactBurnThreshold(contactTime);
  if (temperature > threshold) {
    return {
      code: "hot-surface-contact",
      severity: "warning",
      message: `The ${location} reaches ${celsiusText}, above the ${round(threshold - ZERO_CELSIUS)} °C at which ${round(contactTime)} s of contact with bare metal burns the skin. Keep contact short or guard the surface. ${DEFER_TO_CODES}`,
      value: temperature,
      limit: threshold,
      unit: "K",
      source: `EN 563:1994 / ISO 13732-1:2006 burn threshold of uncoated metal for ${round(contactTime)} s contact (1 min 51 °C, 10 min 48 °C, 8 h 43 °C from the table; 10 s 55 °C from the figure, unverified)`,
    };
  }
  return null;
}
