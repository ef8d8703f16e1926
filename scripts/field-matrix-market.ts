/**
 * Writes the finite-element matrix of two field-solver benchmark cases in Matrix Market form
 * (complex symmetric, coordinate) with a right-hand side, and times fluxwright's own sparse
 * factorisation and solve on it (CPU time of this process, one core). Pair with
 * `scripts/field-scipy-spsolve.py`, which times scipy's sparse direct solver on the same files.
 * Not run in CI.
 *
 *   npx tsx scripts/field-matrix-market.ts <output folder>
 */
import { mkdirSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { factorComplexSymmetric } from "../src/special/index.js";
import { assembleSystem } from "../src/field/assembly.js";
import type { SolverProblem } from "../src/field/solver-types.js";

const out = process.argv[2];
if (out === undefined) {
  console.error("usage: tsx scripts/field-matrix-market.ts <output folder>");
  process.exit(2);
}
mkdirSync(out, { recursive: true });

const tube = (z: number) => ({ kind: "circle" as const, r: 0.02, z, radius: 0.003, innerRadius: 0.002 });
const cases: { name: string; density: number; problem: SolverProblem }[] = [
  {
    // scenario A of the shared field fixtures: 4 tube turns around a 400 mm steel bar, 10 kHz
    name: "solenoid-bar",
    density: 1,
    problem: {
      frequency: 10e3,
      bodies: [
        ...[0, 1, 2, 3].map((i) => ({ shape: { ...tube(-0.016 + (i + 0.5) * 0.008), innerRadius: 0.002 }, sigma: 1 / 1.75e-8, mur: 1, role: "solid" as const, owner: 0, count: 1, resistivity: 1.75e-8 })),
        { shape: { kind: "rectangle" as const, rMin: 0, rMax: 0.008, zMin: -0.2, zMax: 0.2 }, sigma: 1 / 2e-7, mur: 50, role: "region" as const, owner: 0, count: 1, resistivity: 2e-7 },
      ],
      coilCount: 1,
      regionCount: 1,
      blockHalfSizes: [0.004, 0.004, 0.004, 0.004, 0],
      extent: { rMax: 0.023, zMin: -0.2, zMax: 0.2 },
    },
  },
  {
    // TEAM Problem 15 coil (problem 1) over the 12.22 mm aluminium plate, 900 Hz
    name: "coil-over-plate",
    density: 2,
    problem: {
      frequency: 900,
      bodies: [
        { shape: { kind: "rectangle" as const, rMin: 6.15e-3, rMax: 12.4e-3, zMin: 0.88e-3, zMax: 7.03e-3 }, sigma: 0, mur: 1, role: "stranded" as const, owner: 0, count: 3790, resistivity: 1.75e-8 },
        { shape: { kind: "rectangle" as const, rMin: 0, rMax: 0.3, zMin: -12.22e-3, zMax: 0 }, sigma: 3.06e7, mur: 1, role: "region" as const, owner: 0, count: 1, resistivity: 1 / 3.06e7 },
      ],
      coilCount: 1,
      regionCount: 1,
      blockHalfSizes: [0, 0],
      extent: { rMax: 0.3, zMin: -12.22e-3, zMax: 7.03e-3 },
    },
  },
];

for (const c of cases) {
  const sys = assembleSystem(c.problem, { density: c.density });
  const n = sys.size;
  const lines: string[] = ["%%MatrixMarket matrix coordinate complex symmetric", `${n} ${n} 0`];
  let count = 0;
  for (let j = 0; j < n; j++) {
    for (let p = sys.columnStarts[j]!; p < sys.columnStarts[j + 1]!; p++) {
      const i = sys.rowIndices[p]!;
      if (i < j) continue; // lower triangle only (symmetric storage)
      lines.push(`${i + 1} ${j + 1} ${sys.re[p]!.toExponential(17)} ${sys.im[p]!.toExponential(17)}`);
      count++;
    }
  }
  lines[1] = `${n} ${n} ${count}`;
  writeFileSync(join(out, `${c.name}.mtx`), lines.join("\n") + "\n");
  const rhs = ["%%MatrixMarket matrix array complex general", `${n} 1`];
  const bRe = new Float64Array(n);
  const bIm = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    bRe[i] = Math.sin(i + 1);
    rhs.push(`${bRe[i]!.toExponential(17)} 0`);
  }
  writeFileSync(join(out, `${c.name}-rhs.mtx`), rhs.join("\n") + "\n");
  // time: best of 5 (CPU time of this process)
  let best = Infinity;
  let nnzL = 0;
  let keep: [Float64Array, Float64Array] = [bRe, bIm];
  for (let k = 0; k < 5; k++) {
    const t0 = process.cpuUsage();
    const f = factorComplexSymmetric({ size: n, columnStarts: sys.columnStarts, rowIndices: sys.rowIndices, re: sys.re, im: sys.im }, sys.ordering);
    const xr = Float64Array.from(bRe);
    const xi = Float64Array.from(bIm);
    f.solve(xr, xi);
    const t = process.cpuUsage(t0);
    best = Math.min(best, (t.user + t.system) / 1000);
    nnzL = f.factorNonzeros;
    keep = [xr, xi];
  }
  const sol = ["%%MatrixMarket matrix array complex general", `${n} 1`];
  for (let i = 0; i < n; i++) sol.push(`${keep[0][i]!.toExponential(17)} ${keep[1][i]!.toExponential(17)}`);
  writeFileSync(join(out, `${c.name}-x.mtx`), sol.join("\n") + "\n");
  console.log(`${c.name}: n = ${n}, nnz(A) = ${sys.columnStarts[n]}, nnz(L) = ${nnzL}, factor + solve ${best.toFixed(1)} ms CPU (best of 5)`);
}
