/**
 * Wire gauges: American Wire Gauge by its defining formula (ASTM B258) and the metric nominal
 * conductor cross-sections of IEC 60228.
 *
 * @packageDocumentation
 */
import { InputError } from "../core/input-error.js";
import { requireInRange, requirePositive } from "../core/validate.js";
import type { Metres, SquareMetres } from "./quantities.js";

/** Diameter of AWG 36 [m]: 0.005 in exactly. */
const AWG36_DIAMETER = 0.005 * 0.0254;
/** Ratio of the 0000 diameter (0.46 in) to the 36 diameter (0.005 in): 92, spread over 39 steps. */
const LN_92 = Math.log(92);
/** Smallest and largest gauge numbers accepted (0000 = −3). */
const AWG_MIN = -3;
const AWG_MAX = 56;

/** Gauge names with zeros ("0000", "4/0", "000", "3/0", ...) → gauge number. */
function gaugeNumber(gauge: number | string): number {
  if (typeof gauge === "number") return gauge;
  if (typeof gauge === "string") {
    const t = gauge.trim();
    if (/^0{1,4}$/u.test(t)) return 1 - t.length;
    const slash = /^([1-4])\/0$/u.exec(t);
    if (slash !== null) return 1 - Number(slash[1]);
    if (/^[+-]?(0|[1-9]\d*)(\.\d+)?$/u.test(t)) return Number(t);
  }
  throw new InputError("awgToDiameter", "gauge", gauge, "", 'a gauge number (e.g. 24, 10.5, -3) or a name such as "0000" or "4/0"');
}

/**
 * Diameter of a solid round conductor of the given American Wire Gauge.
 *
 * $$
 * d(n) = 0.005\,\mathrm{in} \times 92^{(36 - n)/39}
 * $$
 *
 * This is the defining relation of the gauge (the 0000 gauge is 0.4600 in, the 36 gauge
 * 0.0050 in, with 39 gauges in geometric progression between them), so fractional gauges are
 * meaningful. Gauges 0000, 000, 00 and 0 are the numbers −3, −2, −1 and 0; they are also
 * accepted as the strings `"0000"`/`"4/0"`, `"000"`/`"3/0"`, `"00"`/`"2/0"` and `"0"`/`"1/0"`.
 *
 * @param gauge - AWG number, −3 … 56 (fractional allowed), or a zero-gauge name
 * @returns diameter [m]
 * @throws {@link InputError} when the gauge is outside −3 … 56 or not a gauge
 * @remarks Accuracy: exact formula; the standard's tables round it to 0.1 mil (0.0001 in).
 * @see ASTM B258, Standard Specification for Standard Nominal Diameters and Cross-Sectional
 *   Areas of AWG Sizes of Solid Round Wires Used as Electrical Conductors, §4 (definition).
 * @example
 * ```ts
 * import { awgToDiameter } from "fluxwright";
 * console.log((awgToDiameter(24) * 1000).toFixed(4)); // 0.5106
 * console.log((awgToDiameter("0000") / 0.0254).toFixed(4)); // 0.4600
 * ```
 * @category Wire gauges
 */
export function awgToDiameter(gauge: number | string): Metres {
  const n = requireInRange("awgToDiameter", "gauge", gaugeNumber(gauge), "", AWG_MIN, AWG_MAX);
  return (AWG36_DIAMETER * Math.exp(((36 - n) / 39) * LN_92)) as Metres;
}

/**
 * The American Wire Gauge number (fractional) of a solid round conductor of the given
 * diameter: the inverse of {@link awgToDiameter},
 * $n = 36 - 39 \log_{92}(d / 0.005\,\mathrm{in})$.
 *
 * @param diameter - conductor diameter [m], between the 56 gauge (≈ 12.4 µm) and the
 *   0000 gauge (11.684 mm) inclusive
 * @returns the gauge number (0000 = −3); round it yourself to pick a stock size
 * @throws {@link InputError} when the diameter is not positive or outside the gauge range
 * @remarks Accuracy: round trip with {@link awgToDiameter} within 1e-12 absolute in gauge.
 * @see ASTM B258, §4.
 * @example
 * ```ts
 * import { diameterToAwg } from "fluxwright";
 * console.log(diameterToAwg(0.00051054).toFixed(2)); // 24.00
 * ```
 * @category Wire gauges
 */
export function diameterToAwg(diameter: number): number {
  requirePositive("diameterToAwg", "diameter", diameter, "m");
  const n = 36 - (39 * Math.log(diameter / AWG36_DIAMETER)) / LN_92;
  if (n < AWG_MIN - 1e-9 || n > AWG_MAX + 1e-9) {
    throw new InputError("diameterToAwg", "diameter", diameter, "m", "a diameter between AWG 56 (1.24e-5) and AWG 0000 (0.011684)");
  }
  return n;
}

/**
 * The nominal cross-sections of conductors in IEC 60228 [m²], from 0.5 mm² to 2500 mm²
 * (the series used for cables and building wire).
 *
 * @see IEC 60228:2004, Conductors of insulated cables, Tables 1–4 (nominal cross-sectional areas).
 *   0.5 … 1200 mm² checked against the standard's class 1 and class 2 tables as reproduced by
 *   cable makers (e.g. KabelMetal Indonesia, "Conductor specification according to IEC 60228",
 *   Tables A.1 and A.2); 1400 … 2500 mm² not checked (listed in docs/unverified-values.md).
 * @example
 * ```ts
 * import { METRIC_CROSS_SECTIONS } from "fluxwright";
 * console.log(METRIC_CROSS_SECTIONS[0]); // 5e-7
 * ```
 * @category Wire gauges
 */
export const METRIC_CROSS_SECTIONS: readonly SquareMetres[] = Object.freeze(
  [0.5, 0.75, 1, 1.5, 2.5, 4, 6, 10, 16, 25, 35, 50, 70, 95, 120, 150, 185, 240, 300, 400, 500, 630, 800, 1000, 1200, 1400, 1600, 1800, 2000, 2500]
    .map((mm2) => (mm2 / 1e6) as SquareMetres),
);

/**
 * The smallest IEC 60228 nominal cross-section at least as large as `area`.
 *
 * @param area - required conductor cross-section [m²], > 0 and ≤ 2500 mm²
 * @returns the nominal cross-section [m²]
 * @throws {@link InputError} when the area is not positive or above the largest size
 * @see IEC 60228:2004, Tables 1–4.
 * @example
 * ```ts
 * import { nextMetricCrossSection } from "fluxwright";
 * console.log(nextMetricCrossSection(2e-6)); // 0.0000025
 * ```
 * @category Wire gauges
 */
export function nextMetricCrossSection(area: number): SquareMetres {
  requirePositive("nextMetricCrossSection", "area", area, "m²");
  for (const s of METRIC_CROSS_SECTIONS) if (s >= area * (1 - 1e-12)) return s;
  throw new InputError("nextMetricCrossSection", "area", area, "m²", "a cross-section ≤ 0.0025");
}

/**
 * Diameter of a solid round conductor of the given cross-section: $d = \sqrt{4A/\pi}$.
 *
 * @param area - cross-section [m²], > 0
 * @returns diameter [m]
 * @throws {@link InputError} when the area is not positive and finite
 * @remarks Exact up to rounding. Stranded conductors of IEC 60228 are larger than this.
 * @example
 * ```ts
 * import { crossSectionToDiameter } from "fluxwright";
 * console.log((crossSectionToDiameter(1.5e-6) * 1000).toFixed(3)); // 1.382
 * ```
 * @category Wire gauges
 */
export function crossSectionToDiameter(area: number): Metres {
  return Math.sqrt((4 * requirePositive("crossSectionToDiameter", "area", area, "m²")) / Math.PI) as Metres;
}

/**
 * Cross-section of a solid round conductor of the given diameter: $A = \pi d^2 / 4$.
 *
 * @param diameter - diameter [m], > 0
 * @returns cross-section [m²]
 * @throws {@link InputError} when the diameter is not positive and finite
 * @example
 * ```ts
 * import { diameterToCrossSection } from "fluxwright";
 * console.log(diameterToCrossSection(0.002).toPrecision(6)); // 0.00000314159
 * ```
 * @category Wire gauges
 */
export function diameterToCrossSection(diameter: number): SquareMetres {
  const d = requirePositive("diameterToCrossSection", "diameter", diameter, "m");
  return ((Math.PI * d * d) / 4) as SquareMetres;
}
