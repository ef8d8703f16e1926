/**
 * The solve of the LLC steady state on an assumed mode sequence: unknowns (j0, u0, g0, m,
 * τ_0 … τ_{n−2}), residuals (antisymmetry, the switching conditions, the load balance) and their
 * exact Jacobian by forward-mode differentiation of the segment maps, Newton on them, and the
 * edits of the sequence (adopt a propagation's segments, drop a segment). Internal.
 *
 * @packageDocumentation
 */
import { HalfPeriodRecord, PeriodicNewton, type NewtonSettings, type PeriodicSystem } from "./periodic-newton.js";
import { MAX_SEGMENTS, MODE_O, MODE_P, SEG_COS, SEG_SIN, flow, flowDiode, out } from "./llc-segments.js";

// ---------------------------------------------------------------------------------------------
// Newton on (m, τ_0 … τ_{k−2}) for a fixed sequence.

/** The assumed mode sequence: the mode and duration of each segment. */
export const seqModes = new Int32Array(MAX_SEGMENTS);
export const seqTau = new Float64Array(MAX_SEGMENTS);
let seqLength = 0;

/** Number of segments of the assumed sequence. */
export function sequenceLength(): number {
  return seqLength;
}

/** The segment durations from the unknowns y: τ_0 … τ_{n−2} given, the last what remains of the half period θ. */
export function setDurations(y: Float64Array, theta: number): void {
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
export const unknowns = newton.x;

/** Solves the assumed sequence from the given state and gain (durations from seqTau); returns the final residual norm. */
export function solveSequence(theta: number, lam: number, kappa: number, j0: number, u0: number, g0: number, m: number): number {
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


/** Removes segment k of the assumed sequence, merging neighbours of the same mode. */
export function dropSegment(k: number): void {
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

/** Takes the segments a propagation found as the assumed sequence. */
export function adoptSegments(events: HalfPeriodRecord): void {
  seqLength = events.length;
  for (let k = 0; k < events.length; k++) {
    seqModes[k] = events.modes[k] ?? 0;
    seqTau[k] = events.durations[k] ?? 0;
  }
}
