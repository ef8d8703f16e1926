/**
 * Caution generators: turn a design's numbers (tank voltage, stored capacitor energy, surface
 * temperature, operating frequency, field at a person) into {@link Caution} records.
 *
 * @packageDocumentation
 */
import { DEFER_TO_CODES, InputError, requireFinite, requireInRange, requireKnownKeys, requireObject, requirePositive } from "../core/index.js";
import type { Caution } from "../core/index.js";
import { bySeverity } from "../core/caution.js";
import { voltageCaution } from "../core/extra-low-voltage.js";
// The extra-low-voltage caution is shared with the tank module, so it lives in core; this
// module re-exports it as part of the safety inventory.
export { EXTRA_LOW_VOLTAGE_LIMITS, voltageCaution } from "../core/extra-low-voltage.js";
export type { VoltageCautionOptions } from "../core/extra-low-voltage.js";
export { storedEnergyCaution } from "./stored-energy-caution.js";
export type { StoredEnergyCautionOptions } from "./stored-energy-caution.js";
export { contactBurnThreshold, surfaceTemperatureCaution } from "./surface-temperature-caution.js";
export type { SurfaceTemperatureCautionOptions } from "./surface-temperature-caution.js";
import { storedEnergyCaution } from "./stored-energy-caution.js";
import { surfaceTemperatureCaution } from "./surface-temperature-caution.js";
import { formatTesla, qty, round } from "./caution-text.js";
import { exposureCheck } from "./exposure.js";
import type { ExposurePopulation } from "./exposure.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const SAFETY_FIELDS: readonly string[] = Object.freeze(["tankVoltageRms", "supplyVoltageDc", "capacitance", "capacitorVoltagePeak", "surfaceTemperature", "contactTime", "frequency", "fluxDensityRms", "population"]);

/** Accepted fields (misspelt ones are rejected, not ignored). */
const EXPOSURE_CAUTION_FIELDS: readonly string[] = Object.freeze(["fluxDensityRms", "frequency", "population"]);


/** Upper limit of human hearing used for the audible-frequency caution [Hz] (common practice). */
const AUDIBLE_LIMIT = 20000;

/**
 * A caution when a converter runs at an audible frequency (below 20 kHz, common practice):
 * coils, capacitors and the part itself whistle or hum, and at heater power levels the sound can
 * be loud. Code `"audible-frequency"`, severity `"warning"`; `null` at or above 20 kHz.
 *
 * Hard domain (throws {@link InputError}): frequency ≤ 0 or non-finite.
 *
 * @param frequency - operating frequency [Hz], > 0
 * @returns the caution, or `null`
 * @throws {@link InputError} on bad input
 * @see Common practice: the conventional 20 Hz – 20 kHz range of human hearing (e.g. ISO 226
 *   equal-loudness contours stop at 12.5 kHz; young listeners hear to about 20 kHz).
 * @example
 * ```ts
 * import { audibleFrequencyCaution } from "fluxwright";
 * console.log(audibleFrequencyCaution(12000)?.code); // audible-frequency
 * console.log(audibleFrequencyCaution(30000)); // null
 * ```
 * @category Cautions
 */
export function audibleFrequencyCaution(frequency: number): Caution | null {
  const f = requirePositive("audibleFrequencyCaution", "frequency", frequency, "Hz");
  if (f >= AUDIBLE_LIMIT) return null;
  return {
    code: "audible-frequency",
    severity: "warning",
    message: `The operating frequency of ${qty(f, "Hz")} is audible: expect whistling or humming from the coil, capacitors and part, loud at high power. Consider hearing protection or a frequency above 20 kHz. ${DEFER_TO_CODES}`,
    value: f,
    limit: AUDIBLE_LIMIT,
    unit: "Hz",
    source: "Common practice (upper limit of human hearing about 20 kHz)",
  };
}

/**
 * Options of {@link exposureCaution}.
 *
 * @category Cautions
 */
export interface ExposureCautionOptions {
  /** RMS magnetic flux density where a person can be [T], ≥ 0. */
  readonly fluxDensityRms: number;
  /** Field frequency [Hz], 1 Hz … 10 MHz. */
  readonly frequency: number;
  /** Who can be there (default `"general-public"`). */
  readonly population?: ExposurePopulation;
}

/**
 * A caution when the magnetic flux density where a person can be exceeds the ICNIRP 2010
 * reference level (via {@link exposureCheck}). Code `"field-above-reference-level"`, severity
 * `"warning"` (a reference level is a screening value: exceeding it calls for assessment of
 * the basic restrictions, and people with implanted medical devices need separate
 * consideration); `null` at or below the level.
 *
 * Hard domain: as {@link exposureCheck}.
 *
 * @param options - flux density, frequency and population
 * @returns the caution, or `null`
 * @throws {@link InputError} on bad input
 * @see ICNIRP (2010), Health Physics 99(6):818–836, Tables 3 and 4.
 * @example
 * ```ts
 * import { exposureCaution } from "fluxwright";
 * console.log(exposureCaution({ fluxDensityRms: 1e-4, frequency: 30000 })?.code); // field-above-reference-level
 * ```
 * @category Cautions
 */
export function exposureCaution(options: ExposureCautionOptions): Caution | null {
  requireObject("exposureCaution", "options", options);
  requireKnownKeys("exposureCaution", "", options, EXPOSURE_CAUTION_FIELDS);
  const population = options.population ?? "general-public";
  const check = exposureCheck({ fluxDensityRms: options.fluxDensityRms, frequency: options.frequency, population });
  if (!check.exceeded) return null;
  const who = population === "occupational" ? "workers" : "the general public";
  return {
    code: "field-above-reference-level",
    severity: "warning",
    message: `The magnetic flux density of ${formatTesla(options.fluxDensityRms)} RMS at ${qty(options.frequency, "Hz")} is ${round(check.ratio)} times the ICNIRP 2010 reference level for ${who} (${formatTesla(check.referenceLevel)}). Keep people further from the coil or assess the exposure in detail; people with implanted medical devices need separate advice. ${DEFER_TO_CODES}`,
    value: options.fluxDensityRms,
    limit: check.referenceLevel,
    unit: "T",
    source: check.source,
  };
}

/**
 * Everything a heater design knows that a safety check can use; every field is optional and
 * only the given ones are checked.
 *
 * @category Cautions
 */
export interface SafetyCautionsOptions {
  /** RMS voltage across the resonant tank [V] (checked against 50 V AC). */
  readonly tankVoltageRms?: number;
  /** DC supply or bus voltage [V] (checked against 120 V ripple-free DC). */
  readonly supplyVoltageDc?: number;
  /** Capacitance of the tank or bus capacitor bank [F], with `capacitorVoltagePeak`. */
  readonly capacitance?: number;
  /** Peak voltage across that capacitance [V]. */
  readonly capacitorVoltagePeak?: number;
  /** Highest surface temperature of the part or any touchable surface [K]. */
  readonly surfaceTemperature?: number;
  /** Contact time for the burn check [s] (default 1 s). */
  readonly contactTime?: number;
  /** Operating frequency [Hz] (audible check; with `fluxDensityRms`, exposure check). */
  readonly frequency?: number;
  /** RMS flux density where a person can be [T] (needs `frequency`). */
  readonly fluxDensityRms?: number;
  /** Who can be near (default `"general-public"`). */
  readonly population?: ExposurePopulation;
}

/**
 * Runs one of the single cautions for {@link safetyCautions} and, when it rejects a value, says
 * so in terms of the field the caller wrote (`tankVoltageRms`, not `voltageCaution: voltage`).
 */
function relabel<T>(run: () => T, fields: Readonly<Record<string, string>>): T {
  try {
    return run();
  } catch (e) {
    if (e instanceof InputError) {
      const field = fields[e.parameter];
      if (field !== undefined) throw new InputError("safetyCautions", field, e.value, e.unit, e.expected);
    }
    throw e;
  }
}

/**
 * Runs every applicable caution generator ({@link voltageCaution}, {@link storedEnergyCaution},
 * {@link surfaceTemperatureCaution}, {@link audibleFrequencyCaution}, {@link exposureCaution}) on
 * the given numbers and returns the cautions found, most severe first. Each message ends with
 * "Consult local codes and licensed practice."
 *
 * Hard domain (throws {@link InputError}): any given field out of its domain (see the
 * individual generators); `capacitance` without `capacitorVoltagePeak` or the reverse;
 * `fluxDensityRms` without `frequency`.
 *
 * @param options - the design's numbers; see {@link SafetyCautionsOptions}
 * @returns the cautions (possibly empty), danger before warning before info
 * @throws {@link InputError} on bad input
 * @see The sources named by each generator (IEC 61140, IEC 60335-1, IEC 60950-1, ISO 13732-1, ICNIRP 2010).
 * @example
 * ```ts
 * import { safetyCautions, celsius } from "fluxwright";
 * const cautions = safetyCautions({ tankVoltageRms: 180, surfaceTemperature: celsius(250), frequency: 25000 });
 * console.log(cautions.map((c) => c.code)); // [ 'voltage-above-extra-low', 'hot-surface-burn' ]
 * ```
 * @category Cautions
 */
export function safetyCautions(options: SafetyCautionsOptions): Caution[] {
  const where = "safetyCautions";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, SAFETY_FIELDS);
  const cautions: (Caution | null)[] = [];
  const { tankVoltageRms, supplyVoltageDc, capacitance, capacitorVoltagePeak, surfaceTemperature, contactTime, fluxDensityRms, population } = options;
  if (tankVoltageRms !== undefined) {
    cautions.push(relabel(() => voltageCaution({ voltage: tankVoltageRms, waveform: "ac", location: "resonant tank" }), { voltage: "tankVoltageRms" }));
  }
  if (supplyVoltageDc !== undefined) {
    cautions.push(relabel(() => voltageCaution({ voltage: supplyVoltageDc, waveform: "dc", location: "DC supply" }), { voltage: "supplyVoltageDc" }));
  }
  if ((options.capacitance === undefined) !== (options.capacitorVoltagePeak === undefined)) {
    const missing = options.capacitance === undefined ? "capacitance" : "capacitorVoltagePeak";
    requireFinite(where, missing, undefined, missing === "capacitance" ? "F" : "V");
  }
  if (capacitance !== undefined && capacitorVoltagePeak !== undefined) {
    cautions.push(
      relabel(() => storedEnergyCaution({ capacitance, voltagePeak: capacitorVoltagePeak }), {
        capacitance: "capacitance",
        voltagePeak: "capacitorVoltagePeak",
      }),
    );
  }
  if (surfaceTemperature !== undefined) {
    cautions.push(
      relabel(
        () =>
          surfaceTemperatureCaution({
            temperature: surfaceTemperature,
            ...(contactTime === undefined ? {} : { contactTime }),
          }),
        { temperature: "surfaceTemperature", contactTime: "contactTime" },
      ),
    );
  }
  const audible = options.frequency;
  if (audible !== undefined) cautions.push(relabel(() => audibleFrequencyCaution(audible), { frequency: "frequency" }));
  if (fluxDensityRms !== undefined) {
    const frequency = requireInRange(where, "frequency", options.frequency, "Hz", 1, 1e7);
    cautions.push(
      relabel(
        () =>
          exposureCaution({
            fluxDensityRms,
            frequency,
            ...(population === undefined ? {} : { population }),
          }),
        { fluxDensityRms: "fluxDensityRms", population: "population" },
      ),
    );
  }
  return cautions.filter((c): c is Caution => c !== null).sort(bySeverity);
}
