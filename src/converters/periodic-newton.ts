/**
 * The shared solver machinery of the exact periodic steady states of the ideal resonant
 * converters (LLC and series-resonant, parallel-resonant and LCC, and any further
 * piecewise-linear topology). Internal.
 *
 * Each topology reduces its steady state to a square system of residuals in a small vector of
 * unknowns laid out as
 *
 *   x = (state at θ = 0 (`states` entries), gain, segment durations …)
 *
 * — the half-wave antisymmetry $x(\Theta) + x(0) = 0$, the load balance, and (for a solve on a
 * fixed mode sequence) the switching conditions. {@link PeriodicNewton} solves it by Newton's
 * method with an analytic Jacobian where the topology provides one (forward differences
 * otherwise), optional chord steps and
 * backtracking; {@link HalfPeriodRecord} holds the segments and waveform totals an event-driven
 * propagation found and names the mode sequence. The waveform tools (crossings, peaks, square integrals) are in
 * `ramp-sinusoid.ts`.
 *
 * A third topology uses it so: implement {@link PeriodicSystem} (an object whose `residuals`
 * reads the topology's parameters from its own fields, so no closure is made per call), fill
 * {@link PeriodicNewton.x}, call {@link PeriodicNewton.solve} with its {@link NewtonSettings},
 * and read the solution back from `x`. A topology solved on its state and gain alone (the
 * LCC and parallel-resonant kernels) gives its propagation and load balance to
 * {@link StateAndGainSolver} instead, which holds the residuals, the starts (continuation,
 * first harmonic, relaxation) and the figures of the solution.
 *
 * Size: the generic Newton solver, the half-period record and the state-and-gain scaffolding
 * built on both are one family, each part short; the LCC kernels and the LLC sequence solve
 * read them from this one place.
 *
 * @packageDocumentation
 */
import { factorDense, solveFactored } from "../special/internal.js";

/** A square system of residuals r(x) of a periodic steady state (see the module comment for the layout of x). */
export interface PeriodicSystem {
  /**
   * Writes r(x) into the first `size` entries of `r`; returns false where the residuals are
   * not defined (a non-positive gain, a propagation that overflowed, a non-finite value).
   */
  residuals(x: Float64Array, r: Float64Array): boolean;
  /**
   * Optional: the residuals at x (the same values `residuals` gives) and their exact
   * Jacobian, row-major size × size into `jac`; false as `residuals`. When present, it
   * replaces the forward differences (one pass instead of size + 1).
   */
  residualsAndJacobian?(x: Float64Array, r: Float64Array, jac: Float64Array): boolean;
}

/** How {@link PeriodicNewton.solve} iterates; each topology keeps one constant object of these. */
export interface NewtonSettings {
  /** Number of state unknowns at the start of x; the gain follows them, durations after it. */
  readonly states: number;
  /** A trial step is taken only when it keeps the gain above gainFloor × its current value (0 < gainFloor < 1). */
  readonly gainFloor: number;
  /** Divide the state residuals by max(1, |x_state|) (of the starting point) in the convergence norm. */
  readonly scaledNorm: boolean;
  /** Keep the Jacobian (chord steps) while full steps reduce the residual at least tenfold. */
  readonly reuseJacobian: boolean;
  /** Step halvings tried with a fresh Jacobian (a chord step is tried once, then the Jacobian is rebuilt). */
  readonly backtracks: number;
  /** Residual norm at which the iteration stops. */
  readonly tolerance: number;
  /** Most Newton iterations. */
  readonly maxIterations: number;
  /**
   * A full Newton step from a residual norm below this is taken without evaluating the
   * residuals at its end (0: never). In the quadratic regime the step lands at about the
   * square of the residual; only for a caller that verifies the solution independently.
   */
  readonly unverifiedStepBelow?: number;
}

/**
 * Newton settings of the topologies solved on their state and gain alone (unknowns
 * (j0, u0, v0, M), residuals from a propagation: the LCC and parallel-resonant kernels, with an
 * inductive or a capacitive output filter): a fresh forward-difference Jacobian each step, up to
 * 40 halvings, stop at 1e-14 with the states scaled by max(1, |x|).
 */
export const STATE_AND_GAIN_NEWTON: NewtonSettings = {
  states: 3,
  gainFloor: 0.1,
  scaledNorm: true,
  reuseJacobian: false,
  backtracks: 40,
  tolerance: 1e-14,
  maxIterations: 60,
};

/**
 * Damped Newton solver for a {@link PeriodicSystem}, with preallocated work arrays (no
 * allocation per solve). Difference steps: 1e-7 × max(1, |state|) for the states,
 * 1e-7 × max(|gain|, 1e-3) for the gain, 1e-7 × `durationScale` for the durations.
 */
export class PeriodicNewton {
  /** The unknowns: the starting point before {@link PeriodicNewton.solve}, the solution after it. */
  readonly x: Float64Array;
  private readonly r: Float64Array;
  private readonly rTrial: Float64Array;
  private readonly trial: Float64Array;
  private readonly step: Float64Array;
  private jac: Float64Array;
  private jacTrial: Float64Array;
  private readonly lu: Float64Array;
  private readonly pivots: Int32Array;
  private normScale = 1;

  /** @param capacity - the largest number of unknowns solved for */
  constructor(capacity: number) {
    this.x = new Float64Array(capacity);
    this.r = new Float64Array(capacity);
    this.rTrial = new Float64Array(capacity);
    this.trial = new Float64Array(capacity);
    this.step = new Float64Array(capacity);
    this.jac = new Float64Array(capacity * capacity);
    this.jacTrial = new Float64Array(capacity * capacity);
    this.lu = new Float64Array(capacity * capacity);
    this.pivots = new Int32Array(capacity);
  }

  private norm(r: Float64Array, size: number, settings: NewtonSettings): number {
    let s = 0;
    for (let i = 0; i < size; i++) {
      const v = Math.abs(r[i] ?? 0);
      s = Math.max(s, settings.scaledNorm && i < settings.states ? v / this.normScale : v);
    }
    return s;
  }

  /** Forward-difference Jacobian at x (residuals in `r`) into `jac`; false where a residual is undefined. */
  private differenceJacobian(system: PeriodicSystem, size: number, settings: NewtonSettings, durationScale: number): boolean {
    const { x, r, rTrial, jac } = this;
    const states = settings.states;
    for (let c = 0; c < size; c++) {
      const base = x[c] ?? 0;
      const h = 1e-7 * (c < states ? this.normScale : c === states ? Math.max(Math.abs(base), 1e-3) : durationScale);
      x[c] = base + h;
      const ok = system.residuals(x, rTrial);
      x[c] = base;
      if (!ok) return false;
      for (let i = 0; i < size; i++) jac[i * size + c] = ((rTrial[i] ?? 0) - (r[i] ?? 0)) / h;
    }
    return true;
  }

  /**
   * Solves r(x) = 0 from the starting point in {@link PeriodicNewton.x} (first `size`
   * entries), leaving the last accepted iterate there.
   *
   * @param system - the residuals
   * @param size - number of unknowns (≤ capacity)
   * @param settings - the iteration settings
   * @param durationScale - scale of the duration unknowns (the half period), for the difference steps
   * @returns the final residual norm (Infinity when the residuals are undefined at the start or the Jacobian is singular)
   */
  solve(system: PeriodicSystem, size: number, settings: NewtonSettings, durationScale: number): number {
    const { x, r, rTrial, trial, step, lu, pivots } = this;
    const gain = settings.states;
    // with an analytic Jacobian and no chord steps, every trial point is evaluated with its
    // Jacobian: an accepted trial brings the next iteration's Jacobian along
    const exact = system.residualsAndJacobian !== undefined && !settings.reuseJacobian;
    let scale = 1;
    for (let i = 0; i < settings.states; i++) scale = Math.max(scale, Math.abs(x[i] ?? 0));
    this.normScale = scale;
    if (!(exact ? this.evaluateWithJacobian(system, x, r, this.jac) : system.residuals(x, r))) return Infinity;
    let rn = this.norm(r, size, settings);
    let fresh = false;
    let haveJacobian = exact;
    for (let iteration = 0; iteration < settings.maxIterations && rn > settings.tolerance; iteration++) {
      if (!haveJacobian) {
        const ok = system.residualsAndJacobian === undefined ? this.differenceJacobian(system, size, settings, durationScale) : system.residualsAndJacobian(x, r, this.jac);
        if (!ok) return Infinity;
        haveJacobian = true;
        fresh = true;
      }
      // factor a new Jacobian once; chord steps reuse the factors. With the exact Jacobian of
      // every trial (`exact`) the factors are made in place: that Jacobian is not read again
      // (an accepted trial brings the next one, a rejected step ends the iteration)
      const factors = exact ? this.jac : lu;
      if (fresh || exact) {
        if (!exact) {
          const jac = this.jac;
          for (let i = 0; i < size * size; i++) lu[i] = jac[i] ?? 0;
        }
        if (!factorDense(size, factors, pivots)) return Infinity;
        fresh = true;
      }
      for (let i = 0; i < size; i++) step[i] = -(r[i] ?? 0);
      if (!solveFactored(size, factors, pivots, step)) return Infinity;
      if (fresh && rn < (settings.unverifiedStepBelow ?? 0)) {
        for (let i = 0; i < size; i++) x[i] = (x[i] ?? 0) + (step[i] ?? 0);
        return rn * rn;
      }
      let lambda = 1;
      let accepted = false;
      const backtracks = fresh ? settings.backtracks : 1;
      for (let back = 0; back < backtracks; back++) {
        for (let i = 0; i < size; i++) trial[i] = (x[i] ?? 0) + lambda * (step[i] ?? 0);
        if ((trial[gain] ?? 0) > settings.gainFloor * (x[gain] ?? 0) && (exact ? this.evaluateWithJacobian(system, trial, rTrial, this.jacTrial) : system.residuals(trial, rTrial))) {
          const tn = this.norm(rTrial, size, settings);
          if (tn < rn) {
            for (let i = 0; i < size; i++) {
              x[i] = trial[i] ?? 0;
              r[i] = rTrial[i] ?? 0;
            }
            if (exact) {
              const t = this.jac;
              this.jac = this.jacTrial;
              this.jacTrial = t;
            } else if (!(settings.reuseJacobian && lambda === 1 && tn < 0.1 * rn)) {
              // keep the Jacobian only while full steps converge fast
              haveJacobian = false;
            }
            rn = tn;
            accepted = true;
            break;
          }
        }
        lambda *= 0.5;
      }
      if (!accepted) {
        if (fresh) break; // a fresh Jacobian found no descent: converged as far as rounding allows
        haveJacobian = false; // a stale one: rebuild and retry
        continue;
      }
      fresh = false;
    }
    return rn;
  }

  private evaluateWithJacobian(system: PeriodicSystem, at: Float64Array, r: Float64Array, jac: Float64Array): boolean {
    return system.residualsAndJacobian === undefined ? false : system.residualsAndJacobian(at, r, jac);
  }

}

/** The conduction-mode sequence of a half period and the duration of each mode. */
export interface ModeSummary {
  /** Letters of the modes in order, neighbours of the same mode merged, e.g. "PO". */
  readonly sequence: string;
  /** Duration of each letter's interval [normalised time]. */
  readonly durations: number[];
}

/**
 * What an event-driven propagation of one half period found: its segments (mode, duration)
 * and the running totals of its waveform figures (normalised units), all reset by
 * {@link HalfPeriodRecord.clear}. Each topology says in its kernel which waveform each total
 * holds.
 */
export class HalfPeriodRecord {
  /** Mode code of each segment. */
  readonly modes: Int32Array;
  /** Duration of each segment [normalised time]. */
  readonly durations: Float64Array;
  /** Number of segments held. */
  length = 0;
  /** Set when a propagation needed more segments than the record holds. */
  overflow = false;
  /** ∫ of the rectified quantity of the load balance (LLC: |j − g|; PRC/LCC: |v|). */
  loadIntegral = 0;
  /** ∫ j (resonant current). */
  currentIntegral = 0;
  /** ∫ j². */
  currentSquareIntegral = 0;
  /** ∫ of the square of the rectifier-side waveform (LLC: j − g; PRC/LCC: v). */
  rectifierSquareIntegral = 0;
  /** Peak |j|. */
  currentPeak = 0;
  /** Peak |u| (the series or resonant capacitor voltage). */
  capacitorPeak = 0;
  /** Peak of the third state (LLC: |g|, the magnetising current; PRC/LCC: |v|). */
  thirdStatePeak = 0;
  /** Time spent in a clamped mode. */
  clampedTime = 0;

  /** @param capacity - most segments in one half period */
  constructor(capacity: number) {
    this.modes = new Int32Array(capacity);
    this.durations = new Float64Array(capacity);
  }

  /** Empties the record and zeroes the totals before a propagation. */
  clear(): void {
    this.length = 0;
    this.overflow = false;
    this.loadIntegral = 0;
    this.currentIntegral = 0;
    this.currentSquareIntegral = 0;
    this.rectifierSquareIntegral = 0;
    this.currentPeak = 0;
    this.capacitorPeak = 0;
    this.thirdStatePeak = 0;
    this.clampedTime = 0;
  }

  /** True while another segment fits; otherwise marks the overflow (the propagation must stop). */
  hasRoom(): boolean {
    if (this.length < this.modes.length) return true;
    this.overflow = true;
    return false;
  }

  /** Appends a segment (call {@link HalfPeriodRecord.hasRoom} first). */
  push(mode: number, duration: number): void {
    this.modes[this.length] = mode;
    this.durations[this.length] = duration;
    this.length++;
  }

  /**
   * Names the sequence: segments no longer than 1e-9 × halfPeriod (a zero-length segment at a
   * mode boundary) are not modes, and neighbours of the same mode merge.
   *
   * @param letters - the letter of each mode code
   * @param halfPeriod - the half period [normalised time]
   */
  summary(letters: readonly string[], halfPeriod: number): ModeSummary {
    let sequence = "";
    const durations: number[] = [];
    for (let k = 0; k < this.length; k++) {
      const tau = this.durations[k] ?? 0;
      if (tau <= 1e-9 * halfPeriod) continue;
      const letter = letters[this.modes[k] ?? 0] ?? "?";
      if (sequence.endsWith(letter)) {
        durations[durations.length - 1] = (durations[durations.length - 1] ?? 0) + tau;
        continue;
      }
      sequence += letter;
      durations.push(tau);
    }
    return { sequence, durations };
  }
}

// ---------------------------------------------------------------------------------------------
// Topologies solved on their state and gain alone (the LCC and parallel-resonant kernels).

/** A start of a state-and-gain solve: a previous solution (continuation). */
export interface StateAndGainStart {
  readonly j0: number;
  readonly u0: number;
  readonly v0: number;
  readonly gain: number;
}

/**
 * What a topology solved on its state and gain alone gives {@link StateAndGainSolver}: its
 * exact propagation of the positive half period from the states (j, u, v) with the gain m,
 * for the capacitance ratio a = C_p/C_s, the load ζ = Z_p/(n²R_load) and the half period Θ
 * (normalised), and its load balance.
 */
export interface StateAndGainTopology {
  /** Letter of each mode code (for {@link HalfPeriodRecord.summary}). */
  readonly letters: readonly string[];
  /** The record the propagation fills: segments and load integral, with `record` the waveform totals. */
  readonly events: HalfPeriodRecord;
  /** End state (j, u, v) of the last propagation. */
  readonly end: Float64Array;
  /** Propagates the positive half period from (j, u, v) with gain m into `events` and `end`. */
  propagate(j: number, u: number, v: number, m: number, a: number, zeta: number, theta: number, record: boolean): void;
  /** Load-balance residual of the last propagation at gain m (0 at the steady state). */
  loadResidual(m: number, zeta: number, theta: number): number;
  /** The relaxation's gain for the next half period, from the last propagation's load integral. */
  relaxedGain(m: number, zeta: number, theta: number): number;
}

/** The figures every state-and-gain kernel reports, normalised (its kernel states the units). */
export interface StateAndGainSteadyState {
  gain: number;
  j0: number;
  u0: number;
  v0: number;
  /** Mode sequence of the positive half period. */
  sequence: string;
  durations: number[];
  resonantRms: number;
  resonantPeak: number;
  seriesPeak: number;
  parallelPeak: number;
  parallelRms: number;
  /** Fraction of the period in the clamped modes. */
  clampedFraction: number;
  /** Mean of j over the positive half period (input current). */
  inputMean: number;
  /** Boundary-condition residual of the accepted solution. */
  residual: number;
}

/**
 * Newton's method on x = (j0, u0, v0, M) for a {@link StateAndGainTopology}: the residuals are
 * the half-wave antisymmetry x(Θ) + x(0) of the states and the topology's load balance, solved
 * with {@link STATE_AND_GAIN_NEWTON}; the starts, and the figures of the solution.
 */
export class StateAndGainSolver implements PeriodicSystem {
  private readonly newton = new PeriodicNewton(4);
  /** The unknowns (j0, u0, v0, M): the starting point, then the solution. */
  readonly x: Float64Array = this.newton.x;
  private readonly topology: StateAndGainTopology;
  private a = 0;
  private zeta = 0;
  private theta = 0;

  constructor(topology: StateAndGainTopology) {
    this.topology = topology;
  }

  residuals(x: Float64Array, out: Float64Array): boolean {
    const m = x[3] ?? 0;
    if (!(m > 0)) return false;
    const t = this.topology;
    t.propagate(x[0] ?? 0, x[1] ?? 0, x[2] ?? 0, m, this.a, this.zeta, this.theta, false);
    if (t.events.overflow) return false;
    const end = t.end;
    out[0] = (end[0] ?? 0) + (x[0] ?? 0);
    out[1] = (end[1] ?? 0) + (x[1] ?? 0);
    out[2] = (end[2] ?? 0) + (x[2] ?? 0);
    out[3] = t.loadResidual(m, this.zeta, this.theta);
    return Number.isFinite(out[0] + out[1] + out[2] + out[3]);
  }

  /** Newton from (j, u, v, m) for (a, ζ, Θ); leaves the last iterate in `x` and returns its residual norm. */
  solveFrom(j: number, u: number, v: number, m: number, a: number, zeta: number, theta: number): number {
    const x = this.x;
    x[0] = j;
    x[1] = u;
    x[2] = v;
    x[3] = m;
    this.a = a;
    this.zeta = zeta;
    this.theta = theta;
    return this.newton.solve(this, 4, STATE_AND_GAIN_NEWTON, theta);
  }

  /**
   * Newton from `start` when given; where that does not reach `tolerance`, from `seed` (j, u,
   * v, m in its first four entries: the first harmonic); where that does not either, from the
   * seed relaxed over up to 400 half periods (each from the negated end state of the last, the
   * gain from {@link StateAndGainTopology.relaxedGain}). Returns the last residual norm.
   */
  solveFromStarts(start: StateAndGainStart | undefined, seed: Float64Array, a: number, zeta: number, theta: number, tolerance: number): number {
    let res = start === undefined ? Infinity : this.solveFrom(start.j0, start.u0, start.v0, start.gain, a, zeta, theta);
    if (!(res < tolerance)) res = this.solveFrom(seed[0] ?? 0, seed[1] ?? 0, seed[2] ?? 0, seed[3] ?? 1, a, zeta, theta);
    if (res < tolerance) return res;
    const t = this.topology;
    const end = t.end;
    let j = seed[0] ?? 0;
    let u = seed[1] ?? 0;
    let v = seed[2] ?? 0;
    let m = seed[3] ?? 1;
    for (let i = 0; i < 400; i++) {
      t.propagate(j, u, v, m, a, zeta, theta, false);
      if (t.events.overflow) break;
      j = -(end[0] ?? 0);
      u = -(end[1] ?? 0);
      v = -(end[2] ?? 0);
      m = t.relaxedGain(m, zeta, theta);
    }
    return this.solveFrom(j, u, v, m, a, zeta, theta);
  }

  /**
   * The figures of the solution in `x`, with the start voltage v0 (a kernel may clamp it):
   * one more propagation that records the waveforms (the topology's `events` keep its totals).
   */
  steadyState(a: number, zeta: number, theta: number, v0: number, residual: number): StateAndGainSteadyState {
    const x = this.x;
    const m = x[3] ?? 0;
    const j0 = x[0] ?? 0;
    const u0 = x[1] ?? 0;
    const t = this.topology;
    t.propagate(j0, u0, v0, m, a, zeta, theta, true);
    const events = t.events;
    const { sequence, durations } = events.summary(t.letters, theta);
    return {
      gain: m,
      j0,
      u0,
      v0,
      sequence,
      durations,
      resonantRms: Math.sqrt(events.currentSquareIntegral / theta),
      resonantPeak: events.currentPeak,
      seriesPeak: events.capacitorPeak,
      parallelPeak: events.thirdStatePeak,
      parallelRms: Math.sqrt(Math.max(0, events.rectifierSquareIntegral) / theta),
      clampedFraction: events.clampedTime / theta,
      inputMean: events.currentIntegral / theta,
      residual,
    };
  }
}
