/**
 * Heat-up of a part at one uniform temperature (lumped capacitance) with convection and
 * radiation losses: temperature curve, time to target, steady state and energy balance.
 *
 * @packageDocumentation
 */
import { InputError } from "../core/index.js";
import type { ValidityNote } from "../core/index.js";
import type { ConductiveMaterial } from "../materials/index.js";
import { specificEnthalpyChange } from "../materials/index.js";
import { solveOde } from "../special/index.js";
import type { OdeResult } from "../special/index.js";
import { STEFAN_BOLTZMANN } from "../units/index.js";
import { findEquilibrium } from "./steady-state.js";
import { effectiveCoefficient } from "./surface-loss.js";
import { lumpedRunNotes, readLumpedHeatUpOptions, WHERE } from "./lumped-heat-up-input.js";
import type { LumpedHeatUpInput } from "./lumped-heat-up-input.js";

/** Longest duration accepted, in time constants (about 0.3 s of work there on one core). */
const MAX_TIME_CONSTANTS = 1e5;

function steadyText(equilibrium: number | null): string {
  return equilibrium === null ? "" : `(${equilibrium.toPrecision(6)} K)`;
}

/**
 * Options of {@link lumpedHeatUp}. Give `specificHeat` or `material` (or both: `specificHeat`
 * then overrides the material's), and exactly one of `power` and `powerAt`.
 *
 * @category Thermal
 */
export interface LumpedHeatUpOptions {
  /** Mass of the part [kg], > 0. */
  readonly mass: number;
  /** Specific heat capacity [J/(kg·K)], > 0, constant. */
  readonly specificHeat?: number;
  /**
   * Material of the part: supplies the temperature-dependent specific heat
   * ({@link specificHeatAt}), and the density and thermal conductivity for the Biot-number check.
   */
  readonly material?: ConductiveMaterial;
  /** Heating power absorbed by the part [W], ≥ 0, constant. */
  readonly power?: number;
  /** Heating power absorbed by the part as a function of its temperature [K] → [W] (finite). */
  readonly powerAt?: (temperature: number) => number;
  /** Surface area losing heat [m²], > 0. */
  readonly surfaceArea: number;
  /** Convection coefficient h [W/(m²·K)], ≥ 0. */
  readonly convectionCoefficient: number;
  /** Total hemispherical emissivity ε [-], 0 … 1. */
  readonly emissivity: number;
  /** Temperature of the surrounding air and surfaces [K], > 0. */
  readonly ambientTemperature: number;
  /** Starting temperature of the part [K], > 0 (default: `ambientTemperature`). */
  readonly initialTemperature?: number;
  /** Temperature whose time of arrival is wanted [K], > 0. */
  readonly targetTemperature?: number;
  /**
   * Time span to simulate [s], > 0. Default: up to the target when it is reachable, else five
   * time constants (within 1 % of the steady state). Required when there is neither a reachable
   * target nor a steady state (no losses).
   */
  readonly duration?: number;
  /** Thermal conductivity for the Biot-number check [W/(m·K)], > 0 (default: from `material`). */
  readonly thermalConductivity?: number;
  /** Density, to get the volume for the Biot-number check [kg/m³], > 0 (default: from `material`). */
  readonly density?: number;
  /**
   * Characteristic length $L_c = V/A$ for the Biot number [m], > 0 (default: volume from mass and
   * density, divided by `surfaceArea`).
   */
  readonly characteristicLength?: number;
  /** Relative tolerance of the ODE integration, in [1e-13, 1e-3] (default 1e-10). */
  readonly relativeTolerance?: number;
}

/**
 * Energy balance of a heat-up from the start to the end of the simulated span [J].
 *
 * @category Thermal
 */
export interface LumpedEnergyBalance {
  /** Heat absorbed from the heater, $\int P\,dt$ [J]. */
  readonly input: number;
  /** Heat stored in the part, $m \int_{T_0}^{T_{end}} c(T)\,dT$ (exact for the material's specific-heat model, via `specificEnthalpyChange`) [J]. */
  readonly stored: number;
  /** Heat lost by convection, $\int hA(T - T_a)\,dt$ [J]. */
  readonly convection: number;
  /** Heat lost by radiation, $\int \varepsilon\sigma A(T^4 - T_a^4)\,dt$ [J]. */
  readonly radiation: number;
  /**
   * `input − stored − convection − radiation` [J], zero but for the integration error
   * (|imbalance| ≤ 1e-6 of the largest term at the default tolerance).
   */
  readonly imbalance: number;
}

/**
 * Result of {@link lumpedHeatUp}.
 *
 * @category Thermal
 */
export interface LumpedHeatUpResult {
  /** Times of the temperature curve [s], from 0 (the integrator's accepted steps). */
  readonly times: number[];
  /** Temperatures of the part at {@link LumpedHeatUpResult.times} [K]. */
  readonly temperatures: number[];
  /**
   * Temperature at any time in [0, `duration`] [K], from the integrator's dense output (order 4).
   *
   * @param time - [s], 0 ≤ time ≤ duration (throws {@link InputError} outside)
   * @returns temperature [K]
   */
  readonly temperatureAt: (time: number) => number;
  /** The simulated span [s]. */
  readonly duration: number;
  /** Temperature at the end of the span [K]. */
  readonly finalTemperature: number;
  /**
   * Time to reach `targetTemperature` [s]; `null` when no target was given or it is not
   * reachable (it lies beyond the steady state, or on the wrong side of the start). It is found
   * even when it lies beyond a given `duration` (the curve then stops before it).
   */
  readonly timeToTarget: number | null;
  /** `true` when a target was given and is reached in finite time; `false` otherwise. */
  readonly reachable: boolean;
  /**
   * Equilibrium temperature the part approaches [K] (see {@link steadyStateTemperature});
   * `null` when there is none (net heating without any loss: unbounded rise).
   */
  readonly steadyStateTemperature: number | null;
  /**
   * Time constant near the steady state [s]: $m\,c(T_s) / (h_{eff}(T_s) A)$ with the linearised
   * radiation coefficient; `null` without losses.
   */
  readonly timeConstant: number | null;
  /** Energy balance over the simulated span. */
  readonly energy: LumpedEnergyBalance;
  /**
   * Biot number $Bi = h_{eff} L_c / k$ at the hottest point of the curve; `null` when the
   * conductivity or the volume is unknown.
   */
  readonly biotNumber: number | null;
  /** Validity notes: Biot number above 0.1 (or unknown), material data range left, melting. */
  readonly validity: ValidityNote[];
}


/**
 * Heats a part of uniform temperature (lumped capacitance) with absorbed power $P(T)$ against
 * convection and radiation losses:
 * $$ m\,c(T)\,\frac{dT}{dt} = P(T) - hA\,(T - T_a) - \varepsilon\sigma A\,(T^4 - T_a^4), \qquad T(0) = T_0 . $$
 *
 * Integrated by {@link solveOde} (Dormand–Prince 5(4), adaptive) together with the energy
 * integrals of power, convection and radiation; the time to target is the ODE's event (the
 * first crossing of the target, located on the dense output). Because the model is a
 * one-dimensional autonomous ODE, the temperature moves monotonically toward the first
 * equilibrium in the direction of the net heat flow; the target is reachable exactly when it
 * lies between the start and that equilibrium (computed by the same root search as
 * {@link steadyStateTemperature}). Temperature-dependent specific heat (a material's peak near
 * the Curie point) and power (coupling lost above the Curie point) are followed by the step
 * control, not by a fixed step.
 *
 * Closed form (checked in the tests to 1e-9): with constant $P$, $c$, no radiation and
 * $T_0 = T_a$, $t = -\frac{mc}{hA}\ln\!\left(1 - \frac{(T - T_a)\,hA}{P}\right)$.
 *
 * Cost: grows as duration / time constant (explicit steps near the time constant); a duration
 * above 1e5 time constants is refused with an InputError (the part is long at its steady state).
 * Hard domain (throws {@link InputError}): non-finite or out-of-range inputs (see
 * {@link LumpedHeatUpOptions}); neither `specificHeat` nor `material`; both or neither of
 * `power`/`powerAt`; no `duration` when the span cannot be chosen (no losses and no reachable
 * target).
 *
 * Validity: the part's internal temperature differences are small when the Biot number
 * $Bi = h_{eff} L_c/k < 0.1$ (a validity note is attached otherwise; use {@link radialHeatUp}).
 * Grey diffuse surface, surroundings at one temperature, constant $h$.
 *
 * Accuracy: the integration to the tolerance (default relativeTolerance 1e-10): time to target
 * ≤ 1e-9 relative to the closed form above; |energy imbalance| ≤ 1e-6 of the input energy.
 *
 * @param options - part, heater, surface and surroundings; see {@link LumpedHeatUpOptions}
 * @returns temperature curve, time to target, steady state, energy balance, Biot number and validity notes
 * @throws {@link InputError} on bad input
 * @see F. P. Incropera, D. P. DeWitt et al., Fundamentals of Heat and Mass Transfer, 6th ed.,
 *   Wiley 2007, §5.1–5.3 (lumped capacitance, eqs. 5.2, 5.10 and the Biot criterion eq. 5.13; the
 *   general lumped energy balance eq. 5.15).
 * @example
 * ```ts
 * import { lumpedHeatUp } from "fluxwright";
 * // A 50 g steel part absorbing 200 W, in 20 °C air: when is it at 60 °C?
 * const r = lumpedHeatUp({ mass: 0.05, specificHeat: 490, power: 200, surfaceArea: 0.003,
 *   convectionCoefficient: 10, emissivity: 0.5, ambientTemperature: 293.15,
 *   targetTemperature: 333.15 });
 * console.log(r.reachable); // true
 * console.log(r.timeToTarget); // ≈ 4.9
 * ```
 * @category Thermal
 */
export function lumpedHeatUp(options: LumpedHeatUpOptions): LumpedHeatUpResult {
  const read = readLumpedHeatUpOptions(options);
  const { heatCapacityAt, power, surface, initial, target, duration, rtol } = read;
  const { area, convection, emissivity, ambient } = surface;

  // Equilibrium and reachability (exact for a 1-D autonomous ODE).
  const equilibrium = findEquilibrium(power, surface, initial, options.powerAt === undefined);
  let reachable = false;
  if (target !== null) {
    if (target === initial) reachable = true;
    else if (equilibrium === null) {
      // No equilibrium: unbounded rise (no losses, net heating) or fall toward 0 K.
      const rising = power(initial) > 0;
      reachable = rising ? target > initial : target < initial;
    } else {
      reachable = (target - initial) * (equilibrium - initial) > 0 && Math.abs(target - initial) < Math.abs(equilibrium - initial);
    }
  }

  const derivative = lumpedDerivative(read);
  const energyScale = heatCapacityAt(initial) * Math.max(1, Math.abs((equilibrium ?? target ?? initial) - initial));
  const absoluteTolerance = [1e-12 * Math.max(initial, ambient), 1e-13 * energyScale, 1e-13 * energyScale, 1e-13 * energyScale];
  const riseToTarget = target === null ? 0 : target - initial;

  // Time constant near the steady state.
  const heff = effectiveCoefficient(equilibrium ?? initial, ambient, convection, emissivity);
  const timeConstant = heff > 0 && equilibrium !== null ? heatCapacityAt(equilibrium) / (heff * area) : null;

  // bounded work: the explicit integrator's steps stay near the time constant, so the cost grows
  // as duration/τ; the part sits at its steady state long before 1e5 τ
  if (duration !== null && timeConstant !== null && duration > MAX_TIME_CONSTANTS * timeConstant) {
    throw new InputError(WHERE, "duration", duration, "s", `at most ${MAX_TIME_CONSTANTS} time constants = ${(MAX_TIME_CONSTANTS * timeConstant).toPrecision(4)} s (the part is at its steady state ${steadyText(equilibrium)} long before)`);
  }
  const run = (end: number, withEvent: boolean): OdeResult => {
    const result = solveOde(derivative, [0, 0, 0, 0], {
      end,
      ...(withEvent ? {} : { maxStep: end / 64 }),
      relativeTolerance: rtol,
      absoluteTolerance,
      dense: true,
      maxSteps: 1000000,
      ...(withEvent && target !== null ? { event: (_t: number, y: Float64Array): number => y[0]! - riseToTarget } : {}),
    });
    if (result.status !== "completed" && result.status !== "event") {
      throw new InputError(WHERE, "options", options, "", `a problem the integrator can follow (it stopped: ${result.status})`);
    }
    return result;
  };

  let timeToTarget: number | null = null;
  let eventRun: OdeResult | null = null;
  if (target !== null && reachable) {
    if (target === initial) timeToTarget = 0;
    else {
      const horizon = Math.max(1e12, 1e3 * (timeConstant ?? 0));
      eventRun = run(horizon, true);
      if (eventRun.status === "event" && eventRun.eventTime !== null) timeToTarget = eventRun.eventTime;
      else reachable = false;
    }
  }

  let end: number;
  if (duration !== null) end = duration;
  else if (timeToTarget !== null && timeToTarget > 0) end = timeToTarget;
  else if (timeConstant !== null && equilibrium !== null && equilibrium !== initial) end = 5 * timeConstant;
  else {
    throw new InputError(WHERE, "duration", options.duration, "s", "a finite number > 0 (required: no reachable target and no steady state to approach)");
  }
  // The curve: the run that stopped at the target when the span ends there (its steps merged
  // with 64 dense samples, for plotting), else a run over the span with at least 64 steps.
  const curve = eventRun !== null && end === timeToTarget ? eventRun : run(end, false);
  const { times, temperatures } = curve === eventRun ? mergedCurve(curve, end, initial) : { times: curve.times, temperatures: curve.states.map((s) => initial + s[0]!) };
  const finalState = curve.finalState;
  const finalTemperature = initial + finalState[0]!;
  const sample = curve.sample!;
  const temperatureAt = (time: number): number => {
    if (typeof time !== "number" || !(time >= 0 && time <= end)) {
      throw new InputError("LumpedHeatUpResult.temperatureAt", "time", time, "s", `a finite number between 0 and ${end}`);
    }
    return initial + sample(time)[0]!;
  };

  const energy = lumpedEnergy(read, finalState);

  const { biotNumber, validity } = lumpedRunNotes(read, temperatures);

  return {
    times,
    temperatures,
    temperatureAt,
    duration: end,
    finalTemperature,
    timeToTarget,
    reachable,
    steadyStateTemperature: equilibrium,
    timeConstant,
    energy,
    biotNumber,
    validity,
  };
}

/**
 * The right-hand side of the run: the rise above the initial temperature and the integrated
 * input, convective and radiative energies. The state is the rise (not the temperature itself),
 * so that a tiny rise keeps its full relative precision and the stored energy m·c·ΔT balances the
 * integrated input to rounding; the losses use T − Ta = (T0 − Ta) + ΔT and
 * T⁴ − Ta⁴ = (T − Ta)(T + Ta)(T² + Ta²) for the same reason.
 */
function lumpedDerivative(read: LumpedHeatUpInput): (t: number, y: Float64Array, dy: Float64Array) => void {
  const { initial, power, heatCapacityAt } = read;
  const { area, convection, emissivity, ambient } = read.surface;
  const sigmaA = emissivity * STEFAN_BOLTZMANN * area;
  const hA = convection * area;
  const initialExcess = initial - ambient;
  return (_t: number, y: Float64Array, dy: Float64Array): void => {
    const rise = y[0]!;
    const temperature = initial + rise;
    const p = power(temperature);
    const excess = initialExcess + rise;
    const convective = hA * excess;
    const radiative = sigmaA * excess * (temperature + ambient) * (temperature * temperature + ambient * ambient);
    dy[0] = (p - convective - radiative) / heatCapacityAt(temperature);
    dy[1] = p;
    dy[2] = convective;
    dy[3] = radiative;
  };
}

/** The steps of a run that stopped at the target, merged with 64 dense samples (for plotting). */
function mergedCurve(curve: OdeResult, end: number, initial: number): { times: number[]; temperatures: number[] } {
  const merged: { t: number; v: number }[] = curve.times.map((t, k) => ({ t, v: initial + curve.states[k]![0]! }));
  for (let k = 1; k < 64; k++) {
    const t = (end * k) / 64;
    merged.push({ t, v: initial + curve.sample!(t)[0]! });
  }
  merged.sort((a, b) => a.t - b.t);
  return { times: merged.map((p) => p.t), temperatures: merged.map((p) => p.v) };
}

/** Energy balance at the end of the run; stored energy m ∫c(T) dT, exact for the material's specific-heat model. */
function lumpedEnergy(read: LumpedHeatUpInput, finalState: Float64Array): LumpedEnergyBalance {
  const { mass, material, constantSpecificHeat, initial } = read;
  const finalRise = finalState[0]!;
  const stored =
    constantSpecificHeat !== null
      ? mass * constantSpecificHeat * finalRise
      : mass * specificEnthalpyChange(material!, { fromTemperature: initial, toTemperature: initial + finalRise });
  const input = finalState[1]!;
  const convective = finalState[2]!;
  const radiative = finalState[3]!;
  return { input, stored, convection: convective, radiation: radiative, imbalance: input - stored - convective - radiative };
}
