/**
 * Conductor, workpiece and core material property sets, each value sourced, with
 * temperature-dependent resistivity, specific heat, thermal conductivity and permeability
 * (Curie transition and saturation).
 *
 * Every {@link ConductiveMaterial} carries `resistivity20` [Ω·m], `temperatureCoefficient`
 * [1/K], `density` [kg/m³], `specificHeat20` [J/(kg·K)], `thermalConductivity` [W/(m·K)],
 * `emissivity` (`min`/`max`/`typical`), `meltingTemperature` [K], `temperatureRange` [K],
 * `magnetic`, and for magnetic ones `curieTemperature` [K] and a `permeability` model. Read
 * temperature-dependent values with {@link resistivityAt}, {@link specificHeatAt},
 * {@link thermalConductivityAt}, {@link relativePermeabilityAt},
 * {@link specificEnthalpyChange} and
 * {@link saturationFluxDensityAt}.
 *
 * Import from `fluxwright/materials` (or from `fluxwright`, which re-exports every module).
 *
 * @document ../../docs/materials.md
 * @module fluxwright/materials
 */
export type {
  ConductiveMaterial,
  CoreMaterial,
  EmissivityRange,
  PermeabilityModel,
  QuantityRange,
  ResistivityModel,
  SpecificHeatModel,
  SteinmetzCoefficients,
  SteinmetzTemperatureTerm,
  TemperatureRange,
  TemperatureTable,
} from "./types.js";
export { copper, aluminium, silver } from "./conductors.js";
export {
  lowCarbonSteel,
  mediumCarbonSteel,
  austeniticStainless,
  ferriticStainless,
  aluminiumAlloy,
  brass,
  titaniumAlloy,
} from "./workpieces.js";
export { conductiveMaterials } from "./catalogue.js";
export { inventedExampleFerrite, inventedExampleIronPowder } from "./core-materials.js";
export { resistivityAt } from "./resistivity.js";
export { specificHeatAt } from "./specific-heat.js";
export { specificEnthalpyChange } from "./enthalpy.js";
export type { EnthalpyChangeInterval } from "./enthalpy.js";
export { thermalConductivityAt } from "./thermal-conductivity.js";
export { relativePermeabilityAt, saturationFluxDensityAt } from "./permeability.js";
export type { PermeabilityConditions } from "./permeability.js";
