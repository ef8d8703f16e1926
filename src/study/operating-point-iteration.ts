/**
 * The operating-point iteration: frequency and the part's field-dependent permeability to a
 * fixed point (Anderson-accelerated and damped), a bracketing search over the surface field
 * where that fails, and the refresh of the surrogate's correction until the exact model agrees.
 *
 * @packageDocumentation
 */
import { InputError } from "../core/index.js";
import { andersonStep } from "../special/internal.js";
import { AGREEMENT, correctionOf } from "./operating-point-correction.js";
import type { Correction } from "./operating-point-correction.js";
import { coilVoltagePeakOf } from "./operating-point-evaluation.js";
import type { Evaluation, PointEvaluator, Solution } from "./operating-point-evaluation.js";
import type { OperatingPointStart } from "./operating-point-types.js";

/**
 * Thrown when the loaded current-fed tank cannot oscillate for any permeability the part can
 * take at this temperature (its resistance exceeds √(L/C) for every field strength).
 */
export class NoOscillationError extends InputError {}

/** An iterate of the fixed point: the evaluation, the inverter's figures there, the iterations it took and whether it settled. */
export interface Iterate {
  readonly e: Evaluation;
  readonly s: Solution;
  readonly iterations: number;
  readonly converged: boolean;
}

/**
 * The starting iterate: a neighbour's solution (`start`, continuation), else the empty coil's
 * resonance and the field its current produces at the part surface (`emptyField`, also the
 * reference of the bracketing search).
 */
export function startingIterate(ev: PointEvaluator, start: OperatingPointStart | null): { f0: number; h0: number; emptyField: number } {
  const L0 = ev.props.inductance;
  const C = ev.d.capacitor.capacitance;
  const coilResonance = 1 / (2 * Math.PI * Math.sqrt(L0 * C));
  let f0 = ev.fixedFrequency ?? 1 / (2 * Math.PI * Math.sqrt((L0 + ev.leadAt(coilResonance).inductance) * C));
  let h0 = 0;
  let emptyField = 0;
  if (ev.withPart) {
    try {
      const empty = ev.solveStep(ev.evaluate(f0, 0, 0, 0, false));
      f0 = ev.fixedFrequency ?? empty.frequency;
      emptyField = ev.fieldOf(empty);
    } catch (error) {
      if (!(error instanceof InputError)) throw error;
    }
    h0 = emptyField;
    // continuation from a neighbour's solution (an empty-coil start carries no field: keep the estimate)
    if (start !== null && start.surfaceFieldStrengthPeak > 0) {
      f0 = ev.fixedFrequency ?? start.frequency;
      h0 = start.surfaceFieldStrengthPeak;
    }
  }
  return { f0, h0, emptyField };
}

/** Anderson-accelerated, damped fixed point from (f, h); `null` when it cannot proceed. */
export function iterate(ev: PointEvaluator, frequency: number, field: number): Iterate | null {
  let coilCurrent = 0;
  let coilVoltagePeak = 0;
  let e: Evaluation;
  let s: Solution;
  try {
    e = ev.evaluate(frequency, field, coilCurrent, coilVoltagePeak, ev.withPart);
    s = ev.solveStep(e);
  } catch (error) {
    if (!(error instanceof InputError)) throw error;
    return null;
  }
  let previous = false;
  let previousX = [0, 0];
  let previousG = [0, 0];
  const next = [0, 0];
  let iterations = 1;
  for (; iterations < 80; iterations++) {
    const newField = ev.fieldOf(s);
    const df = Math.abs(s.frequency - frequency) / frequency;
    const dh = Math.abs(newField - field) / Math.max(newField, 1);
    const nextCore = ev.d.concentrator === null ? 0 : ev.coreResistance(s.frequency, s.coilCurrentRms, coilVoltagePeakOf(e, s));
    const dc = Math.abs(nextCore - e.coreResistance) / e.tankResistance;
    if (df < 1e-10 && dh < 1e-9 && dc < 1e-11 && iterations > 1) return { e, s, iterations, converged: true };
    let nextFrequency = s.frequency;
    let nextField = newField;
    // Anderson acceleration (depth 1) over (frequency, field), each scaled by its size
    const x = [frequency, field];
    const g = [s.frequency, newField];
    if (previous && andersonStep(2, x, g, previousX, previousG, [frequency, Math.max(newField, 1)], next)) {
      const candidateFrequency = next[0]!;
      const candidateField = next[1]!;
      if (candidateFrequency > 0.8 * s.frequency && candidateFrequency < 1.25 * s.frequency && candidateField >= 0 && Number.isFinite(candidateField)) {
        nextFrequency = candidateFrequency;
        nextField = candidateField;
      }
    }
    previousX = x;
    previousG = g;
    previous = true;
    coilCurrent = s.coilCurrentRms;
    coilVoltagePeak = coilVoltagePeakOf(e, s);
    const good = { frequency, field };
    // damping: an iterate the inverter cannot run at is pulled back towards the last good one
    let accepted = false;
    for (let k = 0; k < 40; k++) {
      try {
        const eNext = ev.evaluate(nextFrequency, nextField, coilCurrent, coilVoltagePeak, ev.withPart);
        const sNext = ev.solveStep(eNext);
        e = eNext;
        s = sNext;
        frequency = nextFrequency;
        field = nextField;
        accepted = true;
        break;
      } catch (error) {
        if (!(error instanceof InputError)) throw error;
        nextFrequency = 0.5 * (nextFrequency + good.frequency);
        nextField = 0.5 * (nextField + good.field);
        previous = false;
      }
    }
    if (!accepted) return null;
  }
  return { e, s, iterations, converged: false };
}

/**
 * The robust path: the frequency fixed point at a given surface field, and a bracketing search
 * (log field) for the field the resulting coil current reproduces; `f0` is the starting
 * frequency. Throws the design's limit when the inverter can run at no field strength.
 */
export function bracketField(ev: PointEvaluator, reference: number, f0: number): { frequency: number; field: number } {
  if (!ev.withPart) {
    // the empty coil has no field to iterate: its inverter failure is the design's limit
    ev.solveStep(ev.evaluate(f0, 0, 0, 0, false));
    return { frequency: f0, field: 0 };
  }
  let lastError: InputError | null = null;
  let allOscillation = true;
  const atField = (h: number): { f: number; r: number } | null => {
    let f = f0;
    ev.correction = null; // the first coupling at this field is exact
    try {
      let e = ev.evaluate(f, h, 0, 0, ev.withPart);
      let s = ev.solveStep(e);
      for (let k = 0; k < 60 && Math.abs(s.frequency - f) > 1e-12 * f; k++) {
        f = s.frequency;
        e = ev.evaluate(f, h, s.coilCurrentRms, coilVoltagePeakOf(e, s), ev.withPart);
        s = ev.solveStep(e);
      }
      return { f: s.frequency, r: Math.log(Math.max(ev.fieldOf(s), 1e-300) / h) };
    } catch (error) {
      if (!(error instanceof InputError)) throw error;
      lastError = error;
      if (error.parameter !== "coilResistance") allOscillation = false;
      return null;
    }
  };
  const ref = Math.max(reference, 1);
  const fields: number[] = [];
  for (let k = -24; k <= 24; k++) fields.push(ref * 10 ** (k / 4));
  const values = fields.map(atField);
  for (let i = 0; i + 1 < fields.length; i++) {
    const a = values[i];
    const b = values[i + 1];
    if (a === null || a === undefined || b === null || b === undefined || !(a.r > 0 && b.r <= 0)) continue;
    let lo = Math.log(fields[i]!);
    let hi = Math.log(fields[i + 1]!);
    let best = { frequency: b.f, field: fields[i + 1]! };
    for (let k = 0; k < 60 && hi - lo > 1e-13; k++) {
      const mid = 0.5 * (lo + hi);
      const m = atField(Math.exp(mid));
      if (m === null) break;
      best = { frequency: m.f, field: Math.exp(mid) };
      if (m.r > 0) lo = mid;
      else hi = mid;
    }
    return best;
  }
  if (values.every((v) => v === null)) {
    const err = lastError as InputError | null;
    if (ev.d.inverter.kind === "current-fed-parallel" && allOscillation && err !== null) {
      throw new NoOscillationError(
        "heaterOperatingPoint",
        "part",
        ev.partTemperature,
        "K",
        `a part temperature at which the loaded tank can oscillate: its resistance exceeds √(L/C) for every surface field from ${ref * 1e-6} to ${ref * 1e6} A/m, so the switches would latch on and only the supply would limit the current (${err.message})`,
      );
    }
    if (err !== null) throw err;
  }
  throw new InputError("heaterOperatingPoint", "part", ev.partTemperature, "K", "a part temperature with a self-consistent operating point (no surface field reproduces itself)");
}

/**
 * The converged operating point of `ev` from the starting iterate `(f0, h0)`: the accelerated
 * fixed point, else the bracketing search polished by it; then the surrogate's correction
 * refreshed at the converged point until the exact model agrees with it.
 */
export function solveFixedPoint(ev: PointEvaluator, f0: number, h0: number, emptyField: number): Iterate {
  let result = iterate(ev, f0, h0);
  if (result === null || !result.converged) {
    const found = bracketField(ev, Math.max(h0, emptyField), f0);
    const polished = iterate(ev, found.frequency, found.field);
    if (polished !== null) result = polished;
    if (result === null) throw new InputError("heaterOperatingPoint", "part", ev.partTemperature, "K", "a part temperature with an operating point the inverter can run");
  }
  return refineCorrection(ev, result);
}

/**
 * Refreshes the correction at the converged point until the exact model agrees with it (to
 * {@link AGREEMENT}), re-iterating from there; returns the last converged iterate, its
 * evaluation from the exact model when they agreed.
 */
function refineCorrection(ev: PointEvaluator, converged: Iterate): Iterate {
  let result = converged;
  // refresh the correction at the converged point until the exact model agrees with it; the
  // corrections are a fixed point of their own, solved by the secant method per component
  let previousCorrection: { c: Correction; g: Correction } | null = null;
  const loaded = ev.withPart && ev.model !== null;
  for (let outer = 0; outer < 16; outer++) {
    const at = result.e;
    const exact = ev.exactState(at.f, at.mur, loaded);
    const g = correctionOf(exact, ev.cheapState(at.f, at.mur, loaded));
    const agreed =
      Math.abs(exact.part - at.reflectedResistance) <= AGREEMENT * at.tankResistance &&
      Math.abs(exact.copper + at.leadR - at.coilResistance) <= AGREEMENT * at.tankResistance &&
      Math.abs(exact.L - at.coilL) <= 0.1 * AGREEMENT * at.coilL;
    if (agreed) {
      // the reported numbers come from the exact model at this point
      ev.correction = g;
      result = { ...result, e: ev.evaluate(at.f, at.h, result.s.coilCurrentRms, coilVoltagePeakOf(at, result.s), loaded) };
      break;
    }
    const c = ev.correction ?? g;
    let next = g;
    if (previousCorrection !== null) {
      const secant = (cn: number, gn: number, cp: number, gp: number): number => {
        const denominator = gn - cn - (gp - cp);
        return denominator !== 0 ? cn - ((gn - cn) * (cn - cp)) / denominator : gn;
      };
      const p = previousCorrection;
      const candidate: Correction = {
        copper: secant(c.copper, g.copper, p.c.copper, p.g.copper),
        part: secant(c.part, g.part, p.c.part, p.g.part),
        L: secant(c.L, g.L, p.c.L, p.g.L),
        emptyL: secant(c.emptyL, g.emptyL, p.c.emptyL, p.g.emptyL),
      };
      const factorOk = (x: number, ref: number): boolean => x > 0.5 * ref && x < 2 * ref;
      if (factorOk(candidate.copper, g.copper) && factorOk(candidate.part, g.part) && Number.isFinite(candidate.L) && Number.isFinite(candidate.emptyL)) next = candidate;
    }
    previousCorrection = { c, g };
    if (loaded) ev.correction = next;
    else ev.emptyCorrection = next;
    const again = iterate(ev, at.f, at.h);
    if (again === null) {
      if (loaded) ev.correction = g;
      else ev.emptyCorrection = g;
      break;
    }
    result = again;
  }
  return result;
}
