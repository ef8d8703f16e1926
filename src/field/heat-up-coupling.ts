/**
 * The coupling of {@link fieldHeatUp}: the part's cells as regions of the field problem with
 * their resistivity and permeability at the cell temperatures, the fixed-point iteration of
 * the permeability on the cells' peak field strength, the starting mesh and its error
 * estimate, and the induced power of each cell handed to the conduction solver. Internal.
 *
 * @packageDocumentation
 */
import { relativePermeabilityAt, resistivityAt } from "../materials/index.js";
import type { ConductiveMaterial } from "../materials/index.js";
import { MU_0 } from "../units/index.js";
import type { PartGenerationRequest } from "./conduction-types.js";
import { bodyLosses, fieldAtProbe, impedanceChange, probe } from "./field-evaluation.js";
import { MAX_DENSITY, MAX_NODES } from "./solve-axisymmetric-field.js";
import { solveOnce } from "./solver.js";
import type { SolverBody, SolverProblem, SolverSolution } from "./solver-types.js";

/** Gauss–Legendre points on [0, 1]: 3 across r, 2 along z (where a cell's field strength is sampled). */
const GAUSS_3 = [0.5 - Math.sqrt(0.15), 0.5, 0.5 + Math.sqrt(0.15)];
const GAUSS_2 = [0.5 - 0.5 / Math.sqrt(3), 0.5 + 0.5 / Math.sqrt(3)];
/** Finite-element solves per field solution at most (permeability iterations; the first solution gets three times as many). */
const PERMEABILITY_ITERATIONS = 2;
/** Stop the permeability iteration when the field-weighted relative change is below this. */
const PERMEABILITY_TOLERANCE = 0.05;

/**
 * A coil's terminal values at one field solution of a heat-up.
 *
 * @category Field
 */
export interface FieldHeatUpCoilState {
  /** Self-resistance [Ω] (the coil's own conductor and the losses it induces). */
  readonly resistance: number;
  /** Self-inductance [H]. */
  readonly inductance: number;
}

/**
 * One field solution of a heat-up.
 *
 * @category Field
 */
export interface FieldHeatUpSolution {
  /** Time of the temperatures it was solved for [s]. */
  readonly time: number;
  /** Power induced in the part [W]. */
  readonly power: number;
  /** Volume-mean temperature of the part [K]. */
  readonly meanTemperature: number;
  /** Hottest cell of the part [K]. */
  readonly maximumTemperature: number;
  /** Self-resistance [Ω] and self-inductance [H] of each coil, by name. */
  readonly coils: Readonly<Record<string, FieldHeatUpCoilState>>;
}

/** What the coupling needs to know of the part and the field problem. */
export interface HeatedCells {
  /** The field problem with the part's cells as regions at the starting properties. */
  readonly base: SolverProblem;
  /** Body number of the part's first cell (cell (i, j) is body first + i·axial + j). */
  readonly firstCellBody: number;
  readonly coilNames: readonly string[];
  /** Coil currents (RMS phasors, real). */
  readonly currents: readonly { re: number; im: number }[];
  readonly material: ConductiveMaterial;
  readonly rEdges: readonly number[];
  readonly zEdges: readonly number[];
  /** Cells across r and along z. */
  readonly nr: number;
  readonly nz: number;
  /** Starting temperature [K] and the properties there. */
  readonly initial: number;
  readonly rho0: number;
  readonly mu0: number;
  /** Re-solve when a cell has moved by more than this [K]. */
  readonly resolveStep: number;
  /** Target relative error of the impedance of the starting mesh. */
  readonly accuracy: number;
}

/** The field side of a heat-up: cell properties, the latest field solution and the history of solutions. */
export class HeatUpCoupling {
  /** Finite-element solves so far. */
  fieldIterations = 0;
  /** Estimated relative error of the impedance on the starting mesh (set by {@link start}). */
  estimatedError = 0;
  /** Every field solution taken, in time order. */
  readonly solutions: FieldHeatUpSolution[] = [];
  private readonly n: number;
  private readonly rho: Float64Array;
  private readonly mur: Float64Array;
  private readonly hPeak: Float64Array;
  /** μr of each cell in the last solution. */
  private readonly murSolved: Float64Array;
  private readonly cellPower: Float64Array;
  private readonly lastTemps: Float64Array;
  private problem: SolverProblem;
  private sol: SolverSolution | undefined;
  private density = 0;
  private solved = false;

  constructor(private readonly cells: HeatedCells) {
    this.n = cells.nr * cells.nz;
    const n = this.n;
    this.rho = new Float64Array(n);
    this.mur = new Float64Array(n);
    this.hPeak = new Float64Array(n);
    this.murSolved = new Float64Array(n);
    this.cellPower = new Float64Array(n);
    this.lastTemps = new Float64Array(n);
    this.problem = cells.base;
  }

  /** The latest solution. */
  private get solution(): SolverSolution {
    if (this.sol === undefined) throw new Error("HeatUpCoupling: no field solution yet (start first)");
    return this.sol;
  }

  /** The field problem with every cell at its present resistivity and permeability. */
  private withProperties(): SolverProblem {
    const { base, firstCellBody } = this.cells;
    const { n, rho, mur } = this;
    const bodies: SolverBody[] = base.bodies.map((b, k) => {
      const c = k - firstCellBody;
      if (c < 0 || c >= n) return b;
      return { ...b, sigma: 1 / rho[c]!, mur: mur[c]!, resistivity: rho[c]! };
    });
    return { ...base, bodies };
  }

  /** Solves the field with the present properties on the present mesh. */
  private solveWith(): void {
    this.problem = this.withProperties();
    this.sol = solveOnce(this.problem, { density: this.density });
    this.murSolved.set(this.mur);
    this.fieldIterations++;
  }

  /**
   * Peak field strength of each cell [A/m] from the last solution: the loss-weighted mean
   * $\sum H^3/\sum H^2$ over 3 × 2 Gauss points of the cell, so that a cell thicker than the
   * skin depth takes the field where its power is.
   */
  private fieldStrengths(): void {
    const { nr, nz, rEdges, zEdges, currents: I } = this.cells;
    const { problem, murSolved, hPeak } = this;
    const sol = this.solution;
    for (let i = 0; i < nr; i++) {
      for (let j = 0; j < nz; j++) {
        const c = i * nz + j;
        let s2 = 0;
        let s3 = 0;
        for (const fr of GAUSS_3) {
          const r = rEdges[i]! + fr * (rEdges[i + 1]! - rEdges[i]!);
          for (const fz of GAUSS_2) {
            const pr = probe(sol.mesh, r, zEdges[j]! + fz * (zEdges[j + 1]! - zEdges[j]!));
            if (pr === null) continue;
            const f = fieldAtProbe(problem, sol, I, pr);
            const br2 = f.dzR * f.dzR + f.dzI * f.dzI;
            const bzr = f.drR + f.ar / r;
            const bzi = f.drI + f.ai / r;
            const h = (Math.SQRT2 * Math.sqrt(br2 + bzr * bzr + bzi * bzi)) / (MU_0 * murSolved[c]!);
            s2 += h * h;
            s3 += h * h * h;
          }
        }
        hPeak[c] = s2 > 0 ? s3 / s2 : 0;
      }
    }
  }

  /** μr at the field of the last solution; returns the field-weighted relative change. */
  private permeabilityChange(temps: Float64Array): number {
    const { n, hPeak, mur } = this;
    const material = this.cells.material;
    this.fieldStrengths();
    let hMax = 0;
    for (let c = 0; c < n; c++) hMax = Math.max(hMax, hPeak[c]!);
    let change = 0;
    for (let c = 0; c < n; c++) {
      const wanted = relativePermeabilityAt(material, { temperature: temps[c]!, fieldStrengthPeak: hPeak[c]! });
      const weight = hMax > 0 ? hPeak[c]! / hMax : 0;
      change = Math.max(change, (Math.abs(wanted - mur[c]!) / mur[c]!) * weight);
      mur[c] = wanted;
    }
    return change;
  }

  /**
   * The starting solution: the permeability iterated at the starting temperature, and the mesh
   * refined until the impedance settles (its change to a mesh √2 finer, doubled, is
   * `estimatedError`).
   */
  start(): void {
    const { n, rho, mur } = this;
    const { rho0, mu0, accuracy, initial } = this.cells;
    const nc = this.cells.base.coilCount;
    // starting mesh density: refine at the starting temperature until the impedance settles
    for (let c = 0; c < n; c++) {
      rho[c] = rho0;
      mur[c] = mu0;
    }
    // a first solve at the low-field permeability gives the field strengths for the starting μr
    this.density = Math.min(MAX_DENSITY / Math.SQRT2, Math.max(0.7, Math.pow(1e-3 / accuracy, 0.25)));
    this.solveWith();
    const startTemps = new Float64Array(n).fill(initial);
    for (let it = 0; it < 3 * PERMEABILITY_ITERATIONS; it++) {
      if (this.permeabilityChange(startTemps) < PERMEABILITY_TOLERANCE) break;
      this.solveWith();
    }
    // error estimate: the change to a mesh √2 finer; with the error falling at least by half per
    // refinement (as solveAxisymmetricField assumes) the coarser mesh's error is at most twice it
    for (;;) {
      const finer = solveOnce(this.problem, { density: this.density * Math.SQRT2 });
      this.fieldIterations++;
      this.estimatedError = 2 * impedanceChange(this.solution, finer, nc);
      if (this.estimatedError <= accuracy || this.density * 2 > MAX_DENSITY * 1.0001 || 2.2 * finer.nodes > MAX_NODES) break;
      this.density *= Math.SQRT2;
      this.sol = finer;
    }
  }

  /** Records the power of every cell from the last solution, and the solution's summary at `time`. */
  private take(time: number, temps: Float64Array): void {
    const { n, cellPower, lastTemps } = this;
    const { nr, nz, rEdges, zEdges, firstCellBody, coilNames, currents: I } = this.cells;
    const nc = this.cells.base.coilCount;
    const sol = this.solution;
    const losses = bodyLosses(this.problem, sol, I);
    let total = 0;
    let mean = 0;
    let vol = 0;
    let hottest = 0;
    for (let c = 0; c < n; c++) {
      cellPower[c] = losses[firstCellBody + c]!;
      total += cellPower[c]!;
      lastTemps[c] = temps[c]!;
      hottest = Math.max(hottest, temps[c]!);
    }
    for (let i = 0; i < nr; i++) {
      const ring = rEdges[i + 1]! * rEdges[i + 1]! - rEdges[i]! * rEdges[i]!;
      for (let j = 0; j < nz; j++) {
        const v = ring * (zEdges[j + 1]! - zEdges[j]!);
        vol += v;
        mean += v * temps[i * nz + j]!;
      }
    }
    const coils: Record<string, { resistance: number; inductance: number }> = {};
    coilNames.forEach((name, c) => {
      const k = c * nc + c;
      coils[name] = { resistance: sol.zRe[k]!, inductance: sol.zIm[k]! / sol.omega };
    });
    this.solutions.push({ time, power: total, meanTemperature: mean / vol, maximumTemperature: hottest, coils });
  }

  /**
   * The conduction solver's generation callback: the power of the last solution, re-solved
   * first (new temperatures, then the permeability iteration) when a cell has moved by more
   * than `resolveStep` since it.
   */
  generationAt(request: PartGenerationRequest): void {
    const { n, rho, mur, hPeak, lastTemps } = this;
    const { material, resolveStep } = this.cells;
    const temps = request.temperatures;
    if (!this.solved) {
      this.take(request.time, temps);
      this.solved = true;
    } else {
      let moved = false;
      for (let c = 0; c < n; c++) {
        if (Math.abs(temps[c]! - lastTemps[c]!) > resolveStep) {
          moved = true;
          break;
        }
      }
      if (moved) {
        // the new temperatures at the last field strengths, then iterate on the permeability
        for (let c = 0; c < n; c++) {
          rho[c] = resistivityAt(material, temps[c]!);
          mur[c] = relativePermeabilityAt(material, { temperature: temps[c]!, fieldStrengthPeak: hPeak[c]! });
        }
        this.solveWith();
        for (let it = 1; it < PERMEABILITY_ITERATIONS; it++) {
          if (this.permeabilityChange(temps) < PERMEABILITY_TOLERANCE) break;
          this.solveWith();
        }
        this.take(request.time, temps);
      }
    }
    request.generation.set(this.cellPower);
  }
}
