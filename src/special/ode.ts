/**
 * Adaptive integration of systems of ordinary differential equations: the Dormand–Prince
 * 5(4) embedded Runge–Kutta pair with local error control, a continuous (dense) extension of
 * order 4, and detection of a terminal event (the first zero crossing of a function of the
 * state, e.g. "the part reaches its target temperature").
 *
 * @packageDocumentation
 */
import { requirePositive } from "../core/index.js";
import { brentBracketed } from "./brent-root.js";
import { dormandPrinceDense, dormandPrinceError, dormandPrinceStages } from "./dormand-prince.js";
import { denseSampler } from "./ode-dense.js";
import type { DenseStep } from "./ode-dense.js";
import { readOdeSetup, startingStep, WHERE } from "./ode-setup.js";
import type { OdeDerivative, OdeOptions, OdeResult, OdeStatus } from "./ode-types.js";

export type { OdeDerivative, OdeEvent, OdeOptions, OdeStatus, OdeResult } from "./ode-types.js";

/**
 * Integrates $y'(t) = f(t, y)$, $y(t_0) = y_0$ for a system of any size with the
 * Dormand–Prince 5(4) embedded Runge–Kutta pair (FSAL, 6 derivative calls per step) and
 * adaptive step size, stopping at `end` or at the first zero crossing of an optional event
 * function.
 *
 * Each step takes the 5th-order solution and estimates its local error as the difference from
 * the embedded 4th-order one; a step is accepted when
 * $$ \mathrm{err} = \sqrt{\frac{1}{n}\sum_i \left(\frac{\hat e_i}{a_i + r\,\max(|y_i|, |y_i^{new}|)}\right)^2} \le 1 $$
 * ($a_i$ absolute, $r$ relative tolerance) and the next step is
 * $h \cdot \min(5, \max(0.2, 0.9\,\mathrm{err}^{-1/5}))$. Between steps the solution is
 * available through the order-4 continuous extension (dense output), which also locates events
 * (a bracketed root search in the step where $g$ changes sign, to the event tolerance).
 *
 * Hard domain (throws {@link InputError}): `derivative` not a function; `initialState` empty or
 * with non-finite entries; `end` equal to `start` or non-finite; tolerances out of range;
 * `event` given but not a function. Problems in the run itself (step cap, non-finite
 * derivative, vanishing step) are reported in {@link OdeResult.status}, not thrown.
 *
 * Validity: non-stiff and mildly stiff problems. For stiff systems (widely separated time
 * constants) the step is limited by stability, not accuracy, and the run is slow: use an
 * implicit method instead (fluxwright's 1-D conduction model does).
 *
 * Accuracy: the global error follows the tolerances; measured in the tests with
 * relativeTolerance 1e-10, absoluteTolerance 1e-12: exponential decay over 10 time constants and
 * the harmonic oscillator over 10 periods both agree with the closed form to ≤ 1e-8 (relative
 * to the solution's scale); dense output ≤ 1e-7 at rtol 1e-8; event times ≤ 1e-9.
 *
 * @param derivative - the right-hand side $f(t, y)$, written into its third argument
 * @param initialState - $y_0$ (length ≥ 1, finite entries)
 * @param options - integration interval, tolerances, recording, dense output and event; see {@link OdeOptions}
 * @returns the final state, recorded steps, dense samples, event time and step statistics
 * @throws {@link InputError} on bad input (see the hard domain above)
 * @see J. R. Dormand and P. J. Prince, "A family of embedded Runge–Kutta formulae",
 *   J. Comput. Appl. Math. 6(1), 19–26 (1980), Table 2.
 * @see E. Hairer, S. P. Nørsett, G. Wanner, Solving Ordinary Differential Equations I, 2nd ed.,
 *   Springer 1993: §II.4 (step-size control, starting step), §II.5 (Table 5.2), §II.6 (dense output).
 * @example
 * ```ts
 * import { solveOde } from "fluxwright";
 * // y' = -y, y(0) = 1: stop where y falls to 1/2 (at t = ln 2).
 * const result = solveOde((t, y, dy) => { dy[0] = -y[0]!; }, [1], {
 *   end: 10,
 *   event: (t, y) => y[0]! - 0.5,
 * });
 * console.log(result.status); // event
 * console.log(result.eventTime); // ≈ 0.693147
 * ```
 * @category ODE
 */
export function solveOde(
  derivative: OdeDerivative,
  initialState: ArrayLike<number>,
  options: OdeOptions,
): OdeResult {
  const setup = readOdeSetup(derivative, initialState, options);
  const { n, t0, t1, rtol, direction, maxStep, maxSteps, recordSteps, dense, event, eventDirection, eventTolerance, outputTimes, y } = setup;
  const k1 = new Float64Array(n);
  const k2 = new Float64Array(n);
  const k3 = new Float64Array(n);
  const k4 = new Float64Array(n);
  const k5 = new Float64Array(n);
  const k6 = new Float64Array(n);
  const k7 = new Float64Array(n);
  const yStage = new Float64Array(n);
  const yNew = new Float64Array(n);
  const work = { k1, k2, k3, k4, k5, k6, k7, yStage, yNew };
  // Dense-output coefficients of the current step: y(t + θh) = r1 + θ(r2 + (1−θ)(r3 + θ(r4 + (1−θ) r5))).
  const r1 = new Float64Array(n);
  const r2 = new Float64Array(n);
  const r3 = new Float64Array(n);
  const r4 = new Float64Array(n);
  const r5 = new Float64Array(n);
  const scratch = new Float64Array(n);

  const times: number[] = [];
  const states: Float64Array[] = [];
  const outStates: number[] = [];
  const outStateArrays: Float64Array[] = [];
  const denseSteps: DenseStep[] = [];
  let evaluations = 0;
  let accepted = 0;
  let rejected = 0;

  const evaluate = (t: number, state: Float64Array, out: Float64Array): boolean => {
    derivative(t, state, out);
    evaluations++;
    for (let i = 0; i < n; i++) if (!Number.isFinite(out[i]!)) return false;
    return true;
  };
  const interpolate = (theta: number, out: Float64Array): void => {
    const omt = 1 - theta;
    for (let i = 0; i < n; i++) {
      out[i] = r1[i]! + theta * (r2[i]! + omt * (r3[i]! + theta * (r4[i]! + omt * r5[i]!)));
    }
  };

  let t = t0;
  if (recordSteps) {
    times.push(t);
    states.push(Float64Array.from(y));
  }
  let outIndex = 0;
  // Skip output times before the start; report those exactly at the start.
  while (outIndex < outputTimes.length && (outputTimes[outIndex]! - t0) * direction < 0) outIndex++;
  while (outIndex < outputTimes.length && outputTimes[outIndex] === t0) {
    outStates.push(t0);
    outStateArrays.push(Float64Array.from(y));
    outIndex++;
  }

  if (!evaluate(t, y, k1)) {
    return finish("non-finite", t, y, null, null);
  }
  let gOld = event === undefined ? 0 : event(t, y);

  // Starting step (Hairer, Nørsett & Wanner, §II.4, "Starting step size").
  let h = options.initialStep === undefined ? startingStep(evaluate, setup, y, k1, yStage, k2) : Math.min(requirePositive(WHERE, "initialStep", options.initialStep, ""), maxStep);

  let lastRejected = false;
  let attempts = 0;
  for (;;) {
    if (attempts >= maxSteps) return finish("max-steps", t, y, null, null);
    attempts++;
    const remaining = (t1 - t) * direction;
    const minStep = 16 * Number.EPSILON * Math.max(Math.abs(t), Number.MIN_VALUE);
    let last = false;
    if (h >= remaining || remaining - h <= minStep) {
      h = remaining;
      last = true;
    }
    if (h < minStep) {
      if (last) {
        // Rounding left a sliver of the interval: nothing to integrate.
        t = t1;
        if (recordSteps && times[times.length - 1] !== t1) {
          times.push(t1);
          states.push(Float64Array.from(y));
        }
        return finish("completed", t, y, null, null);
      }
      return finish("step-too-small", t, y, null, null);
    }
    const hs = direction * h;

    const ok = dormandPrinceStages(evaluate, n, t, hs, last ? t1 : t + hs, y, work);
    if (!ok) {
      // Non-finite derivative inside the step: retry smaller, give up when the step vanishes.
      rejected++;
      h *= 0.25;
      lastRejected = true;
      if (h < minStep) return finish("non-finite", t, y, null, null);
      continue;
    }

    const err = dormandPrinceError(n, hs, y, setup.atol, rtol, work);

    if (!(err <= 1)) {
      rejected++;
      const factor = Number.isFinite(err) ? Math.max(0.2, 0.9 * Math.pow(err, -0.2)) : 0.2;
      h *= Math.min(1, factor);
      lastRejected = true;
      continue;
    }

    // Accepted: build the dense output of this step.
    const tNew = last ? t1 : t + hs;
    dormandPrinceDense(n, hs, y, work, r1, r2, r3, r4, r5);
    accepted++;

    // Event: sign change of g over the step, located on the dense output.
    let eventTime: number | null = null;
    if (event !== undefined) {
      const gNew = event(tNew, yNew);
      const crosses =
        (eventDirection !== "falling" && gOld < 0 && gNew >= 0) ||
        (eventDirection !== "rising" && gOld > 0 && gNew <= 0);
      if (crosses) {
        const g = (theta: number): number => {
          interpolate(theta, scratch);
          return event(t + theta * hs, scratch);
        };
        const thetaTolerance =
          eventTolerance > 0 ? eventTolerance / h : (4 * Number.EPSILON * Math.max(Math.abs(t), Math.abs(tNew))) / h;
        // Brent's method, returning the bracket end past the crossing so that the event has happened
        // (a NaN of the event function ends the search at the step's end).
        const located = gNew === 0 ? 1 : brentBracketed(g, 0, 1, gOld, gNew, Math.max(thetaTolerance, 1e-15), 200, true);
        const theta = Number.isNaN(located) ? 1 : located;
        eventTime = theta === 1 ? tNew : t + theta * hs;
        interpolate(theta, scratch);
        if (theta === 1) scratch.set(yNew);
      }
      gOld = gNew;
    }

    const stepEnd = eventTime ?? tNew;
    // Dense samples at requested output times inside this step.
    while (outIndex < outputTimes.length) {
      const to = outputTimes[outIndex]!;
      if ((to - stepEnd) * direction > 0) break;
      if (to === tNew && eventTime === null) {
        outStateArrays.push(Float64Array.from(yNew));
      } else {
        const out = new Float64Array(n);
        const theta = (to - t) / hs;
        const omt = 1 - theta;
        for (let i = 0; i < n; i++) {
          out[i] = r1[i]! + theta * (r2[i]! + omt * (r3[i]! + theta * (r4[i]! + omt * r5[i]!)));
        }
        outStateArrays.push(out);
      }
      outStates.push(to);
      outIndex++;
    }
    if (dense) {
      const c = new Float64Array(5 * n);
      c.set(r1, 0);
      c.set(r2, n);
      c.set(r3, 2 * n);
      c.set(r4, 3 * n);
      c.set(r5, 4 * n);
      denseSteps.push({ t, h: hs, c });
    }

    if (eventTime !== null) {
      const eventState = Float64Array.from(scratch);
      if (recordSteps) {
        times.push(eventTime);
        states.push(Float64Array.from(eventState));
      }
      return finish("event", eventTime, eventState, eventTime, eventState);
    }

    t = tNew;
    y.set(yNew);
    k1.set(k7); // first same as last
    if (recordSteps) {
      times.push(t);
      states.push(Float64Array.from(y));
    }
    if (last) return finish("completed", t, y, null, null);

    let factor = Math.min(5, Math.max(0.2, 0.9 * Math.pow(Math.max(err, 1e-10), -0.2)));
    if (lastRejected) factor = Math.min(1, factor);
    lastRejected = false;
    h = Math.min(h * factor, maxStep);
  }

  function finish(
    status: OdeStatus,
    finalTime: number,
    finalState: Float64Array,
    eventTime: number | null,
    eventState: Float64Array | null,
  ): OdeResult {
    return {
      status,
      finalTime,
      finalState: Float64Array.from(finalState),
      times,
      states,
      outputTimes: outStates,
      outputStates: outStateArrays,
      eventTime,
      eventState: eventState === null ? null : Float64Array.from(eventState),
      acceptedSteps: accepted,
      rejectedSteps: rejected,
      evaluations,
      sample: dense ? denseSampler(denseSteps, n, t0, finalTime, direction, finalState) : null,
    };
  }
}
