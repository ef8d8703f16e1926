/**
 * The discrete problem of the axisymmetric conduction solver (internal): the material tables,
 * the finite-volume lattice of ring cells (volumes, radial and axial resistance factors, the
 * 5-point sparse pattern and its nested-dissection order), the exposed faces with their
 * convection and radiation, and one implicit time step by Newton's method on the enthalpy form.
 *
 * @packageDocumentation
 */
import type { ConductiveMaterial } from "../materials/index.js";
import { specificEnthalpyChange, thermalConductivityAt } from "../materials/index.js";
import { factorComplexSymmetric, latticeNestedDissection } from "../special/index.js";
import { STEFAN_BOLTZMANN } from "../units/index.js";
import type { ConductionSetup } from "./conduction-setup.js";

/** Temperature step of the material tables [K]. */
const TABLE_STEP = 0.5;
/** Newton iterations of a time step stop when no cell moves by more than this [K]. */
const NEWTON_TOLERANCE = 1e-7;

/**
 * Material tables on a uniform temperature grid: specific enthalpy (exact integral of c(T) at
 * the grid points, linear between) and thermal conductivity. Built once per run.
 */
export interface MaterialTables {
  readonly t0: number;
  readonly step: number;
  readonly h: Float64Array;
  readonly k: Float64Array;
}

/** Builds the material tables from tMin to tMax (the readers extrapolate the enthalpy linearly and hold the conductivity beyond). */
export function materialTables(material: ConductiveMaterial, tMin: number, tMax: number): MaterialTables {
  const t0 = Math.max(1, Math.floor(tMin) - 2);
  const n = Math.ceil((tMax + 2 - t0) / TABLE_STEP) + 2;
  const h = new Float64Array(n);
  const k = new Float64Array(n);
  // cumulative enthalpy from exact integrals over each interval, summed from t0
  for (let i = 0; i < n; i++) {
    const t = t0 + i * TABLE_STEP;
    k[i] = thermalConductivityAt(material, t);
    if (i > 0) h[i] = h[i - 1]! + specificEnthalpyChange(material, { fromTemperature: t - TABLE_STEP, toTemperature: t });
  }
  return { t0, step: TABLE_STEP, h, k };
}

/** Specific enthalpy [J/kg] (relative to t0) and its slope dh/dT [J/(kg·K)] at t, written into out[0], out[1]. */
export function enthalpy(tab: MaterialTables, t: number, out: Float64Array): void {
  const x = (t - tab.t0) / tab.step;
  const n = tab.h.length;
  let i = Math.floor(x);
  if (i < 0) i = 0;
  if (i > n - 2) i = n - 2;
  const slope = (tab.h[i + 1]! - tab.h[i]!) / tab.step;
  out[0] = tab.h[i]! + slope * (t - (tab.t0 + i * tab.step));
  out[1] = slope;
}

/** Thermal conductivity [W/(m·K)] at t, linear between the table points and held beyond them. */
export function conductivity(tab: MaterialTables, t: number): number {
  const x = (t - tab.t0) / tab.step;
  const n = tab.k.length;
  if (x <= 0) return tab.k[0]!;
  if (x >= n - 1) return tab.k[n - 1]!;
  const i = Math.floor(x);
  const f = x - i;
  return tab.k[i]! * (1 - f) + tab.k[i + 1]! * f;
}

/** An exposed boundary face of a cell. */
interface Face {
  readonly cell: number;
  readonly area: number;
  /** resistance·k from the cell centre to the face [1/m·…]: R = geo / k */
  readonly geo: number;
}

const TWO_PI = 2 * Math.PI;

/** The lattice, its faces, the cell temperatures `T` [K] and the work arrays of the Newton steps. */
export class ConductionLattice {
  readonly nr: number;
  readonly nz: number;
  readonly n: number;
  readonly tab: MaterialTables;
  readonly volume: Float64Array;
  readonly totalVolume: number;
  readonly faces: Face[] = [];
  /** Temperature of each exposed face [K] at the last face-flow evaluation. */
  readonly faceTemp: Float64Array;
  /** Cell temperatures [K]. */
  readonly T: Float64Array;
  private readonly rEdges: readonly number[];
  private readonly zEdges: readonly number[];
  private readonly zc: Float64Array;
  private readonly logIn: Float64Array;
  private readonly logOut: Float64Array;
  private readonly colStart: Int32Array;
  private readonly rowIdx: Int32Array;
  private readonly valRe: Float64Array;
  private readonly valIm: Float64Array;
  private readonly diagAt: Int32Array;
  private readonly ordering: Int32Array;
  private readonly density: number;
  private readonly ambient: number;
  private readonly hConv: number;
  private readonly eps: number;
  private readonly kCell: Float64Array;
  private readonly res: Float64Array;
  private readonly dx: Float64Array;
  private readonly dxi: Float64Array;
  private readonly eh = new Float64Array(2);
  /** Heat flow [W] out through the last face evaluated, and its derivative in the cell temperature [W/K]. */
  private readonly faceOut = new Float64Array(2);

  constructor(setup: ConductionSetup) {
    const { material, cells, surface, initial, rEdges, zEdges } = setup;
    const nr = cells.radial;
    const nz = cells.axial;
    const n = nr * nz;
    this.nr = nr;
    this.nz = nz;
    this.n = n;
    this.rEdges = rEdges;
    this.zEdges = zEdges;
    this.density = material.density;
    this.ambient = surface.ambientTemperature;
    this.hConv = surface.convectionCoefficient;
    this.eps = surface.emissivity;
    // The property functions hold their end values outside the material's documented range, so
    // beyond the table's top the enthalpy is linear (extrapolated with the last slope, exact) and
    // the conductivity constant: one table up to the top of the range serves any temperature.
    this.tab = materialTables(material, Math.min(initial, this.ambient, material.temperatureRange.min), Math.max(initial, this.ambient, material.temperatureRange.max));
    // geometry: volumes, face conductance factors (conductance = factor / Σ(d/k) form)
    const volume = new Float64Array(n);
    const rc = new Float64Array(nr);
    const zc = new Float64Array(nz);
    for (let i = 0; i < nr; i++) rc[i] = 0.5 * (rEdges[i]! + rEdges[i + 1]!);
    for (let j = 0; j < nz; j++) zc[j] = 0.5 * (zEdges[j]! + zEdges[j + 1]!);
    for (let i = 0; i < nr; i++) {
      const ring = Math.PI * (rEdges[i + 1]! * rEdges[i + 1]! - rEdges[i]! * rEdges[i]!);
      for (let j = 0; j < nz; j++) volume[i * nz + j] = ring * (zEdges[j + 1]! - zEdges[j]!);
    }
    this.volume = volume;
    this.totalVolume = volume.reduce((a, b) => a + b, 0);
    this.zc = zc;
    // radial resistance factors: thermal resistance of a ring from radius a to b, length L, conductivity k: ln(b/a)/(2πLk)
    this.logIn = new Float64Array(nr); // ln(rc_i / r_i) (inner half of cell i); 0-radius inner edge: none
    this.logOut = new Float64Array(nr); // ln(r_{i+1} / rc_i)
    for (let i = 0; i < nr; i++) {
      // as differences of logarithms: a bore of a denormal radius must not overflow the ratio
      this.logIn[i] = rEdges[i]! > 0 ? Math.log(rc[i]!) - Math.log(rEdges[i]!) : 0;
      this.logOut[i] = Math.log(rEdges[i + 1]!) - Math.log(rc[i]!);
    }
    // sparse pattern: 5-point stencil on the nr × nz lattice, both triangles, columns in row order
    const colStart = new Int32Array(n + 1);
    const rows: number[] = [];
    for (let i = 0; i < nr; i++) {
      for (let j = 0; j < nz; j++) {
        const c = i * nz + j;
        if (i > 0) rows.push(c - nz);
        if (j > 0) rows.push(c - 1);
        rows.push(c);
        if (j < nz - 1) rows.push(c + 1);
        if (i < nr - 1) rows.push(c + nz);
        colStart[c + 1] = rows.length;
      }
    }
    this.colStart = colStart;
    this.rowIdx = Int32Array.from(rows);
    this.valRe = new Float64Array(rows.length);
    this.valIm = new Float64Array(rows.length);
    this.diagAt = new Int32Array(n);
    for (let c = 0; c < n; c++) for (let p = colStart[c]!; p < colStart[c + 1]!; p++) if (this.rowIdx[p] === c) this.diagAt[c] = p;
    this.ordering = latticeNestedDissection({ columns: nr, rows: nz, step: 1 });
    this.addFaces(setup, zc);
    this.faceTemp = new Float64Array(this.faces.length);
    this.T = new Float64Array(n).fill(initial);
    this.kCell = new Float64Array(n);
    this.res = new Float64Array(n);
    this.dx = new Float64Array(n);
    this.dxi = new Float64Array(n);
  }

  /** The exposed boundary faces: (cell, area, distance resistance factor). */
  private addFaces(setup: ConductionSetup, zc: Float64Array): void {
    const { insulated, rEdges, zEdges } = setup;
    const { nr, nz, faces, logIn, logOut } = this;
    for (let j = 0; j < nz; j++) {
      const dz = zEdges[j + 1]! - zEdges[j]!;
      if (!insulated.has("outer")) faces.push({ cell: (nr - 1) * nz + j, area: TWO_PI * rEdges[nr]! * dz, geo: logOut[nr - 1]! / (TWO_PI * dz) });
      if (rEdges[0]! > 0 && !insulated.has("inner")) faces.push({ cell: j, area: TWO_PI * rEdges[0]! * dz, geo: logIn[0]! / (TWO_PI * dz) });
    }
    for (let i = 0; i < nr; i++) {
      const ring = Math.PI * (rEdges[i + 1]! * rEdges[i + 1]! - rEdges[i]! * rEdges[i]!);
      if (!insulated.has("lower")) faces.push({ cell: i * nz, area: ring, geo: (zc[0]! - zEdges[0]!) / ring });
      if (!insulated.has("upper")) faces.push({ cell: i * nz + nz - 1, area: ring, geo: (zEdges[nz]! - zc[nz - 1]!) / ring });
    }
  }

  /** Heat flow [W] out through a face from a cell at temperature tc; writes the face temperature and [flow, dflow/dtc] into faceOut. */
  private faceFlow(f: Face, tc: number, k: number, slot: number): void {
    const { faceTemp, faceOut, ambient, hConv, eps } = this;
    const g = k / f.geo; // conductance centre → face [W/K]
    if (!(g > 0) || !(f.area > 0)) {
      // a face of no area (a bore of vanishing radius) passes no heat
      faceTemp[slot] = tc;
      faceOut[0] = 0;
      faceOut[1] = 0;
      return;
    }
    let ts = faceTemp[slot]! > 0 ? faceTemp[slot]! : tc;
    let hp = 0;
    for (let it = 0; it < 30; it++) {
      const t2 = ts * ts;
      const loss = f.area * (hConv * (ts - ambient) + eps * STEFAN_BOLTZMANN * (t2 * t2 - ambient * ambient * ambient * ambient));
      hp = f.area * (hConv + 4 * eps * STEFAN_BOLTZMANN * t2 * ts);
      const r = g * (tc - ts) - loss;
      const d = r / (g + hp);
      ts += d;
      if (Math.abs(d) < 1e-12 * ts) break;
    }
    faceTemp[slot] = ts;
    faceOut[0] = g * (tc - ts);
    faceOut[1] = (g * hp) / (g + hp);
  }

  /** The heat flow out through every exposed face at the present temperatures [W] (updates the face temperatures). */
  faceLoss(): number {
    const { faces, T, tab } = this;
    let loss = 0;
    for (let s = 0; s < faces.length; s++) {
      const f = faces[s]!;
      this.faceFlow(f, T[f.cell]!, conductivity(tab, T[f.cell]!), s);
      loss += this.faceOut[0]!;
    }
    return loss;
  }

  /** Specific enthalpy of each cell at the present temperatures [J/kg], into `out`. */
  enthalpies(out: Float64Array): void {
    for (let c = 0; c < this.n; c++) {
      enthalpy(this.tab, this.T[c]!, this.eh);
      out[c] = this.eh[0]!;
    }
  }

  /** Energy stored in the part since it was uniformly at `initial` [J]. */
  storedEnergy(initial: number): number {
    const { eh, tab, T, volume, density } = this;
    enthalpy(tab, initial, eh);
    const hStart = eh[0]!;
    let stored = 0;
    for (let c = 0; c < this.n; c++) {
      enthalpy(tab, T[c]!, eh);
      stored += density * volume[c]! * (eh[0]! - hStart);
    }
    return stored;
  }

  /**
   * One backward-Euler step of size dt from cell enthalpies `Hold` with the power `gen` [W] of
   * each cell held over it: Newton iterations on
   * ρV(H(T) − H_old)/Δt − Σ G (T_nb − T) + faces(T) − P = 0, updating `T`. False when the
   * iterations did not converge.
   */
  newtonStep(dt: number, Hold: Float64Array, gen: Float64Array): boolean {
    const { n, nr, nz, T, tab, kCell, valRe, res, eh, diagAt, volume, density, rEdges, zEdges, zc, logIn, logOut, faces, faceOut, dx, dxi } = this;
    for (let it = 0; it < 40; it++) {
      for (let c = 0; c < n; c++) kCell[c] = conductivity(tab, T[c]!);
      valRe.fill(0);
      for (let c = 0; c < n; c++) {
        enthalpy(tab, T[c]!, eh);
        const m = (density * volume[c]!) / dt;
        res[c] = m * (eh[0]! - Hold[c]!) - gen[c]!;
        valRe[diagAt[c]!] = m * eh[1]!;
      }
      // radial links between (i, j) and (i+1, j)
      for (let i = 0; i + 1 < nr; i++) {
        for (let j = 0; j < nz; j++) {
          const a = i * nz + j;
          const b = a + nz;
          const dz = zEdges[j + 1]! - zEdges[j]!;
          const g = (TWO_PI * dz) / (logOut[i]! / kCell[a]! + logIn[i + 1]! / kCell[b]!);
          this.link(a, b, g);
        }
      }
      for (let i = 0; i < nr; i++) {
        const ring = Math.PI * (rEdges[i + 1]! * rEdges[i + 1]! - rEdges[i]! * rEdges[i]!);
        for (let j = 0; j + 1 < nz; j++) {
          const a = i * nz + j;
          const b = a + 1;
          const g = ring / ((zEdges[j + 1]! - zc[j]!) / kCell[a]! + (zc[j + 1]! - zEdges[j + 1]!) / kCell[b]!);
          this.link(a, b, g);
        }
      }
      for (let s = 0; s < faces.length; s++) {
        const f = faces[s]!;
        this.faceFlow(f, T[f.cell]!, kCell[f.cell]!, s);
        res[f.cell] = res[f.cell]! + faceOut[0]!;
        valRe[diagAt[f.cell]!] = valRe[diagAt[f.cell]!]! + faceOut[1]!;
      }
      // Newton step
      const factor = factorComplexSymmetric({ size: n, columnStarts: this.colStart, rowIndices: this.rowIdx, re: valRe, im: this.valIm }, this.ordering);
      for (let c = 0; c < n; c++) {
        dx[c] = -res[c]!;
        dxi[c] = 0;
      }
      factor.solve(dx, dxi);
      let dMax = 0;
      for (let c = 0; c < n; c++) {
        // damp steps that would cross far beyond the table or below 1 K
        let d = dx[c]!;
        if (T[c]! + d < 1) d = 1 - T[c]!;
        T[c] = T[c]! + d;
        dMax = Math.max(dMax, Math.abs(d));
      }
      if (dMax < NEWTON_TOLERANCE) return true;
    }
    return false;
  }

  /** Adds the conductance g between cells a and b to the residual and the Jacobian. */
  private link(a: number, b: number, g: number): void {
    const { T, res, valRe, diagAt } = this;
    const ta = T[a]!;
    const tb = T[b]!;
    res[a] = res[a]! - g * (tb - ta);
    res[b] = res[b]! - g * (ta - tb);
    valRe[diagAt[a]!] = valRe[diagAt[a]!]! + g;
    valRe[diagAt[b]!] = valRe[diagAt[b]!]! + g;
    // off-diagonals (a, b) and (b, a)
    this.setOff(a, b, -g);
    this.setOff(b, a, -g);
  }

  private setOff(col: number, row: number, v: number): void {
    const { colStart, rowIdx, valRe } = this;
    for (let p = colStart[col]!; p < colStart[col + 1]!; p++) {
      if (rowIdx[p] === row) {
        valRe[p] = v;
        return;
      }
    }
  }
}
