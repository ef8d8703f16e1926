/**
 * The inverter and source of the operating point: the tank (coil branch with the part, leads,
 * capacitor and core losses as one series resistance) driven by the current-fed parallel or the
 * voltage-fed series inverter from the supply, as the figures the operating point reports.
 *
 * @packageDocumentation
 */
import type { Caution, ValidityNote } from "../core/index.js";
import { currentFedParallelInverterWithSource, parallelTank, seriesInverterWithSource, seriesTank, tankStresses } from "../tank/index.js";
import type { ResolvedCurrentFedInverter, ResolvedHeaterDescription, ResolvedSeriesInverter } from "./read-description.js";

/** The inverter's solution at one tank: source, switches, tank stresses, and the inverter model's cautions and notes. */
export interface InverterSolution {
  readonly reactivePower: number;
  readonly storedEnergyPeak: number;
  readonly coilVoltageRmsStress: number;
  readonly frequency: number;
  readonly vin: number;
  readonly terminalVoltage: number;
  readonly supplyCurrent: number;
  readonly sourcePower: number;
  readonly sourceLoss: number;
  readonly coilCurrentRms: number;
  readonly tankVoltagePeak: number;
  readonly capacitorVoltageRms: number;
  readonly capacitorCurrentRms: number;
  readonly switchVoltagePeak: number;
  readonly switchCurrentPeak: number;
  readonly switchCurrentRms: number;
  readonly switchLoss: number;
  readonly switchResistance: number;
  readonly qualityFactor: number;
  readonly zvs: boolean | null;
  readonly cautions: readonly Caution[];
  readonly validity: readonly ValidityNote[];
}

/**
 * The current-fed parallel inverter at a tank of inductance `L` [H] and series resistance
 * `tankResistance` [Ω]; the tank stresses only when `final` (the iteration does not read them).
 */
function currentFedSolution(d: ResolvedHeaterDescription, inv: ResolvedCurrentFedInverter, L: number, tankResistance: number, final: boolean): InverterSolution {
  const C = d.capacitor.capacitance;
  const op = currentFedParallelInverterWithSource({
    sourceVoltage: d.supply.voltage,
    sourceResistance: d.supply.internalResistance,
    switchOnResistance: inv.switchOnResistance,
    inductance: L,
    capacitance: C,
    coilResistance: tankResistance,
    chokeInductance: inv.chokeInductance,
  });
  const st = final ? tankStresses(parallelTank({ inductance: L, capacitance: C, coilResistance: tankResistance }), { frequency: op.frequency, voltageRms: op.tankVoltageRms }) : null;
  return {
    reactivePower: st?.capacitorReactivePower ?? 0,
    storedEnergyPeak: st?.storedEnergyPeak ?? 0,
    coilVoltageRmsStress: st?.coilVoltageRms ?? op.tankVoltageRms,
    frequency: op.frequency,
    vin: op.inputVoltage,
    terminalVoltage: op.terminalVoltage,
    supplyCurrent: op.sourceCurrent,
    sourcePower: op.sourcePower,
    sourceLoss: op.sourceLoss,
    coilCurrentRms: op.coilCurrentRms,
    tankVoltagePeak: op.tankVoltagePeak,
    capacitorVoltageRms: op.tankVoltageRms,
    capacitorCurrentRms: op.capacitorCurrentRmsWithHarmonics,
    switchVoltagePeak: op.switchVoltagePeak,
    switchCurrentPeak: op.switchCurrentPeak,
    switchCurrentRms: op.switchCurrentRms,
    switchLoss: op.switchConductionLoss,
    switchResistance: 0,
    qualityFactor: op.qualityFactor,
    zvs: null,
    cautions: op.cautions,
    validity: op.validity,
  };
}

/**
 * The voltage-fed series inverter at a tank of inductance `L` [H] and series resistance
 * `tankResistance` [Ω]: at the fixed switching frequency when one is given, else tracking the
 * target power; the switches' conduction adds to the tank's resistance.
 */
function seriesSolution(d: ResolvedHeaterDescription, inv: ResolvedSeriesInverter, fixedFrequency: number | null, L: number, tankResistance: number): InverterSolution {
  const C = d.capacitor.capacitance;
  const common = {
    sourceVoltage: d.supply.voltage,
    sourceResistance: d.supply.internalResistance,
    bridge: inv.bridge,
    inductance: L,
    capacitance: C,
    resistance: tankResistance,
    switchOnResistance: inv.switchOnResistance,
  };
  const op = seriesInverterWithSource(fixedFrequency !== null ? { ...common, switchingFrequency: fixedFrequency } : { ...common, power: inv.targetPower ?? 0 });
  const st = tankStresses(seriesTank({ inductance: L, capacitance: C, resistance: op.tankResistance }), { frequency: op.switchingFrequency, currentRms: op.currentRms });
  return {
    reactivePower: st.capacitorReactivePower,
    storedEnergyPeak: st.storedEnergyPeak,
    coilVoltageRmsStress: st.coilVoltageRms,
    frequency: op.switchingFrequency,
    vin: op.inputVoltage,
    terminalVoltage: op.terminalVoltage,
    supplyCurrent: op.sourceCurrent,
    sourcePower: op.sourcePower,
    sourceLoss: op.sourceLoss,
    coilCurrentRms: op.currentRms,
    tankVoltagePeak: Math.SQRT2 * st.coilVoltageRms,
    capacitorVoltageRms: op.capacitorVoltageRms,
    capacitorCurrentRms: op.currentRms,
    switchVoltagePeak: op.inputVoltage,
    switchCurrentPeak: op.switchCurrentPeak,
    switchCurrentRms: op.switchCurrentRms,
    switchLoss: op.switchConductionLoss,
    switchResistance: op.tankResistance - tankResistance,
    qualityFactor: (2 * Math.PI * op.switchingFrequency * L) / op.tankResistance,
    zvs: op.zeroVoltageSwitching,
    cautions: op.cautions,
    validity: [],
  };
}

/**
 * The description's inverter and supply at a tank of inductance `L` [H] (coil with the part and
 * the leads) and series resistance `tankResistance` [Ω]; `fixedFrequency` is the series
 * inverter's fixed switching frequency, or `null`. Throws the tank or inverter model's
 * `InputError` where the inverter cannot run.
 */
export function solveInverter(d: ResolvedHeaterDescription, fixedFrequency: number | null, L: number, tankResistance: number, final: boolean): InverterSolution {
  const inv = d.inverter;
  if (inv.kind === "current-fed-parallel") return currentFedSolution(d, inv, L, tankResistance, final);
  return seriesSolution(d, inv, fixedFrequency, L, tankResistance);
}
