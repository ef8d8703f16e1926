/**
 * Checks and reads the input of {@link solveOde}: the initial state, the interval, the
 * tolerances and the recording, dense-output and event options.
 *
 * @packageDocumentation
 */
import { InputError, requireFinite, requirePositive, requireInteger, requireKnownKeys } from "../core/index.js";
import type { OdeDerivative, OdeEvent, OdeOptions } from "./ode-types.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const ODE_FIELDS: readonly string[] = Object.freeze(["start", "end", "relativeTolerance", "absoluteTolerance", "initialStep", "maxStep", "maxSteps", "recordSteps", "outputTimes", "dense", "event", "eventDirection", "eventTolerance"]);

/** The function name errors are reported under. */
export const WHERE = "solveOde";

/** The checked input of a run. */
export interface OdeSetup {
  readonly n: number;
  readonly t0: number;
  readonly t1: number;
  readonly rtol: number;
  readonly atol: Float64Array;
  readonly span: number;
  readonly direction: number;
  readonly maxStep: number;
  readonly maxSteps: number;
  readonly recordSteps: boolean;
  readonly dense: boolean;
  readonly event: OdeEvent | undefined;
  readonly eventDirection: "rising" | "falling" | "either";
  readonly eventTolerance: number;
  readonly outputTimes: number[];
  /** The initial state (a fresh array). */
  readonly y: Float64Array;
}

/** Checks the arguments of {@link solveOde} (throws {@link InputError}) and returns them read. */
export function readOdeSetup(derivative: OdeDerivative, initialState: ArrayLike<number>, options: OdeOptions): OdeSetup {
  if (typeof derivative !== "function") throw new InputError(WHERE, "derivative", derivative, "", "a function");
  if (initialState === null || typeof initialState !== "object" || typeof initialState.length !== "number") {
    throw new InputError(WHERE, "initialState", initialState, "", "an array of finite numbers");
  }
  const n = initialState.length;
  if (n < 1) throw new InputError(WHERE, "initialState", initialState, "", "an array of length ≥ 1");
  requireKnownKeys(WHERE, "options", options, ODE_FIELDS);
  const t0 = options.start === undefined ? 0 : requireFinite(WHERE, "start", options.start, "");
  const t1 = requireFinite(WHERE, "end", options.end, "");
  if (t1 === t0) throw new InputError(WHERE, "end", t1, "", `a finite number ≠ start (${t0})`);
  const rtol = options.relativeTolerance ?? 1e-8;
  if (typeof rtol !== "number" || !(rtol >= 1e-13 && rtol < 1)) {
    throw new InputError(WHERE, "relativeTolerance", rtol, "", "a number ≥ 1e-13 and < 1");
  }
  const atol = new Float64Array(n);
  const atolOption = options.absoluteTolerance ?? 1e-10;
  if (typeof atolOption === "number") {
    if (!(atolOption >= 0) || !Number.isFinite(atolOption)) {
      throw new InputError(WHERE, "absoluteTolerance", atolOption, "", "a finite number ≥ 0");
    }
    atol.fill(atolOption);
  } else {
    if (atolOption === null || typeof atolOption !== "object" || atolOption.length !== n) {
      throw new InputError(WHERE, "absoluteTolerance", atolOption, "", `a number or an array of length ${n}`);
    }
    for (let i = 0; i < n; i++) {
      const a = atolOption[i];
      if (typeof a !== "number" || !(a >= 0) || !Number.isFinite(a)) {
        throw new InputError(WHERE, `absoluteTolerance[${i}]`, a, "", "a finite number ≥ 0");
      }
      atol[i] = a;
    }
  }
  const span = Math.abs(t1 - t0);
  const direction = t1 > t0 ? 1 : -1;
  const maxStep = options.maxStep === undefined ? span : requirePositive(WHERE, "maxStep", options.maxStep, "");
  const maxSteps = options.maxSteps === undefined ? 100000 : requireInteger(WHERE, "maxSteps", options.maxSteps, 1);
  const recordSteps = options.recordSteps ?? true;
  const dense = options.dense ?? false;
  const event = options.event;
  if (event !== undefined && typeof event !== "function") throw new InputError(WHERE, "event", event, "", "a function");
  const eventDirection = options.eventDirection ?? "either";
  if (eventDirection !== "rising" && eventDirection !== "falling" && eventDirection !== "either") {
    throw new InputError(WHERE, "eventDirection", eventDirection, "", 'one of "rising", "falling", "either"');
  }
  const eventTolerance =
    options.eventTolerance === undefined ? 0 : requirePositive(WHERE, "eventTolerance", options.eventTolerance, "");
  let outputTimes: number[] = [];
  if (options.outputTimes !== undefined) {
    const ot = options.outputTimes;
    if (ot === null || typeof ot !== "object" || typeof ot.length !== "number") {
      throw new InputError(WHERE, "outputTimes", ot, "", "an array of finite numbers");
    }
    outputTimes = Array.from(ot);
    for (let i = 0; i < outputTimes.length; i++) {
      requireFinite(WHERE, `outputTimes[${i}]`, outputTimes[i], "");
      if (i > 0 && (outputTimes[i]! - outputTimes[i - 1]!) * direction < 0) {
        throw new InputError(WHERE, `outputTimes[${i}]`, outputTimes[i], "", "ordered in the direction of integration");
      }
    }
  }

  const y = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const v = initialState[i];
    if (typeof v !== "number" || !Number.isFinite(v)) {
      throw new InputError(WHERE, `initialState[${i}]`, v, "", "a finite number");
    }
    y[i] = v;
  }
  return { n, t0, t1, rtol, atol, span, direction, maxStep, maxSteps, recordSteps, dense, event, eventDirection, eventTolerance, outputTimes, y };
}

/**
 * The automatic first step (Hairer, Nørsett & Wanner, §II.4, "Starting step size") from the
 * initial state `y` and its derivative `k1`; `yStage` and `k2` are scratch.
 */
export function startingStep(
  evaluate: (t: number, state: Float64Array, out: Float64Array) => boolean,
  setup: OdeSetup,
  y: Float64Array,
  k1: Float64Array,
  yStage: Float64Array,
  k2: Float64Array,
): number {
  const { n, t0: t, atol, rtol, span, direction, maxStep } = setup;
  let d0 = 0;
  let d1 = 0;
  for (let i = 0; i < n; i++) {
    const sc = atol[i]! + rtol * Math.abs(y[i]!);
    const s = sc > 0 ? sc : 1;
    d0 += (y[i]! / s) ** 2;
    d1 += (k1[i]! / s) ** 2;
  }
  d0 = Math.sqrt(d0 / n);
  d1 = Math.sqrt(d1 / n);
  let h0 = d0 < 1e-5 || d1 < 1e-5 ? 1e-6 * span : 0.01 * (d0 / d1);
  h0 = Math.min(h0, maxStep, span);
  for (let i = 0; i < n; i++) yStage[i] = y[i]! + direction * h0 * k1[i]!;
  if (!evaluate(t + direction * h0, yStage, k2)) return h0 * 1e-3;
  let d2 = 0;
  for (let i = 0; i < n; i++) {
    const sc = atol[i]! + rtol * Math.abs(y[i]!);
    const s = sc > 0 ? sc : 1;
    d2 += ((k2[i]! - k1[i]!) / s) ** 2;
  }
  d2 = Math.sqrt(d2 / n) / h0;
  const dm = Math.max(d1, d2);
  const h1 = dm <= 1e-15 ? Math.max(1e-6, h0 * 1e-3) : Math.pow(0.01 / dm, 1 / 5);
  return Math.min(100 * h0, h1, maxStep, span);
}
