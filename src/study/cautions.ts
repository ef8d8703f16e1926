/**
 * Cautions of a heater study: the safety module's hazard checks applied to the study's
 * numbers, plus checks of the description's own ratings (capacitor bank, switches, supply).
 *
 * @packageDocumentation
 */
import { DEFER_TO_CODES } from "../core/index.js";
import type { Caution, ValidityNote } from "../core/index.js";
import { exposureCaution, exposureCheck, fieldOnAxis, safetyCautions } from "../safety/index.js";
import { formatQuantity } from "../units/index.js";
import type { HeaterOperatingPoint } from "./operating-point.js";
import { conductorOuterDiameter } from "./read-description.js";
import type { ResolvedHeaterDescription } from "./read-description.js";

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
  const out: Caution[] = [];
  const max = (f: (p: HeaterOperatingPoint) => number): number => points.reduce((m, p) => Math.max(m, f(p)), 0);
  const min = (f: (p: HeaterOperatingPoint) => number): number => points.reduce((m, p) => Math.min(m, f(p)), Infinity);
  const capV = max((p) => p.capacitorVoltageRms);
  const capI = max((p) => p.capacitorCurrentRms);
  const switchV = max((p) => p.switchVoltagePeak);
  const supplyI = max((p) => p.supplyCurrent);
  // where the worst value occurs, in words ("with the empty coil", "with the part at 120 °C")
  const at = (f: (p: HeaterOperatingPoint) => number): string => {
    const worst = points.reduce((a, p) => (f(p) > f(a) ? p : a));
    return worst.withPart ? ` with the part at ${(worst.partTemperature - 273.15).toFixed(0)} °C` : " with the empty coil (no part in place)";
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

  // the safety module's hazard checks on the worst numbers of the study
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
  // each operating point's field at its own frequency: the worst ratio to the reference level
  // (the largest current and the lowest frequency need not occur together)
  let worst = { fluxDensityRms: 0, frequency: 0, ratio: -1 };
  for (const p of points) {
    if (!(p.coilCurrentRms > 0) || !(p.frequency >= 1 && p.frequency <= 1e7)) continue;
    const fluxDensityRms = Math.abs(fieldOnAxis({ coil: fieldCoil, current: p.coilCurrentRms, axialPosition: EXPOSURE_DISTANCE }));
    const ratio = exposureCheck({ fluxDensityRms, frequency: p.frequency, population: "general-public" }).ratio;
    if (ratio > worst.ratio) worst = { fluxDensityRms, frequency: p.frequency, ratio };
  }
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
  // a part that would melt: at the end of the heat-up, or where it would settle if left on
  const melting = d.part.material.meltingTemperature;
  const hottest = Math.max(hottestPartTemperature, settleTemperature ?? -Infinity);
  if (hottest >= melting) {
    const settles = settleTemperature !== null && settleTemperature >= melting && !(hottestPartTemperature >= melting);
    out.push({
      code: "part-above-melting",
      severity: "danger",
      message:
        `The part ${settles ? "would settle" : "reaches"} at ${(hottest - 273.15).toFixed(0)} °C${settles ? " if the heater is left on" : ""}, at or above the melting temperature of ${d.part.material.name} (${(melting - 273.15).toFixed(0)} °C): ` +
        `molten metal can drip, spatter and burn, and the coil can be destroyed. Switch off at the target (a temperature-controlled or timed cut-off) or lower the power. ${DEFER_TO_CODES}`,
      value: hottest,
      limit: melting,
      unit: "K",
      source: `the melting temperature of the materials catalogue (${d.part.material.id})`,
    });
  }
  // still heating at the top of the solved range: where it settles is unknown, and may be molten
  const aboveRange = validity.find((v) => v.code === "settles-above-range");
  if (!(hottest >= melting) && aboveRange !== undefined) {
    const top = aboveRange.value ?? hottest;
    out.push({
      code: "part-may-melt",
      severity: "danger",
      message:
        `The part would still be heating at ${(top - 273.15).toFixed(0)} °C, the top of the study's data for ${d.part.material.name}, if the heater is left on: nothing stops it short of its melting temperature (${(melting - 273.15).toFixed(0)} °C), where molten metal can drip, spatter and burn. ` +
        `Switch off at the target (a temperature-controlled or timed cut-off) or lower the power. ${DEFER_TO_CODES}`,
      value: top,
      limit: melting,
      unit: "K",
      source: `the melting temperature of the materials catalogue (${d.part.material.id}) and the top of the solved power curve`,
    });
  }
  // a square-wave bridge driving a series tank far from resonance: the odd harmonics of the
  // drive pass the tank too, and the first-harmonic model leaves their power out
  if (d.inverter.kind === "voltage-fed-series") {
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
    if (worstShare > HARMONIC_NOTE_THRESHOLD) {
      validity.push({
        code: "first-harmonic-stretched",
        message:
          `The bridge runs up to ${worstRatio.toPrecision(2)} × the loaded resonance; there the odd harmonics of its square-wave voltage drive ${(100 * worstShare).toPrecision(2)} % as much power into the tank as the fundamental ` +
          "(harmonics 3 to 99 through the same series tank, coil resistance and inductance held at their fundamental values), which the first-harmonic model leaves out: powers and currents are low by about that much. Run closer to resonance (more capacitance or turns) for a better first-harmonic estimate.",
        value: worstShare,
      });
    }
  }
  validity.push({
    code: "exposure-distance",
    message: `Field exposure checked on the coil axis ${EXPOSURE_DISTANCE * 1000} mm from the coil centre for each operating point at its own coil current and frequency (the worst reported), against the ICNIRP 2010 general-public reference levels; the part's screening is ignored (conservative).`,
    value: fluxDensityRms,
  });
  return out;
}
