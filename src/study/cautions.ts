/**
 * Cautions of a heater study: the safety module's hazard checks applied to the study's
 * numbers, plus checks of the description's own ratings (capacitor bank, switches, supply), the
 * part's melting, the first-harmonic model's reach and the bands where the tank cannot oscillate.
 *
 * @packageDocumentation
 */
import { DEFER_TO_CODES } from "../core/index.js";
import type { Caution, ValidityNote } from "../core/index.js";
import { bySeverity } from "../core/caution.js";
import { exposureCaution, exposureCheck, fieldOnAxis, safetyCautions } from "../safety/index.js";
import { formatQuantity, toCelsius } from "../units/index.js";
import type { HeaterOperatingPoint } from "./operating-point.js";
import { conductorOuterDiameter } from "./read-description.js";
import type { ResolvedHeaterDescription } from "./read-description.js";
import type { HeaterHeatUp, HeaterUnsolvedBand } from "./study-heater-types.js";

/** Where a person is assumed to stand for the field-exposure check: 300 mm from the coil centre on its axis (an operator's reach, common practice). */
const EXPOSURE_DISTANCE = 0.3;

/** Harmonic power share above which the first-harmonic note is given (1 %). */
const HARMONIC_NOTE_THRESHOLD = 0.01;

/**
 * Power the odd harmonics n = 3 … 99 of a square-wave voltage drive into a series R–L–C tank,
 * relative to the fundamental's: Σ (1/n²) |Z(f)|² / |Z(nf)|² (the square wave's n-th harmonic
 * has 1/n of the fundamental's amplitude; each harmonic's power is V²R/|Z|²).
 */
export function harmonicPowerShare(frequency: number, inductance: number, capacitance: number, resistance: number): number {
  const w = 2 * Math.PI * frequency;
  const z2 = (omega: number): number => resistance * resistance + (omega * inductance - 1 / (omega * capacitance)) ** 2;
  const fundamental = z2(w);
  let sum = 0;
  for (let n = 3; n <= 99; n += 2) sum += fundamental / (n * n * z2(n * w));
  return sum;
}

/** Part facts the cautions need. */
interface PartFacts {
  readonly mass: number;
  readonly surfaceArea: number;
}

/** A rating check: `value` above `limit` gives a warning. */
function ratingCaution(code: string, what: string, value: number, limit: number, unit: string, source: string): Caution {
  return {
    code,
    severity: "warning",
    message: `${what} (${formatQuantity(value, unit, { digits: 3 })}) exceeds ${formatQuantity(limit, unit, { digits: 3 })}; choose parts rated above it or change the design. ${DEFER_TO_CODES}`,
    value,
    limit,
    unit,
    source,
  };
}

/**
 * Collects the cautions of a study. `points` are every operating point solved (empty coil,
 * cold, hot, heat-up grid); the worst value of each quantity is checked.
 */
export function heaterCautions(
  d: ResolvedHeaterDescription,
  facts: PartFacts,
  points: readonly HeaterOperatingPoint[],
  hottestPartTemperature: number,
  validity: ValidityNote[],
  settleTemperature: number | null = null,
): Caution[] {
  const out: Caution[] = ratingCautions(d, points);
  const max = (f: (p: HeaterOperatingPoint) => number): number => points.reduce((m, p) => Math.max(m, f(p)), 0);
  const min = (f: (p: HeaterOperatingPoint) => number): number => points.reduce((m, p) => Math.min(m, f(p)), Infinity);
  // the safety module's hazard checks on the worst numbers of the study
  const worst = worstExposure(d, points);
  const fluxDensityRms = worst.fluxDensityRms;
  out.push(
    ...safetyCautions({
      tankVoltageRms: max((p) => Math.max(p.coilVoltageRms, p.capacitorVoltageRms)),
      supplyVoltageDc: d.supply.voltage,
      capacitance: d.capacitor.capacitance,
      capacitorVoltagePeak: max((p) => Math.SQRT2 * p.capacitorVoltageRms),
      surfaceTemperature: hottestPartTemperature,
      frequency: min((p) => p.frequency),
      population: "general-public",
    }),
  );
  if (worst.ratio >= 0) {
    const c = exposureCaution({ fluxDensityRms, frequency: worst.frequency, population: "general-public" });
    if (c !== null) out.push(c);
  }
  const melting = meltingCaution(d, hottestPartTemperature, settleTemperature, validity);
  if (melting !== null) out.push(melting);
  const harmonics = harmonicNote(d, points);
  if (harmonics !== null) validity.push(harmonics);
  validity.push({
    code: "exposure-distance",
    message: `Field exposure checked on the coil axis ${EXPOSURE_DISTANCE * 1000} mm from the coil centre for each operating point at its own coil current and frequency (the worst reported), against the ICNIRP 2010 general-public reference levels; the part's screening is ignored (conservative).`,
    value: fluxDensityRms,
  });
  return out;
}

/** The description's own ratings (capacitor bank, switches, supply) against the worst operating point. */
function ratingCautions(d: ResolvedHeaterDescription, points: readonly HeaterOperatingPoint[]): Caution[] {
  const out: Caution[] = [];
  const max = (f: (p: HeaterOperatingPoint) => number): number => points.reduce((m, p) => Math.max(m, f(p)), 0);
  const capV = max((p) => p.capacitorVoltageRms);
  const capI = max((p) => p.capacitorCurrentRms);
  const switchV = max((p) => p.switchVoltagePeak);
  const supplyI = max((p) => p.supplyCurrent);
  // where the worst value occurs, in words ("with the empty coil", "with the part at 120 °C")
  const at = (f: (p: HeaterOperatingPoint) => number): string => {
    const worst = points.reduce((a, p) => (f(p) > f(a) ? p : a));
    return worst.withPart ? ` with the part at ${toCelsius(worst.partTemperature).toFixed(0)} °C` : " with the empty coil (no part in place)";
  };
  const cap = d.capacitor;
  if (cap.voltageRatingRms !== null && capV > cap.voltageRatingRms) {
    out.push(ratingCaution("capacitor-voltage-above-rating", `The capacitor bank's RMS voltage${at((p) => p.capacitorVoltageRms)}`, capV, cap.voltageRatingRms, "V", "the description's capacitor.voltageRatingRms"));
  }
  if (cap.currentRatingRms !== null && capI > cap.currentRatingRms) {
    out.push(ratingCaution("capacitor-current-above-rating", `The capacitor bank's RMS current${at((p) => p.capacitorCurrentRms)}`, capI, cap.currentRatingRms, "A", "the description's capacitor.currentRatingRms"));
  }
  const rating = d.inverter.switchVoltageRating;
  if (rating !== null && switchV > 0.8 * rating) {
    out.push(ratingCaution("switch-voltage-above-derated", `The switches' peak off-state voltage${at((p) => p.switchVoltagePeak)}`, switchV, 0.8 * rating, "V", "80 % of inverter.switchVoltageRating (voltage derating, common practice)"));
  }
  if (d.supply.currentLimit !== null && supplyI > d.supply.currentLimit) {
    out.push(ratingCaution("supply-current-above-limit", `The current drawn from the supply${at((p) => p.supplyCurrent)}`, supplyI, d.supply.currentLimit, "A", "the description's supply.currentLimit"));
  }
  return out;
}

/**
 * The worst field exposure of the study: each operating point's field on the coil axis at
 * {@link EXPOSURE_DISTANCE}, at its own current and frequency, against the reference level (the
 * largest current and the lowest frequency need not occur together); `ratio` −1 when no point runs.
 */
function worstExposure(d: ResolvedHeaterDescription, points: readonly HeaterOperatingPoint[]): { fluxDensityRms: number; frequency: number; ratio: number } {
  const coil = d.coil;
  const fieldCoil =
    coil.shape === "solenoid"
      ? ({ kind: "solenoid", radius: coil.radius, length: coil.length, turns: coil.turns } as const)
      : ({
          kind: "flatSpiral",
          innerEdgeRadius: Math.max(0, coil.innerRadius - conductorOuterDiameter(coil.conductor) / 2),
          outerEdgeRadius: coil.outerRadius + conductorOuterDiameter(coil.conductor) / 2,
          turns: coil.turns,
        } as const);
  let worst = { fluxDensityRms: 0, frequency: 0, ratio: -1 };
  for (const p of points) {
    if (!(p.coilCurrentRms > 0) || !(p.frequency >= 1 && p.frequency <= 1e7)) continue;
    const fluxDensityRms = Math.abs(fieldOnAxis({ coil: fieldCoil, current: p.coilCurrentRms, axialPosition: EXPOSURE_DISTANCE }));
    const ratio = exposureCheck({ fluxDensityRms, frequency: p.frequency, population: "general-public" }).ratio;
    if (ratio > worst.ratio) worst = { fluxDensityRms, frequency: p.frequency, ratio };
  }
  return worst;
}

/**
 * A part that would melt: at the end of the heat-up, or where it would settle if left on; or,
 * still heating at the top of the solved range (the `settles-above-range` note), one that may.
 */
function meltingCaution(d: ResolvedHeaterDescription, hottestPartTemperature: number, settleTemperature: number | null, validity: readonly ValidityNote[]): Caution | null {
  const melting = d.part.material.meltingTemperature;
  const hottest = Math.max(hottestPartTemperature, settleTemperature ?? -Infinity);
  if (hottest >= melting) {
    const settles = settleTemperature !== null && settleTemperature >= melting && !(hottestPartTemperature >= melting);
    return {
      code: "part-above-melting",
      severity: "danger",
      message:
        `The part ${settles ? "would settle" : "reaches"} at ${toCelsius(hottest).toFixed(0)} °C${settles ? " if the heater is left on" : ""}, at or above the melting temperature of ${d.part.material.name} (${toCelsius(melting).toFixed(0)} °C): ` +
        `molten metal can drip, spatter and burn, and the coil can be destroyed. Switch off at the target (a temperature-controlled or timed cut-off) or lower the power. ${DEFER_TO_CODES}`,
      value: hottest,
      limit: melting,
      unit: "K",
      source: `the melting temperature of the materials catalogue (${d.part.material.id})`,
    };
  }
  // still heating at the top of the solved range: where it settles is unknown, and may be molten
  const aboveRange = validity.find((v) => v.code === "settles-above-range");
  if (aboveRange === undefined) return null;
  const top = aboveRange.value ?? hottest;
  return {
    code: "part-may-melt",
    severity: "danger",
    message:
      `The part would still be heating at ${toCelsius(top).toFixed(0)} °C, the top of the study's data for ${d.part.material.name}, if the heater is left on: nothing stops it short of its melting temperature (${toCelsius(melting).toFixed(0)} °C), where molten metal can drip, spatter and burn. ` +
      `Switch off at the target (a temperature-controlled or timed cut-off) or lower the power. ${DEFER_TO_CODES}`,
    value: top,
    limit: melting,
    unit: "K",
    source: `the melting temperature of the materials catalogue (${d.part.material.id}) and the top of the solved power curve`,
  };
}

/**
 * A square-wave bridge driving a series tank far from resonance: the odd harmonics of the drive
 * pass the tank too, and the first-harmonic model leaves their power out. The note when their
 * share exceeds {@link HARMONIC_NOTE_THRESHOLD} at some operating point, else `null`.
 */
function harmonicNote(d: ResolvedHeaterDescription, points: readonly HeaterOperatingPoint[]): ValidityNote | null {
  if (d.inverter.kind !== "voltage-fed-series") return null;
  const C = d.capacitor.capacitance;
  let worstShare = 0;
  let worstRatio = 0;
  for (const p of points) {
    if (!(p.frequency > 0) || !(p.inductance > 0) || !(p.tankResistance > 0)) continue;
    // the tank's inductance: coil and leads in series
    const share = harmonicPowerShare(p.frequency, p.inductance + p.leadInductance, C, p.tankResistance);
    if (share > worstShare) {
      worstShare = share;
      worstRatio = p.frequency * 2 * Math.PI * Math.sqrt((p.inductance + p.leadInductance) * C);
    }
  }
  if (!(worstShare > HARMONIC_NOTE_THRESHOLD)) return null;
  return {
    code: "first-harmonic-stretched",
    message:
      `The bridge runs up to ${worstRatio.toPrecision(2)} × the loaded resonance; there the odd harmonics of its square-wave voltage drive ${(100 * worstShare).toPrecision(2)} % as much power into the tank as the fundamental ` +
      "(harmonics 3 to 99 through the same series tank, coil resistance and inductance held at their fundamental values), which the first-harmonic model leaves out: powers and currents are low by about that much. Run closer to resonance (more capacitance or turns) for a better first-harmonic estimate.",
    value: worstShare,
  };
}

/**
 * Every caution of a study, most serious first, each deferring to local codes:
 * {@link heaterCautions} on every operating point solved, `tank-cannot-oscillate` for the bands
 * where the current-fed tank cannot run, and the operating points' own cautions (tank voltage,
 * hard switching) once per code. Appends the `no-operating-point` note and those of
 * {@link heaterCautions} to `validity`.
 */
export function studyCautions(
  d: ResolvedHeaterDescription,
  facts: PartFacts,
  allPoints: readonly HeaterOperatingPoint[],
  heatUp: HeaterHeatUp | null,
  bands: readonly HeaterUnsolvedBand[],
  validity: ValidityNote[],
): Caution[] {
  const part = d.part;
  if (bands.length > 0) {
    validity.push({
      code: "no-operating-point",
      message: `The inverter has no operating point with the part at ${bandList(bands)} (${bands[0]?.reason ?? ""}); the study counts no power there and does not interpolate across it.`,
      value: bands[0]?.from ?? 0,
    });
  }
  const cautions = heaterCautions(d, facts, allPoints, heatUp?.finalTemperature ?? part.targetTemperature, validity, heatUp?.steadyStateTemperature ?? null);
  // the operating points' own cautions (tank voltage, hard switching) join the list once per code:
  // the safety module's caution of the same code, or the first point's, stands for the rest
  const latched = bands.filter((band) => band.noOscillation);
  if (latched.length > 0) {
    cautions.push({
      code: "tank-cannot-oscillate",
      severity: "danger",
      message: `With the part at ${bandList(latched)} the loaded tank's resistance exceeds √(L/C) for every permeability the part can take: the current-fed inverter cannot oscillate, its switches latch on and only the supply's internal resistance, the choke and the switches limit the current (a short circuit of the supply through the choke). Add current limiting or a shutdown, or change the tank so that √(L/C) exceeds the loaded resistance (less capacitance, more turns).`,
      value: latched[0]?.from ?? 0,
      limit: part.startTemperature,
      unit: "K",
      source: "current-fed inverter: the tank oscillates only while its coil-branch resistance is below √(L/C) (currentFedParallelInverter)",
    });
  }
  const seen = new Set(cautions.map((c) => c.code));
  for (const p of allPoints) {
    for (const c of p.cautions) {
      if (seen.has(c.code)) continue;
      seen.add(c.code);
      cautions.push(c);
    }
  }
  return sortCautions(cautions).map((c) => (c.message.endsWith(DEFER_TO_CODES) ? c : { ...c, message: `${c.message} ${DEFER_TO_CODES}` }));
}

/** The bands as text: "from–to °C" each, comma-separated. */
function bandList(bands: readonly HeaterUnsolvedBand[]): string {
  return bands.map((band) => `${toCelsius(band.from).toFixed(0)}–${toCelsius(band.to).toFixed(0)} °C`).join(", ");
}

/** Keeps one caution per code (the largest value), most serious first. */
function sortCautions(cautions: readonly Caution[]): Caution[] {
  const byCode = new Map<string, Caution>();
  for (const c of cautions) {
    const prev = byCode.get(c.code);
    if (prev === undefined || c.value > prev.value) byCode.set(c.code, c);
  }
  return [...byCode.values()].sort(bySeverity);
}
