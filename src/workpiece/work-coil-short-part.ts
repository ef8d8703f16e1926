/**
 * End-effect factor of a conducting, possibly magnetic part shorter than the coil: the ratio of
 * the short part's impedance change to the same part's when it is long, both from a surface
 * impedance model (Leontovich boundary condition, solved by the method of fundamental
 * solutions with coaxial current loops).
 *
 * In the surface-impedance limit (skin depth δ small against the part's dimensions) the part's
 * interior drops out: the tangential electric field on the surface equals $Z_s$ times the
 * tangential magnetic field, $Z_s = (1+j)\rho/\delta$. With the flux function $\psi = rA_\varphi$
 * this is the Robin condition
 * $$\psi = p\,\frac{\partial\psi}{\partial n}, \qquad p = \frac{Z_s}{j\omega\mu_0} = (1-j)\,\frac{\mu_r\delta}{2},$$
 * a perfect conductor whose surface is moved inwards by the complex depth $p$ (the magnetic
 * generalisation of Wheeler's incremental-inductance rule). The end effect of a magnetic part
 * therefore depends on its material only through $\mu_r\delta$: a short steel part with
 * $\mu_r\delta$ comparable to its size lets flux through its ends and couples far less than a
 * non-magnetic part of the same shape.
 *
 * @packageDocumentation
 */
import { ellipticEFromComplement, ellipticKFromComplement } from "../special/index.js";
import { complexGeneralSolve } from "../special/complex-symmetric-solve.js";
import { gaussLegendreRule } from "../special/internal.js";

/**
 * Where a short part's end-effect correction stands, by its thinnest section w against the skin
 * depth δ and against μr·δ (see {@link shortPartSection}): `thick` w ≥ 100 δ and w ≥ 0.15 μr·δ;
 * `general` 5 δ ≤ w < 100 δ and w ≥ 0.15 μr·δ; `thin` w < 5 δ and w ≥ 0.15 μr·δ; `outside`
 * w < 0.15 μr·δ (the flux crosses the whole section, which a surface impedance cannot hold).
 */
export type ShortPartTier = "thick" | "general" | "thin" | "outside";

/**
 * The thinnest section of a bar, tube or ring that decides how well the surface-impedance end
 * factor holds [m]: the radial section (bar radius, or wall) or half the part's length,
 * whichever is smaller — the field enters a short part through its end faces too, and a disc
 * thinner than a few μr·δ lets the flux through axially (measured: scripts/measurements/
 * short-part-grid.ts, where the radial section alone left errors up to 64 % in the tiers).
 *
 * @internal
 */
export function shortPartSection(outerRadius: number, innerRadius: number, length: number): number {
  return Math.min(outerRadius - innerRadius, length / 2);
}

/**
 * Below this many μr·δ the part's thinnest section lets the flux through: `outside`. Measured:
 * between 0.09 and 0.15 μr·δ the reflected resistance was still up to 21 % off (short-part grid),
 * from 0.15 on within the `general` bound.
 */
const OUTSIDE_FLUX_RATIO = 0.15;

/** The tier of {@link ShortPartTier} for a section w [m], skin depth δ [m] and μr. @internal */
export function shortPartTier(section: number, skinDepth: number, relativePermeability: number): ShortPartTier {
  if (section < OUTSIDE_FLUX_RATIO * relativePermeability * skinDepth) return "outside";
  if (section < 5 * skinDepth) return "thin";
  return section >= 100 * skinDepth ? "thick" : "general";
}

/**
 * Measured error of `workCoilImpedance` for a magnetic part shorter than the coil (the long part's
 * exact coupling times this module's end-effect factor) against the library's axisymmetric field
 * solver (scripts/measurements/short-part-grid.ts, table in docs/workpiece.md: tube solenoids of
 * length/diameter 0.3, 1, 2 and 4; bars and rings 0.3–0.9 × the coil's length; μr 20, 100, 600;
 * 3–150 skin depths; metal resistivities; and scripts/measurements/short-magnetic-part.ts: the
 * bearing-race coil, μr 3–300), by {@link ShortPartTier} of the section {@link shortPartSection}:
 * the largest relative error of the reflected resistance, and of ΔL as a fraction of the empty
 * coil's inductance (measured: thick 5.8 % and 1.09 %, general 9.2 % and 1.16 %, thin 24.2 % and
 * 4.35 %, the thin and general maxima from the bearing-race coil's μr 3 ring). `outside` is beyond
 * the model (the largest error seen, 23 × and 78 %, not a bound).
 */
export const SHORT_PART_FACTOR_ERROR = {
  thick: { resistance: 0.06, inductance: 0.011 },
  general: { resistance: 0.095, inductance: 0.012 },
  thin: { resistance: 0.25, inductance: 0.044 },
  outside: { resistance: 24, inductance: 0.79 },
} as const;

/**
 * Weight of the non-magnetic correction at a relative permeability: 1 at μr = 1, falling
 * linearly in 1/μr to 0 at μr = 20 and above (where the surface-impedance factor alone is
 * within the measured bounds); continuous, so the operating point is continuous through Curie.
 *
 * @internal
 */
export function nonMagneticWeight(relativePermeability: number): number {
  return Math.max(0, (1 / relativePermeability - 1 / 20) / (1 - 1 / 20));
}

/** Coaxial geometry of the end-effect model (SI, metres). */
export interface ShortPartGeometry {
  /** Turn-centre radius of the coil [m]. */
  readonly coilRadius: number;
  /** Axial positions of the turn centres [m], symmetric about 0. */
  readonly turnPositions: readonly number[];
  /** Outer radius of the part [m]. */
  readonly outerRadius: number;
  /** Bore radius of the part [m] (0 for a bar). */
  readonly innerRadius: number;
  /** Length of the part [m], centred on the coil. */
  readonly length: number;
}

/** μ0 as used inside the kernels: only ratios of the model's results are used, so its value cancels. */
const MU = 4e-7 * Math.PI;

/**
 * Flux function ψ = rA_φ at (r, z) of a unit-current loop of radius a at height c, and its
 * gradient (∂ψ/∂r, ∂ψ/∂z) = (r·B_z, −r·B_r) (Smythe, Static and Dynamic Electricity, 3rd ed.,
 * §7.10, the loop's vector potential and field through complete elliptic integrals).
 */
function loopKernel(a: number, c: number, r: number, z: number, out: Float64Array): void {
  const dz = z - c;
  const sum = (a + r) * (a + r) + dz * dz;
  const diff = (a - r) * (a - r) + dz * dz;
  const m1 = diff / sum; // 1 − k²
  const K = ellipticKFromComplement(m1);
  const E = ellipticEFromComplement(m1);
  const k2 = 1 - m1;
  const sq = Math.sqrt(sum);
  const c0 = MU / (2 * Math.PI);
  // ψ = (μ0/2π)·√(ar)·[(2/k − k)K − (2/k)E] = (μ0/2π)·√sum·[(1 − k²/2)K − E]
  out[0] = c0 * sq * ((1 - k2 / 2) * K - E);
  const bz = (c0 / sq) * (K + ((a * a - r * r - dz * dz) / diff) * E);
  const rbr = (c0 * dz / sq) * (-K + ((a * a + r * r + dz * dz) / diff) * E); // r·B_r
  out[1] = r * bz;
  out[2] = -rbr;
}

/** A straight panel of the part's section (upper half), with its outward normal. */
interface Panel {
  readonly r0: number;
  readonly z0: number;
  readonly r1: number;
  readonly z1: number;
  readonly nr: number;
  readonly nz: number;
}

/** Breakpoints along [0, length], graded geometrically towards the ends flagged. */
function breakpoints(length: number, smallest: number, largest: (s: number) => number, gradeStart: boolean, gradeEnd: boolean): number[] {
  const growth = 1.4;
  const size = (s: number): number => {
    let h = largest(s);
    if (gradeStart) h = Math.min(h, smallest + (growth - 1) * s);
    if (gradeEnd) h = Math.min(h, smallest + (growth - 1) * (length - s));
    return Math.max(h, smallest);
  };
  const out = [0];
  let s = 0;
  while (s < length) {
    s += size(s);
    if (s > length - 0.3 * size(Math.min(s, length))) s = length;
    out.push(s);
  }
  return out;
}

/** The panels of the section's upper half: outer side, end face, bore side (rings and tubes). */
function panelsOf(g: ShortPartGeometry, halfLength: number, coilHalf: number): Panel[] {
  const ro = g.outerRadius;
  const ri = g.innerRadius;
  const wall = ro - ri;
  const base = Math.min(wall, 2 * halfLength, g.coilRadius) / 8;
  const smallest = base / 30;
  // along a side: fine over the coil, coarser beyond it
  const sideSize = (z: number): number => base + 0.5 * Math.max(0, z - coilHalf);
  const panels: Panel[] = [];
  const zs = breakpoints(halfLength, smallest, sideSize, false, true);
  for (let i = 0; i + 1 < zs.length; i++) panels.push({ r0: ro, z0: zs[i]!, r1: ro, z1: zs[i + 1]!, nr: 1, nz: 0 });
  const rs = breakpoints(wall, smallest, () => base, ri > 0, true);
  for (let i = rs.length - 1; i > 0; i--) panels.push({ r0: ri + rs[i]!, z0: halfLength, r1: ri + rs[i - 1]!, z1: halfLength, nr: 0, nz: 1 });
  if (ri > 0) {
    for (let i = zs.length - 1; i > 0; i--) panels.push({ r0: ri, z0: zs[i]!, r1: ri, z1: zs[i - 1]!, nr: -1, nz: 0 });
  }
  return panels;
}

const RULE = gaussLegendreRule(4);

/**
 * ∫ over a panel (and over its mirror image in z = 0) of the loop kernel at (r, z): adds
 * [∫ψ dℓ, ∫∂ψ/∂r dℓ, ∫∂ψ/∂z dℓ] into `acc`. Adaptive bisection by distance.
 */
function panelIntegral(r0: number, z0: number, r1: number, z1: number, r: number, z: number, acc: Float64Array, tmp: Float64Array, depth: number): void {
  const dr = r1 - r0;
  const dz = z1 - z0;
  const len = Math.hypot(dr, dz);
  const mr = 0.5 * (r0 + r1);
  const mz = 0.5 * (z0 + z1);
  const dist = Math.hypot(r - mr, z - mz);
  if (dist < 1.5 * len && depth < 22) {
    panelIntegral(r0, z0, mr, mz, r, z, acc, tmp, depth + 1);
    panelIntegral(mr, mz, r1, z1, r, z, acc, tmp, depth + 1);
    return;
  }
  for (let q = 0; q < RULE.nodes.length; q++) {
    const u = 0.5 * (1 + RULE.nodes[q]!);
    const w = 0.5 * RULE.weights[q]! * len;
    const a = r0 + u * dr;
    if (a <= 0) continue;
    loopKernel(a, z0 + u * dz, r, z, tmp);
    acc[0]! += w * tmp[0]!;
    acc[1]! += w * tmp[1]!;
    acc[2]! += w * tmp[2]!;
  }
}

/** The discretised part: collocation matrices and the coil's excitation and linkage. */
interface Boundary {
  readonly n: number;
  /** P[i,j]: ψ at panel i's midpoint from unit sheet current on panel j and its mirror. */
  readonly psi: Float64Array;
  /** D[i,j]: outward normal derivative of ψ at panel i (outer side of the sheet) from panel j. */
  readonly dpsi: Float64Array;
  readonly coilPsi: Float64Array;
  readonly coilDpsi: Float64Array;
  /** 2π·Σ_turns ψ at the turn from unit sheet current on panel j (and mirror): flux linkage [Wb per A/m]. */
  readonly linkage: Float64Array;
}

function buildBoundary(g: ShortPartGeometry, halfLength: number): Boundary {
  const coilHalf = Math.max(...g.turnPositions.map(Math.abs)) + g.coilRadius / 4;
  const panels = panelsOf(g, halfLength, coilHalf);
  const n = panels.length;
  const psi = new Float64Array(n * n);
  const dpsi = new Float64Array(n * n);
  const acc = new Float64Array(3);
  const tmp = new Float64Array(3);
  const out = new Float64Array(3);
  const coilPsi = new Float64Array(n);
  const coilDpsi = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const pi = panels[i]!;
    const r = 0.5 * (pi.r0 + pi.r1);
    const z = 0.5 * (pi.z0 + pi.z1);
    for (let j = 0; j < n; j++) {
      const pj = panels[j]!;
      acc.fill(0);
      panelIntegral(pj.r0, pj.z0, pj.r1, pj.z1, r, z, acc, tmp, 0);
      panelIntegral(pj.r0, -pj.z0, pj.r1, -pj.z1, r, z, acc, tmp, 0);
      psi[i * n + j] = acc[0]!;
      // the outer side of the sheet: principal value minus half the jump, r·μ0·K/2
      dpsi[i * n + j] = pi.nr * acc[1]! + pi.nz * acc[2]! - (i === j ? 0.5 * MU * r : 0);
    }
    let s = 0;
    let d = 0;
    for (const t of g.turnPositions) {
      loopKernel(g.coilRadius, t, r, z, out);
      s += out[0]!;
      d += pi.nr * out[1]! + pi.nz * out[2]!;
    }
    coilPsi[i] = s;
    coilDpsi[i] = d;
  }
  const linkage = new Float64Array(n);
  for (let j = 0; j < n; j++) {
    const pj = panels[j]!;
    let s = 0;
    for (const t of g.turnPositions) {
      acc.fill(0);
      panelIntegral(pj.r0, pj.z0, pj.r1, pj.z1, g.coilRadius, t, acc, tmp, 0);
      panelIntegral(pj.r0, -pj.z0, pj.r1, -pj.z1, g.coilRadius, t, acc, tmp, 0);
      s += acc[0]!;
    }
    linkage[j] = 2 * Math.PI * s;
  }
  return { n, psi, dpsi, coilPsi, coilDpsi, linkage };
}

/** The part's impedance change over jω (a complex inductance change [H], model units) at p = (1 − j)·t. */
function inductanceChange(b: Boundary, t: number, re: Float64Array, im: Float64Array, bRe: Float64Array, bIm: Float64Array): [number, number] {
  const n = b.n;
  // (P − pD)K = −(ψc − p·dc) with p = t − jt: P − pD = (P − tD) + j·tD
  for (let k = 0; k < n * n; k++) {
    re[k] = b.psi[k]! - t * b.dpsi[k]!;
    im[k] = t * b.dpsi[k]!;
  }
  for (let i = 0; i < n; i++) {
    bRe[i] = -(b.coilPsi[i]! - t * b.coilDpsi[i]!);
    bIm[i] = -(t * b.coilDpsi[i]!);
  }
  if (!complexGeneralSolve(n, re, im, bRe, bIm)) return [Number.NaN, Number.NaN];
  let sumRe = 0;
  let sumIm = 0;
  for (let j = 0; j < n; j++) {
    sumRe += b.linkage[j]! * bRe[j]!;
    sumIm += b.linkage[j]! * bIm[j]!;
  }
  return [sumRe, sumIm];
}

/** Table spacing of the end-effect factor in log t: nodes a quarter octave apart. */
const NODES_PER_OCTAVE = 4;

/**
 * The direct solve of the end-effect factor at t (both boundaries built on the first call: a
 * factor whose table was handed over from another thread may never need them).
 */
function directFactor(g: ShortPartGeometry): (t: number) => [number, number] {
  let solve: ((t: number) => [number, number]) | null = null;
  return (t) => {
    if (solve === null) {
      const coilHalf = Math.max(...g.turnPositions.map(Math.abs));
      const short = buildBoundary(g, g.length / 2);
      const long = buildBoundary(g, Math.max(g.length / 2, coilHalf + 3 * g.coilRadius));
      const size = Math.max(short.n, long.n);
      const re = new Float64Array(size * size);
      const im = new Float64Array(size * size);
      const bRe = new Float64Array(size);
      const bIm = new Float64Array(size);
      solve = (x) => {
        const [sr, si] = inductanceChange(short, x, re, im, bRe, bIm);
        const [lr, li] = inductanceChange(long, x, re, im, bRe, bIm);
        const den = lr * lr + li * li;
        return [(sr * lr + si * li) / den, (si * lr - sr * li) / den];
      };
    }
    return solve(t);
  };
}

/**
 * An end-effect factor's geometry and the table nodes computed so far ([k, re, im]): plain
 * numbers, so that a worker thread can start from another thread's table
 * ({@link prepareShortPartFactor}'s `known`) and compute the same values.
 *
 * @internal
 */
export interface ShortPartFactorData {
  readonly geometry: ShortPartGeometry;
  readonly nodes: readonly (readonly [number, number, number])[];
}

/** The geometry and table of each factor made by {@link prepareShortPartFactor}. */
const factorTables = new WeakMap<(t: number) => [number, number], { geometry: ShortPartGeometry; table: Map<number, [number, number]> }>();

/**
 * The geometry and table so far of a factor made by {@link prepareShortPartFactor} (`null` for
 * another function).
 *
 * @internal
 */
export function shortPartFactorData(factor: (t: number) => [number, number]): ShortPartFactorData | null {
  const f = factorTables.get(factor);
  if (f === undefined) return null;
  return { geometry: f.geometry, nodes: Array.from(f.table, ([k, [re, im]]) => [k, re, im] as const) };
}

/**
 * Prepares the end-effect factor of a part shorter than the coil (surface-impedance model):
 * returns a function of $t = \mu_r\delta/2$ [m] (> 0) giving the complex ratio
 * $F = \Delta Z_\text{short}/\Delta Z_\text{long}$ as [re, im], the long part being the same
 * section reaching three coil radii beyond the coil's ends. The function keeps a table in
 * log t (nodes a quarter octave apart, computed when first needed, or taken from `known`,
 * nodes of the same geometry's table computed elsewhere: each node is a pure function of the
 * geometry and its index, so the result is the same) and interpolates it with cubic Lagrange
 * polynomials (within 1e-4 of the direct solve).
 *
 * Measured against the library's axisymmetric field solver (scripts/measurements/
 * short-part-grid.ts: tube solenoids of length/diameter 0.3–4, bars and rings 0.3–0.9 × the
 * coil's length, μr 20–600, 3–150 skin depths; and scripts/measurements/short-magnetic-part.ts:
 * the bearing-race coil, μr 3–300), the long part's exact coupling times this factor gives the
 * short part's reflected resistance within the numbers stated in `SHORT_PART_FACTOR_ERROR` for
 * the tier of the part's thinnest section ({@link shortPartSection}, {@link shortPartTier}).
 *
 * @internal
 */
export function prepareShortPartFactor(g: ShortPartGeometry, known: ShortPartFactorData["nodes"] = []): (t: number) => [number, number] {
  const direct = directFactor(g);
  const table = new Map<number, [number, number]>();
  for (const [k, re, im] of known) table.set(k, [re, im]);
  const node = (k: number): [number, number] => {
    let v = table.get(k);
    if (v === undefined) {
      v = direct(2 ** (k / NODES_PER_OCTAVE));
      table.set(k, v);
    }
    return v;
  };
  const factor = (t: number): [number, number] => {
    const x = Math.log2(t) * NODES_PER_OCTAVE;
    const k0 = Math.floor(x) - 1;
    let fr = 0;
    let fi = 0;
    for (let a = 0; a < 4; a++) {
      let w = 1;
      for (let b = 0; b < 4; b++) if (b !== a) w *= (x - (k0 + b)) / (a - b);
      const v = node(k0 + a);
      fr += w * v[0];
      fi += w * v[1];
    }
    return [fr, fi];
  };
  factorTables.set(factor, { geometry: g, table });
  return factor;
}
