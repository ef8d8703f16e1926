/**
 * The exact periodic steady state of the ideal LLC (and, with an infinite magnetising
 * inductance, series-resonant) converter with a stiff output capacitor, in normalised units:
 * voltages in units of the bridge amplitude $V_b$, currents in $V_b/Z_r$, time as
 * $\theta = \omega_r t$. Internal: the public wrappers check the input and scale the result.
 *
 * States: $j$ (resonant current), $u$ (resonant capacitor voltage), $g$ (magnetising current).
 * In the positive half period the bridge applies $+1$. Three circuit modes:
 * - P (rectifier conducts, $v_m = +m$), N ($v_m = -m$): $j' = 1 - u \mp m$, $u' = j$,
 *   $g' = \pm m\lambda$ with $\lambda = L_r/L_m$;
 * - O (rectifier off, $j = g$): $j' = \lambda(1-u)/(1+\lambda)$, $u' = j$;
 *   it lasts while $|v_m| = |1-u|/(1+\lambda) < m$.
 *
 * The half-wave antisymmetric steady state $x(\Theta) = -x(0)$, $\Theta = \pi/f_n$, with
 * the load balance $\frac1\Theta\int_0^\Theta |j-g|\,d\theta = \frac{8Q}{\pi^2}m$, is a
 * boundary-value problem. For an assumed mode sequence the half-period map is affine in
 * $x(0)$, so $x(0)$ follows from a 3×3 linear solve, and the unknowns left are $m$ and the
 * switching instants, fixed by the switching conditions (Newton). The sequence is then checked
 * by an event-driven propagation of the solution (exact events: extrema of the sinusoid-plus-
 * ramp found in closed form, the crossing bracketed and solved by Brent's method); if the
 * physics picks another sequence, it is adopted and the solve repeated.
 *
 * The pieces: `llc-segments.ts` (segment maps), `llc-sequence.ts` (the solve on an assumed
 * sequence), `llc-propagation.ts` (the event-driven propagation); this file seeds, drives and
 * verifies.
 *
 * @packageDocumentation
 */
import { adoptSegments, dropSegment, sequenceLength, seqTau, solveSequence, unknowns } from "./llc-sequence.js";
import { events, evEnd, propagateEvents } from "./llc-propagation.js";

export { MODE_N, MODE_O, MODE_P } from "./llc-segments.js";
export { sequenceResiduals, sequenceResidualsAndJacobian, setSequence } from "./llc-sequence.js";
export { propagateEvents } from "./llc-propagation.js";

const MODE_LETTER = ["O", "P", "N"] as const;

/** The solved steady state and its waveform figures, normalised; filled by {@link llcSteadyState}. */
export interface LlcSteadyState {
  /** Gain m = n·V_out/V_b. */
  gain: number;
  /** State at θ = 0 (start of the positive half period). */
  j0: number;
  u0: number;
  g0: number;
  /** Mode sequence of the positive half period, e.g. "PO". */
  sequence: string;
  /** Segment durations [normalised time]. */
  durations: number[];
  /** RMS of j, of j − g (rectifier current), peaks of |j|, |u|, |g|. */
  resonantRms: number;
  rectifierRms: number;
  resonantPeak: number;
  capacitorPeak: number;
  magnetisingPeak: number;
  /** Mean of |j − g| over the period (rectified current), and mean of j over the positive half (input current). */
  rectifiedMean: number;
  inputMean: number;
  /** Largest residual of the boundary conditions in the verifying propagation. */
  residual: number;
}


// ---------------------------------------------------------------------------------------------
// First-harmonic seed and the driver.

/** First-harmonic state at θ = 0 and gain, normalised (bridge fundamental (4/π) sin(f_n θ)). */
export function fhaSeed(lam: number, q: number, fn: number, seed: Float64Array): void {
  // impedances normalised by Z_r: series j(fn − 1/fn); magnetising j fn/λ ∥ 1/q
  const xs = fn - 1 / fn;
  // admittance of the parallel branch: q − j λ/fn
  const yr = q;
  const yi = -lam / fn;
  // Z_par = 1/(yr + j yi)
  const den = yr * yr + yi * yi;
  const zpr = yr / den;
  const zpi = -yi / den;
  // total impedance
  const ztr = zpr;
  const zti = zpi + xs;
  const v1 = 4 / Math.PI;
  // I = v1 / Zt (phasor, reference sin → imaginary part is the value at θ = 0)
  const zt2 = ztr * ztr + zti * zti;
  const ir = (v1 * ztr) / zt2;
  const ii = (-v1 * zti) / zt2;
  // Vm = I · Z_par
  const vr = ir * zpr - ii * zpi;
  const vi = ir * zpi + ii * zpr;
  // capacitor voltage U = I · (−j/fn)
  const ur = ii / fn;
  const ui = -ir / fn;
  // magnetising current Im = Vm / (j fn/λ) = −j λ Vm / fn
  const gr = (lam * vi) / fn;
  const gi = (-lam * vr) / fn;
  seed[0] = ii; // j(0) = Im(I)
  seed[1] = ui;
  seed[2] = gi;
  seed[3] = (Math.PI / 4) * Math.hypot(vr, vi);
  seed[4] = Math.hypot(ir, ii);
  seed[5] = Math.hypot(ur, ui);
  seed[6] = Math.hypot(gr, gi);
  // current at the end of the positive half (θ = Θ): phasor value Im(I e^{jπ}) = −Im(I)
  seed[7] = -ii;
  // rectifier current amplitude (I − Im)
  seed[8] = Math.hypot(ir - gr, ii - gi);
}

const seed = new Float64Array(9);


function verifyResidual(j0: number, u0: number, g0: number, m: number, kappa: number, theta: number): number {
  const scale = Math.max(1, Math.abs(j0), Math.abs(u0), Math.abs(g0));
  const e1 = Math.abs((evEnd[0] ?? 0) + j0);
  const e2 = Math.abs((evEnd[1] ?? 0) + u0);
  const e3 = Math.abs((evEnd[2] ?? 0) + g0);
  const e4 = Math.abs(events.loadIntegral / theta - kappa * m) / Math.max(kappa * m, 1e-300);
  return Math.max(e1 / scale, e2 / scale, e3 / scale, e4);
}

/** Tolerance on the verifying propagation's boundary residual for accepting a solution. */
export const STEADY_STATE_TOLERANCE = 1e-9;

function attempt(lam: number, q: number, fn: number, theta: number, kappa: number, m: number, j0: number, u0: number, g0: number): number {
  let mm = m;
  let sj = j0;
  let su = u0;
  let sg = g0;
  let best = Infinity;
  for (let round = 0; round < 8; round++) {
    propagateEvents(sj, su, sg, mm, lam, theta, false);
    if (events.overflow) return Infinity;
    adoptSegments(events);
    let rn = solveSequence(theta, lam, kappa, sj, su, sg, mm);
    for (let fix = 0; fix < 6 && Number.isFinite(rn); fix++) {
      // a segment driven to a negative duration does not exist: drop it and solve again
      let worst = -1;
      let worstTau = -1e-9 * theta;
      for (let k = 0; k < sequenceLength(); k++) {
        const tau = seqTau[k] ?? 0;
        if (tau < worstTau) {
          worstTau = tau;
          worst = k;
        }
      }
      if (worst < 0 || sequenceLength() < 2) break;
      dropSegment(worst);
      rn = solveSequence(theta, lam, kappa, unknowns[0] ?? 0, unknowns[1] ?? 0, unknowns[2] ?? 0, unknowns[3] ?? mm);
    }
    if (!Number.isFinite(rn)) return Infinity;
    sj = unknowns[0] ?? 0;
    su = unknowns[1] ?? 0;
    sg = unknowns[2] ?? 0;
    mm = unknowns[3] ?? mm;
    // the verifying propagation also records the waveform figures: when it confirms the
    // solution, the caller needs no second pass
    propagateEvents(sj, su, sg, mm, lam, theta, true);
    if (events.overflow) return Infinity;
    const residual = verifyResidual(sj, su, sg, mm, kappa, theta);
    best = residual;
    if (residual < STEADY_STATE_TOLERANCE) {
      solved[0] = mm;
      solved[1] = sj;
      solved[2] = su;
      solved[3] = sg;
      return residual;
    }
  }
  return best;
}

/** The last accepted solution (m, j0, u0, g0) of {@link attempt}. */
const solved = new Float64Array(4);

/**
 * Solves the steady state. `lam` = L_r/L_m (0: series resonant), `q` = Z_r/R_ac, `fn` = f_s/f_r.
 * Returns null when no consistent periodic solution was found.
 */
export function llcSteadyState(lam: number, q: number, fn: number): LlcSteadyState | null {
  const theta = Math.PI / fn;
  const kappa = (8 * q) / (Math.PI * Math.PI);
  fhaSeed(lam, q, fn, seed);
  let residual = attempt(lam, q, fn, theta, kappa, seed[3] ?? 1, seed[0] ?? 0, seed[1] ?? 0, seed[2] ?? 0);
  if (!(residual < STEADY_STATE_TOLERANCE)) {
    // continuation from resonance, where the first harmonic is close
    const steps = 16;
    let ok = true;
    fhaSeed(lam, q, 1, seed);
    let m = seed[3] ?? 1;
    let j = seed[0] ?? 0;
    let u = seed[1] ?? 0;
    let g = seed[2] ?? 0;
    for (let s = 0; s <= steps && ok; s++) {
      const f = Math.pow(fn, s / steps);
      const th = Math.PI / f;
      residual = attempt(lam, q, f, th, kappa, m, j, u, g);
      if (!(residual < STEADY_STATE_TOLERANCE)) ok = false;
      m = solved[0] ?? 0;
      j = solved[1] ?? 0;
      u = solved[2] ?? 0;
      g = solved[3] ?? 0;
    }
    if (!ok) return null;
  }
  const m = solved[0] ?? 0;
  const solvedJ = solved[1] ?? 0;
  const solvedU = solved[2] ?? 0;
  const solvedG = solved[3] ?? 0;
  // the last propagation (attempt's verifying pass at the solved state and this θ) holds the record
  const { sequence, durations } = events.summary(MODE_LETTER, theta);
  return {
    gain: m,
    j0: solvedJ,
    u0: solvedU,
    g0: solvedG,
    sequence,
    durations,
    resonantRms: Math.sqrt(events.currentSquareIntegral / theta),
    rectifierRms: Math.sqrt(Math.max(0, events.rectifierSquareIntegral) / theta),
    resonantPeak: events.currentPeak,
    capacitorPeak: events.capacitorPeak,
    magnetisingPeak: events.thirdStatePeak,
    rectifiedMean: events.loadIntegral / theta,
    inputMean: ((evEnd[1] ?? 0) - solvedU) / theta,
    residual: verifyResidual(solvedJ, solvedU, solvedG, m, kappa, theta),
  };
}
