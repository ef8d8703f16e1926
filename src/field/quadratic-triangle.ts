/**
 * The six-node (quadratic, isoparametric) triangle of the field solver: its shape functions,
 * the 7-point quadrature rule on it, and the geometry of an element at the quadrature points.
 * Internal.
 *
 * @packageDocumentation
 */
import type { LatticeMesh } from "./mesh.js";


// 7-point degree-5 rule on the reference triangle (Dunavant 1985), weights summing to 1.
const QA = [1 / 3, 0.059715871789770, 0.470142064105115, 0.470142064105115, 0.797426985353087, 0.101286507323456, 0.101286507323456];
const QB = [1 / 3, 0.470142064105115, 0.059715871789770, 0.470142064105115, 0.101286507323456, 0.797426985353087, 0.101286507323456];
const QW = [0.225, 0.132394152788506, 0.132394152788506, 0.132394152788506, 0.125939180544827, 0.125939180544827, 0.125939180544827];
/** Quadrature points per triangle. */
export const NQ = 7;

/** Shape functions of the six-node triangle and their derivatives at (xi, eta). */
export function shape(xi: number, eta: number, N: Float64Array, dx: Float64Array, de: Float64Array): void {
  const l1 = 1 - xi - eta;
  const l2 = xi;
  const l3 = eta;
  N[0] = l1 * (2 * l1 - 1);
  N[1] = l2 * (2 * l2 - 1);
  N[2] = l3 * (2 * l3 - 1);
  N[3] = 4 * l1 * l2;
  N[4] = 4 * l2 * l3;
  N[5] = 4 * l3 * l1;
  // d/dxi: dl1 = -1, dl2 = 1, dl3 = 0
  dx[0] = -(4 * l1 - 1);
  dx[1] = 4 * l2 - 1;
  dx[2] = 0;
  dx[3] = 4 * (l1 - l2);
  dx[4] = 4 * l3;
  dx[5] = -4 * l3;
  // d/deta: dl1 = -1, dl2 = 0, dl3 = 1
  de[0] = -(4 * l1 - 1);
  de[1] = 0;
  de[2] = 4 * l3 - 1;
  de[3] = -4 * l2;
  de[4] = 4 * l2;
  de[5] = 4 * (l1 - l3);
}

/** Shape functions at each quadrature point (and, private, their derivatives in ξ and η). */
export const QN: Float64Array[] = [];
const QDX: Float64Array[] = [];
const QDE: Float64Array[] = [];
for (let q = 0; q < NQ; q++) {
  const N = new Float64Array(6);
  const dx = new Float64Array(6);
  const de = new Float64Array(6);
  shape(QA[q]!, QB[q]!, N, dx, de);
  QN.push(N);
  QDX.push(dx);
  QDE.push(de);
}

/** Per-element geometric data at the quadrature points, written into caller buffers. */
export interface ElementPoints {
  /** r at each point. */
  readonly r: Float64Array;
  /** weight·|det J| (area weight) at each point. */
  readonly w: Float64Array;
  /** d N_i/dr, d N_i/dz at each point (q·6 + i). */
  readonly nr: Float64Array;
  readonly nz: Float64Array;
}

/** Fills `out` with the geometry of triangle `t` at the quadrature points (allocates nothing). */
export function elementPoints(mesh: LatticeMesh, t: number, out: ElementPoints): void {
  const T = mesh.triangles;
  const o = t * 6;
  for (let q = 0; q < NQ; q++) {
    const dx = QDX[q]!;
    const de = QDE[q]!;
    const N = QN[q]!;
    let rx = 0;
    let re = 0;
    let zx = 0;
    let ze = 0;
    let rq = 0;
    for (let i = 0; i < 6; i++) {
      const n = T[o + i]!;
      const rn = mesh.r[n]!;
      const zn = mesh.z[n]!;
      rx += dx[i]! * rn;
      re += de[i]! * rn;
      zx += dx[i]! * zn;
      ze += de[i]! * zn;
      rq += N[i]! * rn;
    }
    const det = rx * ze - re * zx;
    out.r[q] = rq;
    out.w[q] = 0.5 * QW[q]! * Math.abs(det);
    // [dN/dr, dN/dz] = J^{-T} [dN/dxi, dN/deta], J = [[rx, zx], [re, ze]]
    for (let i = 0; i < 6; i++) {
      out.nr[q * 6 + i] = (ze * dx[i]! - zx * de[i]!) / det;
      out.nz[q * 6 + i] = (-re * dx[i]! + rx * de[i]!) / det;
    }
  }
}

/** Buffers for {@link elementPoints}. */
export function newPoints(): ElementPoints {
  return { r: new Float64Array(NQ), w: new Float64Array(NQ), nr: new Float64Array(NQ * 6), nz: new Float64Array(NQ * 6) };
}
