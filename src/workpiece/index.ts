/**
 * Workpiece coupling: eddy-current power in the part and the impedance the coil terminals see.
 * Baker's functions, a bar or tube in a long coil, a slab in a tangential field, a finite coil
 * around a rod (Dodd, Deeds & Luquire), a coil above a layered plate (Dodd & Deeds), coil
 * efficiency, and coupling re-evaluated at the part's temperature.
 *
 * Import from `fluxwright/workpiece` (or from `fluxwright`, which re-exports every module).
 *
 * @document ../../docs/workpiece.md
 * @module fluxwright/workpiece
 */
export { bakerFunctions, bakerFunctionsAsymptotic } from "./baker.js";
export type { BakerFunctions } from "./baker.js";
export { barInLongCoil, tubeInLongCoil } from "./long-coil.js";
export type {
  BarInLongCoilOptions,
  LongCoil,
  LongCoilCouplingResult,
  RoundBar,
  RoundTube,
  TubeInLongCoilOptions,
} from "./long-coil.js";
export { slabInTangentialField } from "./slab.js";
export type { SlabInTangentialFieldOptions, SlabInTangentialFieldResult } from "./slab.js";
export { coilOverPlate } from "./coil-over-plate.js";
export { coilOverPlateTruncatedRegion } from "./coil-over-plate-truncated.js";
export type { CoilOverPlateTruncatedRegionOptions } from "./coil-over-plate-truncated.js";
export type {
  CoilAbovePlate,
  // eslint-disable-next-line @typescript-eslint/no-deprecated -- exported until 1.0
  CoilAbovePlateWithHeight,
  CoilOverPlateOptions,
  CoilOverPlateResult,
  PlateLayer,
} from "./coil-over-plate.js";
export { encirclingCoilOverRod } from "./encircling-coil.js";
export { prepareEncirclingCoilOverRod } from "./encircling-coil-prepared.js";
export type { EncirclingCoilGeometry, EncirclingCoilChange, EncirclingCoilEvaluator, RodRadii } from "./encircling-coil-prepared.js";
export type {
  EncirclingCoil,
  EncirclingCoilOverRodOptions,
  EncirclingCoilOverRodResult,
  LongRod,
} from "./encircling-coil.js";
export { coilEfficiency, powerInPart } from "./efficiency.js";
export type { CoilEfficiencyOptions, PowerInPartOptions } from "./efficiency.js";
export { workpieceCouplingAtTemperature } from "./temperature.js";
export type {
  HeatedBar,
  HeatedPart,
  HeatedPlate,
  HeatedTube,
  WorkpieceCouplingAtTemperatureOptions,
  WorkpieceCouplingAtTemperatureResult,
} from "./temperature.js";
export { workCoilImpedance, prepareWorkCoil } from "./work-coil-impedance.js";
export type {
  PreparedWorkCoil,
  PrepareWorkCoilOptions,
  ReducedWorkCoil,
  ReducedWorkCoilResult,
  ReduceWorkCoilOptions,
  WorkCoilConductor,
  WorkCoilImpedanceOptions,
  WorkCoilImpedanceResult,
  WorkCoilPancake,
  WorkCoilPart,
  WorkCoilSolenoid,
} from "./work-coil-impedance.js";
export { layeredCylinderInLongCoil } from "./layered-cylinder.js";
export type { LayeredCylinderInLongCoilOptions, LayeredCylinderInLongCoilResult } from "./layered-cylinder.js";
export { workpieceGeometry } from "./geometry.js";
export type { WorkpieceShape, WorkpieceBar, WorkpieceTube, WorkpiecePlate, WorkpieceGeometry } from "./geometry.js";
