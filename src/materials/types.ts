/**
 * The types of the material property sets: conducting metals (coil conductors and
 * workpieces) and magnetic core materials.
 *
 * @packageDocumentation
 */

/**
 * A property tabulated against temperature, read by piecewise-linear interpolation.
 * Outside the first and last temperature the end values are held (no extrapolation).
 *
 * @category Materials
 */
export interface TemperatureTable {
  /** Temperatures [K], strictly increasing, at least two. */
  readonly temperatures: readonly number[];
  /** The property at each temperature, in the unit of the field that holds the table. */
  readonly values: readonly number[];
  /** Where the numbers come from (handbook and table, standard, or "typical, from memory"). */
  readonly source: string;
}

/**
 * A closed temperature interval [K].
 *
 * @category Materials
 */
export interface TemperatureRange {
  /** Lower end [K]. */
  readonly min: number;
  /** Upper end [K]. */
  readonly max: number;
}

/**
 * Total hemispherical emissivity of a surface: the span from a bright (polished) surface to a
 * heavily oxidised one, and a typical value for an as-received industrial surface.
 * Dimensionless, each in (0, 1].
 *
 * @category Materials
 */
export interface EmissivityRange {
  /** Bright, polished surface (lowest) [-]. */
  readonly min: number;
  /** Heavily oxidised surface (highest) [-]. */
  readonly max: number;
  /** A typical as-received surface; the value to use when nothing better is known [-]. */
  readonly typical: number;
  /** Where the numbers come from. */
  readonly source: string;
}

/**
 * How resistivity varies with temperature.
 *
 * - `"linear"`: $\rho(T) = \rho_{20}\,[1 + \alpha_{20}\,(T - 293.15\ \mathrm{K})]$ with the
 *   material's {@link ConductiveMaterial.resistivity20} and
 *   {@link ConductiveMaterial.temperatureCoefficient} (the form conductor standards use).
 * - `"table"`: piecewise-linear interpolation in `table` (resistivity in Ω·m).
 *
 * @category Materials
 */
export type ResistivityModel =
  | {
      /** The linear law about 20 °C. */
      readonly kind: "linear";
      /** Where the 20 °C value and coefficient come from. */
      readonly source: string;
    }
  | {
      /** Interpolation in a table. */
      readonly kind: "table";
      /** Resistivity [Ω·m] against temperature [K]. */
      readonly table: TemperatureTable;
    };

/**
 * How specific heat capacity varies with temperature.
 *
 * - `"table"`: piecewise-linear interpolation in `table` (J/(kg·K)).
 * - `"en1993-carbon-steel"`: the closed form of EN 1993-1-2:2005, §3.4.1.2, eq. (3.2) for
 *   carbon steel, which carries the sharp peak of the ferrite–austenite transformation and
 *   the magnetic (Curie) anomaly near 735 °C (see {@link specificHeatAt}).
 *
 * @category Materials
 */
export type SpecificHeatModel =
  | {
      /** Interpolation in a table. */
      readonly kind: "table";
      /** Specific heat [J/(kg·K)] against temperature [K]. */
      readonly table: TemperatureTable;
    }
  | {
      /** The EN 1993-1-2 closed form for carbon steel. */
      readonly kind: "en1993-carbon-steel";
      /** The standard and clause. */
      readonly source: string;
    };

/**
 * Parameters of the relative-permeability model of a ferromagnetic metal, read by
 * {@link relativePermeabilityAt}: a Fröhlich–Kennelly saturation law in the field strength,
 * a Kuz'min-shaped fall of the saturation magnetisation with temperature, and a smooth
 * fall of the low-field permeability to exactly 1 over the `transitionWidth` below the Curie
 * temperature.
 *
 * @category Materials
 */
export interface PermeabilityModel {
  /**
   * Low-field relative permeability at 20 °C [-]: the value the model approaches as the field
   * strength goes to zero; it bounds the permeability from above. Set near the material's
   * maximum permeability, so the saturation law fits the strong fields of induction heating
   * (≳ 1 kA/m); at very weak fields (≲ 100 A/m) real steels sit lower.
   */
  readonly initialRelativePermeability: number;
  /** Saturation flux density $B_s$ at 20 °C [T]. */
  readonly saturationFluxDensity: number;
  /**
   * Width of the permeability transition below the Curie temperature [K]: the low-field
   * permeability starts to fall at $T_c - w$ and reaches exactly 1 at $T_c$.
   */
  readonly transitionWidth: number;
  /**
   * Shape parameter $s$ of Kuz'min's magnetisation curve
   * $m(\tau) = [1 - s\,\tau^{3/2} - (1 - s)\,\tau^{p}]^{1/3}$, $\tau = T/T_c$ [-].
   */
  readonly magnetisationShape: number;
  /** Exponent $p$ of Kuz'min's magnetisation curve [-]. */
  readonly magnetisationExponent: number;
  /** Where the numbers come from. */
  readonly source: string;
}

/**
 * An electrically conducting metal: a coil conductor or a workpiece. Every numeric field is SI;
 * every value names its source in the matching `source` field or in the material's docs.
 * Objects are frozen.
 *
 * @category Materials
 */
export interface ConductiveMaterial {
  /** Plain generic name, e.g. `"annealed copper (IEC 60028)"`. */
  readonly name: string;
  /** Short identifier, equal to the exported constant's name, e.g. `"copper"`. */
  readonly id: string;
  /** Resistivity at 20 °C (293.15 K) [Ω·m]. */
  readonly resistivity20: number;
  /**
   * Temperature coefficient of resistivity at 20 °C [1/K]: $\alpha_{20} = \rho'(293.15\ \mathrm{K})/\rho_{20}$
   * (for a tabulated material, the slope of its table near 20 °C).
   */
  readonly temperatureCoefficient: number;
  /** How resistivity follows temperature (read by {@link resistivityAt}). */
  readonly resistivity: ResistivityModel;
  /** Density at 20 °C [kg/m³] (thermal expansion ignored). */
  readonly density: number;
  /** Specific heat capacity at 20 °C [J/(kg·K)]. */
  readonly specificHeat20: number;
  /** How specific heat capacity follows temperature (read by {@link specificHeatAt}). */
  readonly specificHeat: SpecificHeatModel;
  /** Thermal conductivity at 20 °C [W/(m·K)]. */
  readonly thermalConductivity: number;
  /** Thermal conductivity against temperature [W/(m·K)] (read by {@link thermalConductivityAt}). */
  readonly thermalConductivityTable: TemperatureTable;
  /** Total emissivity span of the surface. */
  readonly emissivity: EmissivityRange;
  /** Melting temperature (solidus for alloys) [K]. */
  readonly meltingTemperature: number;
  /**
   * Temperatures over which the data are documented [K]. The property functions hold the end
   * values outside it (and still return positive, finite numbers).
   */
  readonly temperatureRange: TemperatureRange;
  /** `true` for a ferromagnetic material (then `curieTemperature` and `permeability` are set). */
  readonly magnetic: boolean;
  /** Curie temperature [K], for magnetic materials only. */
  readonly curieTemperature?: number;
  /** Relative-permeability model, for magnetic materials only. */
  readonly permeability?: PermeabilityModel;
  /** Sources of the scalar values (resistivity, density, thermal data), one line each. */
  readonly sources: readonly string[];
}

/**
 * A range of a quantity, `min` ≤ value ≤ `max`, in the unit of the field that holds it.
 *
 * @category Core materials
 */
export interface QuantityRange {
  /** Lower end. */
  readonly min: number;
  /** Upper end. */
  readonly max: number;
}

/**
 * The optional temperature factor of a Steinmetz fit, in the common quadratic form,
 * written about a reference temperature so that its value there is 1:
 * $$
 * F(T) = 1 + c_1\,(T - T_{\mathrm{ref}}) + c_2\,(T - T_{\mathrm{ref}})^2 .
 * $$
 * A datasheet form $c_{t0} - c_{t1}\,\theta + c_{t2}\,\theta^2$ (θ in °C) converts by
 * dividing through by its value at $T_{\mathrm{ref}}$.
 *
 * @category Core materials
 */
export interface SteinmetzTemperatureTerm {
  /** Reference temperature $T_{\mathrm{ref}}$ [K], where the factor is 1. */
  readonly referenceTemperature: number;
  /** Linear coefficient $c_1$ [1/K]. */
  readonly linear: number;
  /** Quadratic coefficient $c_2$ [1/K²]. */
  readonly quadratic: number;
}

/**
 * Steinmetz coefficients in SI: loss density $P_v = k\,f^{\alpha}\,\hat B^{\beta}$ in W/m³
 * with f in Hz and the peak flux density $\hat B$ in T.
 *
 * @category Core materials
 */
export interface SteinmetzCoefficients {
  /** Coefficient k [W/m³ at f = 1 Hz, B̂ = 1 T], > 0. */
  readonly k: number;
  /** Frequency exponent α [-], typically 1…2. */
  readonly alpha: number;
  /** Flux-density exponent β [-], typically 2…3, > 0. */
  readonly beta: number;
}

/**
 * A magnetic core material described by Steinmetz coefficients and the ranges over which they
 * were fitted (outside them the loss estimate is an extrapolation).
 *
 * @category Core materials
 */
export interface CoreMaterial {
  /** Name; for the example sets shipped with the library it says "invented". */
  readonly name: string;
  /** `true` when the numbers are made up for examples and describe no real material. */
  readonly invented: boolean;
  /** Steinmetz coefficients (SI). */
  readonly steinmetz: SteinmetzCoefficients;
  /** Frequencies over which the coefficients hold [Hz]. */
  readonly frequencyRange: QuantityRange;
  /** Peak flux densities over which the coefficients hold [T]. */
  readonly fluxDensityRange: QuantityRange;
  /** Core temperatures over which the coefficients (and temperature term) hold [K]. */
  readonly temperatureRange: QuantityRange;
  /** Optional temperature factor; without it the loss is taken as temperature-independent. */
  readonly temperatureTerm?: SteinmetzTemperatureTerm;
  /** Relative permeability (amplitude, low field) [-], for inductance estimates. */
  readonly relativePermeability: number;
  /** Saturation flux density [T] at the upper end of `temperatureRange`. */
  readonly saturationFluxDensity: number;
  /** Where the numbers come from. */
  readonly source: string;
}
