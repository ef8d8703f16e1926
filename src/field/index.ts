/**
 * Axisymmetric field solution: the time-harmonic eddy-current field of coaxial coils (solid or
 * stranded turns), parts and concentrators in the r–z half-plane by quadratic finite elements,
 * with each coil's impedance, the losses in every body and the field at any point; saturating
 * steel by an effective permeability per element.
 *
 * Import from `fluxwright/field` (or from `fluxwright`, which re-exports every module).
 *
 * @document ../../docs/field.md
 * @module fluxwright/field
 */
export { solveAxisymmetricField } from "./solve-axisymmetric-field.js";
export type {
  AxisymmetricFieldResult,
  FieldCircle,
  FieldCurvePoint,
  FieldFluxDensity,
  FieldMagnetisation,
  FieldMeshSize,
  FieldRegionResult,
  FieldWindingBlock,
  AxisymmetricFieldCoil,
  AxisymmetricFieldCoilResult,
  AxisymmetricFieldPoint,
  FieldRectangle,
  FieldRegion,
  FieldSaturationResult,
  FieldShape,
  SolveAxisymmetricFieldOptions,
} from "./solve-axisymmetric-field.js";
export { axisymmetricHeatConduction } from "./axisymmetric-conduction.js";
export type {
  AxisymmetricHeatConductionOptions,
  AxisymmetricHeatConductionResult,
  PartCells,
  PartEnergyBalance,
  PartFace,
  PartGenerationRequest,
  PartGrid,
  PartSurfaceExchange,
  PartTemperatureMap,
} from "./axisymmetric-conduction.js";
export { fieldHeatUp } from "./field-heat-up.js";
export type { FieldHeatUpCoilState, FieldHeatUpOptions, FieldHeatUpResult, FieldHeatUpSolution, FieldHeatedPart } from "./field-heat-up.js";
