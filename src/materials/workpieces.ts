/**
 * Workpiece metals: carbon steels, stainless steels, an aluminium alloy, brass and a
 * titanium alloy (copper workpieces use {@link copper}).
 *
 * Size: data tables, one block per metal with the source of every row beside it; splitting them
 * would separate values that are read and checked together.
 *
 * @packageDocumentation
 */
import { ANNEALED_COPPER_RESISTIVITY, ZERO_CELSIUS } from "../units/index.js";
import { interpolateTemperatureTable, tableFromCelsius } from "./interpolate.js";
import { carbonSteelSpecificHeatEn1993 } from "./specific-heat.js";
import type { ConductiveMaterial, PermeabilityModel, TemperatureTable } from "./types.js";

const T20 = 293.15;
/** The table the thermal data below were checked against (scanned appendix of the 7th edition). */
const INCROPERA = "F. P. Incropera, D. P. DeWitt, T. L. Bergman, A. S. Lavine, Fundamentals of Heat and Mass Transfer, 7th ed. (Wiley 2011), Table A.1, pp. 983–986";
/** Emissivity of iron and steel as tabulated by an instrument maker (total spectrum). */
const FLIR_EMISSIVITY = "FLIR T10xx series operation manual, emissivity Table 39.1";
/** Data sheets of the wrought alloys (typical values at room temperature). */
const ASM_304 = "ASM/MatWeb data sheet 'AISI Type 304 Stainless Steel' (72 µΩ·cm at 20 °C, 116 µΩ·cm at 650 °C)";
const AK_430 = "AK Steel Type 430 product data sheet (60 µΩ·cm at 21 °C; 0.46 kJ/(kg·K) over 0–100 °C; 26.1 W/(m·K) at 100 °C, 26.3 at 500 °C; 7.74 g/cm³)";
const KOOZ_430 = "KOOZ special-steels data page for 1.4016 / X6Cr17 / AISI 430 (average values at ambient temperature: 25.0 W/(m·K), 0.60 Ω·mm²/m, 0.46 J/(g·K), 7.7 g/cm³)";
const ATLAS_430 = "Atlas Steels grade 430 data (7750 kg/m³; 460 J/(kg·K) over 0–100 °C; 26.1 and 26.3 W/(m·K) at 100 and 500 °C; 600 nΩ·m)";
const AA_6061 = "Aluminum Association typical values for 6061-T6, as in the BTI Metals and MatWeb 6061-T6 data sheets (43 % IACS; 167 W/(m·K) at 25 °C; 896 J/(kg·K) at 100 °C; 2.70 g/cm³; melting range 582–652 °C)";
const OLIN_C26000 = "Olin Brass C26000 (ASTM B36) alloy data (28 % IACS annealed, 6.16 µΩ·cm; 8.53 g/cm³)";
const TI64 = "BTI Metals Ti-6Al-4V data sheet (4.43 g/cm³; 526 J/(kg·K) at 25 °C; 6.70 W/(m·K) over 100–300 °C; 1780 nΩ·m at 25 °C; melting range 1604–1660 °C) and ASM/MatWeb Ti-6Al-4V (Grade 5) annealed bar (178 µΩ·cm)";
/**
 * Table A.1 of Lienhard & Lienhard read in a transcription (a public materials library quoting
 * it row by row); the book itself was not at hand, and the transcription has slips in other rows.
 */
const LIENHARD_A1 = "J. H. Lienhard IV, J. H. Lienhard V, A Heat Transfer Textbook (Phlogiston Press 2011), Table A.1, as transcribed in a public materials library";
const EN1993 = "EN 1993-1-2:2005, §3.4.1.2 eq. (3.2) (specific heat) and §3.4.1.3 eq. (3.3) (thermal conductivity)";
/**
 * The AISI 304 row of Incropera's Table A.1 (5th edition), read in a transcription: the
 * comments of package AnFPs in Regions.mo of the FCSys Modelica library
 * (github.com/kdavies4/FCSys), which quote c_p and k of AISI 302, 304, 316 and 347 at
 * 100–1000 K "from [Incropera2002, pp. 905 & 907]".
 */
const INCROPERA_304 = "F. P. Incropera, D. P. DeWitt, Fundamentals of Heat and Mass Transfer, 5th ed. (Wiley 2002), Table A.1, pp. 905 and 907, AISI 304 at 200–1000 K, as transcribed in the FCSys Modelica library (github.com/kdavies4/FCSys, Regions.mo, package AnFPs)";
/**
 * The AISI 304 row of the 7th edition's Table A.1 above 1000 K and its density, read in
 * transcriptions: two public heat-transfer scripts that name that table give c_p 640 and
 * 682 J/(kg·K) and k 28.0 and 31.7 W/(m·K) at 1200 and 1500 K (their 200–1000 K points are
 * those of the FCSys transcription of the 5th edition), and one of them pairs the row with
 * 7900 kg/m³.
 */
const INCROPERA_304_HOT = "F. P. Incropera, D. P. DeWitt, T. L. Bergman, A. S. Lavine, Fundamentals of Heat and Mass Transfer, 7th ed. (Wiley 2011), Table A.1, AISI 304 row (c_p 640 and 682 J/(kg·K), k 28.0 and 31.7 W/(m·K) at 1200 and 1500 K; 7900 kg/m³), as transcribed in two public heat-transfer scripts that name that table (the scan's page with that row was not at hand)";
/** A maker's property page for type 304 with resistivity against temperature. */
const VALLEY_304 = "Valley Design Corp., 'Type 304 and 304L Stainless Steel' property page (7.90 g/cm³; 72, 78, 86, 100, 111, 121, 126 µΩ·cm at 20, 100, 200, 400, 600, 800, 900 °C)";
/** The same figures up to 400 °C for type 302, the base 18-8 grade. */
const ASM_302 = "ASM/MatWeb data sheet 'AISI Type 302 Stainless Steel' (72, 78, 86, 100 µΩ·cm at 20, 100, 200, 400 °C)";
const KUZMIN_IRON = "magnetisation curve: M. D. Kuz'min, Phys. Rev. Lett. 94, 107204 (2005), s = 0.35, p = 4 for iron (from memory)";

/** Resistivity and temperature coefficient of brasses from a data page. */
const TOOLBOX_BRASS = "The Engineering ToolBox, 'Resistivity and Conductivity - Temperature Coefficients Common Materials' (engineeringtoolbox.com/resistivity-conductivity-d_418.html): brass 58 % Cu 5.9 × 10⁻⁸ Ω·m and brass 63 % Cu 7.1 × 10⁻⁸ Ω·m, both α = 1.5 × 10⁻³ /°C";
/** Curie temperature of carbon steel as stated by a steel maker (and of iron in a foundry glossary). */
const CURIE_CARBON_STEEL = "Curie temperature 768 °C (A2 of iron): Atlas Steels technical note 'Magnetic response of stainless steels' (about 768 °C for carbon steel); Giesserei-Lexikon, 'Curiepunkt' (769 °C for iron)";

/** Instrument makers' emissivity tables read for the alloys (band or total, as each says). */
const RAYTEK_EMISSIVITY = "Raytek, 'Emissivity Table for Metals' (raytek.com, IR Education; columns 1.0 µm, 1.6 µm, 8–14 µm)";
const RAYTEK_MI3_EMISSIVITY = "Raytek MI3 manual, appendix emissivity table for metals (3.9 µm, 5 µm, 8–14 µm)";
const OMEGA_EMISSIVITY = "Omega OS100 series manual, section 6 emissivity table";
const FLIR_EMISSIVITY_22 = "FLIR camera manual emissivity Table 22.1 (total spectrum 'T' rows; the table of the T10xx manual's Table 39.1)";
const IDEAL_EMISSIVITY = "Ideal Industries HeatSeeker 160 manual, Appendix A1 emissivity look-up tables";
/** Emissivity of the stainless steels: endpoints read in two instrument makers' tables. */
const STAINLESS_EMISSIVITY = `0.1–0.8 for stainless steel in the 8–14 µm column of ${RAYTEK_EMISSIVITY}; 0.85 for stainless steel oxidised at 800 °C in ${IDEAL_EMISSIVITY}; typical 0.4 a choice of ours within that range`;

/** Emissivity of the carbon steels: a rounded range inside the instrument maker's table. */
const STEEL_EMISSIVITY = `polished to heavily scaled; inside ${FLIR_EMISSIVITY} for iron and steel (polished 0.07, rough plate 0.95–0.98); typical 0.8 = its oxidised steel at 200–600 °C`;

/** Slope of a table near 20 °C divided by its 20 °C value: α₂₀ [1/K] (derived, not typed in). */
function coefficientNear20(table: TemperatureTable): number {
  const r20 = interpolateTemperatureTable(table, T20);
  const r100 = interpolateTemperatureTable(table, T20 + 80);
  return (r100 - r20) / (80 * r20);
}

/** Freezes a permeability model. */
function permeabilityModel(model: PermeabilityModel): PermeabilityModel {
  return Object.freeze({ ...model });
}

// ---------------------------------------------------------------- low-carbon steel
const lowCarbonResistivity = tableFromCelsius(
  [20, 100, 200, 300, 400, 500, 600, 700, 750, 800, 850, 900, 1000, 1100, 1200, 1300],
  [0.142, 0.19, 0.263, 0.349, 0.451, 0.571, 0.717, 0.887, 0.99, 1.077, 1.1, 1.116, 1.15, 1.178, 1.206, 1.23],
  1e6,
  "typical for a 0.1 % C steel, of the form of the BISRA (1953) elevated-temperature tables reproduced in the ASM Metals Handbook; typical, from memory",
);
const lowCarbonConductivity: TemperatureTable = Object.freeze({
  temperatures: Object.freeze([300, 400, 600, 800, 1000, 1200, 1500]),
  values: Object.freeze([63.9, 58.7, 48.8, 39.2, 31.3, 28.0, 30.0]),
  source: `${INCROPERA} (plain carbon steel AISI 1010, 300–1000 K); 1200 and 1500 K typical austenite values, from memory`,
});

/**
 * Low-carbon steel (about 0.1 % C, AISI 1010 class). Resistivity 0.142 µΩ·m at 20 °C
 * (within 1 % of the 1.43 × 10⁻⁷ Ω·m of MatMake's SAE/AISI 1010 data page and of the MatWeb
 * AISI 1010 sheet as reproduced on a179.net), rising about eightfold to 1.15 µΩ·m at 1000 °C
 * (table above 20 °C typical, from memory); density 7870 kg/m³ (the same two AISI 1010
 * sources; Incropera's Table A.1 gives 7832, 0.5 % less); specific heat from EN 1993-1-2
 * with its peak at 735 °C; thermal conductivity 63.9 W/(m·K) at 300 K (Incropera et al.,
 * Table A.1, AISI 1010; that row ends at 1000 K), 28.0 W/(m·K) at 1200 K (from memory; within
 * 3 % of EN 1993-1-2's 27.3 W/(m·K) for carbon steel from 800 to 1200 °C, read as quoted in
 * Dlubal's knowledge-base article on that standard) and 30.0 at 1500 K (from memory; at 1200 °C
 * the table reads 29.8, 9 % above EN 1993-1-2's 27.3); emissivity
 * 0.1–0.95, typical 0.8 (inside the FLIR table's 0.07 polished … 0.95–0.98 rough plate for
 * iron and steel; 0.8 is its value for steel oxidised at 200–600 °C). Ferromagnetic: Curie
 * temperature 1041 K (768 °C, the A2 point of iron; Atlas Steels: about 768 °C for carbon
 * steel), low-field relative permeability 1000, saturation 2.0 T at 20 °C
 * (typical, from memory), transition width 40 K. Documented range 293–1573 K.
 *
 * @see EN 1993-1-2:2005 (specific heat); Incropera & DeWitt Table A.1 (conductivity).
 * @example
 * ```ts
 * import { lowCarbonSteel } from "fluxwright";
 * console.log(lowCarbonSteel.curieTemperature); // 1041.15
 * ```
 * @category Materials
 */
export const lowCarbonSteel: ConductiveMaterial = Object.freeze({
  name: "low-carbon steel (about 0.1 % C)",
  id: "lowCarbonSteel",
  resistivity20: interpolateTemperatureTable(lowCarbonResistivity, T20),
  temperatureCoefficient: coefficientNear20(lowCarbonResistivity),
  resistivity: Object.freeze({ kind: "table", table: lowCarbonResistivity }),
  density: 7870,
  specificHeat20: carbonSteelSpecificHeatEn1993(20),
  specificHeat: Object.freeze({ kind: "en1993-carbon-steel", source: EN1993 }),
  thermalConductivity: interpolateTemperatureTable(lowCarbonConductivity, T20),
  thermalConductivityTable: lowCarbonConductivity,
  emissivity: Object.freeze({ min: 0.1, max: 0.95, typical: 0.8, source: STEEL_EMISSIVITY }),
  meltingTemperature: 1773,
  temperatureRange: Object.freeze({ min: 293.15, max: 1573.15 }),
  magnetic: true,
  curieTemperature: 1041.15,
  permeability: permeabilityModel({
    initialRelativePermeability: 1000,
    saturationFluxDensity: 2.0,
    transitionWidth: 40,
    magnetisationShape: 0.35,
    magnetisationExponent: 4,
    source: `μi and Bs typical, from memory; ${KUZMIN_IRON}`,
  }),
  sources: Object.freeze([
    `resistivity: ${lowCarbonResistivity.source}`,
    "density: typical, from memory",
    `specific heat: ${EN1993}`,
    `thermal conductivity: ${lowCarbonConductivity.source}`,
    `${CURIE_CARBON_STEEL}; solidus about 1500 °C: common practice`,
  ]),
});

// ---------------------------------------------------------------- medium-carbon steel
const mediumCarbonResistivity = tableFromCelsius(
  [20, 100, 200, 300, 400, 500, 600, 700, 800, 900, 1000, 1100, 1200],
  [0.16, 0.221, 0.296, 0.385, 0.49, 0.614, 0.761, 0.935, 1.111, 1.156, 1.179, 1.21, 1.235],
  1e6,
  "typical for a 0.4 % C steel, of the form of the BISRA (1953) elevated-temperature tables reproduced in the ASM Metals Handbook; typical, from memory",
);
/** EN 1993-1-2 eq. (3.3): λ = 54 − 3.33 × 10⁻² θ for 20 ≤ θ < 800 °C, 27.3 W/(m·K) above. */
const en1993Conductivity = (theta: number): number => (theta < 800 ? 54 - 3.33e-2 * theta : 27.3);
const mediumCarbonConductivity = tableFromCelsius(
  [20, 799.999, 800, 1200],
  [en1993Conductivity(20), en1993Conductivity(799.999), en1993Conductivity(800), en1993Conductivity(1200)],
  1,
  "EN 1993-1-2:2005, §3.4.1.3 eq. (3.3) (carbon steel)",
);

/**
 * Medium-carbon steel (about 0.4–0.45 % C, AISI 1040/1045 class). Resistivity
 * 0.160 µΩ·m at 20 °C (within 2 % of the 6.42 µΩ·in of Double Eagle Alloys' AISI 1045 page,
 * but 6 % below the 17.1 µΩ·cm of the ASM/MatWeb AISI 1040 sheets), 0.221 and 0.296 µΩ·m at
 * 100 and 200 °C (those 1040 sheets, as rolled and cold drawn, read in copies on steelsz.com
 * and Scribd: 22.1 and 29.6 µΩ·cm), to 1.18 µΩ·m at 1000 °C (table above 200 °C typical, from
 * memory); density
 * 7850 kg/m³; specific heat (with its peak at 735 °C) and thermal conductivity from
 * EN 1993-1-2; emissivity 0.1–0.95, typical 0.8 (as for low-carbon steel). Ferromagnetic:
 * Curie temperature 1041 K (768 °C, as for low-carbon steel), low-field relative permeability 600,
 * saturation 1.9 T at 20 °C (typical, from memory), transition width 40 K (covers the
 * ferrite loss between A1 = 727 °C and A2). Documented range 293–1473 K.
 *
 * @see EN 1993-1-2:2005 (specific heat, thermal conductivity).
 * @example
 * ```ts
 * import { mediumCarbonSteel } from "fluxwright";
 * console.log(mediumCarbonSteel.magnetic); // true
 * ```
 * @category Materials
 */
export const mediumCarbonSteel: ConductiveMaterial = Object.freeze({
  name: "medium-carbon steel (about 0.45 % C)",
  id: "mediumCarbonSteel",
  resistivity20: interpolateTemperatureTable(mediumCarbonResistivity, T20),
  temperatureCoefficient: coefficientNear20(mediumCarbonResistivity),
  resistivity: Object.freeze({ kind: "table", table: mediumCarbonResistivity }),
  density: 7850,
  specificHeat20: carbonSteelSpecificHeatEn1993(20),
  specificHeat: Object.freeze({ kind: "en1993-carbon-steel", source: EN1993 }),
  thermalConductivity: interpolateTemperatureTable(mediumCarbonConductivity, T20),
  thermalConductivityTable: mediumCarbonConductivity,
  emissivity: Object.freeze({ min: 0.1, max: 0.95, typical: 0.8, source: STEEL_EMISSIVITY }),
  meltingTemperature: 1733,
  temperatureRange: Object.freeze({ min: 293.15, max: 1473.15 }),
  magnetic: true,
  curieTemperature: 1041.15,
  permeability: permeabilityModel({
    initialRelativePermeability: 600,
    saturationFluxDensity: 1.9,
    transitionWidth: 40,
    magnetisationShape: 0.35,
    magnetisationExponent: 4,
    source: `μi and Bs typical, from memory; ${KUZMIN_IRON}`,
  }),
  sources: Object.freeze([
    `resistivity: ${mediumCarbonResistivity.source}`,
    "density: 7850 kg/m³, the density of steel assumed in EN 1993 section tables (Tata Steel / SCI Blue Book, EN 1993-1-1 UK NA edition, explanatory notes §2.1)",
    `specific heat and thermal conductivity: ${EN1993}`,
    `${CURIE_CARBON_STEEL}; solidus about 1460 °C: common practice`,
  ]),
});

// ---------------------------------------------------------------- austenitic stainless
const austeniticResistivity = tableFromCelsius(
  [20, 100, 200, 300, 400, 500, 600, 700, 800, 900, 1000, 1200],
  [0.72, 0.78, 0.86, 0.92, 0.98, 1.03, 1.08, 1.12, 1.16, 1.19, 1.22, 1.27],
  1e6,
  `typical for AISI 304 class: 0.72 µΩ·m at 20 °C as in the ${ASM_304}; 0.78 and 0.86 µΩ·m at 100 and 200 °C as in ${VALLEY_304} and the ${ASM_302}; 0.98 and 1.08 µΩ·m at 400 and 600 °C within 3 % of that page's 1.00 and 1.11; the points at 300, 500 °C and from 700 °C up are from memory, and from 650 °C up the table reads 4–6 % below the sources (1.10 against the ASM sheet's 1.16 at 650 °C; 1.16 and 1.19 against Valley Design's 1.21 and 1.26 at 800 and 900 °C)`,
);
const austeniticSpecificHeat: TemperatureTable = Object.freeze({
  temperatures: Object.freeze([200, 300, 400, 600, 800, 1000, 1200, 1500]),
  values: Object.freeze([402, 477, 515, 557, 582, 611, 640, 682]),
  source: `${INCROPERA_304}; 1200 and 1500 K: ${INCROPERA_304_HOT}`,
});
const austeniticConductivity: TemperatureTable = Object.freeze({
  temperatures: Object.freeze([200, 300, 400, 600, 800, 1000, 1200, 1500]),
  values: Object.freeze([12.6, 14.9, 16.6, 19.8, 22.6, 25.4, 28.0, 31.7]),
  source: `${INCROPERA_304}; 1200 and 1500 K: ${INCROPERA_304_HOT}`,
});

/**
 * Austenitic stainless steel (18Cr–8Ni, AISI 304 class), non-magnetic. Resistivity
 * 0.72 µΩ·m at 20 °C (ASM/MatWeb AISI 304 data sheet), 0.78 and 0.86 µΩ·m at 100 and
 * 200 °C (Valley Design's type 304 page; ASM/MatWeb type 302), within 3 % of that page at 400
 * and 600 °C; 1.22 µΩ·m at 1000 °C (typical, from memory; from 650 °C up the table reads
 * 4–6 % below the 1.16 µΩ·m of the ASM sheet at 650 °C and Valley Design's 1.21 and 1.26 µΩ·m
 * at 800 and 900 °C); density 7900 kg/m³ (Valley Design; Incropera et al., 7th ed., Table A.1);
 * specific heat and thermal conductivity of AISI 304 at 200–1000 K from Incropera & DeWitt,
 * 5th ed., Table A.1, pp. 905 and 907 (477 J/(kg·K) and 14.9 W/(m·K) at 300 K), and at 1200
 * and 1500 K from the 7th edition's Table A.1 (all read in transcriptions, see the sources). Emissivity
 * 0.1–0.85 (Raytek's 8–14 µm table: 0.1–0.8; 0.85 oxidised at 800 °C in an Ideal Industries
 * table), typical 0.4 (a choice within that range). Documented range 200–1500 K.
 *
 * @see Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, 5th ed. (2002), Table A.1,
 *   pp. 905 and 907 (AISI 304); Incropera, DeWitt, Bergman, Lavine, 7th ed. (2011), Table A.1
 *   (AISI 304 at 1200 and 1500 K, density).
 * @example
 * ```ts
 * import { austeniticStainless } from "fluxwright";
 * console.log(austeniticStainless.magnetic); // false
 * ```
 * @category Materials
 */
export const austeniticStainless: ConductiveMaterial = Object.freeze({
  name: "austenitic stainless steel (18Cr-8Ni)",
  id: "austeniticStainless",
  resistivity20: interpolateTemperatureTable(austeniticResistivity, T20),
  temperatureCoefficient: coefficientNear20(austeniticResistivity),
  resistivity: Object.freeze({ kind: "table", table: austeniticResistivity }),
  density: 7900,
  specificHeat20: interpolateTemperatureTable(austeniticSpecificHeat, T20),
  specificHeat: Object.freeze({ kind: "table", table: austeniticSpecificHeat }),
  thermalConductivity: interpolateTemperatureTable(austeniticConductivity, T20),
  thermalConductivityTable: austeniticConductivity,
  emissivity: Object.freeze({ min: 0.1, max: 0.85, typical: 0.4, source: STAINLESS_EMISSIVITY }),
  meltingTemperature: 1673,
  temperatureRange: Object.freeze({ min: 200, max: 1500 }),
  magnetic: false,
  sources: Object.freeze([
    `resistivity: ${austeniticResistivity.source}`,
    `density: 7900 kg/m³ as in ${VALLEY_304} and in ${INCROPERA_304_HOT}; the ${ASM_304} gives 8.00 g/cm³ (1.3 % higher)`,
    `specific heat and thermal conductivity: ${austeniticConductivity.source}`,
    "solidus 1400 °C: ASM/MatWeb data sheet 'AISI Type 304 Stainless Steel'",
  ]),
});

// ---------------------------------------------------------------- ferritic stainless
const ferriticResistivity = tableFromCelsius(
  [20, 100, 200, 400, 600, 700, 800, 1000, 1200],
  [0.6, 0.66, 0.74, 0.88, 1.0, 1.05, 1.09, 1.15, 1.2],
  1e6,
  `typical for AISI 430 class: 0.60 µΩ·m at 20 °C as in the ${AK_430}; the values above 20 °C are from memory`,
);
const ferriticSpecificHeat = tableFromCelsius(
  [20, 200, 400, 600, 800, 1000],
  [460, 530, 590, 680, 650, 660],
  1,
  `typical for AISI 430 class: 460 J/(kg·K) near 20 °C as in the ${ATLAS_430}; the values above 20 °C are from memory; the anomaly at the Curie temperature is not resolved`,
);
const ferriticConductivity = tableFromCelsius(
  [20, 100, 500, 800, 1000],
  [25.0, 26.1, 26.3, 26.5, 27.5],
  1,
  `typical for AISI 430 class: 25.0 W/(m·K) at 20 °C as in ${KOOZ_430}; 26.1 W/(m·K) at 100 °C and 26.3 at 500 °C as in the ${AK_430}; 800 and 1000 °C from memory`,
);

/**
 * Ferritic stainless steel (17Cr, AISI 430 class), ferromagnetic (martensitic grades behave
 * alike for heating purposes). Resistivity 0.60 µΩ·m at 20 °C, density 7750 kg/m³, specific
 * heat 460 J/(kg·K) near 20 °C and conductivity 26.1 W/(m·K) at 100 °C, 26.3 at 500 °C (AK
 * Steel and Atlas Steels type 430 data sheets), 25.0 W/(m·K) at 20 °C (KOOZ's 1.4016 data
 * page); the other table points typical, from memory
 * (the Curie anomaly of the specific heat is not resolved); emissivity 0.1–0.85, typical 0.4 (as
 * for austenitic stainless). Curie
 * temperature 943 K (670 °C, from memory), low-field relative permeability 750, saturation
 * 1.5 T at 20 °C (typical, from memory), transition width 40 K. Documented range
 * 293–1473 K.
 *
 * @see AK Steel, Type 430 stainless steel product data sheet; Atlas Steels, grade 430 data
 *   (room-temperature resistivity, density, specific heat, conductivity at 100 and 500 °C).
 * @example
 * ```ts
 * import { ferriticStainless } from "fluxwright";
 * console.log(ferriticStainless.curieTemperature); // 943.15
 * ```
 * @category Materials
 */
export const ferriticStainless: ConductiveMaterial = Object.freeze({
  name: "ferritic stainless steel (17Cr)",
  id: "ferriticStainless",
  resistivity20: interpolateTemperatureTable(ferriticResistivity, T20),
  temperatureCoefficient: coefficientNear20(ferriticResistivity),
  resistivity: Object.freeze({ kind: "table", table: ferriticResistivity }),
  density: 7750,
  specificHeat20: interpolateTemperatureTable(ferriticSpecificHeat, T20),
  specificHeat: Object.freeze({ kind: "table", table: ferriticSpecificHeat }),
  thermalConductivity: interpolateTemperatureTable(ferriticConductivity, T20),
  thermalConductivityTable: ferriticConductivity,
  emissivity: Object.freeze({ min: 0.1, max: 0.85, typical: 0.4, source: STAINLESS_EMISSIVITY }),
  meltingTemperature: 1698,
  temperatureRange: Object.freeze({ min: 293.15, max: 1473.15 }),
  magnetic: true,
  curieTemperature: 943.15,
  permeability: permeabilityModel({
    initialRelativePermeability: 750,
    saturationFluxDensity: 1.5,
    transitionWidth: 40,
    magnetisationShape: 0.35,
    magnetisationExponent: 4,
    source: `μi, Bs and Curie temperature typical, from memory; ${KUZMIN_IRON}`,
  }),
  sources: Object.freeze([
    `resistivity: ${ferriticResistivity.source}`,
    `density: ${ATLAS_430}`,
    `specific heat: ${ferriticSpecificHeat.source}`,
    `thermal conductivity: ${ferriticConductivity.source}`,
    "Curie temperature about 670 °C: from memory; melting point about 1425 °C: Hamilton Precision Metals SS 430 data",
  ]),
});

// ---------------------------------------------------------------- aluminium alloy
/** 6061-T6 class: 43 % IACS (Aluminum Association typical value, see AA_6061). */
const alloyResistivity20 = ANNEALED_COPPER_RESISTIVITY / 0.43;
/** Matthiessen's rule: the same dρ/dT as IEC 60889 aluminium, 2.8264e-8 × 0.00403 Ω·m/K. */
const alloyCoefficient = (2.8264e-8 * 0.00403) / alloyResistivity20;
const alloySpecificHeat = tableFromCelsius([20, 100, 200, 300, 400, 500], [896, 945, 985, 1030, 1080, 1130], 1, `typical for 6061 class, from memory; the data sheets' 896 J/(kg·K) is given at 100 °C, where this table reads 945 (${AA_6061})`);
const alloyConductivity = tableFromCelsius([20, 100, 200, 300, 400, 500], [167, 177, 186, 190, 192, 190], 1, `typical for 6061-T6 class: 167 W/(m·K) near room temperature as in the ${AA_6061}; above 20 °C from memory, and 3–6 % above the 172, 177, 180 W/(m·K) at 100, 200, 300 °C of ${LIENHARD_A1}`);

/**
 * Wrought aluminium alloy (Al–Mg–Si, 6061-T6 class). Resistivity 43 % IACS
 * (≈ 4.01 × 10⁻⁸ Ω·m at 20 °C, Aluminum Association typical value for 6061-T6) with the
 * temperature slope of pure aluminium (Matthiessen's rule: dρ/dT of IEC 60889 aluminium, so
 * α₂₀ ≈ 0.00284 /K); density 2700 kg/m³, conductivity 167 W/(m·K) near room temperature and
 * solidus 855 K (582 °C) as in the same data sheets; specific heat 896 J/(kg·K) at 20 °C
 * (the data sheets give 896 at 100 °C; the table above 20 °C is from memory); emissivity
 * 0.03–0.3 as aluminium's in instrument makers' tables (Omega: 0.04–0.06 highly polished,
 * 0.20–0.31 heavily oxidised; Raytek: 0.02–0.1 polished), typical 0.1 (a choice near the 0.09
 * of commercial sheet). Documented range 200–850 K.
 *
 * @see A. Matthiessen, C. Vogt, Ann. Phys. 198 (1864) 19 (Matthiessen's rule).
 * @example
 * ```ts
 * import { aluminiumAlloy } from "fluxwright";
 * console.log(aluminiumAlloy.temperatureCoefficient.toFixed(5)); // 0.00284
 * ```
 * @category Materials
 */
export const aluminiumAlloy: ConductiveMaterial = Object.freeze({
  name: "wrought aluminium alloy (Al-Mg-Si, 43 % IACS)",
  id: "aluminiumAlloy",
  resistivity20: alloyResistivity20,
  temperatureCoefficient: alloyCoefficient,
  resistivity: Object.freeze({ kind: "linear", source: `43 % IACS (${AA_6061}); slope by Matthiessen's rule from IEC 60889 aluminium` }),
  density: 2700,
  specificHeat20: interpolateTemperatureTable(alloySpecificHeat, T20),
  specificHeat: Object.freeze({ kind: "table", table: alloySpecificHeat }),
  thermalConductivity: interpolateTemperatureTable(alloyConductivity, T20),
  thermalConductivityTable: alloyConductivity,
  emissivity: Object.freeze({ min: 0.03, max: 0.3, typical: 0.1, source: `taken as aluminium's: ${OMEGA_EMISSIVITY} (0.04–0.06 highly polished, 0.09 commercial sheet, 0.20–0.31 heavily oxidised) and ${RAYTEK_MI3_EMISSIVITY} (polished 0.02–0.1 at 8–14 µm); typical 0.1 a choice of ours near commercial sheet` }),
  meltingTemperature: 855,
  temperatureRange: Object.freeze({ min: 200, max: 850 }),
  magnetic: false,
  sources: Object.freeze([
    `resistivity: 43 % IACS (${AA_6061}); slope by Matthiessen's rule`,
    `density, conductivity near 20 °C, solidus: ${AA_6061}`,
    `specific heat: ${alloySpecificHeat.source}`,
  ]),
});

// ---------------------------------------------------------------- brass
const brassSpecificHeat: TemperatureTable = Object.freeze({
  temperatures: Object.freeze([300, 400, 600]),
  values: Object.freeze([380, 395, 425]),
  source: `${INCROPERA} (cartridge brass 70Cu-30Zn, p. 983; the table ends at 600 K, held above)`,
});
const brassConductivity: TemperatureTable = Object.freeze({
  temperatures: Object.freeze([300, 400, 600]),
  values: Object.freeze([110, 137, 149]),
  source: `${INCROPERA} (cartridge brass 70Cu-30Zn, p. 983; the table ends at 600 K, held above)`,
});

/**
 * Brass (70Cu–30Zn cartridge brass class). Resistivity 28 % IACS ≈ 6.16 × 10⁻⁸ Ω·m at
 * 20 °C (Olin Brass C26000 data), temperature coefficient 0.0015 /K (the Engineering
 * ToolBox's value for 58 % and 63 % Cu brasses; no figure for 70/30 brass was found), linear; density 8530 kg/m³; specific heat and conductivity from Incropera et al., 7th ed.,
 * Table A.1, p. 983, which ends at 600 K (values held above); emissivity 0.03 (highly polished,
 * Omega table) to 0.6 (oxidised: 0.61 in the FLIR table), typical 0.2 (a choice near the 0.22
 * of dull brass); melting point 1188 K (Incropera, Table A.1). Documented range 293–1100 K.
 *
 * @see Incropera, DeWitt, Bergman, Lavine, Fundamentals of Heat and Mass Transfer, 7th ed.,
 *   Table A.1, p. 983 (cartridge brass).
 * @example
 * ```ts
 * import { brass } from "fluxwright";
 * console.log(brass.density); // 8530
 * ```
 * @category Materials
 */
export const brass: ConductiveMaterial = Object.freeze({
  name: "brass (70Cu-30Zn)",
  id: "brass",
  resistivity20: ANNEALED_COPPER_RESISTIVITY / 0.28,
  temperatureCoefficient: 0.0015,
  resistivity: Object.freeze({ kind: "linear", source: `28 % IACS (${OLIN_C26000}); 0.0015 /K as for 58 % and 63 % Cu brasses in ${TOOLBOX_BRASS}` }),
  density: 8530,
  specificHeat20: interpolateTemperatureTable(brassSpecificHeat, T20),
  specificHeat: Object.freeze({ kind: "table", table: brassSpecificHeat }),
  thermalConductivity: interpolateTemperatureTable(brassConductivity, T20),
  thermalConductivityTable: brassConductivity,
  emissivity: Object.freeze({ min: 0.03, max: 0.6, typical: 0.2, source: `${OMEGA_EMISSIVITY} (highly polished 73.2Cu–26.7Zn brass 0.03, dull plate 0.22); ${FLIR_EMISSIVITY_22} (dull, tarnished 0.22; oxidised at 100 °C 0.61); typical 0.2 a choice of ours near the dull-plate value` }),
  meltingTemperature: 1188,
  temperatureRange: Object.freeze({ min: 293.15, max: 1100 }),
  magnetic: false,
  sources: Object.freeze([
    `resistivity: ${OLIN_C26000}; temperature coefficient 0.0015 /K: ${TOOLBOX_BRASS} (not given for 70/30 brass)`,
    `density, specific heat, conductivity, melting point 1188 K: ${INCROPERA} (cartridge brass, p. 983)`,
  ]),
});

// ---------------------------------------------------------------- titanium alloy
const titaniumResistivity = tableFromCelsius(
  [20, 200, 400, 600, 800, 1000],
  [1.7, 1.8, 1.9, 1.98, 2.04, 2.06],
  1e6,
  `typical for Ti-6Al-4V class: 1.70 µΩ·m at 20 °C lies inside the data sheets' 1.68–1.78 µΩ·m (${TI64}); above 20 °C from memory (Nickel Systems' Grade 5 page gives 1143 Ω·cmil/ft = 1.90 µΩ·m at 986 °F = 530 °C, 2.7 % below the table there, and 1.75 µΩ·m at 73 °F)`,
);
const titaniumSpecificHeat = tableFromCelsius([20, 200, 400, 600, 800, 1000], [526, 570, 610, 650, 690, 720], 1, `typical for Ti-6Al-4V class: 526 J/(kg·K) near room temperature as in the ${TI64}; above 20 °C from memory`);
const titaniumConductivity = tableFromCelsius([20, 200, 400, 600, 800, 1000], [6.7, 8.8, 11.5, 14.0, 17.0, 20.0], 1, `typical for Ti-6Al-4V class, from memory; ${LIENHARD_A1} gives 7.1, 7.8, 8.8, 10, 12 W/(m·K) at 20, 100, 200, 300, 400 °C (the table: 6 % lower at 20 °C, equal at 200 °C, 4 % lower at 400 °C)`);

/**
 * Titanium alloy (Ti–6Al–4V class), non-magnetic. Resistivity 1.70 µΩ·m at 20 °C (inside
 * the 1.68–1.78 µΩ·m of producers' data sheets), rising slowly to 2.06 µΩ·m at 1000 °C
 * (from memory); density 4430 kg/m³, specific heat 526 J/(kg·K) near room temperature and solidus
 * 1877 K (1604 °C) as in the BTI Metals Ti-6Al-4V data sheet; conductivity 6.7 W/(m·K) at
 * 20 °C (that data sheet gives 6.70 over 100–300 °C, where this table reads 7.6–10.2: the
 * table is from memory); emissivity 0.2–0.8, typical 0.5 (0.8 as oxidised titanium in Raytek's
 * table; 0.2 and 0.5 from memory). Documented range
 * 293–1273 K.
 *
 * @see BTI Metals, Ti-6Al-4V data sheet; ASM/MatWeb, Titanium Ti-6Al-4V (Grade 5), annealed bar.
 * @example
 * ```ts
 * import { titaniumAlloy } from "fluxwright";
 * console.log(titaniumAlloy.density); // 4430
 * ```
 * @category Materials
 */
export const titaniumAlloy: ConductiveMaterial = Object.freeze({
  name: "titanium alloy (Ti-6Al-4V)",
  id: "titaniumAlloy",
  resistivity20: interpolateTemperatureTable(titaniumResistivity, T20),
  temperatureCoefficient: coefficientNear20(titaniumResistivity),
  resistivity: Object.freeze({ kind: "table", table: titaniumResistivity }),
  density: 4430,
  specificHeat20: interpolateTemperatureTable(titaniumSpecificHeat, T20),
  specificHeat: Object.freeze({ kind: "table", table: titaniumSpecificHeat }),
  thermalConductivity: interpolateTemperatureTable(titaniumConductivity, T20),
  thermalConductivityTable: titaniumConductivity,
  emissivity: Object.freeze({ min: 0.2, max: 0.8, typical: 0.5, source: `maximum 0.8: oxidised titanium at 1.6 µm (0.6–0.8) in ${RAYTEK_EMISSIVITY}; minimum 0.2 and typical 0.5 from memory (that table's lowest value for titanium is 0.3, polished at 1.6 µm)` }),
  meltingTemperature: 1877,
  temperatureRange: Object.freeze({ min: ZERO_CELSIUS + 20, max: ZERO_CELSIUS + 1000 }),
  magnetic: false,
  sources: Object.freeze([
    `resistivity: ${titaniumResistivity.source}`,
    `density, solidus: ${TI64}`,
    `specific heat: ${titaniumSpecificHeat.source}`,
    `thermal conductivity: ${titaniumConductivity.source}`,
  ]),
});
