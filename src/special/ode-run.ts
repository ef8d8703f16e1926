/**
 * The state of one {@link solveOde} run apart from step-size control: the stage and
 * dense-output arrays, what the run records (steps, output times, dense steps), the event
 * search inside an accepted step, and the result. Internal to `special/`.
 *
 * @packageDocumentation
 */
import { brentBracketed } from "./brent-root.js";
import type { DormandPrinceWork } from "./dormand-prince.js";
import { denseSampler } from "./ode-dense.js";
import type { DenseStep } from "./ode-dense.js";
import type { OdeSetup } from "./ode-setup.js";
import type { OdeDerivative, OdeResult, OdeStatus } from "./ode-types.js";

/** One run's arrays, records and counters. */
export class OdeRun {
  readonly n: number;
  /** Stage derivatives and stage/new states of the Dormand–Prince step. */
  readonly work: DormandPrinceWork & { readonly k1: Float64Array; readonly k2: Float64Array; readonly k7: Float64Array; readonly yStage: Float64Array; readonly yNew: Float64Array };
  // Dense-output coefficients of the current step: y(t + θh) = r1 + θ(r2 + (1−θ)(r3 + θ(r4 + (1−θ) r5))).
  readonly r1: Float64Array;
  readonly r2: Float64Array;
  readonly r3: Float64Array;
  readonly r4: Float64Array;
  readonly r5: Float64Array;
  /** The interpolated state at the last event search (the event state once one is found). */
  readonly scratch: Float64Array;
  readonly times: number[] = [];
  readonly states: Float64Array[] = [];
  private readonly outStates: number[] = [];
  private readonly outStateArrays: Float64Array[] = [];
  private readonly denseSteps: DenseStep[] = [];
  private outIndex = 0;
  evaluations = 0;
  accepted = 0;
  rejected = 0;

  constructor(
    private readonly setup: OdeSetup,
    private readonly derivative: OdeDerivative,
  ) {
    const n = setup.n;
    this.n = n;
    this.work = {
      k1: new Float64Array(n),
      k2: new Float64Array(n),
      k3: new Float64Array(n),
      k4: new Float64Array(n),
      k5: new Float64Array(n),
      k6: new Float64Array(n),
      k7: new Float64Array(n),
      yStage: new Float64Array(n),
      yNew: new Float64Array(n),
    };
    this.r1 = new Float64Array(n);
    this.r2 = new Float64Array(n);
    this.r3 = new Float64Array(n);
    this.r4 = new Float64Array(n);
    this.r5 = new Float64Array(n);
    this.scratch = new Float64Array(n);
  }

  /** One derivative call, counted; false when a component is not finite. */
  readonly evaluate = (t: number, state: Float64Array, out: Float64Array): boolean => {
    this.derivative(t, state, out);
    this.evaluations++;
    for (let i = 0; i < this.n; i++) if (!Number.isFinite(out[i]!)) return false;
    return true;
  };

  /** The current step's continuous extension at fraction θ of the step, into `out`. */
  interpolate(theta: number, out: Float64Array): void {
    const { n, r1, r2, r3, r4, r5 } = this;
    const omt = 1 - theta;
    for (let i = 0; i < n; i++) {
      out[i] = r1[i]! + theta * (r2[i]! + omt * (r3[i]! + theta * (r4[i]! + omt * r5[i]!)));
    }
  }

  /** Records the initial state, skips output times before the start and reports those at it. */
  recordStart(y: Float64Array): void {
    const { t0, direction, outputTimes, recordSteps } = this.setup;
    if (recordSteps) this.recordStep(t0, y);
    while (this.outIndex < outputTimes.length && (outputTimes[this.outIndex]! - t0) * direction < 0) this.outIndex++;
    while (this.outIndex < outputTimes.length && outputTimes[this.outIndex] === t0) {
      this.outStates.push(t0);
      this.outStateArrays.push(Float64Array.from(y));
      this.outIndex++;
    }
  }

  /** Appends one recorded step (a copy of the state). */
  recordStep(t: number, y: Float64Array): void {
    this.times.push(t);
    this.states.push(Float64Array.from(y));
  }

  /**
   * Where the event function crosses zero in the accepted step from `t` (signed size `hs`,
   * unsigned `h`) to `tNew`, located on the dense output by Brent's method; `null` when it does
   * not cross in the set direction. On a crossing, `scratch` holds the event state.
   */
  locateEvent(t: number, hs: number, h: number, tNew: number, gOld: number, gNew: number): number | null {
    const { event, eventDirection, eventTolerance } = this.setup;
    if (event === undefined) return null;
    const crosses = (eventDirection !== "falling" && gOld < 0 && gNew >= 0) || (eventDirection !== "rising" && gOld > 0 && gNew <= 0);
    if (!crosses) return null;
    const scratch = this.scratch;
    const g = (theta: number): number => {
      this.interpolate(theta, scratch);
      return event(t + theta * hs, scratch);
    };
    const thetaTolerance = eventTolerance > 0 ? eventTolerance / h : (4 * Number.EPSILON * Math.max(Math.abs(t), Math.abs(tNew))) / h;
    // Brent's method, returning the bracket end past the crossing so that the event has happened
    // (a NaN of the event function ends the search at the step's end).
    const located = gNew === 0 ? 1 : brentBracketed(g, 0, 1, gOld, gNew, Math.max(thetaTolerance, 1e-15), 200, true);
    const theta = Number.isNaN(located) ? 1 : located;
    this.interpolate(theta, scratch);
    if (theta === 1) scratch.set(this.work.yNew);
    return theta === 1 ? tNew : t + theta * hs;
  }

  /** Dense samples at the requested output times inside the accepted step, up to `stepEnd`. */
  recordOutputs(t: number, hs: number, tNew: number, stepEnd: number, eventTime: number | null): void {
    const { outputTimes, direction } = this.setup;
    while (this.outIndex < outputTimes.length) {
      const to = outputTimes[this.outIndex]!;
      if ((to - stepEnd) * direction > 0) break;
      if (to === tNew && eventTime === null) {
        this.outStateArrays.push(Float64Array.from(this.work.yNew));
      } else {
        const out = new Float64Array(this.n);
        this.interpolate((to - t) / hs, out);
        this.outStateArrays.push(out);
      }
      this.outStates.push(to);
      this.outIndex++;
    }
  }

  /** Keeps the accepted step's continuous extension for {@link OdeResult.sample}. */
  keepDenseStep(t: number, hs: number): void {
    const n = this.n;
    const c = new Float64Array(5 * n);
    c.set(this.r1, 0);
    c.set(this.r2, n);
    c.set(this.r3, 2 * n);
    c.set(this.r4, 3 * n);
    c.set(this.r5, 4 * n);
    this.denseSteps.push({ t, h: hs, c });
  }

  /** The result of the run (copies of the final and event states). */
  finish(status: OdeStatus, finalTime: number, finalState: Float64Array, eventTime: number | null, eventState: Float64Array | null): OdeResult {
    const { dense, t0, direction } = this.setup;
    return {
      status,
      finalTime,
      finalState: Float64Array.from(finalState),
      times: this.times,
      states: this.states,
      outputTimes: this.outStates,
      outputStates: this.outStateArrays,
      eventTime,
      eventState: eventState === null ? null : Float64Array.from(eventState),
      acceptedSteps: this.accepted,
      rejectedSteps: this.rejected,
      evaluations: this.evaluations,
      sample: dense ? denseSampler(this.denseSteps, this.n, t0, finalTime, direction, finalState) : null,
    };
  }
}
