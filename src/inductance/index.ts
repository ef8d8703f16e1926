/**
 * Coil inductance: single-layer solenoids, multilayer coils, flat spirals, circular loops, mutual inductance and coupling.
 *
 * Exact methods are the defaults (`solenoidInductance`, `multilayerCoilInductance`,
 * `spiralCoilInductance`, `loopMutualInductance`, `coaxialCoilMutualInductance`); the classic
 * approximations sit beside them under their authors' names, each with its measured error.
 *
 * Import from `fluxwright/inductance` (or from `fluxwright`, which re-exports every module).
 *
 * @document ../../docs/inductance.md
 * @module fluxwright/inductance
 */
export { nagaokaCoefficient, solenoidInductance, solenoidInductanceWheeler } from "./solenoid.js";
export type { SolenoidInductanceOptions, SolenoidInductanceWheelerOptions } from "./solenoid.js";
export { rosaCorrectionA, rosaCorrectionB } from "./rosa.js";
export { loopInductance, loopMutualInductance } from "./loop.js";
export type { LoopCurrentDistribution, LoopInductanceOptions, LoopMutualInductanceOptions } from "./loop.js";
export { multilayerCoilInductance, multilayerCoilInductanceWheeler, brooksCoilInductance } from "./multilayer.js";
export type { MultilayerCoilOptions, BrooksCoilOptions } from "./multilayer.js";
export { spiralCoilInductance, spiralCoilInductanceWheeler, spiralCoilInductanceMohan } from "./spiral.js";
export type { SpiralCoilOptions, SpiralCoilApproximationOptions } from "./spiral.js";
export { coaxialCoilMutualInductance } from "./coaxial.js";
// eslint-disable-next-line @typescript-eslint/no-deprecated -- couplingCoefficient keeps its positional form until 1.0
export { couplingCoefficient } from "./coupling.js";
export type { CouplingCoefficientOptions } from "./coupling.js";
// eslint-disable-next-line @typescript-eslint/no-deprecated -- former coil type names, kept until 1.0
export type { CoaxialCoil, CoaxialLoop, CoaxialSolenoid, CoaxialMultilayerCoil, CoaxialSpiralCoil } from "./coaxial.js";
export type {
  CoilGeometry,
  LoopGeometry,
  SolenoidGeometry,
  MultilayerGeometry,
  FlatSpiralGeometry,
  FlatSpiralByTurnCentres,
  FlatSpiralByEdges,
} from "./coil-geometry.js";
