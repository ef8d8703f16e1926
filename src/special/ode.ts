/**
 * Adaptive integration of systems of ordinary differential equations: the Dormand–Prince
 * 5(4) embedded Runge–Kutta pair with local error control, a continuous (dense) extension of
 * order 4, and detection of a terminal event (the first zero crossing of a function of the
 * state, e.g. "the part reaches its target temperature").
 *
 * @packageDocumentation
 */
import { requirePositive } from "../core/index.js";
import { dormandPrinceDense, dormandPrinceError, dormandPrinceStages } from "./dormand-prince.js";
import { OdeRun } from "./ode-run.js";
import { readOdeSetup, startingStep, WHERE } from "./ode-setup.js";
import type { OdeDerivative, OdeOptions, OdeResult } from "./ode-types.js";

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
  const { n, t1, rtol, direction, maxStep, maxSteps, recordSteps, dense, event, y } = setup;
  const run = new OdeRun(setup, derivative);
  const { work, evaluate } = run;
  const { k1, k7, yNew } = work;

  let t = setup.t0;
  run.recordStart(y);
  if (!evaluate(t, y, k1)) return run.finish("non-finite", t, y, null, null);
  let gOld = event === undefined ? 0 : event(t, y);

  // Starting step (Hairer, Nørsett & Wanner, §II.4, "Starting step size").
  let h = options.initialStep === undefined ? startingStep(evaluate, setup, y, k1, work.yStage, work.k2) : Math.min(requirePositive(WHERE, "initialStep", options.initialStep, ""), maxStep);

  let lastRejected = false;
  let attempts = 0;
  for (;;) {
    if (attempts >= maxSteps) return run.finish("max-steps", t, y, null, null);
    attempts++;
    const remaining = (t1 - t) * direction;
    const minStep = 16 * Number.EPSILON * Math.max(Math.abs(t), Number.MIN_VALUE);
    let last = false;
    if (h >= remaining || remaining - h <= minStep) {
      h = remaining;
      last = true;
    }
    if (h < minStep) {
      if (!last) return run.finish("step-too-small", t, y, null, null);
      // Rounding left a sliver of the interval: nothing to integrate.
      t = t1;
      if (recordSteps && run.times[run.times.length - 1] !== t1) run.recordStep(t1, y);
      return run.finish("completed", t, y, null, null);
    }
    const hs = direction * h;

    if (!dormandPrinceStages(evaluate, n, t, hs, last ? t1 : t + hs, y, work)) {
      // Non-finite derivative inside the step: retry smaller, give up when the step vanishes.
      run.rejected++;
      h *= 0.25;
      lastRejected = true;
      if (h < minStep) return run.finish("non-finite", t, y, null, null);
      continue;
    }
    const err = dormandPrinceError(n, hs, y, setup.atol, rtol, work);
    if (!(err <= 1)) {
      run.rejected++;
      const factor = Number.isFinite(err) ? Math.max(0.2, 0.9 * Math.pow(err, -0.2)) : 0.2;
      h *= Math.min(1, factor);
      lastRejected = true;
      continue;
    }

    // Accepted: build the dense output of this step, then look for the event on it.
    const tNew = last ? t1 : t + hs;
    dormandPrinceDense(n, hs, y, work, run.r1, run.r2, run.r3, run.r4, run.r5);
    run.accepted++;
    let eventTime: number | null = null;
    if (event !== undefined) {
      const gNew = event(tNew, yNew);
      eventTime = run.locateEvent(t, hs, h, tNew, gOld, gNew);
      gOld = gNew;
    }
    run.recordOutputs(t, hs, tNew, eventTime ?? tNew, eventTime);
    if (dense) run.keepDenseStep(t, hs);

    if (eventTime !== null) {
      const eventState = Float64Array.from(run.scratch);
      if (recordSteps) run.recordStep(eventTime, eventState);
      return run.finish("event", eventTime, eventState, eventTime, eventState);
    }

    t = tNew;
    y.set(yNew);
    k1.set(k7); // first same as last
    if (recordSteps) run.recordStep(t, y);
    if (last) return run.finish("completed", t, y, null, null);

    let factor = Math.min(5, Math.max(0.2, 0.9 * Math.pow(Math.max(err, 1e-10), -0.2)));
    if (lastRejected) factor = Math.min(1, factor);
    lastRejected = false;
    h = Math.min(h * factor, maxStep);
  }
}
