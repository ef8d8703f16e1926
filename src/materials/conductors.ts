/**
 * Coil conductor metals: annealed copper, hard-drawn aluminium and silver.
 *
 * @packageDocumentation
 */
import { ANNEALED_COPPER_RESISTIVITY, ANNEALED_COPPER_TEMPERATURE_COEFFICIENT } from "../units/index.js";
import { interpolateTemperatureTable } from "./interpolate.js";
import type { ConductiveMaterial, TemperatureTable } from "./types.js";

/** The table the thermal data below were checked against (scanned appendix of the 7th edition). */
const INCROPERA = "F. P. Incropera, D. P. DeWitt, T. L. Bergman, A. S. Lavine, Fundamentals of Heat and Mass Transfer, 7th ed. (Wiley 2011), Table A.1, pp. 983–986";
/** Emissivity of metals as tabulated by an instrument maker (total spectrum, with the original references). */
const FLIR_EMISSIVITY = "FLIR T10xx series operation manual, emissivity Table 39.1";
/** A second instrument maker's emissivity table. */
const OMEGA_EMISSIVITY = "Omega OS100 series manual, section 6 emissivity table";

/** An open textbook's table of resistivities and temperature coefficients at 20 °C. */
const OPENSTAX_RESISTIVITY = "S. J. Ling, J. Sanny, W. Moebs, University Physics Volume 2 (OpenStax 2016), §9.3, Table 9.1 'Resistivities and Conductivities of Various Materials at 20 °C' (silver 1.59 × 10⁻⁸ Ω·m, α = 0.0038 /°C; source text openstax/osbooks-university-physics-bundle, modules/m58731)";

/** The CRC Handbook's resistivity of pure silver near room temperature, read in a transcription. */
const CRC_SILVER = "CRC Handbook of Chemistry and Physics, online edition 2010, 'Electrical Resistivity of Pure Metals', pp. 12-40 ff. (silver 1.467, 1.587 and 1.629 × 10⁻⁸ Ω·m at 273, 293 and 300 K), as transcribed in a public Python script of that table";

/** A frozen table in kelvin. */
function kelvinTable(temperatures: readonly number[], values: readonly number[], source: string): TemperatureTable {
  return Object.freeze({ temperatures: Object.freeze([...temperatures]), values: Object.freeze([...values]), source });
}

const copperSpecificHeat = kelvinTable([200, 300, 400, 600, 800, 1000, 1200], [356, 385, 397, 417, 433, 451, 480], `${INCROPERA} (pure copper)`);
const copperConductivity = kelvinTable([200, 300, 400, 600, 800, 1000, 1200], [413, 401, 393, 379, 366, 352, 339], `${INCROPERA} (pure copper)`);

/**
 * Annealed copper to IEC 60028: resistivity 1/58 µΩ·m ≈ 1.7241 × 10⁻⁸ Ω·m at 20 °C
 * (58 MS/m, 100 % IACS), temperature coefficient 0.00393 /K, density 8890 kg/m³; the
 * resistivity follows the standard's linear law over 200–1300 K. Thermal data are those of
 * pure copper (Incropera et al., 7th ed., Table A.1, p. 983); emissivity 0.02 (polished) to
 * 0.78 (heavily oxidised) as in the FLIR emissivity table, typical 0.1 (a choice of ours
 * within that range, unverified). Melting point 1357.77 K (ITS-90
 * fixed point). Use it for windings and for copper workpieces alike.
 *
 * @see IEC 60028:1925, International standard of resistance for copper.
 * @example
 * ```ts
 * import { copper } from "fluxwright";
 * console.log(copper.resistivity20.toPrecision(5)); // 1.7241e-8
 * ```
 * @category Materials
 */
export const copper: ConductiveMaterial = Object.freeze({
  name: "annealed copper (IEC 60028)",
  id: "copper",
  resistivity20: ANNEALED_COPPER_RESISTIVITY,
  temperatureCoefficient: ANNEALED_COPPER_TEMPERATURE_COEFFICIENT,
  resistivity: Object.freeze({ kind: "linear", source: "IEC 60028:1925 (58 MS/m at 20 °C, 0.00393 /K)" }),
  density: 8890,
  specificHeat20: interpolateTemperatureTable(copperSpecificHeat, 293.15),
  specificHeat: Object.freeze({ kind: "table", table: copperSpecificHeat }),
  thermalConductivity: interpolateTemperatureTable(copperConductivity, 293.15),
  thermalConductivityTable: copperConductivity,
  emissivity: Object.freeze({ min: 0.02, max: 0.78, typical: 0.1, source: `${FLIR_EMISSIVITY} (copper: polished 0.02, heavily oxidised 0.78); typical 0.1 unverified (a choice within the range)` }),
  meltingTemperature: 1357.77,
  temperatureRange: Object.freeze({ min: 200, max: 1300 }),
  magnetic: false,
  sources: Object.freeze([
    "resistivity, temperature coefficient and density: IEC 60028:1925",
    `specific heat and thermal conductivity: ${INCROPERA} (pure copper)`,
    "melting point: ITS-90 fixed point of copper, 1084.62 °C",
  ]),
} as const);

const aluminiumSpecificHeat = kelvinTable([200, 300, 400, 600, 800, 933], [798, 903, 949, 1033, 1146, 1200], `${INCROPERA} (pure aluminium; the 933 K entry is an extrapolation of ours, not in the table)`);
const aluminiumConductivity = kelvinTable([200, 300, 400, 600, 800], [237, 237, 240, 231, 218], `${INCROPERA} (pure aluminium)`);

/**
 * Hard-drawn aluminium to IEC 60889: resistivity 0.028264 µΩ·m = 2.8264 × 10⁻⁸ Ω·m at
 * 20 °C (61 % IACS), temperature coefficient 0.00403 /K, density 2703 kg/m³; linear law
 * over 200–900 K. Thermal data of pure aluminium (Incropera et al., 7th ed., Table A.1, p. 983);
 * emissivity 0.03–0.3, typical 0.09 (unverified: the Omega emissivity table gives 0.04–0.06
 * polished, 0.09 commercial sheet, 0.20–0.31 heavily oxidised). Melting point 933.473 K (ITS-90).
 *
 * @see IEC 60889:1987, Hard-drawn aluminium wire for overhead line conductors.
 * @example
 * ```ts
 * import { aluminium } from "fluxwright";
 * console.log(aluminium.resistivity20); // 2.8264e-8
 * ```
 * @category Materials
 */
export const aluminium: ConductiveMaterial = Object.freeze({
  name: "hard-drawn aluminium (IEC 60889)",
  id: "aluminium",
  resistivity20: 2.8264e-8,
  temperatureCoefficient: 0.00403,
  resistivity: Object.freeze({ kind: "linear", source: "IEC 60889:1987 (0.028264 Ω·mm²/m at 20 °C, 0.00403 /K)" }),
  density: 2703,
  specificHeat20: interpolateTemperatureTable(aluminiumSpecificHeat, 293.15),
  specificHeat: Object.freeze({ kind: "table", table: aluminiumSpecificHeat }),
  thermalConductivity: interpolateTemperatureTable(aluminiumConductivity, 293.15),
  thermalConductivityTable: aluminiumConductivity,
  emissivity: Object.freeze({ min: 0.03, max: 0.3, typical: 0.09, source: `unverified (polished to oxidised, not anodised); ${OMEGA_EMISSIVITY}: 0.04–0.06 highly polished, 0.09 commercial sheet, 0.20–0.31 heavily oxidised` }),
  meltingTemperature: 933.473,
  temperatureRange: Object.freeze({ min: 200, max: 900 }),
  magnetic: false,
  sources: Object.freeze([
    "resistivity, temperature coefficient and density: IEC 60889:1987",
    `specific heat and thermal conductivity: ${INCROPERA} (pure aluminium)`,
    "melting point: ITS-90 fixed point of aluminium, 660.323 °C",
  ]),
} as const);

const silverSpecificHeat = kelvinTable([200, 300, 400, 600, 800, 1000], [225, 235, 239, 250, 262, 277], `${INCROPERA} (pure silver)`);
const silverConductivity = kelvinTable([200, 300, 400, 600, 800, 1000], [430, 429, 425, 412, 396, 379], `${INCROPERA} (pure silver)`);

/**
 * Pure silver: resistivity 1.587 × 10⁻⁸ Ω·m at 20 °C (CRC Handbook, "Electrical Resistivity
 * of Pure Metals", 293 K) and temperature coefficient 0.0038 /K (OpenStax University Physics
 * Vol. 2, Table 9.1; the CRC values at 273 and 300 K give a slope of 0.00378 /K); linear law
 * over 200–1200 K. Density 10 500 kg/m³ and thermal data from
 * Incropera et al., 7th ed., Table A.1 (pure silver, 300 K); emissivity 0.02 (Raytek MI3
 * table) to 0.1, typical 0.03 (these two from memory). Melting point 1234.93 K (ITS-90).
 *
 * @see CRC Handbook of Chemistry and Physics, "Electrical Resistivity of Pure Metals" (online
 *   edition 2010, pp. 12-40 ff.); S. J. Ling, J. Sanny, W. Moebs, University Physics Volume 2,
 *   OpenStax (2016), §9.3, Table 9.1 (resistivity and temperature coefficient at 20 °C).
 * @example
 * ```ts
 * import { silver } from "fluxwright";
 * console.log(silver.resistivity20); // 1.587e-8
 * ```
 * @category Materials
 */
export const silver: ConductiveMaterial = Object.freeze({
  name: "silver",
  id: "silver",
  resistivity20: 1.587e-8,
  temperatureCoefficient: 0.0038,
  resistivity: Object.freeze({ kind: "linear", source: `ρ₂₀ 1.587 × 10⁻⁸ Ω·m: ${CRC_SILVER}; α₂₀ 0.0038 /K: ${OPENSTAX_RESISTIVITY}` }),
  density: 10500,
  specificHeat20: interpolateTemperatureTable(silverSpecificHeat, 293.15),
  specificHeat: Object.freeze({ kind: "table", table: silverSpecificHeat }),
  thermalConductivity: interpolateTemperatureTable(silverConductivity, 293.15),
  thermalConductivityTable: silverConductivity,
  emissivity: Object.freeze({ min: 0.02, max: 0.1, typical: 0.03, source: "minimum 0.02: silver in the Raytek MI3 manual's emissivity table for metals (0.02 at 3.9 µm, 5 µm and 8–14 µm); maximum 0.1 and typical 0.03 from memory" }),
  meltingTemperature: 1234.93,
  temperatureRange: Object.freeze({ min: 200, max: 1200 }),
  magnetic: false,
  sources: Object.freeze([
    `resistivity 1.587 × 10⁻⁸ Ω·m at 293 K: ${CRC_SILVER}; temperature coefficient 0.0038 /K: ${OPENSTAX_RESISTIVITY}`,
    `density (10 500 kg/m³ at 300 K), specific heat and thermal conductivity: ${INCROPERA} (pure silver)`,
    "melting point: ITS-90 fixed point of silver, 961.78 °C",
  ]),
} as const);
