/**
 * The heater study: one description of a design in, every number a designer needs out.
 *
 * Import from `fluxwright/study` (or from `fluxwright`, which re-exports every module).
 *
 * @document ../../docs/study.md
 * @module fluxwright/study
 */
export type {
  QuantityInput,
  HeaterSupply,
  CurrentFedParallelInverterDescription,
  SeriesInverterDescription,
  HeaterInverter,
  SolidConductorDescription,
  LitzConductorDescription,
  TubeConductorDescription,
  RoundPairLeadsDescription,
  FlatPairLeadsDescription,
  CoaxialLeadsDescription,
  HeaterLeadsDescription,
  HeaterConductor,
  SolenoidCoilDescription,
  PancakeCoilDescription,
  HeaterCoil,
  HeaterCapacitorBank,
  HeaterConcentrator,
  PartCommon,
  BarPartDescription,
  TubePartDescription,
  RingPartDescription,
  PlatePartDescription,
  HeaterPart,
  HeaterEnvironment,
  HeaterDescription,
  ConductorMaterialId,
  PartMaterialId,
  ConcentratorMaterialId,
  SeriesInverterCommon,
  FixedFrequencySeriesInverterDescription,
  PowerTrackingSeriesInverterDescription,
} from "./description.js";
export type { HeaterRectangle, RectanglesPartDescription, HeaterFieldConcentrator } from "./description.js";
export { readHeaterDescription, HeaterDescriptionError } from "./read-description.js";
export type { ReadHeaterDescriptionOptions } from "./read-description.js";
export type { ResolvedRectangle, ResolvedFieldConcentrator } from "./read-description.js";
export type {
  ResolvedSupply,
  ResolvedCurrentFedInverter,
  ResolvedSeriesInverter,
  ResolvedInverter,
  ResolvedSolidConductor,
  ResolvedLitzConductor,
  ResolvedTubeConductor,
  ResolvedConductor,
  ResolvedCoilCommon,
  ResolvedRoundPairLeads,
  ResolvedFlatPairLeads,
  ResolvedCoaxialLeads,
  ResolvedLeads,
  ResolvedSolenoidCoil,
  ResolvedPancakeCoil,
  ResolvedCoil,
  ResolvedCapacitorBank,
  ResolvedConcentrator,
  ResolvedPartCommon,
  ResolvedBarPart,
  ResolvedTubePart,
  ResolvedRingPart,
  ResolvedPlatePart,
  ResolvedPart,
  ResolvedEnvironment,
  ResolvedHeaterDescription,
} from "./read-description.js";
export { studyHeater } from "./study-heater.js";
export type {
  StudyHeaterOptions,
  HeaterPartFacts,
  HeaterHeatUp,
  HeaterRadialHeatUp,
  HeaterTemperatureScan,
  HeaterImpedanceSweep,
  HeaterStudy,
  HeaterUnsolvedBand,
  HeaterFieldPicture,
  HeaterFieldSummary,
} from "./study-heater.js";
export type { HeaterLosses, HeaterOperatingPoint, CoilProperties, CoilImpedanceTier } from "./operating-point.js";
export { sweepHeater, sweepHeaterStream } from "./sweep-heater.js";
export type { HeaterSweepSpec, HeaterSweepRow, HeaterSweep, HeaterShard, HeaterSweepStreamOptions, HeaterSweepStreamRow } from "./sweep-heater.js";
export type { HeaterPoolOptions, HeaterProgress } from "./worker-pool.js";
// eslint-disable-next-line @typescript-eslint/no-deprecated -- optimizeHeater kept until 1.0
export { optimiseHeater, optimizeHeater } from "./optimize-heater.js";
export type {
  HeaterLimits,
  HeaterSearchSpace,
  HeaterGoal,
  HeaterCandidate,
  HeaterRejection,
  HeaterOptimisation,
  // eslint-disable-next-line @typescript-eslint/no-deprecated -- kept until 1.0
  HeaterOptimization,
  HeaterSearchOptions,
} from "./optimize-heater.js";
export { optimiseHeaterShard, mergeHeaterOptimisationShards } from "./optimise-shards.js";
export type { HeaterSearchShardOptions, HeaterShardFinalist, HeaterOptimisationShard } from "./optimise-shards.js";
export type { HeaterSummary } from "./summary.js";
export { inductionRadialHeatUp } from "./induction-radial-heat-up.js";
export type {
  InductionRadialDrive,
  InductionRadialHeatUpOptions,
  InductionRadialHeatUpResult,
  InductionRadialState,
  RadialHeatedPart,
} from "./induction-radial-heat-up.js";
