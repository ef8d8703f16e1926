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
 * @packageDocumentation
 */
import { HalfPeriodRecord, PeriodicNewton, type NewtonSettings, type PeriodicSystem } from "./periodic-newton.js";
import { firstDownCrossing, sinusoidPeak, squareIntegral } from "./ramp-sinusoid.js";

export const MODE_O = 0;
export const MODE_P = 1;
export const MODE_N = 2;
const MODE_LETTER = ["O", "P", "N"] as const;

const MAX_SEGMENTS = 48;

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
// Segment flows. Each takes a state and a duration and writes the end state into `out`.

/**
 * End state of the last flow (0–2), then the cosine and sine of the last forced segment's
 * phase ωτ (3, 4), kept for the tangent pass: typed-array slots, written in place (a number
 * written to a module variable is boxed on every write).
 */
const out = new Float64Array(5);
const SEG_COS = 3;
const SEG_SIN = 4;
out[SEG_COS] = 1;

/** Advance by one segment of mode `mode` for time `tau`; `forced` = false drops the constant forcing (linear part only). */
function flow(mode: number, tau: number, j: number, u: number, g: number, m: number, lam: number, forced: boolean): void {
  if (mode === MODE_O) {
    const drive = forced ? 1 : 0;
    if (lam > 0) {
      const w = Math.sqrt(lam / (1 + lam));
      const c = Math.cos(w * tau);
      const s = Math.sin(w * tau);
      out[0] = j * c - (u - drive) * w * s;
      out[1] = drive + (u - drive) * c + (j / w) * s;
      out[SEG_COS] = c;
      out[SEG_SIN] = s;
    } else {
      out[0] = j;
      out[1] = u + j * tau;
    }
    out[2] = out[0];
    return;
  }
  const sign = mode === MODE_P ? 1 : -1;
  const e = forced ? 1 - sign * m : 0;
  const c = Math.cos(tau);
  const s = Math.sin(tau);
  out[0] = j * c + (e - u) * s;
  out[1] = e + (u - e) * c + j * s;
  out[2] = g + (forced ? sign * m * lam * tau : 0);
}

/**
 * {@link flow} (forced) and {@link diodeIntegral} of one P or N segment together, one cosine
 * and sine for both: writes the end state into `out`, returns s·∫(j − g) dθ (s = ±1 for P/N).
 */
function flowDiode(mode: number, tau: number, j: number, u: number, g: number, m: number, lam: number): number {
  const sign = mode === MODE_P ? 1 : -1;
  const e = 1 - sign * m;
  const c = Math.cos(tau);
  const s = Math.sin(tau);
  out[0] = j * c + (e - u) * s;
  out[1] = e + (u - e) * c + j * s;
  out[2] = g + sign * m * lam * tau;
  out[SEG_COS] = c;
  out[SEG_SIN] = s;
  return sign * (j * s + (e - u) * (1 - c) - g * tau - 0.5 * sign * m * lam * tau * tau);
}

/** ∫ (j − g) dθ over a P or N segment from (j, u, g). */
function diodeIntegral(mode: number, tau: number, j: number, u: number, g: number, m: number, lam: number): number {
  const sign = mode === MODE_P ? 1 : -1;
  const e = 1 - sign * m;
  return j * Math.sin(tau) + (e - u) * (1 - Math.cos(tau)) - g * tau - 0.5 * sign * m * lam * tau * tau;
}

// ---------------------------------------------------------------------------------------------
// Newton on (m, τ_0 … τ_{k−2}) for a fixed sequence.

const seqModes = new Int32Array(MAX_SEGMENTS);
const seqTau = new Float64Array(MAX_SEGMENTS);
let seqLength = 0;

/** The segment durations from the unknowns y: τ_0 … τ_{n−2} given, the last what remains of the half period θ. */
function setDurations(y: Float64Array, theta: number): void {
  let last = theta;
  for (let k = 0; k < seqLength - 1; k++) {
    seqTau[k] = y[k + 4] ?? 0;
    last -= seqTau[k] ?? 0;
  }
  seqTau[seqLength - 1] = last;
}

/**
 * Residuals of the sequence solve at unknowns y = (j0, u0, g0, m, τ_0 … τ_{n−2}); the last
 * duration is what remains of the half period. Residuals: antisymmetry (3), the switching
 * condition at each interior boundary (n − 1), and the load balance (relative). Durations may
 * go negative during the iteration (the flows are defined backwards too); the verifying
 * propagation decides what is physical.
 */
export function sequenceResiduals(y: Float64Array, theta: number, lam: number, kappa: number, r: Float64Array): boolean {
  const n = seqLength;
  const m = y[3] ?? 0;
  setDurations(y, theta);
  let j = y[0] ?? 0;
  let u = y[1] ?? 0;
  let g = y[2] ?? 0;
  let charge = 0;
  const band = m * (1 + lam);
  for (let k = 0; k < n; k++) {
    const mode = seqModes[k] ?? 0;
    const tau = seqTau[k] ?? 0;
    if (mode !== MODE_O) charge += flowDiode(mode, tau, j, u, g, m, lam);
    else flow(mode, tau, j, u, g, m, lam, true);
    j = out[0] ?? 0;
    u = out[1] ?? 0;
    g = out[2] ?? 0;
    if (k < n - 1) {
      const next = seqModes[k + 1] ?? 0;
      if (mode !== MODE_O) r[k + 4] = j - g;
      else r[k + 4] = next === MODE_P ? u - (1 - band) : u - (1 + band);
    }
  }
  r[0] = j + (y[0] ?? 0);
  r[1] = u + (y[1] ?? 0);
  r[2] = g + (y[2] ?? 0);
  r[3] = charge / (theta * kappa * m) - 1;
  return Number.isFinite(r[3] ?? NaN) && m > 0;
}

/** Sets the assumed mode sequence (for the Jacobian test; the solver sets it from a propagation). */
export function setSequence(modes: readonly number[]): void {
  seqLength = modes.length;
  for (let k = 0; k < modes.length; k++) seqModes[k] = modes[k] ?? 0;
}

/** Tangents d(j, u, g, charge)/dy of the running state in the Jacobian pass. */
const tj = new Float64Array(MAX_SEGMENTS + 3);
const tu = new Float64Array(MAX_SEGMENTS + 3);
const tg = new Float64Array(MAX_SEGMENTS + 3);
const tq = new Float64Array(MAX_SEGMENTS + 3);

/**
 * The residuals of {@link sequenceResiduals} (the same arithmetic, so the same values) and
 * their exact Jacobian, row-major into `jac`, by forward-mode differentiation of the
 * closed-form segment maps: each segment map is differentiated with respect to its start
 * state, the gain m (through the forcing e = 1 ∓ m and the ramp ±mλτ) and its duration (the
 * last duration is θ − Σ τ_k, so it depends on every duration unknown with slope −1).
 */
export function sequenceResidualsAndJacobian(y: Float64Array, theta: number, lam: number, kappa: number, r: Float64Array, jac: Float64Array): boolean {
  const n = seqLength;
  const size = n + 3;
  const m = y[3] ?? 0;
  setDurations(y, theta);
  for (let c = 0; c < size; c++) {
    tj[c] = c === 0 ? 1 : 0;
    tu[c] = c === 1 ? 1 : 0;
    tg[c] = c === 2 ? 1 : 0;
    tq[c] = 0;
  }
  let j = y[0] ?? 0;
  let u = y[1] ?? 0;
  let g = y[2] ?? 0;
  let charge = 0;
  const band = m * (1 + lam);
  const w = lam > 0 ? Math.sqrt(lam / (1 + lam)) : 0;
  for (let k = 0; k < n; k++) {
    const mode = seqModes[k] ?? 0;
    const tau = seqTau[k] ?? 0;
    // dτ/dy: +1 on the segment's own duration unknown; the last segment −1 on all of them
    const own = k < n - 1 ? k + 4 : -1;
    if (mode !== MODE_O) {
      charge += flowDiode(mode, tau, j, u, g, m, lam);
      const sign = mode === MODE_P ? 1 : -1;
      const e = 1 - sign * m;
      const c = out[SEG_COS] ?? 1;
      const s = out[SEG_SIN] ?? 0;
      const jEnd = out[0] ?? 0;
      const gEnd = out[2] ?? 0;
      const jTau = -j * s + (e - u) * c;
      const uTau = (e - u) * s + j * c;
      const gTau = sign * m * lam;
      const qTau = sign * (jEnd - gEnd);
      for (let col = 0; col < size; col++) {
        const dTau = own >= 0 ? (col === own ? 1 : 0) : col >= 4 ? -1 : 0;
        const dm = col === 3 ? 1 : 0;
        const de = -sign * dm;
        const a = tj[col] ?? 0;
        const b = tu[col] ?? 0;
        const d = tg[col] ?? 0;
        tj[col] = c * a - s * b + s * de + jTau * dTau;
        tu[col] = s * a + c * b + (1 - c) * de + uTau * dTau;
        tg[col] = d + sign * lam * tau * dm + gTau * dTau;
        tq[col] = (tq[col] ?? 0) + sign * (s * a - (1 - c) * b + (1 - c) * de - tau * d) - 0.5 * lam * tau * tau * dm + qTau * dTau;
      }
    } else {
      flow(mode, tau, j, u, g, m, lam, true);
      if (lam > 0) {
        const c = out[SEG_COS] ?? 1;
        const s = out[SEG_SIN] ?? 0;
        const jTau = -j * w * s - (u - 1) * w * w * c;
        const uTau = -(u - 1) * w * s + j * c;
        for (let col = 0; col < size; col++) {
          const dTau = own >= 0 ? (col === own ? 1 : 0) : col >= 4 ? -1 : 0;
          const a = tj[col] ?? 0;
          const b = tu[col] ?? 0;
          const nj = c * a - w * s * b + jTau * dTau;
          tj[col] = nj;
          tu[col] = (s / w) * a + c * b + uTau * dTau;
          tg[col] = nj;
        }
      } else {
        for (let col = 0; col < size; col++) {
          const dTau = own >= 0 ? (col === own ? 1 : 0) : col >= 4 ? -1 : 0;
          const a = tj[col] ?? 0;
          tu[col] = (tu[col] ?? 0) + tau * a + j * dTau;
          tg[col] = a;
        }
      }
    }
    j = out[0] ?? 0;
    u = out[1] ?? 0;
    g = out[2] ?? 0;
    if (k < n - 1) {
      const row = (k + 4) * size;
      const next = seqModes[k + 1] ?? 0;
      if (mode !== MODE_O) {
        r[k + 4] = j - g;
        for (let col = 0; col < size; col++) jac[row + col] = (tj[col] ?? 0) - (tg[col] ?? 0);
      } else {
        r[k + 4] = next === MODE_P ? u - (1 - band) : u - (1 + band);
        const slope = next === MODE_P ? 1 + lam : -(1 + lam);
        for (let col = 0; col < size; col++) jac[row + col] = (tu[col] ?? 0) + (col === 3 ? slope : 0);
      }
    }
  }
  r[0] = j + (y[0] ?? 0);
  r[1] = u + (y[1] ?? 0);
  r[2] = g + (y[2] ?? 0);
  const denominator = theta * kappa * m;
  r[3] = charge / denominator - 1;
  for (let col = 0; col < size; col++) {
    jac[col] = (tj[col] ?? 0) + (col === 0 ? 1 : 0);
    jac[size + col] = (tu[col] ?? 0) + (col === 1 ? 1 : 0);
    jac[2 * size + col] = (tg[col] ?? 0) + (col === 2 ? 1 : 0);
    jac[3 * size + col] = (tq[col] ?? 0) / denominator - (col === 3 ? charge / (denominator * m) : 0);
  }
  return Number.isFinite(r[3] ?? NaN) && m > 0;
}

/** Parameters (θ, λ, κ) of the sequence solve, read by {@link sequenceSystem} (set before each solve). */
const sys = new Float64Array(3);
const sequenceSystem: PeriodicSystem = {
  residuals: (y, r) => sequenceResiduals(y, sys[0] ?? 0, sys[1] ?? 0, sys[2] ?? 0, r),
  residualsAndJacobian: (y, r, jac) => sequenceResidualsAndJacobian(y, sys[0] ?? 0, sys[1] ?? 0, sys[2] ?? 0, r, jac),
};

/**
 * Newton settings of the sequence solve: stop at a residual of 1e-14 (normalised units, about
 * 50 ulp of the O(1) states); the Jacobian is kept from one iteration to the next while a full
 * step still reduces the residual at least tenfold (a chord step costs one residual evaluation
 * instead of n + 1).
 */
const SEQUENCE_NEWTON: NewtonSettings = {
  states: 3,
  gainFloor: 0.2,
  scaledNorm: false,
  reuseJacobian: false,
  backtracks: 30,
  tolerance: 1e-14,
  maxIterations: 60,
  unverifiedStepBelow: 1e-7,
};

/** Unknowns (j0, u0, g0, m, τ_0 … τ_{n−2}) of the sequence solve; the solution after it. */
const newton = new PeriodicNewton(MAX_SEGMENTS + 3);
const unknowns = newton.x;

/** Solves the assumed sequence from the given state and gain (durations from seqTau); returns the final residual norm. */
function solveSequence(theta: number, lam: number, kappa: number, j0: number, u0: number, g0: number, m: number): number {
  unknowns[0] = j0;
  unknowns[1] = u0;
  unknowns[2] = g0;
  unknowns[3] = m;
  for (let k = 0; k < seqLength - 1; k++) unknowns[k + 4] = seqTau[k] ?? 0;
  sys[0] = theta;
  sys[1] = lam;
  sys[2] = kappa;
  const residual = newton.solve(sequenceSystem, seqLength + 3, SEQUENCE_NEWTON, theta);
  // the durations of the solution (the last step may have been taken without an evaluation)
  setDurations(unknowns, theta);
  return residual;
}

// ---------------------------------------------------------------------------------------------
// Event-driven propagation over the positive half period from a given state.

/** The segments of the last propagation. */
const events = new HalfPeriodRecord(MAX_SEGMENTS);
const evEnd = new Float64Array(3);

/** Mode at the start of a segment from the state (bridge +1). */
function startMode(j: number, u: number, g: number, m: number, lam: number): number {
  const d = j - g;
  const scale = Math.max(Math.abs(j), Math.abs(g), 1e-300);
  if (Math.abs(d) > 1e-12 * scale) return d > 0 ? MODE_P : MODE_N;
  const vm = (1 - u) / (1 + lam);
  if (vm >= m) return MODE_P;
  if (vm <= -m) return MODE_N;
  return MODE_O;
}

/** Crossing tolerance (relative to the half period) of a propagation that only seeds the sequence solve. */
const SEED_CROSSING_TOLERANCE = 1e-7;

export function propagateEvents(j0: number, u0: number, g0: number, m: number, lam: number, theta: number, record: boolean): void {
  let j = j0;
  let u = u0;
  let g = g0;
  let t = 0;
  events.clear();
  let mode = startMode(j, u, g, m, lam);
  const band = m * (1 + lam);
  // a propagation that only finds the sequence seeds Newton: its crossings need not be exact
  const crossingTolerance = record ? 0 : SEED_CROSSING_TOLERANCE * theta;
  while (t < theta) {
    if (!events.hasRoom()) break;
    const remaining = theta - t;
    let tau: number;
    let next = mode;
    if (mode === MODE_O) {
      g = j;
      if (lam > 0) {
        const w = Math.sqrt(lam / (1 + lam));
        const a = u - 1;
        const b = j / w;
        // stays while 1 − band < u < 1 + band
        const tLow = firstDownCrossing(a, b, band, 0, w, remaining, crossingTolerance); // u − (1 − band)
        const tHigh = firstDownCrossing(-a, -b, band, 0, w, remaining, crossingTolerance); // (1 + band) − u
        tau = Math.min(tLow, tHigh, remaining);
        if (tau < remaining) next = tLow <= tHigh ? MODE_P : MODE_N;
        if (record) {
          events.currentPeak = Math.max(events.currentPeak, sinusoidPeak(0, j, -a * w, w, tau));
          events.thirdStatePeak = Math.max(events.thirdStatePeak, sinusoidPeak(0, j, -a * w, w, tau));
          events.capacitorPeak = Math.max(events.capacitorPeak, sinusoidPeak(1, a, b, w, tau));
          events.currentSquareIntegral += squareIntegral(j, -a * w, w * tau) / w;
        }
      } else {
        // series-resonant limit: the current rests at zero until the bridge switches
        tau = remaining;
        if (record) {
          events.currentPeak = Math.max(events.currentPeak, Math.abs(j));
          events.thirdStatePeak = Math.max(events.thirdStatePeak, Math.abs(j));
          events.capacitorPeak = Math.max(events.capacitorPeak, Math.abs(u), Math.abs(u + j * tau));
          events.currentSquareIntegral += j * j * tau;
        }
      }
    } else {
      const sign = mode === MODE_P ? 1 : -1;
      const e = 1 - sign * m;
      // s·(j − g) = s[j cos t + (e − u) sin t − g] − m λ t
      const root = firstDownCrossing(sign * j, sign * (e - u), -sign * g, -m * lam, 1, remaining, crossingTolerance);
      tau = Math.min(root, remaining);
      const integral = diodeIntegral(mode, tau, j, u, g, m, lam);
      events.loadIntegral += sign * integral;
      if (record) {
        const a = j;
        const b = e - u;
        events.currentPeak = Math.max(events.currentPeak, sinusoidPeak(0, a, b, 1, tau));
        events.capacitorPeak = Math.max(events.capacitorPeak, sinusoidPeak(e, u - e, j, 1, tau));
        const gEnd = g + sign * m * lam * tau;
        events.thirdStatePeak = Math.max(events.thirdStatePeak, Math.abs(g), Math.abs(gEnd));
        const j2 = squareIntegral(a, b, tau);
        events.currentSquareIntegral += j2;
        // ∫ (j − g − c t)² with c = s m λ
        const c = sign * m * lam;
        const sinT = Math.sin(tau);
        const cosT = Math.cos(tau);
        const intJ = a * sinT + b * (1 - cosT);
        const intJt = a * (tau * sinT + cosT - 1) + b * (sinT - tau * cosT);
        const intLin2 = g * g * tau + g * c * tau * tau + (c * c * tau * tau * tau) / 3;
        events.rectifierSquareIntegral += j2 - 2 * (g * intJ + c * intJt) + intLin2;
      }
      if (root < remaining) {
        flow(mode, tau, j, u, g, m, lam, true);
        const vm = (1 - (out[1] ?? 0)) / (1 + lam);
        next = vm >= m ? MODE_P : vm <= -m ? MODE_N : MODE_O;
        if (next === mode) next = MODE_O;
      }
    }
    flow(mode, tau, j, u, g, m, lam, true);
    j = out[0] ?? 0;
    u = out[1] ?? 0;
    g = out[2] ?? 0;
    if (mode === MODE_O) g = j;
    events.push(mode, tau);
    t += tau;
    if (tau >= remaining) break;
    mode = next;
  }
  evEnd[0] = j;
  evEnd[1] = u;
  evEnd[2] = g;
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

/** Removes segment k of the assumed sequence, merging neighbours of the same mode. */
function dropSegment(k: number): void {
  const tau = seqTau[k] ?? 0;
  for (let i = k; i < seqLength - 1; i++) {
    seqModes[i] = seqModes[i + 1] ?? 0;
    seqTau[i] = seqTau[i + 1] ?? 0;
  }
  seqLength--;
  // give the removed time to a neighbour so the durations still fill the half period
  const target = k > 0 ? k - 1 : 0;
  seqTau[target] = (seqTau[target] ?? 0) + tau;
  if (k > 0 && k < seqLength && seqModes[k - 1] === seqModes[k]) {
    seqTau[k - 1] = (seqTau[k - 1] ?? 0) + (seqTau[k] ?? 0);
    for (let i = k; i < seqLength - 1; i++) {
      seqModes[i] = seqModes[i + 1] ?? 0;
      seqTau[i] = seqTau[i + 1] ?? 0;
    }
    seqLength--;
  }
}

function adoptEvents(): void {
  seqLength = events.length;
  for (let k = 0; k < events.length; k++) {
    seqModes[k] = events.modes[k] ?? 0;
    seqTau[k] = events.durations[k] ?? 0;
  }
}

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
    adoptEvents();
    let rn = solveSequence(theta, lam, kappa, sj, su, sg, mm);
    for (let fix = 0; fix < 6 && Number.isFinite(rn); fix++) {
      // a segment driven to a negative duration does not exist: drop it and solve again
      let worst = -1;
      let worstTau = -1e-9 * theta;
      for (let k = 0; k < seqLength; k++) {
        const tau = seqTau[k] ?? 0;
        if (tau < worstTau) {
          worstTau = tau;
          worst = k;
        }
      }
      if (worst < 0 || seqLength < 2) break;
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
