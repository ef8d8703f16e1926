/**
 * The discretised conduction problem of {@link radialHeatUp}: the finite-volume grid, the heat
 * generation in each control volume (fixed skin-layer shares or the `generationAt` callback),
 * the implicit Euler step with linearised surface loss, the Richardson trial step whose
 * difference is the local error estimate, and the energy balance of accepted steps.
 *
 * @packageDocumentation
 */
import { InputError } from "../core/index.js";
import { solveTridiagonal } from "../special/internal.js";
import { STEFAN_BOLTZMANN } from "../units/index.js";
import { generationShares, radialGrid } from "./radial-grid.js";
import type { RadialHeatUpInput } from "./radial-heat-up-input.js";
import { WHERE } from "./radial-heat-up-input.js";
import type { RadialGenerationRequest } from "./radial-heat-up.js";

/**
 * Grid, work arrays and energy totals of one run. Temperatures are offsets from the initial
 * temperature, so rounding scales with the temperature change rather than with the absolute
 * temperature.
 */
export class RadialConduction {
  readonly n: number;
  readonly span: number;
  /** Node positions x_0 = inner (core or bore) … x_N = size (surface). */
  readonly x: Float64Array;
  readonly faces: Float64Array;
  private readonly volume: Float64Array;
  private readonly faceArea: Float64Array;
  private readonly totalVolume: number;
  /** Power generated in each control volume over the current step [W/m² of heated surface]. */
  private readonly source: Float64Array;
  /** The callback's source at the start of the step, kept across rejected retries. */
  private readonly startSource: Float64Array;
  private startSourceValid = false;
  private readonly capacity: Float64Array;
  private readonly conductance: Float64Array;
  private readonly lower: Float64Array;
  private readonly diag: Float64Array;
  private readonly upper: Float64Array;
  private readonly rhs: Float64Array;
  private readonly work: Float64Array;
  private readonly absolute: Float64Array;
  private readonly generated: Float64Array;
  private readonly request: RadialGenerationRequest;
  private readonly sigmaEps: number;
  private readonly ambient4: number;
  /** After {@link trialStep}: the one-step solution, then (after {@link accept}) the accepted state. */
  readonly full: Float64Array;
  /** After {@link trialStep}: the state after two half steps. */
  readonly half: Float64Array;
  private readonly mid: Float64Array;
  private lossFull = 0;
  private lossHalf1 = 0;
  private lossHalf2 = 0;
  /** Energy totals of the accepted steps [J/m² of heated surface]. */
  input = 0;
  lost = 0;
  stored = 0;

  constructor(private readonly p: RadialHeatUpInput) {
    const n = p.cells;
    this.n = n;
    const { span, x, faces, volume, faceArea, totalVolume } = radialGrid(p.inner, p.size, n, p.skinDepth, p.cylinder);
    this.span = span;
    this.x = x;
    this.faces = faces;
    this.volume = volume;
    this.faceArea = faceArea;
    this.totalVolume = totalVolume;
    // Fixed heating: the share of the generated power in each CV (exact integral of the exponential profile).
    this.source = new Float64Array(n + 1);
    if (p.generationAt === undefined) {
      const share = generationShares(faces, n, p.size, p.skinDepth, p.cylinder);
      for (let i = 0; i <= n; i++) this.source[i] = p.flux * share[i]!;
    }
    this.sigmaEps = p.emissivity * STEFAN_BOLTZMANN;
    this.ambient4 = p.ambient ** 4;
    this.capacity = new Float64Array(n + 1);
    this.conductance = new Float64Array(n);
    this.full = new Float64Array(n + 1);
    this.half = new Float64Array(n + 1);
    this.mid = new Float64Array(n + 1);
    this.lower = new Float64Array(n + 1);
    this.diag = new Float64Array(n + 1);
    this.upper = new Float64Array(n + 1);
    this.rhs = new Float64Array(n + 1);
    this.work = new Float64Array(n + 1);
    this.absolute = new Float64Array(n + 1);
    this.generated = new Float64Array(n + 1);
    this.request = { time: 0, temperatures: this.absolute, faces, generation: this.generated };
    this.startSource = new Float64Array(n + 1);
  }

  /** Fills `into` from the callback at offsets `temps` and time `at` (a no-op for fixed heating). */
  private evaluateSource(temps: Float64Array, at: number, into: Float64Array): void {
    const { generationAt, initial } = this.p;
    if (generationAt === undefined) return;
    const { n, absolute, generated } = this;
    for (let i = 0; i <= n; i++) {
      absolute[i] = initial + temps[i]!;
      generated[i] = 0;
    }
    (this.request as { time: number }).time = at;
    generationAt(this.request);
    for (let i = 0; i <= n; i++) {
      const g = generated[i]!;
      if (typeof g !== "number" || !Number.isFinite(g)) {
        throw new InputError(WHERE, `generationAt(…).generation[${i}]`, g, "W/m²", "a finite number");
      }
      into[i] = g;
    }
  }

  /** Heat capacities of the volumes and conductances between nodes at offsets `temps`. */
  private setProperties(temps: Float64Array): void {
    const { n, capacity, conductance, volume, faceArea, x } = this;
    const { density, cAt, kAt, initial } = this.p;
    for (let i = 0; i <= n; i++) capacity[i] = density * cAt(initial + temps[i]!) * volume[i]!;
    for (let i = 0; i < n; i++) {
      conductance[i] = (kAt(initial + 0.5 * (temps[i]! + temps[i + 1]!)) * faceArea[i]!) / (x[i + 1]! - x[i]!);
    }
  }

  /**
   * One implicit Euler step of size tau from `from` into `to` (offsets from the initial
   * temperature), radiation linearised about the absolute temperature `star`: the surface loss
   * per unit area is lossConstant + lossSlope·θ_N. Returns the surface loss over the step [J/m²].
   */
  private implicitStep(from: Float64Array, to: Float64Array, tau: number, star: number, heating: boolean): number {
    const { n, capacity, conductance, lower, diag, upper, rhs, source, sigmaEps } = this;
    const { convection, initial, ambient } = this.p;
    const star3 = star * star * star;
    const radiationSlope = 4 * sigmaEps * star3;
    const lossSlope = convection + radiationSlope;
    const lossConstant =
      convection * (initial - ambient) + sigmaEps * (star3 * star - this.ambient4) + radiationSlope * (initial - star);
    for (let i = 0; i <= n; i++) {
      const gl = i > 0 ? conductance[i - 1]! : 0;
      const gr = i < n ? conductance[i]! : 0;
      lower[i] = -gl;
      upper[i] = -gr;
      diag[i] = capacity[i]! / tau + gl + gr;
      rhs[i] = (capacity[i]! / tau) * from[i]! + (heating ? source[i]! : 0);
    }
    diag[n] = diag[n]! + lossSlope;
    rhs[n] = rhs[n]! - lossConstant;
    solveTridiagonal(lower, diag, upper, rhs, to, this.work, n + 1);
    return tau * (lossConstant + lossSlope * to[n]!);
  }

  /**
   * A trial step of size tau from the state `T` at `time`: a predictor with properties, radiation
   * and source at the start (when any of them varies), then one full and two half implicit steps
   * about the predicted mid-step state. Leaves them in {@link full} and {@link half} and returns
   * the largest difference between the two [K], the local error estimate.
   */
  trialStep(T: Float64Array, time: number, tau: number, heating: boolean): number {
    const { n, full, half, mid } = this;
    const { generationAt, variable, initial } = this.p;
    if (heating && !this.startSourceValid) {
      this.evaluateSource(T, time, this.startSource);
      this.startSourceValid = true;
    }
    if (heating && generationAt !== undefined) this.source.set(this.startSource);
    this.setProperties(T);
    let star = initial + T[n]!;
    if (variable || this.sigmaEps > 0 || (heating && generationAt !== undefined)) {
      this.implicitStep(T, full, tau, star, heating);
      for (let i = 0; i <= n; i++) mid[i] = 0.5 * (T[i]! + full[i]!);
      if (variable) this.setProperties(mid);
      if (heating) this.evaluateSource(mid, time + 0.5 * tau, this.source);
      star = initial + mid[n]!;
    }
    this.lossFull = this.implicitStep(T, full, tau, star, heating);
    this.lossHalf1 = this.implicitStep(T, mid, 0.5 * tau, star, heating);
    this.lossHalf2 = this.implicitStep(mid, half, 0.5 * tau, star, heating);
    let err = 0;
    for (let i = 0; i <= n; i++) err = Math.max(err, Math.abs(half[i]! - full[i]!));
    return err;
  }

  /** The Richardson-extrapolated state 2·half − full (second order, conservative), into {@link full}. */
  extrapolate(): void {
    const { n, full, half } = this;
    for (let i = 0; i <= n; i++) full[i] = 2 * half[i]! - full[i]!;
  }

  /** Takes the extrapolated state into `T` and adds the step to the energy totals. */
  accept(T: Float64Array, tau: number, heating: boolean): void {
    const { n, capacity, full, source } = this;
    let stored = 0;
    for (let i = 0; i <= n; i++) {
      stored += capacity[i]! * (full[i]! - T[i]!);
      T[i] = full[i]!;
    }
    const stepLoss = 2 * (this.lossHalf1 + this.lossHalf2) - this.lossFull;
    if (heating) {
      let totalSource = 0;
      for (let i = 0; i <= n; i++) totalSource += source[i]!;
      this.input += totalSource * tau;
    }
    this.lost += stepLoss;
    this.stored += stored;
    this.startSourceValid = false;
  }

  /** Volume-mean of offsets `temps`. */
  meanOf(temps: Float64Array): number {
    const { n, volume } = this;
    let s = 0;
    for (let i = 0; i <= n; i++) s += volume[i]! * temps[i]!;
    return s / this.totalVolume;
  }
}
