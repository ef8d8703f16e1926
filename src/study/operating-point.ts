/**
 * One operating point of a heater: the coil, the part's coupling at its temperature, the tank
 * and inverter solved together (frequency and field-dependent permeability iterated to a fixed
 * point), the supply, and where every watt goes. Pure composition of the physics modules.
 *
 * @packageDocumentation
 */
import type { Caution, ValidityNote } from "../core/index.js";
import {
  litzAcRatio,
  litzDcResistance,
  roundWireAcRatio,
  skinDepth,
  tubeAcResistance,
  wireDcResistance,
  workCoilResistanceCurrentSheet,
} from "../conductors/index.js";
import { steinmetzLoss } from "../coreloss/index.js";
import { solenoidInductance, spiralCoilInductance } from "../inductance/index.js";
import { relativePermeabilityAt, resistivityAt } from "../materials/index.js";
import { currentFedParallelInverter, frequencyForPower, parallelTank, seriesInverter, seriesTank, tankStresses } from "../tank/index.js";
import { barInLongCoil, coilEfficiency, coilOverPlate, tubeInLongCoil } from "../workpiece/index.js";
import { conductorOuterDiameter } from "./read-description.js";
import type { ResolvedConductor, ResolvedHeaterDescription } from "./read-description.js";

/**
 * Power by place at one operating point [W]. The places add up to the supply's input power
 * ({@link HeaterOperatingPoint.inputPower}) to rounding (tested to 1e-9 relative).
 *
 * @category Heater study
 */
export interface HeaterLosses {
  /** In the source's internal resistance [W]. */
  readonly supply: number;
  /** Conduction loss of the inverter switches (estimate from on-resistance) [W]. */
  readonly switches: number;
  /** In the coil conductor and its leads [W]. */
  readonly coil: number;
  /** Dielectric loss of the capacitor bank (from its dissipation factor) [W]. */
  readonly capacitors: number;
  /** Core loss of the flux concentrator [W] (0 without one). */
  readonly core: number;
  /** Into the part: the useful heat [W]. */
  readonly part: number;
}

/**
 * Everything about one operating point of the heater, at one part temperature. Each number
 * comes from a named module function; the inputs it was called with are here too, so every
 * number can be reproduced by calling the module directly.
 *
 * @category Heater study
 */
export interface HeaterOperatingPoint {
  /** Whether the part was present (`false`: the empty coil). */
  readonly withPart: boolean;
  /** Part temperature [K]. */
  readonly partTemperature: number;
  /** Operating (switching) frequency [Hz]. */
  readonly frequency: number;
  /** Inductance of the empty coil [H] (`solenoidInductance` or `spiralCoilInductance`). */
  readonly coilInductance: number;
  /** Inductance change caused by the part [H] (workpiece module; 0 without the part). */
  readonly inductanceChange: number;
  /** Inductance seen at the coil terminals: `coilInductance + inductanceChange` [H]. */
  readonly inductance: number;
  /** AC resistance of the coil conductor and leads at the operating frequency [Ω]. */
  readonly coilResistance: number;
  /** Resistance the part reflects into the coil [Ω] (workpiece module). */
  readonly reflectedResistance: number;
  /** Capacitor dielectric loss as an equivalent series resistance in the coil branch [Ω]. */
  readonly capacitorResistance: number;
  /** Concentrator core loss as an equivalent series resistance [Ω]. */
  readonly coreResistance: number;
  /** Switch conduction as a series resistance in the tank (series inverter only, else 0) [Ω]. */
  readonly switchResistance: number;
  /** Total series resistance given to the tank/inverter model [Ω]. */
  readonly tankResistance: number;
  /** Relative permeability of the part used for the coupling (1 without the part). */
  readonly partRelativePermeability: number;
  /** Resistivity of the part at its temperature [Ω·m] (`resistivityAt`). */
  readonly partResistivity: number;
  /** Skin depth in the part [m] (from the coupling result; `null` without the part). */
  readonly partSkinDepth: number | null;
  /** Peak tangential field at the part surface used for the permeability [A/m] (sheet-current estimate). */
  readonly surfaceFieldStrengthPeak: number;
  /** DC voltage at the inverter input, after source and (current-fed) switch drops [V]. */
  readonly inverterInputVoltage: number;
  /** DC current drawn from the supply [A]. */
  readonly supplyCurrent: number;
  /** Supply terminal voltage under load [V]. */
  readonly supplyTerminalVoltage: number;
  /** Peak voltage across the coil (and, for the parallel tank, the capacitor bank) [V]. */
  readonly tankVoltagePeak: number;
  /** RMS voltage across the coil [V]. */
  readonly coilVoltageRms: number;
  /** RMS coil current [A]. */
  readonly coilCurrentRms: number;
  /** RMS capacitor-bank voltage [V]. */
  readonly capacitorVoltageRms: number;
  /** RMS capacitor-bank current [A]. */
  readonly capacitorCurrentRms: number;
  /** Reactive power the capacitor bank handles (first harmonic, `tankStresses`) [var]. */
  readonly capacitorReactivePower: number;
  /** Peak energy stored in coil and capacitor (`tankStresses`) [J]. */
  readonly storedEnergyPeak: number;
  /** Peak voltage across an off switch [V]. */
  readonly switchVoltagePeak: number;
  /** Peak current through a switch [A]. */
  readonly switchCurrentPeak: number;
  /** RMS current through one switch [A]. */
  readonly switchCurrentRms: number;
  /** Coil quality factor ωL/R at the operating point. */
  readonly qualityFactor: number;
  /** Power drawn from the source (open-circuit voltage × current) [W]. */
  readonly inputPower: number;
  /** Power by place [W]. */
  readonly losses: HeaterLosses;
  /** Part power over input power. */
  readonly efficiency: number;
  /** Coil (electrical) efficiency R_reflected/(R_reflected + R_coil) (`coilEfficiency`). */
  readonly coilEfficiency: number;
  /** Series inverter: whether it switches at zero voltage (inductive side); `null` for the current-fed inverter. */
  readonly zeroVoltageSwitching: boolean | null;
  /** Iterations the fixed point took. */
  readonly iterations: number;
  /** Hazards the tank and inverter models flagged. */
  readonly cautions: readonly Caution[];
  /** Approximations used at this point. */
  readonly validity: readonly ValidityNote[];
}

/**
 * The empty coil's fixed properties (independent of frequency and part).
 *
 * @category Heater study
 */
export interface CoilProperties {
  /** Inductance of the empty coil [H]. */
  readonly inductance: number;
  /** Conductor length in the coil (turns only) [m]. */
  readonly windingLength: number;
  /** Conductor length including the leads [m]. */
  readonly conductorLength: number;
  /** Resistivity of the conductor at its working temperature [Ω·m]. */
  readonly resistivity: number;
  /** DC resistance of conductor and leads [Ω]. */
  readonly dcResistance: number;
  /** Outer diameter of the conductor [m]. */
  readonly conductorDiameter: number;
}

/** Copper area of a resolved conductor as a round-wire equivalent diameter, for DC resistance. */
function conductorDcResistance(conductor: ResolvedConductor, resistivity: number, length: number): number {
  switch (conductor.kind) {
    case "solid":
      return wireDcResistance({ resistivity, length, diameter: conductor.diameter });
    case "litz":
      return litzDcResistance({ construction: { strands: conductor.strands, strandDiameter: conductor.strandDiameter }, resistivity, length });
    case "tube": {
      // tube copper area as the difference of two round wires: 1/R = 1/R_outer − 1/R_bore
      const outer = wireDcResistance({ resistivity, length, diameter: conductor.outerDiameter });
      const bore = wireDcResistance({ resistivity, length, diameter: conductor.outerDiameter - 2 * conductor.wallThickness });
      return 1 / (1 / outer - 1 / bore);
    }
  }
}

/** The coil's own properties: inductance (inductance module), conductor length and DC resistance. */
export function coilProperties(d: ResolvedHeaterDescription): CoilProperties {
  const coil = d.coil;
  const conductorDiameter = conductorOuterDiameter(coil.conductor);
  const resistivity = resistivityAt(coil.conductor.material, coil.temperature);
  let inductance: number;
  let windingLength: number;
  if (coil.shape === "solenoid") {
    inductance = solenoidInductance({ radius: coil.radius, length: coil.length, turns: coil.turns, wireDiameter: conductorDiameter });
    windingLength = coil.turns * 2 * Math.PI * coil.radius;
  } else {
    inductance = spiralCoilInductance({ innerRadius: coil.innerRadius, outerRadius: coil.outerRadius, turns: coil.turns, wireDiameter: conductorDiameter });
    windingLength = coil.turns * Math.PI * (coil.innerRadius + coil.outerRadius);
  }
  const conductorLength = windingLength + coil.leadLength;
  return { inductance, windingLength, conductorLength, resistivity, dcResistance: conductorDcResistance(coil.conductor, resistivity, conductorLength), conductorDiameter };
}

/** AC resistance of coil plus leads at a frequency, with the method's validity note. */
function coilAcResistance(d: ResolvedHeaterDescription, props: CoilProperties, frequency: number, notes: ValidityNote[]): number {
  const coil = d.coil;
  const c = coil.conductor;
  const rho = props.resistivity;
  const delta = skinDepth({ resistivity: rho, frequency });
  // conductor resistance per metre, isolated (leads and, where no better model applies, the winding)
  const isolatedPerMetre = (): number => {
    switch (c.kind) {
      case "solid":
        return wireDcResistance({ resistivity: rho, length: 1, diameter: c.diameter }) * roundWireAcRatio({ diameter: c.diameter, frequency, resistivity: rho });
      case "tube":
        return tubeAcResistance({ outerDiameter: c.outerDiameter, wallThickness: c.wallThickness, frequency, resistivity: rho });
      case "litz": {
        const construction = { strands: c.strands, strandDiameter: c.strandDiameter };
        return litzDcResistance({ construction, resistivity: rho, length: 1 }) * litzAcRatio({ construction, frequency, resistivity: rho });
      }
    }
  };
  const leads = coil.leadLength > 0 ? isolatedPerMetre() * coil.leadLength : 0;
  if (c.kind === "litz") {
    const construction = { strands: c.strands, strandDiameter: c.strandDiameter };
    const windowBreadth = coil.shape === "solenoid" ? coil.length : coil.outerRadius - coil.innerRadius + props.conductorDiameter;
    const ratio = litzAcRatio({ construction, frequency, resistivity: rho, turns: coil.turns, windowBreadth });
    return litzDcResistance({ construction, resistivity: rho, length: props.windingLength }) * ratio + leads;
  }
  const thickness = c.kind === "tube" ? c.wallThickness : c.diameter / 2;
  if (coil.shape === "solenoid") {
    const spaceFactor = Math.min(1, (coil.turns * props.conductorDiameter) / coil.length);
    notes.push({
      code: "coil-resistance-current-sheet",
      message: "Coil resistance from the current-sheet estimate (current in one skin depth of the face towards the part); it ignores current on the sides and back of each turn and reads 10–30 % low for short or loosely coupled coils (common practice).",
    });
    if (thickness < 3 * delta) {
      notes.push({
        code: "coil-conductor-thin",
        message: "The coil conductor (tube wall or wire radius) is thinner than 3 skin depths, so the current-sheet estimate of its resistance reads low.",
        value: thickness / delta,
        limit: 3,
      });
    }
    return (
      workCoilResistanceCurrentSheet({
        innerDiameter: 2 * coil.radius - props.conductorDiameter,
        coilLength: coil.length,
        turns: coil.turns,
        spaceFactor,
        frequency,
        resistivity: rho,
      }) + leads
    );
  }
  notes.push({
    code: "coil-resistance-isolated-conductor",
    message: "Coil resistance from the isolated-conductor skin effect; the proximity effect between turns is not included, so it reads low.",
  });
  return isolatedPerMetre() * props.windingLength + leads;
}

/** Coupling of the part at a frequency, temperature and surface field. */
interface Coupling {
  readonly reflectedResistance: number;
  readonly inductanceChange: number;
  readonly skinDepth: number;
  readonly validity: readonly ValidityNote[];
}

function partCoupling(d: ResolvedHeaterDescription, props: CoilProperties, frequency: number, resistivity: number, mur: number): Coupling {
  const coil = d.coil;
  const part = d.part;
  if (coil.shape === "solenoid") {
    const longCoil = { innerRadius: coil.radius - props.conductorDiameter / 2, length: coil.length, turns: coil.turns };
    const partLength = part.shape === "bar" || part.shape === "tube" ? part.length : part.shape === "ring" ? part.height : coil.length;
    // the part fills fill × coil length; the long-coil result is per coil length (uniform field)
    const fill = Math.min(1, partLength / coil.length);
    const r =
      part.shape === "bar"
        ? barInLongCoil({ coil: longCoil, bar: { radius: part.radius, resistivity, relativePermeability: mur }, frequency })
        : part.shape === "tube"
          ? tubeInLongCoil({ coil: longCoil, tube: { outerRadius: part.outerRadius, innerRadius: part.outerRadius - part.wallThickness, resistivity, relativePermeability: mur }, frequency })
          : part.shape === "ring"
            ? tubeInLongCoil({ coil: longCoil, tube: { outerRadius: part.outerRadius, innerRadius: part.innerRadius, resistivity, relativePermeability: mur }, frequency })
            : null;
    if (r === null) throw new RangeError("unreachable: plate in a solenoid");
    const validity = [...r.validity];
    if (fill < 1) {
      validity.push({
        code: "part-shorter-than-coil",
        message: "The part is shorter than the coil: the long-coil coupling was scaled by the fraction of the coil length it fills (uniform field assumed; end effects of the part ignored).",
        value: fill,
        limit: 1,
      });
    }
    // short-coil correction: the long-coil field N·I/ℓ overstates a short coil's field; scale the
    // coupling by the ratio of the exact empty-coil inductance to the long-coil one (Nagaoka's
    // coefficient for a current sheet), so the loaded inductance stays L₀(1 + ΔL_long/L_long) > 0
    const shortCoil = Math.min(1, props.inductance / r.emptyCoilInductance);
    if (shortCoil < 0.95) {
      validity.push({
        code: "short-coil-correction",
        message: "Short coil: the long-coil coupling (reflected resistance and inductance change) was scaled by the ratio of the exact empty-coil inductance to the long-coil one, i.e. by the coil's mean field relative to N·I/ℓ; expect ±20 % on the part power (common practice).",
        value: shortCoil,
        limit: 0.95,
      });
    }
    const k = fill * shortCoil;
    return { reflectedResistance: r.reflectedResistance * k, inductanceChange: r.inductanceChange * k, skinDepth: r.skinDepth, validity };
  }
  if (part.shape !== "plate") throw new RangeError("unreachable: pancake coil over a non-plate part");
  const dCond = props.conductorDiameter;
  const r = coilOverPlate({
    coil: { innerRadius: coil.innerRadius - dCond / 2, outerRadius: coil.outerRadius + dCond / 2, liftOff: coil.liftOff, height: dCond, turns: coil.turns },
    plate: { thickness: part.thickness, resistivity, relativePermeability: mur },
    frequency,
  });
  const validity = [...r.validity];
  const halfSpan = Math.min(part.length, part.width) / 2;
  if (halfSpan < 1.5 * (coil.outerRadius + dCond / 2)) {
    validity.push({
      code: "plate-not-wide",
      message: "The plate is modelled as infinitely wide (Dodd & Deeds); its half-width is less than 1.5 × the coil's outer radius, so edge effects may matter.",
      value: halfSpan,
      limit: 1.5 * (coil.outerRadius + dCond / 2),
    });
  }
  return { reflectedResistance: r.resistanceChange, inductanceChange: r.inductanceChange, skinDepth: r.skinDepth, validity };
}

/** Peak sheet-current estimate of the tangential surface field: N Î / (length of the winding). */
function surfaceField(d: ResolvedHeaterDescription, props: CoilProperties, coilCurrentRms: number): number {
  const coil = d.coil;
  const span = coil.shape === "solenoid" ? coil.length : coil.outerRadius - coil.innerRadius + props.conductorDiameter;
  return (coil.turns * Math.SQRT2 * coilCurrentRms) / span;
}


/**
 * Solves one operating point of the heater at a part temperature. Iterates frequency and the
 * part's field-dependent permeability to a fixed point, then reports the values of the final
 * module calls.
 *
 * @param d - resolved description
 * @param partTemperature - part temperature [K]
 * @param withPart - `false` for the empty coil
 * @param props - the coil's own properties (from {@link coilProperties})
 */
export function heaterOperatingPoint(
  d: ResolvedHeaterDescription,
  partTemperature: number,
  withPart: boolean,
  props: CoilProperties = coilProperties(d),
): HeaterOperatingPoint {
  const inv = d.inverter;
  const cap = d.capacitor;
  const L0 = props.inductance;
  const C = cap.capacitance;
  const partResistivity = resistivityAt(d.part.material, partTemperature);
  let frequency = inv.kind === "voltage-fed-series" && inv.control === "fixed" && inv.frequency !== null ? inv.frequency : 1 / (2 * Math.PI * Math.sqrt(L0 * C));
  let field = 0;
  let coilCurrent = 0;
  let coilVoltagePeak = 0;
  let iterations: number;
  let converged = false;

  // concentrator: Steinmetz loss at the flux the coil voltage drives through its section, as a series resistance
  function evaluateCoreResistance(f: number, current: number, voltagePeak: number): number {
    if (d.concentrator === null || !(voltagePeak > 0) || !(current > 0)) return 0;
    const bPeak = voltagePeak / (2 * Math.PI * f * d.coil.turns * d.concentrator.crossSectionArea);
    const k = d.concentrator.material.steinmetz;
    const loss = steinmetzLoss({ k: k.k, alpha: k.alpha, beta: k.beta, frequency: f, peakFluxDensity: bPeak }) * d.concentrator.volume;
    return loss / (current * current);
  }

  function evaluate(f: number, h: number, previousCurrent: number, previousVoltagePeak: number) {
    const notes: ValidityNote[] = [];
    const coilResistance = coilAcResistance(d, props, f, notes);
    const mur = withPart ? relativePermeabilityAt(d.part.material, { temperature: partTemperature, fieldStrength: h }) : 1;
    const coupling = withPart ? partCoupling(d, props, f, partResistivity, mur) : null;
    const reflectedResistance = coupling?.reflectedResistance ?? 0;
    const inductanceChange = coupling?.inductanceChange ?? 0;
    const L = L0 + inductanceChange;
    const omega = 2 * Math.PI * f;
    // capacitor dielectric loss as a series resistance: exact in a series tank (ESR = tanδ/ωC);
    // in the parallel tank folded into the coil branch as tanδ·ωL (equal at resonance, Q ≫ 1)
    const capacitorResistance = inv.kind === "voltage-fed-series" ? cap.dissipationFactor / (omega * C) : cap.dissipationFactor * omega * L;
    const coreResistance = evaluateCoreResistance(f, previousCurrent, previousVoltagePeak);
    const switchResistance = inv.kind === "voltage-fed-series" ? (inv.bridge === "full" ? 2 : 1) * inv.switchOnResistance : 0;
    const tankResistance = coilResistance + reflectedResistance + capacitorResistance + coreResistance + switchResistance;
    return { notes, coilResistance, mur, coupling, reflectedResistance, inductanceChange, L, capacitorResistance, coreResistance, switchResistance, tankResistance, f, h };
  }

  function solveInverter(e: ReturnType<typeof evaluate>, final: boolean) {
    const Rint = d.supply.internalResistance;
    const Vs = d.supply.voltage;
    if (inv.kind === "current-fed-parallel") {
      // the inverter input is a resistance 2R_d/π²; source and switch resistances in series with it
      const unit = currentFedParallelInverter({ supplyVoltage: 1, inductance: e.L, capacitance: C, coilResistance: e.tankResistance });
      const inputResistance = 1 / unit.supplyCurrent;
      const current = Vs / (inputResistance + Rint + inv.switchOnResistance);
      const vin = current * inputResistance;
      const op = currentFedParallelInverter({ supplyVoltage: vin, inductance: e.L, capacitance: C, coilResistance: e.tankResistance, chokeInductance: inv.chokeInductance });
      const st = final ? tankStresses(parallelTank({ inductance: e.L, capacitance: C, coilResistance: e.tankResistance }), { frequency: op.frequency, voltageRms: op.tankVoltageRms }) : null;
      return {
        reactivePower: st?.capacitorReactivePower ?? 0,
        storedEnergyPeak: st?.storedEnergyPeak ?? 0,
        coilVoltageRmsStress: st?.coilVoltageRms ?? op.tankVoltageRms,
        frequency: op.frequency,
        vin,
        supplyCurrent: op.supplyCurrent,
        tankPower: op.power,
        coilCurrentRms: op.coilCurrentRms,
        tankVoltagePeak: op.tankVoltagePeak,
        coilVoltageRms: op.tankVoltageRms,
        capacitorVoltageRms: op.tankVoltageRms,
        capacitorCurrentRms: op.capacitorCurrentRmsWithHarmonics,
        switchVoltagePeak: op.switchVoltagePeak,
        // each switch carries the (ripple-free) supply current for half a period
        switchCurrentPeak: op.supplyCurrent + (op.chokeRipplePeakToPeak ?? 0) / 2,
        switchCurrentRms: op.supplyCurrent / Math.SQRT2,
        switchLoss: op.supplyCurrent * op.supplyCurrent * inv.switchOnResistance,
        qualityFactor: op.qualityFactor,
        zvs: null,
        cautions: op.cautions,
        validity: op.validity,
      };
    }
    const bridge = inv.bridge;
    const fAt = (vin: number): number =>
      inv.control === "fixed" && inv.frequency !== null
        ? inv.frequency
        : frequencyForPower({ supplyVoltage: vin, bridge, inductance: e.L, capacitance: C, resistance: e.tankResistance, power: inv.targetPower ?? 0 });
    // the source resistance lowers the bridge voltage: iterate V_in = V_s − R_int·I_dc (converges fast, R_int small)
    let vin = Vs;
    let op = seriesInverter({ supplyVoltage: vin, bridge, inductance: e.L, capacitance: C, resistance: e.tankResistance, switchingFrequency: fAt(vin) });
    for (let k = 0; k < 60 && Rint > 0; k++) {
      const next = Vs - Rint * op.supplyCurrent;
      if (!(next > 0)) break;
      const done = Math.abs(next - vin) <= 1e-13 * Vs;
      vin = next;
      op = seriesInverter({ supplyVoltage: vin, bridge, inductance: e.L, capacitance: C, resistance: e.tankResistance, switchingFrequency: fAt(vin) });
      if (done) break;
    }
    const switchCount = bridge === "full" ? 2 : 1;
    const st = tankStresses(seriesTank({ inductance: e.L, capacitance: C, resistance: e.tankResistance }), { frequency: op.switchingFrequency, currentRms: op.currentRms });
    return {
      reactivePower: st.capacitorReactivePower,
      storedEnergyPeak: st.storedEnergyPeak,
      coilVoltageRmsStress: st.coilVoltageRms,
      frequency: op.switchingFrequency,
      vin,
      supplyCurrent: op.supplyCurrent,
      tankPower: op.power,
      coilCurrentRms: op.currentRms,
      tankVoltagePeak: Math.SQRT2 * st.coilVoltageRms,
      coilVoltageRms: st.coilVoltageRms,
      capacitorVoltageRms: op.capacitorVoltageRms,
      capacitorCurrentRms: op.currentRms,
      switchVoltagePeak: vin,
      switchCurrentPeak: op.currentPeak,
      switchCurrentRms: op.currentRms / Math.SQRT2,
      switchLoss: op.currentRms * op.currentRms * switchCount * inv.switchOnResistance,
      qualityFactor: (2 * Math.PI * op.switchingFrequency * e.L) / e.tankResistance,
      zvs: op.zeroVoltageSwitching,
      cautions: op.cautions,
      validity: [] as readonly ValidityNote[],
    };
  }

  let e = evaluate(frequency, field, coilCurrent, coilVoltagePeak);
  let s = solveInverter(e, false);
  let previous: { g0: number; g1: number; x0: number; x1: number; fScale: number; hScale: number } | null = null;
  for (iterations = 1; iterations < 60; iterations++) {
    const newField = withPart ? surfaceField(d, props, s.coilCurrentRms) : 0;
    const residual = newField - field;
    const df = Math.abs(s.frequency - frequency) / frequency;
    const dh = Math.abs(residual) / Math.max(newField, 1);
    // the concentrator's loss resistance lags one iterate: converged when its change no longer matters
    const nextCore = d.concentrator === null ? 0 : evaluateCoreResistance(s.frequency, s.coilCurrentRms, s.tankVoltagePeak);
    const dc = Math.abs(nextCore - e.coreResistance) / e.tankResistance;
    if (df < 1e-9 && dh < 1e-8 && dc < 1e-10 && iterations > 1) {
      converged = true;
      break;
    }
    // Anderson acceleration (depth 1) of the joint map (f, H) → (f_new, H_new), in relative units;
    // plain substitution converges linearly and slowly when the coupling depends strongly on f
    const fScale = frequency;
    const hScale = Math.max(newField, 1);
    const g0 = s.frequency / fScale;
    const g1 = newField / hScale;
    const r0 = g0 - frequency / fScale;
    const r1 = g1 - field / hScale;
    let nextFrequency = s.frequency;
    let nextField = newField;
    if (previous !== null) {
      const d0 = r0 - (previous.g0 - previous.x0) * (previous.fScale / fScale);
      const d1 = r1 - (previous.g1 - previous.x1) * (previous.hScale / hScale);
      const dg0 = g0 - previous.g0 * (previous.fScale / fScale);
      const dg1 = g1 - previous.g1 * (previous.hScale / hScale);
      const denominator = d0 * d0 + d1 * d1;
      if (denominator > 0) {
        const gamma = (r0 * d0 + r1 * d1) / denominator;
        const candidateFrequency = (g0 - gamma * dg0) * fScale;
        const candidateField = (g1 - gamma * dg1) * hScale;
        if (candidateFrequency > 0.8 * s.frequency && candidateFrequency < 1.25 * s.frequency && candidateField >= 0 && Number.isFinite(candidateField)) {
          nextFrequency = candidateFrequency;
          nextField = candidateField;
        }
      }
    }
    previous = { g0, g1, x0: frequency / fScale, x1: field / hScale, fScale, hScale };
    frequency = nextFrequency;
    field = nextField;
    coilCurrent = s.coilCurrentRms;
    coilVoltagePeak = s.tankVoltagePeak;
    e = evaluate(frequency, field, coilCurrent, coilVoltagePeak);
    s = solveInverter(e, false);
  }
  s = solveInverter(e, true);
  const result = e;
  const validity: ValidityNote[] = [...result.notes, ...(result.coupling?.validity ?? []), ...s.validity];
  if (!converged) {
    validity.push({ code: "operating-point-not-converged", message: "The frequency/permeability fixed point did not settle to 1e-9 within 60 iterations; numbers are from the last iterate." });
  }
  if (d.concentrator !== null) {
    validity.push({
      code: "concentrator-loss-only",
      message: "The flux concentrator's core loss is estimated (Steinmetz, all coil flux through its section); its effect on inductance and coupling is not modelled.",
    });
  }
  const I2 = s.coilCurrentRms * s.coilCurrentRms;
  const supplyLoss = s.supplyCurrent * s.supplyCurrent * d.supply.internalResistance;
  const losses: HeaterLosses = {
    supply: supplyLoss,
    switches: s.switchLoss,
    coil: I2 * result.coilResistance,
    capacitors: I2 * result.capacitorResistance,
    core: I2 * result.coreResistance,
    part: I2 * result.reflectedResistance,
  };
  const inputPower = d.supply.voltage * s.supplyCurrent;
  return {
    withPart,
    partTemperature,
    frequency: s.frequency,
    coilInductance: L0,
    inductanceChange: result.inductanceChange,
    inductance: result.L,
    coilResistance: result.coilResistance,
    reflectedResistance: result.reflectedResistance,
    capacitorResistance: result.capacitorResistance,
    coreResistance: result.coreResistance,
    switchResistance: result.switchResistance,
    tankResistance: result.tankResistance,
    partRelativePermeability: result.mur,
    partResistivity,
    partSkinDepth: result.coupling?.skinDepth ?? null,
    surfaceFieldStrengthPeak: result.h,
    inverterInputVoltage: s.vin,
    supplyCurrent: s.supplyCurrent,
    supplyTerminalVoltage: d.supply.voltage - s.supplyCurrent * d.supply.internalResistance,
    tankVoltagePeak: s.tankVoltagePeak,
    coilVoltageRms: s.coilVoltageRmsStress,
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
    losses,
    efficiency: inputPower > 0 ? losses.part / inputPower : 0,
    coilEfficiency: coilEfficiency({ coilResistance: result.coilResistance, reflectedResistance: result.reflectedResistance }),
    zeroVoltageSwitching: s.zvs,
    iterations,
    cautions: s.cautions,
    validity,
  };
}

/**
 * The coil's terminal inductance and resistance (conductor plus reflected part resistance) at
 * any frequency, with the part's permeability held at a given value: for impedance sweeps.
 */
export function coilImpedanceAt(
  d: ResolvedHeaterDescription,
  props: CoilProperties,
  point: HeaterOperatingPoint,
  frequency: number,
): { inductance: number; resistance: number } {
  const notes: ValidityNote[] = [];
  const coilResistance = coilAcResistance(d, props, frequency, notes);
  if (!point.withPart) return { inductance: props.inductance, resistance: coilResistance };
  const c = partCoupling(d, props, frequency, point.partResistivity, point.partRelativePermeability);
  return { inductance: props.inductance + c.inductanceChange, resistance: coilResistance + c.reflectedResistance };
}
