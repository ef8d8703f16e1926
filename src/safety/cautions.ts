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
import { ZERO_CELSIUS, formatQuantity } from "../units/index.js";
// The extra-low-voltage caution is shared with the tank module, so it lives in core; this
// module re-exports it as part of the safety inventory.
export { EXTRA_LOW_VOLTAGE_LIMITS, voltageCaution } from "../core/extra-low-voltage.js";
export type { VoltageCautionOptions } from "../core/extra-low-voltage.js";
import { exposureCheck } from "./exposure.js";
import type { ExposurePopulation } from "./exposure.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const SAFETY_FIELDS: readonly string[] = Object.freeze(["tankVoltageRms", "supplyVoltageDc", "capacitance", "capacitorVoltagePeak", "surfaceTemperature", "contactTime", "frequency", "fluxDensityRms", "population"]);

/** Accepted fields (misspelt ones are rejected, not ignored). */
const EXPOSURE_CAUTION_FIELDS: readonly string[] = Object.freeze(["fluxDensityRms", "frequency", "population"]);

/** Accepted fields (misspelt ones are rejected, not ignored). */
const SURFACE_FIELDS: readonly string[] = Object.freeze(["temperature", "contactTime", "location"]);

/** Accepted fields (misspelt ones are rejected, not ignored). */
const STORED_ENERGY_FIELDS: readonly string[] = Object.freeze(["capacitance", "voltagePeak"]);

/**
 * Options of {@link storedEnergyCaution}.
 *
 * @category Cautions
 */
export interface StoredEnergyCautionOptions {
  /** Capacitance [F], > 0. */
  readonly capacitance: number;
  /** Peak voltage across it [V] (magnitude used). */
  readonly voltagePeak: number;
}

/**
 * Energy above which a charged capacitor is at a hazardous energy level [J]: IEC 60950-1:2005,
 * §2.1.1.5 c) 2) ("exceeds 20 J" at a voltage of 2 V or more).
 */
const ENERGY_HAZARD_LEVEL = 20;
/** Voltage from which the 20 J level applies [V] (IEC 60950-1:2005, §2.1.1.5 c) 2)). */
const ENERGY_HAZARD_MIN_VOLTAGE = 2;
/** Where the 20 J rule comes from (clause text as quoted in product-safety discussions of the standard). */
const ENERGY_HAZARD_SOURCE = "IEC 60950-1:2005, §2.1.1.5 c) 2): a capacitor is at a hazardous energy level when its voltage is 2 V or more and ½CU² exceeds 20 J";
/** Discharge energy limit for accessible parts [J] (IEC 60335-1 §8.1.4). */
const DISCHARGE_ENERGY_LIMIT = 0.35;
/** Peak voltage below which a discharge is not considered a shock hazard [V] (IEC 60335-1 §8.1.4). */
const SHOCK_VOLTAGE_PEAK = 42.4;

/**
 * A caution for the energy stored in a capacitor (or capacitor bank), $E = \tfrac12 C \hat V^2$:
 * - `"stored-energy-hazard"`, `"danger"`: $E > 20$ J at $\hat V \ge 2$ V, an energy hazard
 *   even at low voltage (arcs, burns, welded tools) — the hazardous energy level of
 *   IEC 60950-1:2005 §2.1.1.5 c) 2);
 * - `"stored-energy-shock"`, `"warning"`: $E > 0.35$ J with a peak voltage above 42.4 V, the
 *   discharge-energy limit that IEC 60335-1 §8.1.4 sets for accessible parts (there for peak
 *   voltages above 15 kV; used here as a conservative screen at any shock-capable voltage);
 * - `null` otherwise.
 *
 * Hard domain (throws {@link InputError}): capacitance ≤ 0 or non-finite; non-finite voltage.
 *
 * @param options - capacitance and peak voltage
 * @returns the caution, or `null`
 * @throws {@link InputError} on bad input
 * @see IEC 60335-1:2010, §8.1.4 (45 µC / 350 mJ discharge limits); IEC 60950-1:2005,
 *   §2.1.1.5 c) 2) (hazardous energy level: more than 20 J at 2 V or more).
 * @example
 * ```ts
 * import { storedEnergyCaution } from "fluxwright";
 * console.log(storedEnergyCaution({ capacitance: 10e-6, voltagePeak: 400 })?.severity); // warning
 * ```
 * @category Cautions
 */
export function storedEnergyCaution(options: StoredEnergyCautionOptions): Caution | null {
  const where = "storedEnergyCaution";
  requireObject(where, "options", options);
  requireKnownKeys(where, "", options, STORED_ENERGY_FIELDS);
  const c = requirePositive(where, "capacitance", options.capacitance, "F");
  const v = Math.abs(requireFinite(where, "voltagePeak", options.voltagePeak, "V"));
  const energy = 0.5 * c * v * v;
  if (energy > ENERGY_HAZARD_LEVEL && v >= ENERGY_HAZARD_MIN_VOLTAGE) {
    return {
      code: "stored-energy-hazard",
      severity: "danger",
      message: `The capacitors store ${qty(energy, "J")} at ${qty(v, "V")} peak, above the ${ENERGY_HAZARD_LEVEL} J energy-hazard level: a short circuit can arc, burn and weld, and the charge can remain after switch-off. Fit a bleeder resistor and verify discharge before work. ${DEFER_TO_CODES}`,
      value: energy,
      limit: ENERGY_HAZARD_LEVEL,
      unit: "J",
      source: ENERGY_HAZARD_SOURCE,
    };
  }
  if (energy > DISCHARGE_ENERGY_LIMIT && v > SHOCK_VOLTAGE_PEAK) {
    return {
      code: "stored-energy-shock",
      severity: "warning",
      message: `The capacitors store ${qty(energy, "J")} at ${qty(v, "V")} peak, more than the ${DISCHARGE_ENERGY_LIMIT * 1000} mJ allowed to discharge through a person from an accessible part: the charge can give a painful or harmful shock after switch-off. Fit a bleeder resistor. ${DEFER_TO_CODES}`,
      value: energy,
      limit: DISCHARGE_ENERGY_LIMIT,
      unit: "J",
      source: "IEC 60335-1:2010, §8.1.4 (discharge energy 350 mJ, charge 45 µC)",
    };
  }
  return null;
}

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

/** An optional text option: its value, or the fallback when absent; InputError when not a string. */
function optionalText(where: string, parameter: string, value: unknown, fallback: string): string {
  if (value === undefined) return fallback;
  if (typeof value !== "string") throw new InputError(where, parameter, value, "", "a string");
  return value;
}

/** Three significant digits, plain notation where sensible. */
/** A quantity with SI prefix and 3 significant digits, as every report prints them (`30.1 kHz`, `1.48 kV`). */
function qty(value: number, unit: string): string {
  return formatQuantity(value, unit, { digits: 3 });
}

function round(value: number): string {
  if (value === 0) return "0";
  const a = Math.abs(value);
  if (a >= 1e-3 && a < 1e6) return String(Number(value.toPrecision(3)));
  return value.toPrecision(3);
}

/** Flux density with a µT/mT/T suffix, for messages. */
function formatTesla(value: number): string {
  const a = Math.abs(value);
  if (a < 1e-3) return `${round(value * 1e6)} µT`;
  if (a < 1) return `${round(value * 1e3)} mT`;
  return `${round(value)} T`;
}
