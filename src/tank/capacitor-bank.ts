/**
 * A capacitor bank of identical standard-value units in a series/parallel array.
 *
 * @packageDocumentation
 */
import { InputError, requireInRange, requireInteger, requireKnownKeys, requireObject, requirePositive, type ValidityNote } from "../core/index.js";
import { E12, E24, E96 } from "./e-series.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const BANK_FIELDS: readonly string[] = Object.freeze(["capacitance", "voltageRms", "currentRms", "frequency", "series", "unitVoltageRmsRating", "unitCurrentRmsRating", "unitReactivePowerRating", "tolerance", "maxUnits", "minUnitCapacitance", "maxUnitCapacitance"]);

/**
 * Options of {@link capacitorBank}.
 *
 * @category Capacitor banks
 */
export interface CapacitorBankOptions {
  /** Target bank capacitance [F], > 0. */
  readonly capacitance: number;
  /** RMS voltage across the bank [V], > 0. */
  readonly voltageRms: number;
  /** RMS current through the bank [A], > 0. */
  readonly currentRms: number;
  /** Operating frequency [Hz], > 0 (the current the achieved bank draws at `voltageRms` is also checked). */
  readonly frequency: number;
  /** Standard series of unit values: `"E12"`, `"E24"`, `"E96"`, or an array of mantissas in [1, 10) such as {@link E24}. */
  readonly series: "E12" | "E24" | "E96" | readonly number[];
  /**
   * RMS voltage rating of one unit at the operating frequency [V], > 0. Optional: without it no
   * voltage limit is applied (one unit per string unless the tolerance needs more); check
   * `unitVoltageRms` of the result against the part you buy.
   */
  readonly unitVoltageRmsRating?: number;
  /** RMS current rating of one unit at the operating frequency [A], > 0. Optional, as the voltage rating. */
  readonly unitCurrentRmsRating?: number;
  /** Optional reactive-power rating of one unit [var], > 0. */
  readonly unitReactivePowerRating?: number;
  /** Accepted relative capacitance error, in (0, 0.5] (default 0.05). */
  readonly tolerance?: number;
  /** Largest number of units considered, integer ≥ 1 (default 64). */
  readonly maxUnits?: number;
  /** Smallest unit capacitance on offer [F] (default 1 nF). */
  readonly minUnitCapacitance?: number;
  /** Largest unit capacitance on offer [F] (default 100 µF). */
  readonly maxUnitCapacitance?: number;
}

/**
 * A chosen capacitor bank ({@link capacitorBank}): `parallelCount` strings, each of `seriesCount`
 * identical units of `unitCapacitance`.
 *
 * @category Capacitor banks
 */
export interface CapacitorBank {
  /** Capacitance of one unit, a standard value [F]. */
  readonly unitCapacitance: number;
  /** Units in series in each string. */
  readonly seriesCount: number;
  /** Strings in parallel. */
  readonly parallelCount: number;
  /** Total number of units. */
  readonly unitCount: number;
  /** Achieved bank capacitance, unitCapacitance × parallelCount / seriesCount [F]. */
  readonly capacitance: number;
  /** Relative error of the achieved capacitance, achieved / target − 1. */
  readonly capacitanceError: number;
  /** Whether |capacitanceError| ≤ tolerance. */
  readonly withinTolerance: boolean;
  /** RMS voltage across each unit (equal sharing of identical units) [V]. */
  readonly unitVoltageRms: number;
  /** RMS current through each unit [A] (the larger of the given current and the achieved bank's current at voltageRms, shared by the strings). */
  readonly unitCurrentRms: number;
  /** Reactive power per unit, unitVoltageRms × unitCurrentRms [var]. */
  readonly unitReactivePower: number;
  /** Reactive power of the bank, voltageRms × bank current [var]. */
  readonly reactivePower: number;
  /** Notes: no array within tolerance, unequal voltage sharing through unit tolerance. */
  readonly validity: readonly ValidityNote[];
}

function resolveSeries(where: string, series: unknown): readonly number[] {
  if (series === "E12") return E12;
  if (series === "E24") return E24;
  if (series === "E96") return E96;
  if (Array.isArray(series) && series.length > 0 && series.every((m) => typeof m === "number" && m >= 1 && m < 10)) {
    return [...(series as number[])].sort((a, b) => a - b);
  }
  throw new InputError(where, "series", series, "", `"E12", "E24", "E96" or a non-empty array of mantissas in [1, 10)`);
}

/** A mantissa times a power of ten, rounded to 12 significant digits (6.8 × 1e-7 → 6.8e-7 exactly). */
function standardValue(mantissa: number, decade: number): number {
  return Number((mantissa * Math.pow(10, decade)).toPrecision(12));
}

/**
 * The standard value nearest (in ratio) to `ideal` among those in [lo, hi]; 0 when none lies
 * there. `mantissas` is sorted ascending in [1, 10).
 */
function nearestStandard(mantissas: readonly number[], ideal: number, lo: number, hi: number): number {
  const target = Math.min(Math.max(ideal, lo), hi);
  let decade = Math.floor(Math.log10(target));
  let m = target / Math.pow(10, decade);
  if (m >= 10) {
    m /= 10;
    decade += 1;
  } else if (m < 1) {
    m *= 10;
    decade -= 1;
  }
  // Neighbours: largest mantissa ≤ m and smallest ≥ m (wrapping into the next decades).
  let k = 0;
  while (k < mantissas.length && (mantissas[k] as number) <= m) k++;
  const below = k > 0 ? standardValue(mantissas[k - 1] as number, decade) : standardValue(mantissas[mantissas.length - 1] as number, decade - 1);
  const above = k < mantissas.length ? standardValue(mantissas[k] as number, decade) : standardValue(mantissas[0] as number, decade + 1);
  const inRange = (v: number): boolean => v >= lo * (1 - 1e-12) && v <= hi * (1 + 1e-12);
  const okBelow = inRange(below);
  const okAbove = inRange(above);
  if (okBelow && okAbove) return Math.abs(Math.log(below / ideal)) <= Math.abs(Math.log(above / ideal)) ? below : above;
  if (okBelow) return below;
  if (okAbove) return above;
  return 0;
}

/**
 * Chooses a capacitor bank of identical standard-value units (IEC 60063 E12/E24/E96) arranged
 * as $p$ parallel strings of $s$ units in series, so that
 *
 * $$
 * C_\mathrm{bank} = \frac{p}{s}\,C_\mathrm{unit},\qquad \frac{V}{s} \le V_\mathrm{unit},\qquad
 * \frac{\max(I,\ \omega C_\mathrm{bank}V)}{p} \le I_\mathrm{unit}
 * $$
 *
 * (and $V I/(sp) \le Q_\mathrm{unit}$ when a var rating is given). Among the arrays within the
 * tolerance it takes the one with the fewest units, then the smallest error; when none is within
 * tolerance it returns the closest array with `withinTolerance: false` and a validity note.
 * Identical units share voltage and current equally; mixed values would not.
 *
 * @param options - see {@link CapacitorBankOptions}
 * @returns the {@link CapacitorBank} (F, V, A, var)
 * @throws {@link InputError} when a value is out of its domain, or when no standard value lies in
 * [minUnitCapacitance, maxUnitCapacitance] for any array up to maxUnits that meets the ratings.
 * Validity: ideal capacitors; unit tolerance makes series units share voltage unequally (noted).
 * Accuracy: exact arithmetic on the chosen array; the search is exhaustive over arrays with
 * s·p ≤ maxUnits.
 * @see IEC 60063:2015, Preferred number series for resistors and capacitors (E-series values).
 * @example
 * ```ts
 * import { capacitorBank } from "fluxwright";
 * const bank = capacitorBank({ capacitance: 2e-6, voltageRms: 600, currentRms: 300, frequency: 40e3, series: "E12", unitVoltageRmsRating: 400, unitCurrentRmsRating: 60 });
 * console.log(bank.seriesCount, bank.parallelCount, bank.unitCapacitance); // 2 6 6.8e-7
 * console.log(bank.withinTolerance); // true
 * ```
 * @category Capacitor banks
 */
export function capacitorBank(options: CapacitorBankOptions): CapacitorBank {
  const where = "capacitorBank";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, BANK_FIELDS);
  const target = requirePositive(where, "capacitance", options.capacitance, "F");
  const voltage = requirePositive(where, "voltageRms", options.voltageRms, "V");
  const current = requirePositive(where, "currentRms", options.currentRms, "A");
  const frequency = requirePositive(where, "frequency", options.frequency, "Hz");
  const mantissas = resolveSeries(where, options.series);
  const unitV =
    options.unitVoltageRmsRating === undefined ? Infinity : requirePositive(where, "unitVoltageRmsRating", options.unitVoltageRmsRating, "V");
  const unitI =
    options.unitCurrentRmsRating === undefined ? Infinity : requirePositive(where, "unitCurrentRmsRating", options.unitCurrentRmsRating, "A");
  const unitQ =
    options.unitReactivePowerRating === undefined
      ? Infinity
      : requirePositive(where, "unitReactivePowerRating", options.unitReactivePowerRating, "var");
  const tolerance = options.tolerance === undefined ? 0.05 : requireInRange(where, "tolerance", options.tolerance, "", 0, 0.5, "(]");
  const maxUnits = options.maxUnits === undefined ? 64 : requireInteger(where, "maxUnits", options.maxUnits, 1);
  const lo = options.minUnitCapacitance === undefined ? 1e-9 : requirePositive(where, "minUnitCapacitance", options.minUnitCapacitance, "F");
  const hi = options.maxUnitCapacitance === undefined ? 1e-4 : requirePositive(where, "maxUnitCapacitance", options.maxUnitCapacitance, "F");
  if (hi < lo) throw new InputError(where, "maxUnitCapacitance", hi, "F", `a finite number ≥ minUnitCapacitance (${lo})`);
  const omega = 2 * Math.PI * frequency;
  const sMin = Math.max(1, Math.ceil(voltage / unitV - 1e-12));

  let best: { s: number; p: number; unit: number; error: number; count: number; within: boolean } | null = null;
  const pMin = Math.max(1, Math.ceil(current / unitI - 1e-12));
  for (let s = sMin; s * pMin <= maxUnits; s++) {
    // Once an array within tolerance is known, larger arrays cannot win.
    if (best !== null && best.within && s * pMin > best.count) break;
    for (let p = pMin; s * p <= maxUnits; p++) {
      if (best !== null && best.within && s * p > best.count) break;
      const unit = nearestStandard(mantissas, (target * s) / p, lo, hi);
      if (unit === 0) continue;
      const achieved = (unit * p) / s;
      const bankCurrent = Math.max(current, omega * achieved * voltage);
      if (bankCurrent / p > unitI * (1 + 1e-12)) continue;
      if ((voltage / s) * (bankCurrent / p) > unitQ * (1 + 1e-12)) continue;
      const error = achieved / target - 1;
      const within = Math.abs(error) <= tolerance;
      const count = s * p;
      const better =
        best === null ||
        (within && !best.within) ||
        (within === best.within &&
          (within
            ? count < best.count || (count === best.count && Math.abs(error) < Math.abs(best.error))
            : Math.abs(error) < Math.abs(best.error) || (Math.abs(error) === Math.abs(best.error) && count < best.count)));
      if (better) best = { s, p, unit, error, count, within };
    }
  }
  if (best === null) {
    throw new InputError(where, "maxUnits", maxUnits, "", "large enough for an array that meets the unit ratings with a standard value in range");
  }
  const achieved = Number(((best.unit * best.p) / best.s).toPrecision(15));
  const bankCurrent = Math.max(current, omega * achieved * voltage);
  const unitVoltageRms = voltage / best.s;
  const unitCurrentRms = bankCurrent / best.p;
  const validity: ValidityNote[] = [];
  if (!best.within) {
    validity.push({
      code: "bank-outside-tolerance",
      message: "No array of at most maxUnits identical standard units meets the tolerance; this is the closest one.",
      value: Math.abs(best.error),
      limit: tolerance,
    });
  }
  if (best.s > 1) {
    validity.push({
      code: "series-voltage-sharing",
      message: "Units in series share voltage in inverse proportion to their actual capacitance: with ±t unit tolerance one unit can see up to about (1 + t)/(1 − t) times its nominal share; keep rating margin or match units.",
    });
  }
  return {
    unitCapacitance: best.unit,
    seriesCount: best.s,
    parallelCount: best.p,
    unitCount: best.count,
    capacitance: achieved,
    capacitanceError: best.error,
    withinTolerance: best.within,
    unitVoltageRms,
    unitCurrentRms,
    unitReactivePower: unitVoltageRms * unitCurrentRms,
    reactivePower: voltage * bankCurrent,
    validity,
  };
}
