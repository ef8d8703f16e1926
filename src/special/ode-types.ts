/**
 * The public types of {@link solveOde}: the right-hand side, the event function, the options
 * and the result.
 *
 * @packageDocumentation
 */

/**
 * The right-hand side of $y'(t) = f(t, y)$: writes $f(t, y)$ into `derivative` (length of the
 * state). It must not keep `state` or `derivative` (both are scratch buffers reused between
 * calls) and must not change `state`.
 *
 * @param time - the independent variable $t$ (any unit; seconds in fluxwright's uses)
 * @param state - the state $y$ at `time` (read only)
 * @param derivative - output: $dy/dt$ at (`time`, `state`)
 * @category ODE
 */
export type OdeDerivative = (time: number, state: Float64Array, derivative: Float64Array) => void;

/**
 * An event function $g(t, y)$ for {@link solveOde}: integration stops at the first $t$ where
 * $g$ crosses zero (in the direction chosen by {@link OdeOptions.eventDirection}).
 *
 * @param time - the independent variable $t$
 * @param state - the state $y(t)$ (read only, a scratch buffer; copy it to keep it)
 * @returns $g(t, y)$; its zero is the event
 * @category ODE
 */
export type OdeEvent = (time: number, state: Float64Array) => number;

/**
 * Options of {@link solveOde}. Only `end` is required.
 *
 * @category ODE
 */
export interface OdeOptions {
  /** Initial value of the independent variable $t_0$ (default 0). */
  readonly start?: number;
  /** Final value $t_1$; may be below `start` (integration backwards). Must differ from `start`. */
  readonly end: number;
  /** Relative tolerance of the local error per step, in [1e-13, 1) (default 1e-8). */
  readonly relativeTolerance?: number;
  /**
   * Absolute tolerance of the local error per step: one number ≥ 0 for every component, or
   * one per component (default 1e-10). `relativeTolerance`·|y| + `absoluteTolerance` must be
   * > 0 for every component whose value can be 0.
   */
  readonly absoluteTolerance?: number | ArrayLike<number>;
  /** First trial step size (magnitude, > 0); chosen automatically by default (Hairer's rule). */
  readonly initialStep?: number;
  /** Largest step size allowed (magnitude, > 0; default |end − start|). */
  readonly maxStep?: number;
  /** Cap on the number of attempted steps (integer ≥ 1, default 100 000); status `"max-steps"` when hit. */
  readonly maxSteps?: number;
  /**
   * Record the state after every accepted step in {@link OdeResult.times} /
   * {@link OdeResult.states} (default true). The first entry is the initial state.
   */
  readonly recordSteps?: boolean;
  /**
   * Times at which to report the solution by dense output, in the direction of integration
   * (non-decreasing when `end > start`); entries outside [start, end] or past a stopping event are
   * not reported. Results in {@link OdeResult.outputTimes} / {@link OdeResult.outputStates}.
   */
  readonly outputTimes?: ArrayLike<number>;
  /**
   * Keep the dense-output polynomial of every step, so {@link OdeResult.sample} can evaluate the
   * solution at any time after the run (default false; costs 5·n numbers per step).
   */
  readonly dense?: boolean;
  /** Terminal event: integration stops at the first zero crossing of this function. */
  readonly event?: OdeEvent;
  /**
   * Which crossings count: `"rising"` (g from < 0 to ≥ 0), `"falling"` (from > 0 to ≤ 0) or
   * `"either"` (default).
   */
  readonly eventDirection?: "rising" | "falling" | "either";
  /** Absolute tolerance on the event time (default: 4 ulp of the step's time scale). */
  readonly eventTolerance?: number;
}

/**
 * Why {@link solveOde} stopped.
 * - `"completed"`: reached `end`.
 * - `"event"`: the event function crossed zero (see {@link OdeResult.eventTime}).
 * - `"max-steps"`: the step cap was hit before `end`.
 * - `"step-too-small"`: the step size fell below the resolution of the time variable
 *   (the problem is singular or far too stiff for an explicit method).
 * - `"non-finite"`: the derivative returned NaN or ±Infinity.
 *
 * @category ODE
 */
export type OdeStatus = "completed" | "event" | "max-steps" | "step-too-small" | "non-finite";

/**
 * Result of {@link solveOde}.
 *
 * @category ODE
 */
export interface OdeResult {
  /** Why the integration stopped. */
  readonly status: OdeStatus;
  /** The last time reached: `end`, the event time, or where it stopped early. */
  readonly finalTime: number;
  /** The state at `finalTime` (a fresh array). */
  readonly finalState: Float64Array;
  /** Times of the recorded states: the start and every accepted step (empty if `recordSteps` is false). */
  readonly times: number[];
  /** States at {@link OdeResult.times} (fresh arrays). When an event stops the run, the last entry is the event state. */
  readonly states: Float64Array[];
  /** The requested output times that were reached. */
  readonly outputTimes: number[];
  /** States at {@link OdeResult.outputTimes}, from the dense output (order 4). */
  readonly outputStates: Float64Array[];
  /** Time of the stopping event, or `null` when no event occurred. */
  readonly eventTime: number | null;
  /** State at the event, or `null`. */
  readonly eventState: Float64Array | null;
  /** Accepted steps. */
  readonly acceptedSteps: number;
  /** Rejected steps (error estimate above tolerance). */
  readonly rejectedSteps: number;
  /** Calls of the derivative function. */
  readonly evaluations: number;
  /**
   * Evaluates the solution at any time between `start` and `finalTime` by the dense output of
   * the step that contains it; `null` unless the run had `dense: true`.
   */
  readonly sample: ((time: number) => Float64Array) | null;
}
