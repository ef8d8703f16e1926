/**
 * One-dimensional transient conduction in a cylinder (radial) or a slab (through the
 * thickness, heated from both faces) with heat generated in an exponential skin layer:
 * surface and core temperatures for parts too thick for the lumped model.
 *
 * @packageDocumentation
 */
import { InputError } from "../core/index.js";
import type { Caution, ValidityNote } from "../core/index.js";
import type { ConductiveMaterial } from "../materials/index.js";
import { readRadialHeatUpOptions, WHERE } from "./radial-heat-up-input.js";
import type { RadialHeatUpInput } from "./radial-heat-up-input.js";
import { RadialHistory } from "./radial-heat-up-history.js";
import { radialRunNotes } from "./radial-heat-up-notes.js";
import { RadialConduction } from "./radial-heat-up-step.js";

/**
 * Options of {@link radialHeatUp}.
 *
 * Geometry: a `"cylinder"` of `radius` (heated over its mantle; ends insulated) or a `"slab"`
 * of `thickness` heated equally on both faces (edges insulated). Heat input: `power` with
 * `length` (cylinder) or `faceArea` (slab), or directly `surfacePowerDensity`. Properties:
 * `density`, `specificHeat` and `thermalConductivity`, or a `material` (each explicit number
 * overrides the material's).
 *
 * @category Thermal
 */
export interface RadialHeatUpOptions {
  /** `"cylinder"` (radial conduction) or `"slab"` (conduction through the thickness). */
  readonly geometry: "cylinder" | "slab";
  /** Cylinder radius [m], > 0 (cylinder only). */
  readonly radius?: number;
  /**
   * Bore radius of a hollow cylinder (tube) [m], ≥ 0 and < `radius` (cylinder only; default 0,
   * a solid cylinder). The bore surface is insulated; the "core" is then the bore surface.
   */
  readonly innerRadius?: number;
  /** Slab full thickness [m], > 0 (slab only); the core is the mid-plane. */
  readonly thickness?: number;
  /** Heated length of the cylinder [m], > 0, to turn `power` into a surface density. */
  readonly length?: number;
  /** Area of one face of the slab [m²], > 0, to turn `power` into a surface density. */
  readonly faceArea?: number;
  /** Total power absorbed by the part [W], ≥ 0. */
  readonly power?: number;
  /** Absorbed power per unit heated surface [W/m²], ≥ 0 (instead of `power`). */
  readonly surfacePowerDensity?: number;
  /**
   * Heat generated in each control volume, recomputed from the temperature profile (instead of
   * `power` or `surfacePowerDensity`): called with the node temperatures and the control-volume
   * boundaries, it fills `request.generation` with the power generated in each control volume
   * per square metre of heated surface [W/m²] (finite). Called once at the start of each time
   * step and once at the predicted mid-step temperatures (the source is held over each step,
   * which keeps the energy balance exact). This is how an electromagnetic model that re-solves
   * the induced power as the properties change drives the conduction.
   */
  readonly generationAt?: (request: RadialGenerationRequest) => void;
  /**
   * Electromagnetic skin depth δ [m], > 0: the generated power density falls with depth $d$ below
   * the heated surface as $e^{-2d/\delta}$ (86 % within δ). Omit for heating at the surface itself
   * (δ → 0).
   */
  readonly skinDepth?: number;
  /** Material: temperature-dependent specific heat and conductivity, and density. */
  readonly material?: ConductiveMaterial;
  /** Density [kg/m³], > 0. */
  readonly density?: number;
  /** Specific heat capacity [J/(kg·K)], > 0, constant. */
  readonly specificHeat?: number;
  /** Thermal conductivity [W/(m·K)], > 0, constant. */
  readonly thermalConductivity?: number;
  /** Convection coefficient at the heated surface [W/(m²·K)], ≥ 0. */
  readonly convectionCoefficient: number;
  /** Total hemispherical emissivity of the heated surface [-], 0 … 1. */
  readonly emissivity: number;
  /** Temperature of the surroundings [K], > 0. */
  readonly ambientTemperature: number;
  /** Uniform starting temperature [K], > 0 (default: `ambientTemperature`). */
  readonly initialTemperature?: number;
  /** Time span to simulate [s], > 0. */
  readonly duration: number;
  /** Temperature whose arrival at the surface, at the core and in the mean is wanted [K], > 0. */
  readonly targetTemperature?: number;
  /**
   * Switch the heating off when this temperature reaches `targetTemperature` (the step is
   * shortened to land on it within `temperatureTolerance`): the surface, the core, or the
   * volume-mean temperature. Without `soakBand` the run then ends.
   */
  readonly stopAt?: "surface" | "core" | "mean";
  /**
   * After the heating stops (`stopAt`), continue without heating until the surface and core
   * temperatures are within this band [K], > 0 (the soak); the run ends then or at `duration`.
   */
  readonly soakBand?: number;
  /**
   * Temperature whose reach into the part is wanted [K], > 0: the result gives the depth below
   * the heated surface down to which the peak temperature reached it (the hardening depth).
   */
  readonly hardeningTemperature?: number;
  /** Number of cells across the radius or half-thickness (integer, 4 … 2000; default 60). */
  readonly cells?: number;
  /** Local error allowed per time step [K], > 0 (default 0.005 K). */
  readonly temperatureTolerance?: number;
  /** Largest time step [s], > 0 (default `duration`/100). */
  readonly maxTimeStep?: number;
}

/**
 * What {@link RadialHeatUpOptions.generationAt} receives; it writes into `generation`.
 *
 * @category Thermal
 */
export interface RadialGenerationRequest {
  /** Time [s] at which the generation is wanted. */
  readonly time: number;
  /** Temperature at each node [K], from the core (index 0) to the heated surface (read only; reused between calls). */
  readonly temperatures: Float64Array;
  /**
   * Boundaries of the control volumes [m] (one more than nodes): node `i` owns
   * `faces[i] … faces[i + 1]`; `faces[0]` is the axis, bore or mid-plane and the last is the heated surface.
   */
  readonly faces: Float64Array;
  /** To fill: power generated in each control volume per square metre of heated surface [W/m²]. */
  readonly generation: Float64Array;
}

/**
 * Energy balance of {@link radialHeatUp}, per square metre of heated surface [J/m²].
 *
 * @category Thermal
 */
export interface RadialEnergyBalance {
  /** Heat generated in the part [J/m²]. */
  readonly input: number;
  /** Heat stored: $\sum_i \rho\,c_i V_i\,\Delta T_i$ per unit heated area [J/m²]. */
  readonly stored: number;
  /** Heat lost from the surface by convection and radiation [J/m²]. */
  readonly lost: number;
  /** `input − stored − lost` [J/m²], rounding only (the scheme conserves energy exactly). */
  readonly imbalance: number;
}

/**
 * Result of {@link radialHeatUp}.
 *
 * @category Thermal
 */
export interface RadialHeatUpResult {
  /** Times of the accepted steps [s], from 0. */
  readonly times: number[];
  /** Surface temperature at each time [K]. */
  readonly surfaceTemperatures: number[];
  /** Core (axis, bore surface or mid-plane) temperature at each time [K]. */
  readonly coreTemperatures: number[];
  /** Volume-mean temperature at each time [K]. */
  readonly meanTemperatures: number[];
  /** Distances of the grid nodes from the axis or mid-plane [m], 0 … radius or half-thickness. */
  readonly positions: Float64Array;
  /** Temperature at each node at the end [K]. */
  readonly finalTemperatures: Float64Array;
  /** Surface temperature at the end [K]. */
  readonly finalSurfaceTemperature: number;
  /** Core temperature at the end [K]. */
  readonly finalCoreTemperature: number;
  /** Time the surface first reaches `targetTemperature` [s] (linear between steps), or `null`. */
  readonly timeToSurfaceTarget: number | null;
  /** Time the core first reaches `targetTemperature` [s] (linear between steps), or `null`. */
  readonly timeToCoreTarget: number | null;
  /** Time the volume-mean temperature first reaches `targetTemperature` [s] (linear between steps), or `null`. */
  readonly timeToMeanTarget: number | null;
  /** Volume-mean temperature at the end [K]. */
  readonly finalMeanTemperature: number;
  /** Time the heating was switched off by `stopAt` [s], or `null` (no `stopAt`, or target not reached within `duration`). */
  readonly heatingTime: number | null;
  /** Surface minus core temperature when the heating stopped [K], or `null` when it did not stop. */
  readonly surfaceCoreDifferenceAtStop: number | null;
  /** Time from switching off until surface and core are within `soakBand` [s] (linear between steps), or `null`. */
  readonly soakTime: number | null;
  /**
   * Depth below the heated surface down to which the peak temperature reached
   * `hardeningTemperature` by the end [m] (linear between nodes; 0 when the surface never
   * reached it; the whole radius or half-thickness when the core did), or `null` without
   * `hardeningTemperature`.
   */
  readonly hardeningDepth: number | null;
  /** The hardening depth at each time [m] (never decreasing), or `null` without `hardeningTemperature`. */
  readonly hardeningDepths: number[] | null;
  /** Energy balance per square metre of heated surface. */
  readonly energy: RadialEnergyBalance;
  /**
   * Biot number $h_{eff} L / k$ with $L$ the radius or half-thickness, at the hottest surface
   * temperature reached (the lumped model needs $h_{eff}(V/A)/k < 0.1$).
   */
  readonly biotNumber: number;
  /** Accepted and rejected time steps. */
  readonly steps: {
    /** Time steps accepted. */
    readonly accepted: number;
    /** Time steps rejected by the error control and retried smaller. */
    readonly rejected: number;
  };
  /** Validity notes (grid coarser than the skin layer, material data range). */
  readonly validity: ValidityNote[];
  /**
   * Cautions: `part-above-melting` (danger) when a `material` is given and some point of the
   * part reaches its melting temperature (the model has no phase change: the temperatures above
   * it are not physical).
   */
  readonly cautions: Caution[];
}

/**
 * Transient heat conduction across a cylinder's radius or a slab's half-thickness with the
 * induced power generated in a skin layer, and convection plus radiation at the heated surface:
 * $$ \rho c(T)\,\frac{\partial T}{\partial t} = \frac{1}{r^{n}}\frac{\partial}{\partial r}\!\left(r^{n} k(T)\,\frac{\partial T}{\partial r}\right) + q_0\,e^{-2(R - r)/\delta} , $$
 * $n = 1$ (cylinder) or $0$ (slab, $r$ from the mid-plane), $\partial T/\partial r = 0$ at the core,
 * and at the surface $r = R$:
 * $-k\,\partial T/\partial r = h(T - T_a) + \varepsilon\sigma(T^4 - T_a^4)$; $q_0$ makes the generated
 * power per unit surface equal the absorbed surface power density.
 * A hollow cylinder (`innerRadius` $a$) has an insulated bore, $\partial T/\partial r = 0$ at $r = a$.
 * Instead of the exponential profile, `generationAt` supplies the power generated in each
 * control volume from the current temperature profile (an electromagnetic model re-solved as
 * the properties change, see `inductionRadialHeatUp` in the study module).
 *
 * Results besides the surface and core curves: the volume-mean temperature, the times each of
 * the three reaches `targetTemperature`, the heating switched off when the one named by
 * `stopAt` reaches it (the surface-to-core difference at that moment), the soak time until
 * surface and core are within `soakBand`, and the depth the peak temperature reached
 * `hardeningTemperature` (never decreasing in time).
 *
 * Method of lines: a vertex-centred finite-volume grid (refined geometrically toward the surface
 * when the skin layer is thin; the generation integrated exactly over each cell), stepped in time
 * by implicit Euler with Richardson extrapolation (one step against two half steps: second order
 * and L-stable, so the stiff surface layer costs no stability limit); the difference of the two
 * solutions is the local error estimate that controls the step. Radiation is linearised about a
 * predictor, and temperature-dependent $c$ and $k$ are evaluated at the predicted mid-step
 * temperature. Each implicit step conserves energy exactly (the balance closes to rounding).
 *
 * Hard domain (throws {@link InputError}): unknown option keys; non-finite or out-of-range
 * inputs; a geometry size missing; `innerRadius` for a slab or not below `radius`; `power`
 * without `length`/`faceArea`; not exactly one of `power`, `surfacePowerDensity`, `generationAt`;
 * a non-finite generation written by `generationAt`; `stopAt` without `targetTemperature`,
 * `soakBand` without `stopAt`; missing properties (no material and no explicit value).
 *
 * Validity: 1-D conduction (long cylinder, wide slab), uniform skin depth, properties at the
 * local temperature, no phase change. Accuracy (tests, 60 cells): within 1e-3 of the temperature
 * change against the series solutions for a slab and a cylinder with convection (fixture from
 * mpmath), and against Incropera's Example 5.4 within its rounding; within 1e-3 against the
 * Carslaw–Jaeger series for uniform generation with convection, a constant surface flux, and a
 * hollow cylinder with an insulated bore (fixture `carslaw-jaeger.json`); the mean temperature
 * within 0.1 % of the lumped model at Biot 1e-3 with the power at the surface; energy balance
 * ≤ 1e-9 relative.
 *
 * @param options - geometry, heating, properties, surface and time span; see {@link RadialHeatUpOptions}
 * @returns surface and core temperature curves, final profile, times to target, energy balance
 * @throws {@link InputError} on bad input
 * @see F. P. Incropera, D. P. DeWitt et al., Fundamentals of Heat and Mass Transfer, 6th ed.,
 *   Wiley 2007, §5.5–5.6 (exact series solutions, eqs. 5.39 and 5.49) and §5.10 (finite-volume
 *   implicit method).
 * @see H. S. Carslaw, J. C. Jaeger, Conduction of Heat in Solids, 2nd ed., Oxford 1959, ch. VII
 *   (the circular cylinder: constant flux, heat production, hollow cylinder).
 * @see S. V. Patankar, Numerical Heat Transfer and Fluid Flow, Hemisphere 1980, ch. 4 (control
 *   volumes, source linearisation).
 * @example
 * ```ts
 * import { radialHeatUp } from "fluxwright";
 * // A 20 mm steel bar, 1 kW absorbed per 0.1 m of length in a 1 mm skin, for 10 s:
 * const r = radialHeatUp({ geometry: "cylinder", radius: 0.01, length: 0.1, power: 1000,
 *   skinDepth: 0.001, density: 7850, specificHeat: 480, thermalConductivity: 45,
 *   convectionCoefficient: 10, emissivity: 0, ambientTemperature: 293.15, duration: 10 });
 * console.log(r.finalSurfaceTemperature > r.finalCoreTemperature); // true
 * ```
 * @category Thermal
 */
export function radialHeatUp(options: RadialHeatUpOptions): RadialHeatUpResult {
  const input = readRadialHeatUpOptions(options);
  const { initial, duration, target, stopAt, tolerance, maxStep, cells: n } = input;
  const conduction = new RadialConduction(input);
  const { x, full } = conduction;
  const history = new RadialHistory(input, x, conduction.span);
  const T = new Float64Array(n + 1);
  const stopValue = (temps: Float64Array): number => (stopAt === "surface" ? temps[n]! : stopAt === "core" ? temps[0]! : conduction.meanOf(temps));

  let time = 0;
  let tau = Math.min(maxStep, duration * 1e-6);
  let accepted = 0;
  let rejected = 0;
  let landingTries = 0;
  const rising = target !== null && target >= initial;
  const landing = Math.max(tolerance, 1e-9 * (target ?? 0));

  while (time < duration && !history.done) {
    if (accepted + rejected > 2000000) {
      throw new InputError(WHERE, "temperatureTolerance", tolerance, "K", "large enough for the run to finish in 2e6 steps");
    }
    let last = false;
    if (time + tau >= duration * (1 - 1e-12)) {
      tau = duration - time;
      last = true;
    }
    const heating = history.heating;
    const err = conduction.trialStep(T, time, tau, heating);
    if (!Number.isFinite(err)) {
      throw new InputError(WHERE, "options", options, "", "a problem with finite temperatures");
    }
    if (err > tolerance && tau > duration * 1e-14) {
      rejected++;
      tau *= Math.max(0.1, 0.9 * Math.sqrt(tolerance / err));
      continue;
    }
    conduction.extrapolate();
    // Land on the stop target: shorten the step when it overshoots by more than the tolerance.
    let stopsNow = false;
    if (heating && stopAt !== null && target !== null) {
      const before = stopValue(T);
      const after = stopValue(full);
      const goal = target - initial;
      const crossed = rising ? after >= goal : after <= goal;
      if (crossed) {
        if (Math.abs(after - goal) > landing && landingTries < 12 && after !== before) {
          landingTries++;
          rejected++;
          tau *= Math.max(1e-3, Math.min(0.999, (goal - before) / (after - before)));
          continue;
        }
        stopsNow = true;
      }
    }
    landingTries = 0;
    conduction.accept(T, tau, heating);
    const previousTime = time;
    time = last ? duration : time + tau;
    accepted++;
    history.record(previousTime, time, T, conduction.meanOf(T), stopsNow);
    const factor = err > 0 ? Math.min(3, Math.max(0.2, 0.9 * Math.sqrt(tolerance / err))) : 3;
    tau = Math.min(maxStep, tau * factor);
  }
  return radialResult(input, conduction, history, T, { accepted, rejected });
}

/** The result of a finished run: curves, final profile, target times, energy balance and notes. */
function radialResult(input: RadialHeatUpInput, conduction: RadialConduction, history: RadialHistory, T: Float64Array, steps: { accepted: number; rejected: number }): RadialHeatUpResult {
  const { kAt, ambient, convection, emissivity, size, skinDepth, material, initial } = input;
  const { x, n, span } = conduction;
  const { hottest, peak, surfaceTemperatures, coreTemperatures, hardeningDepths } = history;
  const { biotNumber, validity, cautions } = radialRunNotes({ kAt, hottest, ambient, convection, emissivity, span, size, x, n, skinDepth, material, initial, T, peak, surfaceTemperatures, coreTemperatures });
  const { input: energyIn, stored, lost } = conduction;
  return {
    times: history.times,
    surfaceTemperatures,
    coreTemperatures,
    meanTemperatures: history.meanTemperatures,
    positions: x,
    finalTemperatures: Float64Array.from(T, (v) => initial + v),
    finalSurfaceTemperature: initial + T[n]!,
    finalCoreTemperature: initial + T[0]!,
    finalMeanTemperature: initial + conduction.meanOf(T),
    timeToSurfaceTarget: history.timeToSurfaceTarget,
    timeToCoreTarget: history.timeToCoreTarget,
    timeToMeanTarget: history.timeToMeanTarget,
    heatingTime: history.heatingTime,
    surfaceCoreDifferenceAtStop: history.differenceAtStop,
    soakTime: history.soakTime,
    hardeningDepth: hardeningDepths === null ? null : hardeningDepths[hardeningDepths.length - 1]!,
    hardeningDepths,
    energy: { input: energyIn, stored, lost, imbalance: energyIn - stored - lost },
    biotNumber,
    cautions,
    steps,
    validity,
  };
}
