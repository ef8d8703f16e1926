/**
 * Relative permeability of a ferromagnetic workpiece against temperature and field strength,
 * with the loss of ferromagnetism at the Curie temperature.
 *
 * @packageDocumentation
 */
import { givenName, renamedOption } from "../core/renamed.js";
import { requireKnownKeys, requireNonNegative, requireObject, requirePositive } from "../core/index.js";
import { checkPermeabilityModel } from "./check-material.js";
import { MU_0 } from "../units/index.js";
import type { ConductiveMaterial, PermeabilityModel } from "./types.js";

/** Accepted fields (misspelt ones are rejected, not ignored). */
const CONDITION_FIELDS: readonly string[] = Object.freeze(["temperature", "fieldStrengthPeak", "fieldStrength"]);

/** 20 °C in kelvin: the reference temperature of the permeability data. */
const T20 = 293.15;

/**
 * The operating point at which {@link relativePermeabilityAt} is read.
 *
 * @category Materials
 */
export interface PermeabilityConditions {
  /** Temperature [K], > 0. */
  readonly temperature: number;
  /**
   * Amplitude (peak) of the magnetic field strength at the surface [A/m], ≥ 0. Omitted or 0:
   * the low-field permeability.
   */
  readonly fieldStrengthPeak?: number;
  /**
   * Former name of `fieldStrengthPeak` [A/m]; giving both is refused.
   *
   * @deprecated Use `fieldStrengthPeak`; this name goes at 1.0.
   */
  readonly fieldStrength?: number;
}

/** Kuz'min's reduced spontaneous magnetisation m(τ), τ = T/Tc in [0, 1). */
function kuzminMagnetisation(tau: number, s: number, p: number): number {
  const x = 1 - s * tau * Math.sqrt(tau) - (1 - s) * Math.pow(tau, p);
  return x > 0 ? Math.cbrt(x) : 0;
}

/** Saturation magnetisation [A/m] at temperature t [K] below Curie (0 at and above it). */
function saturationMagnetisation(model: PermeabilityModel, curie: number, t: number): number {
  if (t >= curie) return 0;
  const s = model.magnetisationShape;
  const p = model.magnetisationExponent;
  const m20 = kuzminMagnetisation(T20 / curie, s, p);
  const m = kuzminMagnetisation(t / curie, s, p);
  return ((model.saturationFluxDensity / MU_0) * m) / m20;
}

/**
 * Relative permeability of a material at a temperature and (optionally) a surface field
 * strength. Non-magnetic materials return exactly 1.
 *
 * The model, for a material with Curie temperature $T_c$ and permeability parameters
 * (low-field permeability $\mu_i$, saturation flux density $B_s$ at 20 °C, transition width
 * $w$, Kuz'min shape $s$ and exponent $p$):
 *
 * 1. Saturation (Fröhlich–Kennelly law): the magnetisation $M = M_s H/(a + H)$ gives
 * $$
 * \frac{1}{\mu_r - 1} = \frac{1}{\chi_0(T)} + \frac{H}{M_s(T)},
 * $$
 * so $\mu_r$ falls from $1 + \chi_0$ at weak fields to $1 + M_s/H$ in strong ones
 * (the saturated limit $B = \mu_0 (H + M_s)$), and never exceeds $\mu_i$.
 * 2. Saturation magnetisation against temperature (Kuz'min 2005):
 * $M_s(T) = (B_s/\mu_0)\, m(T/T_c)/m(293.15/T_c)$,
 * $m(\tau) = [1 - s\,\tau^{3/2} - (1 - s)\,\tau^{p}]^{1/3}$, which is 0 at $T_c$.
 * 3. Curie transition: $\chi_0(T) = (\mu_i - 1)\,S(u)$ with $u = (T_c - T)/w$ clipped to
 * [0, 1] and the smoothstep $S(u) = u^2 (3 - 2u)$: unchanged below $T_c - w$, falling
 * smoothly (continuous slope) to 0 at $T_c$.
 *
 * Hence $\mu_r = 1$ exactly for $T \ge T_c$; $1 \le \mu_r \le \mu_i$; $\mu_r$ does not rise
 * with $T$ or with $H$. The Hopkinson peak of weak-field permeability just below $T_c$ and
 * hysteresis are not modelled. The ferrite-to-austenite change of carbon steels between A1
 * (727 °C) and A3 is folded into the transition width.
 *
 * Hard domain (throws {@link InputError}): `material` or `conditions` not an object;
 * `temperature` not a finite number > 0; `fieldStrengthPeak` given but not a finite number ≥ 0.
 * Validity: fields from about 1 kA/m to 1 MA/m (the strong fields of induction heating).
 * Accuracy: the evaluation matches an independent mpmath evaluation of the model to ≤ 1e-12
 * relative; the model itself is an engineering approximation whose parameters are typical
 * values (no comparison with measured steel is shipped), exact at its limits (1 at and above
 * $T_c$, $1 + M_s/H$ for $H \gg M_s/\mu_i$).
 *
 * @param material - the material
 * @param conditions - temperature [K] and optional surface field-strength amplitude [A/m]
 * @returns relative permeability [-], 1 ≤ μr ≤ `initialRelativePermeability`
 * @throws {@link InputError} on bad input
 * @see A. E. Kennelly, "Magnetic reluctance", Trans. AIEE 8 (1891) 485–517 (the
 * Fröhlich–Kennelly saturation law; from memory).
 * @see M. D. Kuz'min, "Shape of temperature dependence of spontaneous magnetization of
 * ferromagnets: quantitative analysis", Phys. Rev. Lett. 94, 107204 (2005), eq. (7).
 * @example
 * ```ts
 * import { relativePermeabilityAt, lowCarbonSteel, celsius } from "fluxwright";
 * console.log(relativePermeabilityAt(lowCarbonSteel, { temperature: celsius(800) })); // 1
 * const cold = relativePermeabilityAt(lowCarbonSteel, { temperature: celsius(20), fieldStrengthPeak: 1e5 });
 * console.log(cold.toFixed(1)); // 16.7
 * ```
 * @category Materials
 */
export function relativePermeabilityAt(material: ConductiveMaterial, conditions: PermeabilityConditions): number {
  requireObject("relativePermeabilityAt", "material", material);
  requireObject("relativePermeabilityAt", "conditions", conditions);
  requireKnownKeys("relativePermeabilityAt", "conditions", conditions, CONDITION_FIELDS);
  const t = requirePositive("relativePermeabilityAt", "conditions.temperature", conditions.temperature, "K");
  const given = renamedOption("relativePermeabilityAt", "conditions", conditions, "fieldStrengthPeak", "fieldStrength");
  const h =
    given === undefined
      ? 0
      : requireNonNegative("relativePermeabilityAt", `conditions.${givenName(conditions, "fieldStrengthPeak", "fieldStrength")}`, given, "A/m");
  checkPermeabilityModel("relativePermeabilityAt", material);
  const model = material.permeability;
  const curie = material.curieTemperature;
  if (!material.magnetic || model === undefined || curie === undefined || t >= curie) return 1;
  let u = (curie - t) / model.transitionWidth;
  if (u > 1) u = 1;
  const chi0 = (model.initialRelativePermeability - 1) * u * u * (3 - 2 * u);
  if (!(chi0 > 0)) return 1;
  if (h === 0) return 1 + chi0;
  const ms = saturationMagnetisation(model, curie, t);
  if (!(ms > 0)) return 1;
  return 1 + (chi0 * ms) / (ms + chi0 * h);
}

/**
 * Saturation flux density of a magnetic material at a temperature,
 * $B_s(T) = \mu_0 M_s(T)$ with Kuz'min's curve (see {@link relativePermeabilityAt});
 * 0 at and above the Curie temperature and for non-magnetic materials.
 *
 * $$
 * B_s(T) = B_s(293.15\ \mathrm{K})\;\frac{m(T/T_c)}{m(293.15/T_c)}
 * $$
 *
 * Hard domain (throws {@link InputError}): `material` not an object; `temperature` not a
 * finite number > 0. Accuracy: Kuz'min's curve fits measured iron magnetisation within about
 * 1 % of its zero-kelvin value (Kuz'min 2005); the 20 °C values of $B_s$ are typical of the
 * material family (from memory), ±5 %.
 *
 * @param material - the material
 * @param temperature - temperature [K], > 0
 * @returns saturation flux density [T], ≥ 0
 * @throws {@link InputError} on bad input
 * @see M. D. Kuz'min, Phys. Rev. Lett. 94, 107204 (2005).
 * @example
 * ```ts
 * import { saturationFluxDensityAt, lowCarbonSteel, celsius } from "fluxwright";
 * console.log(saturationFluxDensityAt(lowCarbonSteel, celsius(20))); // 2
 * ```
 * @category Materials
 */
export function saturationFluxDensityAt(material: ConductiveMaterial, temperature: number): number {
  requireObject("saturationFluxDensityAt", "material", material);
  const t = requirePositive("saturationFluxDensityAt", "temperature", temperature, "K");
  checkPermeabilityModel("saturationFluxDensityAt", material);
  const model = material.permeability;
  const curie = material.curieTemperature;
  if (!material.magnetic || model === undefined || curie === undefined) return 0;
  return MU_0 * saturationMagnetisation(model, curie, t);
}
