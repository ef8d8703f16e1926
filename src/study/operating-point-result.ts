/**
 * The operating point's report: the validity notes of the models it used (coil tier, coupling,
 * inverter, convergence, concentrator) and the assembled {@link HeaterOperatingPoint} with the
 * power by place.
 *
 * @packageDocumentation
 */
import type { ValidityNote } from "../core/index.js";
import { skinDepth } from "../conductors/index.js";
import { coilEfficiency } from "../workpiece/index.js";
import { CELL_MODEL_NOTE, shortPartNote, studyBand } from "./operating-point-cells.js";
import { closedFormWindingResistance } from "./operating-point-coil.js";
import { coilVoltagePeakOf } from "./operating-point-evaluation.js";
import type { Evaluation, PointEvaluator } from "./operating-point-evaluation.js";
import type { InverterSolution } from "./operating-point-inverter.js";
import type { HeaterLosses, HeaterOperatingPoint } from "./operating-point-types.js";

/** The validity notes of an operating point solved by `ev`, at evaluation `e` with the inverter's full solution `s`. */
export function operatingPointValidity(ev: PointEvaluator, e: Evaluation, s: InverterSolution, converged: boolean): ValidityNote[] {
  const validity: ValidityNote[] = [];
  if (ev.outside !== undefined) {
    validity.push(...ev.outside.notes);
  } else if (ev.cellsUsed) {
    validity.push(CELL_MODEL_NOTE);
    const [bandLow, bandHigh] = studyBand(ev.d, ev.props);
    if (e.f < bandLow || e.f > bandHigh) {
      validity.push({
        code: "coil-impedance-outside-band",
        message: `The operating frequency lies outside the band the coil-impedance model was reduced over (${bandLow}–${bandHigh} Hz, from the empty coil's resonance); the reduced model extrapolates there, beyond its tested accuracy.`,
        value: e.f,
      });
    }
    if (ev.withPart && ev.model !== null) {
      for (const note of ev.model.notes) {
        if (note.code === "finite-coil-coupling" || note.code === "plate-coupling") continue;
        if (note.code === "part-shorter-than-coil") {
          validity.push(shortPartNote(ev.d, e.f, ev.partResistivity, e.mur, note));
          continue;
        }
        validity.push(note);
      }
    }
  } else {
    if (ev.props.impedanceTier === "cells") {
      validity.push({
        code: "coil-impedance-closed-form",
        message: "The coil is outside the coil-impedance model's domain (turns that touch, or a part that does not fit inside the turns), so the study falls back to the closed-form coil inductance, resistance and coupling, whose errors the notes below state.",
      });
    }
    closedFormWindingResistance(ev.d, ev.props, e.f, validity);
    if (ev.withPart && ev.model !== null) validity.push(...ev.model.notes);
  }
  validity.push(...s.validity);
  if (e.mur > 1) validity.push({ code: "constant-permeability", message: "The part's permeability is taken as constant through its depth at the value for the surface field (a linear model of a saturating material)." });
  if (!converged) {
    validity.push({ code: "operating-point-not-converged", message: "The frequency/permeability fixed point did not settle to 1e-10 within 80 iterations; numbers are from the last iterate." });
  }
  if (ev.d.concentrator !== null) {
    validity.push({
      code: "concentrator-loss-only",
      message: "The flux concentrator's core loss is estimated (Steinmetz, all coil flux through its section); its effect on inductance and coupling is not modelled.",
    });
  }
  return validity;
}

/** The operating point reported from evaluation `e`, the inverter's full solution `s` there, and its validity notes. */
export function assembleOperatingPoint(ev: PointEvaluator, e: Evaluation, s: InverterSolution, iterations: number, validity: ValidityNote[]): HeaterOperatingPoint {
  const I2 = s.coilCurrentRms * s.coilCurrentRms;
  const lossesPlace: HeaterLosses = {
    supply: s.sourceLoss,
    switches: s.switchLoss,
    coil: I2 * e.coilResistance,
    capacitors: I2 * e.capacitorResistance,
    core: I2 * e.coreResistance,
    part: I2 * e.reflectedResistance,
  };
  const inputPower = s.sourcePower;
  return {
    withPart: ev.withPart,
    partTemperature: ev.partTemperature,
    frequency: s.frequency,
    coilInductance: e.emptyL,
    inductanceChange: e.inductanceChange,
    inductance: e.coilL,
    leadInductance: e.leadL,
    leadResistance: e.leadR,
    coilResistance: e.coilResistance,
    reflectedResistance: e.reflectedResistance,
    capacitorResistance: e.capacitorResistance,
    coreResistance: e.coreResistance,
    switchResistance: s.switchResistance,
    tankResistance: e.tankResistance + s.switchResistance,
    partRelativePermeability: e.mur,
    partResistivity: ev.partResistivity,
    partSkinDepth: ev.withPart ? skinDepth({ resistivity: ev.partResistivity, frequency: e.f, relativePermeability: e.mur }) : null,
    surfaceFieldStrengthPeak: e.h,
    inverterInputVoltage: s.vin,
    supplyCurrent: s.supplyCurrent,
    supplyTerminalVoltage: s.terminalVoltage,
    tankVoltagePeak: s.tankVoltagePeak,
    coilVoltageRms: e.leadL > 0 ? coilVoltagePeakOf(e, s) / Math.SQRT2 : s.coilVoltageRmsStress,
    leadVoltageRms: s.coilCurrentRms * Math.hypot(e.leadR, 2 * Math.PI * e.f * e.leadL),
    coilCurrentRms: s.coilCurrentRms,
    capacitorVoltageRms: s.capacitorVoltageRms,
    capacitorCurrentRms: s.capacitorCurrentRms,
    capacitorReactivePower: s.reactivePower,
    storedEnergyPeak: s.storedEnergyPeak,
    switchVoltagePeak: s.switchVoltagePeak,
    switchCurrentPeak: s.switchCurrentPeak,
    switchCurrentRms: s.switchCurrentRms,
    qualityFactor: s.qualityFactor,
    inputPower,
    losses: lossesPlace,
    efficiency: inputPower > 0 ? lossesPlace.part / inputPower : 0,
    coilEfficiency: coilEfficiency({ coilResistance: e.coilResistance, reflectedResistance: e.reflectedResistance }),
    zeroVoltageSwitching: s.zvs,
    iterations,
    cautions: s.cautions,
    validity,
  };
}
