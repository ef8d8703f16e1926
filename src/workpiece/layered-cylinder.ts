/**
 * A cylinder made of concentric shells of different resistivity and permeability inside a long
 * coil: the exact axisymmetric field, the power generated in each shell, and what the coil
 * terminals see. The electro-thermal radial heat-up re-solves it as the shells heat.
 *
 * @packageDocumentation
 */
import { InputError, requireInteger, requireKnownKeys, requireNonNegative, requireObject, requirePositive } from "../core/index.js";
import type { ValidityNote } from "../core/index.js";
import type { Complex } from "../special/index.js";
import { MU_0 } from "../units/index.js";
import { layeredField } from "./layered-cylinder-field.js";
import type { LongCoil } from "./long-coil.js";

/**
 * Options of {@link layeredCylinderInLongCoil}. Shell `i` spans from `radii[i − 1]` (or
 * `innerRadius` for the first shell) to `radii[i]`.
 *
 * @category Workpiece
 */
export interface LayeredCylinderInLongCoilOptions {
  /** The coil, see {@link LongCoil}; the part's outer radius must not exceed `coil.innerRadius`. */
  readonly coil: LongCoil;
  /** Frequency [Hz], > 0. */
  readonly frequency: number;
  /** Radius of the air bore [m], ≥ 0 and < `radii[0]` (default 0: a solid cylinder). */
  readonly innerRadius?: number;
  /** Outer radius of each shell [m], strictly increasing, > `innerRadius`; the last is the part's surface. 1 … 10 000 shells. */
  readonly radii: ArrayLike<number>;
  /** Resistivity of each shell [Ω·m], > 0 (same length as `radii`). */
  readonly resistivities: ArrayLike<number>;
  /** Relative permeability of each shell [-], ≥ 1 (same length as `radii`). */
  readonly relativePermeabilities: ArrayLike<number>;
}

/**
 * Result of {@link layeredCylinderInLongCoil}.
 *
 * @category Workpiece
 */
export interface LayeredCylinderInLongCoilResult {
  /** Resistance reflected into the coil [Ω] (= total power per A² of RMS coil current). */
  readonly reflectedResistance: number;
  /** Change of the coil's reactance caused by the part [Ω]. */
  readonly reactanceChange: number;
  /** Change of the coil's inductance caused by the part [H]. */
  readonly inductanceChange: number;
  /** Inductance of the empty coil in the same idealisation, $\mu_0\pi r_c^2N^2/\ell$ [H]. */
  readonly emptyCoilInductance: number;
  /** Axial field at the part surface per ampere of coil current, $N/\ell$ [A/m per A]. */
  readonly surfaceFieldPerAmpere: number;
  /** Power generated in each shell per square ampere of RMS coil current, over the coil length [W/A²]; they sum to `reflectedResistance`. */
  readonly shellPowers: Float64Array;
  /**
   * Amplitude of the axial field at each shell boundary relative to the surface field [-]:
   * `innerRadius`, then each of `radii` (the last is 1).
   */
  readonly fieldRatios: Float64Array;
  /** Surface impedance $Z_s = E_\varphi/H_z$ at the outer radius [Ω] (real part ≥ 0). */
  readonly surfaceImpedance: Complex;
  /** Where the long-coil idealisation may not hold (`"short-coil"`). */
  readonly validity: readonly ValidityNote[];
}

const WHERE = "layeredCylinderInLongCoil";
const KNOWN = ["coil", "frequency", "innerRadius", "radii", "resistivities", "relativePermeabilities"] as const;
const COIL_KNOWN = ["innerRadius", "length", "turns"] as const;
/** Coil length over inner radius below which the `"short-coil"` note is returned (as barInLongCoil). */
const SHORT_COIL_LIMIT = 4;

function readArray(where: string, name: string, value: unknown, count: number | null): ArrayLike<number> {
  if (typeof value !== "object" || value === null || typeof (value as { length?: unknown }).length !== "number") {
    throw new InputError(where, name, value, "", "an array of numbers");
  }
  const a = value as ArrayLike<unknown>;
  if (count === null ? a.length < 1 || a.length > 10000 : a.length !== count) {
    throw new InputError(where, `${name}.length`, a.length, "", count === null ? "an integer in [1, 10000]" : `${count} (one value per shell)`);
  }
  return a as ArrayLike<number>;
}

/**
 * The exact eddy-current field in a long cylinder of concentric shells (each with its own
 * resistivity and relative permeability, optionally around an air bore) in a long coil: power
 * generated in each shell, field amplitude at each boundary, and the resistance and inductance
 * change the coil terminals see.
 *
 * In shell $i$ the axial field obeys $H'' + H'/r = k_i^2 H$ with
 * $k_i = (1+j)/\delta_i$, $\delta_i = \sqrt{2\rho_i/(\omega\mu_0\mu_{r,i})}$, so
 * $H = A_i I_0(k_i r) + B_i K_0(k_i r)$. $H_z$ and $E_\varphi = \rho H'$ are continuous at each
 * boundary; the air bore of radius $a_0$ carries a uniform field, so
 * $\rho H'(a_0) = j\omega\mu_0 \tfrac{a_0}{2} H(a_0)$ (a solid cylinder starts with $I_0$ alone).
 * Across a shell from $r_1$ to $r_2$ ($z_{1,2} = k r_{1,2}$, Wronskian $I_0K_1 + I_1K_0 = 1/z$):
 * $$
 * \begin{pmatrix} H \\ H'/k \end{pmatrix}_{r_2} = z_1
 * \begin{pmatrix} K_1(z_1)I_0(z_2) + I_1(z_1)K_0(z_2) & K_0(z_1)I_0(z_2) - I_0(z_1)K_0(z_2) \\
 *                 K_1(z_1)I_1(z_2) - I_1(z_1)K_1(z_2) & K_0(z_1)I_1(z_2) + I_0(z_1)K_1(z_2) \end{pmatrix}
 * \begin{pmatrix} H \\ H'/k \end{pmatrix}_{r_1},
 * $$
 * evaluated with exponentially scaled Bessel functions, the growth $e^{\mathrm{Re}(z_2 - z_1)}$ kept
 * as a logarithm (no overflow for shells thousands of skin depths thick). With $H(R) = NI/\ell$,
 * the power flowing inward through radius $r$ per unit length is $P(r) = 2\pi r\,\mathrm{Re}(\rho H' H^*)$;
 * shell $i$ absorbs $\ell\,[P(r_i) - P(r_{i-1})]$, and
 * $$
 * R_r + j\Delta X = \frac{N^2}{\ell}\left(2\pi R\,Z_s - j\omega\mu_0\pi R^2\right),\qquad Z_s = \rho H'(R)/H(R).
 * $$
 * With one shell (or all shells equal) this is {@link barInLongCoil} / {@link tubeInLongCoil}.
 *
 * Hard domain (throws {@link InputError}): unknown option keys; coil innerRadius, length > 0,
 * turns an integer ≥ 1; frequency > 0; innerRadius ≥ 0; radii strictly increasing above
 * innerRadius, the last ≤ coil.innerRadius; 1 … 10 000 shells; resistivities > 0;
 * relativePermeabilities ≥ 1; the three arrays of equal length.
 * Validity: the long-coil idealisation (uniform applied field, part and coil long against the
 * coil radius; a `"short-coil"` note below 4 coil radii of length, as {@link barInLongCoil}); each
 * shell linear and uniform (a field-dependent permeability is handled by the caller re-solving
 * with the permeability at the shell's field, see `fieldRatios`).
 *
 * Accuracy (tests): equal shells agree with {@link barInLongCoil} and {@link tubeInLongCoil}
 * within 1e-12 relative (reflected resistance; the inductance change within 1e-12 of $\mu_r\mu_0\pi R^2N^2/\ell$) for radius/δ from 0.1 to 2000
 * and 1 to 200 shells; a two-layer and a three-layer case agree with an independent mpmath
 * solution (coefficient system, and the shell powers by quadrature of $\rho|H'|^2$) within 1e-10
 * relative, which a scipy ODE integration confirms to 1e-7 (fixture
 * `test/fixtures/workpiece/layered-cylinder.json`).
 *
 * @param options - coil, frequency, shells, see {@link LayeredCylinderInLongCoilOptions}
 * @returns reflected resistance [Ω], inductance change [H], power per shell [W/A²], field ratios [-]
 * @throws {@link InputError} for values outside the hard domain
 * @see R. L. Stoll, *The Analysis of Eddy Currents*, Clarendon Press 1974, ch. 2 (axial field in
 *   cylindrical conductors and shells); NIST DLMF 10.28.2 (the Wronskian of $I_\nu$ and $K_\nu$).
 * @example
 * ```ts
 * import { layeredCylinderInLongCoil } from "fluxwright";
 * // 40 mm forging bar at 10 kHz: a hot non-magnetic 2 mm rim over a magnetic core
 * const r = layeredCylinderInLongCoil({
 *   coil: { innerRadius: 0.03, length: 0.3, turns: 20 },
 *   frequency: 1e4,
 *   radii: [0.018, 0.02],
 *   resistivities: [6e-7, 1.15e-6],
 *   relativePermeabilities: [30, 1],
 * });
 * console.log(r.reflectedResistance.toPrecision(4)); // 0.06551
 * console.log((r.shellPowers[1]! / r.reflectedResistance).toFixed(3)); // 0.755
 * ```
 * @category Workpiece
 */
export function layeredCylinderInLongCoil(options: LayeredCylinderInLongCoilOptions): LayeredCylinderInLongCoilResult {
  requireObject(WHERE, "options", options);
  requireKnownKeys(WHERE, "options", options, KNOWN);
  const c = requireObject(WHERE, "coil", options.coil);
  requireKnownKeys(WHERE, "coil", c, COIL_KNOWN);
  const coil: LongCoil = {
    innerRadius: requirePositive(WHERE, "coil.innerRadius", c["innerRadius"], "m"),
    length: requirePositive(WHERE, "coil.length", c["length"], "m"),
    turns: requireInteger(WHERE, "coil.turns", c["turns"], 1),
  };
  const frequency = requirePositive(WHERE, "frequency", options.frequency, "Hz");
  const inner = options.innerRadius === undefined ? 0 : requireNonNegative(WHERE, "innerRadius", options.innerRadius, "m");
  const radii = readArray(WHERE, "radii", options.radii, null);
  const n = radii.length;
  const rho = readArray(WHERE, "resistivities", options.resistivities, n);
  const mur = readArray(WHERE, "relativePermeabilities", options.relativePermeabilities, n);
  let previous = inner;
  for (let i = 0; i < n; i++) {
    const r = requirePositive(WHERE, `radii[${i}]`, radii[i], "m");
    if (!(r > previous)) {
      throw new InputError(WHERE, `radii[${i}]`, r, "m", `a finite number > ${i === 0 ? "innerRadius" : `radii[${i - 1}]`} (${previous})`);
    }
    previous = r;
    requirePositive(WHERE, `resistivities[${i}]`, rho[i], "Ω·m");
    const m = mur[i];
    if (typeof m !== "number" || !Number.isFinite(m) || m < 1) {
      throw new InputError(WHERE, `relativePermeabilities[${i}]`, m, "", "a finite number ≥ 1");
    }
  }
  if (previous > coil.innerRadius) {
    throw new InputError(WHERE, `radii[${n - 1}]`, previous, "m", `a finite number ≤ coil.innerRadius (${coil.innerRadius})`);
  }
  const fieldRatios = new Float64Array(n + 1);
  const shellPowers = new Float64Array(n);
  const zs = layeredField(2 * Math.PI * frequency, inner, radii, rho, mur, fieldRatios, shellPowers);
  const outer = radii[n - 1]!;
  const omega = 2 * Math.PI * frequency;
  const perLength = (coil.turns * coil.turns) / coil.length;
  const reflectedResistance = perLength * 2 * Math.PI * outer * zs.re;
  const reactanceChange = perLength * (2 * Math.PI * outer * zs.im - omega * MU_0 * Math.PI * outer * outer);
  // shellPowers hold the inward flux differences per unit length per (A/m)² of surface field:
  // times ℓ (N/ℓ)² gives watts per A² of coil current
  for (let i = 0; i < n; i++) shellPowers[i] = shellPowers[i]! * perLength;
  const validity: ValidityNote[] = [];
  if (coil.length < SHORT_COIL_LIMIT * coil.innerRadius) {
    validity.push({
      code: "short-coil",
      message:
        "The coil is shorter than two diameters: the long-coil idealisation ignores the return flux and end effects and overestimates both the empty-coil inductance and the power.",
      value: coil.length / coil.innerRadius,
      limit: SHORT_COIL_LIMIT,
    });
  }
  return {
    reflectedResistance,
    reactanceChange,
    inductanceChange: reactanceChange / omega,
    emptyCoilInductance: MU_0 * Math.PI * coil.innerRadius * coil.innerRadius * perLength,
    surfaceFieldPerAmpere: coil.turns / coil.length,
    shellPowers,
    fieldRatios,
    surfaceImpedance: zs,
    validity,
  };
}
