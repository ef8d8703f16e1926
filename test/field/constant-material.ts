/**
 * A material with constant thermal properties for the conduction checks against series
 * solutions (which assume constant k, ρ, c): a copy of `lowCarbonSteel` with flat tables.
 */
import { lowCarbonSteel } from "../../src/index.js";
import type { ConductiveMaterial } from "../../src/index.js";

export function constantMaterial(thermalConductivity: number, density: number, specificHeat: number): ConductiveMaterial {
  const temperatures = [200, 3000];
  return {
    ...lowCarbonSteel,
    id: "constantTestMaterial",
    name: "constant-property test material",
    density,
    specificHeat20: specificHeat,
    specificHeat: { kind: "table", table: { temperatures, values: [specificHeat, specificHeat], source: "test" } },
    thermalConductivity,
    thermalConductivityTable: { temperatures, values: [thermalConductivity, thermalConductivity], source: "test" },
    temperatureRange: { min: 200, max: 3000 },
    meltingTemperature: 3000,
  };
}
