/**
 * One valid call per public function, taken from the function's TSDoc @example, plus what the
 * robustness suite may accept instead of an InputError, each with its reason.
 *
 * A new export from src/index.ts without an entry here fails the suite (public-api.test.ts).
 */
import * as api from "../../src/index.js";
import {
  austeniticStainless,
  celsius,
  eCore,
  inventedExampleFerrite,
  complex,
  copper,
  InputError,
  lowCarbonSteel,
  parallelTank,
  resistorElement,
  seriesTank,
  triangularFluxWaveform,
} from "../../src/index.js";
import { loadExample } from "../study/cases.js";
import type { BadNumber, BadObject } from "./harness.js";

/** What a function is, for the purpose of the suite. */
export type ExampleKind =
  /** Validates its input: all three checks. */
  | "checked"
  /** A special-function kernel documented to return NaN outside its domain: valid call only. */
  | "kernel"
  /** A zero-cost unit brand (identity at run time, no checks by design): valid call only. */
  | "brand"
  /** A class: constructed with `new`, valid call only. */
  | "class";

/** Bad values that are accepted (no InputError) for some argument paths, with the reason. */
export interface Allowance {
  /** Path keys (`0.coil.turns`); a trailing `*` matches a prefix, `*` alone every path. */
  paths: readonly string[];
  kinds: readonly (BadNumber | BadObject)[];
  reason: string;
}

/** One table entry. */
export interface Example {
  /** Fresh valid arguments, from the @example. */
  args: () => unknown[];
  /** Further valid calls checked the same way (other kinds of a union option), same allowances. */
  variants?: readonly (() => unknown[])[];
  kind?: ExampleKind;
  allow?: readonly Allowance[];
  /** Result paths (array indices written `[]`) that may hold `null` or ±Infinity, with the reason. */
  nonFinite?: Readonly<Record<string, string>>;
  /** Argument paths (prefixes with `*`) not mutated, with the reason. */
  skip?: { paths: readonly string[]; reason: string };
  /** Study descriptions take quantities as text: treat quantity strings as numeric leaves. */
  quantityStrings?: boolean;
  /**
   * Argument paths (prefixes with `*`) of objects whose field names are data, not options (a map
   * from names to values): the unknown-field check skips them.
   */
  openObjects?: readonly string[];
  /** The replacement used for the "string" bad number (default `"1"`, to catch coercion). */
  badString?: string;
}

/** Objects passed back into the library (results, data sets): checked as objects, not walked. */
export const OPAQUE = new Set<object>();
function opaque<T extends object>(v: T): T {
  OPAQUE.add(v);
  return v;
}

const SERIES_TANK = opaque(seriesTank({ inductance: 100e-6, capacitance: 1e-6, resistance: 0.5 }));
const PARALLEL_TANK = opaque(parallelTank({ inductance: 1e-6, capacitance: 2e-6, coilResistance: 0.01 }));
const FLUX = opaque(triangularFluxWaveform({ fluxDensityPeak: 0.1, frequency: 100e3, dutyCycle: 0.3 }));
const R1 = opaque(resistorElement(1));
const R2 = opaque(resistorElement(2));
const R50 = opaque(resistorElement(50));

const cx = (re: number, im: number): unknown => complex(re, im);
const SIGNED = "a signed quantity: any finite value is in the domain";
const OPTIONAL = "optional field: undefined selects the documented default";

/** Base heater description of the study examples. */
function heater(): Record<string, unknown> {
  return {
    supply: { kind: "battery", voltage: "48 V", internalResistance: "40 mΩ" },
    inverter: { kind: "current-fed-parallel", chokeInductance: "100 µH", switchOnResistance: "8 mΩ" },
    coil: {
      shape: "solenoid",
      radius: "75 mm",
      length: "48 mm",
      turns: 6,
      conductor: { kind: "tube", outerDiameter: "6 mm", wallThickness: "1 mm" },
    },
    capacitor: { capacitance: "4 µF" },
    part: {
      shape: "ring",
      material: "lowCarbonSteel",
      outerRadius: "62 mm",
      innerRadius: "50 mm",
      height: "30 mm",
      targetTemperature: "120 °C",
    },
  };
}

/** Optional fields of a description that the reader resolves to null. */
const DESCRIPTION_NULLS: Readonly<Record<string, string>> = {
  "supply.currentLimit": "null when not given (optional rating, documented)",
  "inverter.switchVoltageRating": "null when not given (optional rating, documented)",
  "capacitor.voltageRatingRms": "null when not given (optional rating, documented)",
  "capacitor.currentRatingRms": "null when not given (optional rating, documented)",
  concentrator: "null when the coil has no flux concentrator (documented)",
  "inverter.frequency": "null for a power-tracking series inverter (documented)",
  "coil.leads": "null when the leads have no cross-section (resistance only, documented)",
};
const STUDY_ALLOW: readonly Allowance[] = [
  {
    paths: [
      "0.supply.internalResistance",
      "0.supply.currentLimit",
      "0.inverter.switchVoltageRating",
      "0.coil.leadLength",
      "0.coil.temperature",
      "0.coil.conductor.outerDiameter",
      "0.capacitor.dissipationFactor",
      "0.capacitor.voltageRatingRms",
      "0.capacitor.currentRatingRms",
      "0.part.startTemperature",
      "0.environment",
      "0.environment.ambientTemperature",
      "0.environment.convectionCoefficient",
      "0.concentrator",
    ],
    kinds: ["undefined"],
    reason: OPTIONAL + " (ratings unchecked, leads 0 m, coil 40 °C, tan δ 0.0005, still air, litz bundle from packing)",
  },
  {
    paths: [
      "0.supply.internalResistance",
      "0.inverter.switchOnResistance",
      "0.coil.leadLength",
      "0.coil.liftOff",
      "0.capacitor.dissipationFactor",
      "0.environment.convectionCoefficient",
    ],
    kinds: ["zero"],
    reason: "resistances, lead length, lift-off, tan δ and convection are ≥ 0 (documented)",
  },
];

const kernel1 = (x: number): Example => ({ kind: "kernel", args: () => [x] });
const kernelC = (...z: [number, number][]): Example => ({ kind: "kernel", args: () => z.map(([re, im]) => cx(re, im)) });
const brand = (x: number): Example => ({ kind: "brand", args: () => [x] });

/** Result fields of the radial heat-ups that are null when not asked for or not reached (documented). */
const RADIAL_NULLS: Readonly<Record<string, string>> = {
  timeToSurfaceTarget: "null when no target was given or it is not reached (documented)",
  timeToCoreTarget: "null when no target was given or it is not reached (documented)",
  timeToMeanTarget: "null when no target was given or it is not reached (documented)",
  heatingTime: "null when the heating is not stopped at a target (documented)",
  surfaceCoreDifferenceAtStop: "null when the heating is not stopped at a target (documented)",
  soakTime: "null without a soak band, or when the band is not reached (documented)",
  hardeningDepth: "null without a hardening temperature (documented)",
  hardeningDepths: "null without a hardening temperature (documented)",
};

/** The table: every function exported from src/index.ts. */
export const EXAMPLES: Readonly<Record<string, Example>> = {
  // ---------------------------------------------------------------- core
  InputError: { kind: "class", args: () => ["demo", "radius", -1, "m", "a finite number > 0"] },
  requireFinite: {
    args: () => ["demo", "offset", -2, "m"],
    allow: [{ paths: ["2"], kinds: ["zero", "negative"], reason: SIGNED }],
  },
  requirePositive: { args: () => ["demo", "radius", 0.01, "m"] },
  requireNonNegative: {
    args: () => ["demo", "gap", 0, "m"],
    allow: [{ paths: ["2"], kinds: ["zero"], reason: "the domain is ≥ 0" }],
  },
  requireInRange: {
    args: () => ["demo", "dutyCycle", 0.5, "", 0, 1, "()"],
    allow: [
      { paths: ["4"], kinds: ["zero", "negative", "-Infinity"], reason: "min is the calling function's own bound (may be -Infinity, documented), not checked input" },
      { paths: ["5"], kinds: ["Infinity", "string"], reason: "max is the calling function's own bound (may be Infinity, documented), not checked input" },
    ],
  },
  requireInteger: { args: () => ["demo", "turns", 12] },
  requireOneOf: {
    args: () => ["demo", "bridge", "half", ["half", "full"]],
    skip: { paths: ["3", "3.*"], reason: "`allowed` is the calling function's own constant list, not checked input" },
  },
  requireObject: { args: () => ["demo", "options", { radius: 1 }], openObjects: ["2"], skip: { paths: ["2.*"], reason: "any object is valid; its contents are not looked at" } },
  requireKnownKeys: {
    args: () => ["demo", "options", { radius: 1 }, ["radius", "length"]],
    skip: { paths: ["2.*", "3", "3.*"], reason: "field values are not looked at, only their names; `known` is the calling function's own constant list" },
  },
  requireArrayLike: {
    args: () => ["demo", "frequencies", [1e3, 2e3], "Hz"],
    skip: { paths: ["2.*"], reason: "element values are not looked at, only the length" },
  },
  nearestName: { args: () => ["relativePermeabilty", ["diameter", "relativePermeability"]], kind: "kernel" },

  // ---------------------------------------------------------------- units
  metres: brand(0.025),
  henries: brand(2.2e-6),
  farads: brand(4.7e-6),
  ohms: brand(0.022),
  ohmMetres: brand(1.7241e-8),
  hertz: brand(25e3),
  teslas: brand(0.2),
  amperesPerMetre: brand(8000),
  amperes: brand(40),
  volts: brand(24),
  watts: brand(1500),
  joules: brand(3.6e6),
  kelvins: brand(300),
  seconds: brand(45),
  kilograms: brand(0.85),
  celsius: { args: () => [20], allow: [{ paths: ["0"], kinds: ["zero", "negative"], reason: "°C: 0 and negative values down to absolute zero are temperatures" }] },
  toCelsius: { args: () => [373.15], allow: [{ paths: ["0"], kinds: ["zero"], reason: "absolute zero (0 K) is a temperature" }] },
  inches: { args: () => [2], allow: [{ paths: ["0"], kinds: ["zero", "negative"], reason: SIGNED + " (a length conversion)" }] },
  toInches: { args: () => [0.0508], allow: [{ paths: ["0"], kinds: ["zero", "negative"], reason: SIGNED + " (a length conversion)" }] },
  mils: { args: () => [10], allow: [{ paths: ["0"], kinds: ["zero", "negative"], reason: SIGNED + " (a length conversion)" }] },
  toMils: { args: () => [0.000254], allow: [{ paths: ["0"], kinds: ["zero", "negative"], reason: SIGNED + " (a length conversion)" }] },
  millimetres: { args: () => [2.5], allow: [{ paths: ["0"], kinds: ["zero", "negative"], reason: SIGNED + " (a length conversion)" }] },
  toMillimetres: { args: () => [0.0025], allow: [{ paths: ["0"], kinds: ["zero", "negative"], reason: SIGNED + " (a length conversion)" }] },
  formatQuantity: {
    args: () => [Math.PI, "V", { digits: 3 }],
    allow: [
      { paths: ["0"], kinds: ["zero", "negative"], reason: SIGNED + " (formatting)" },
      { paths: ["2"], kinds: ["undefined"], reason: OPTIONAL },
      { paths: ["2.digits"], kinds: ["undefined"], reason: OPTIONAL },
    ],
  },
  parseQuantity: { args: () => ["4.7 µF", "F"], badString: "1" },
  awgToDiameter: { args: () => [24], allow: [{ paths: ["0"], kinds: ["zero", "string"], reason: "AWG 0 is a gauge, and gauges may be given as text (\"1\", \"0000\")" }] },
  diameterToAwg: { args: () => [0.00051054] },
  nextMetricCrossSection: { args: () => [2e-6] },
  crossSectionToDiameter: { args: () => [1.5e-6] },
  diameterToCrossSection: { args: () => [0.002] },

  // ---------------------------------------------------------------- special (kernels)
  besselI0Complex: kernelC([1, 1]),
  besselI1Complex: kernelC([2, 0]),
  besselI0ComplexScaled: kernelC([5000, 5000]),
  besselI1ComplexScaled: kernelC([0, 0]),
  besselK0Complex: kernelC([1, 0]),
  besselK1Complex: kernelC([1, 0]),
  besselK0ComplexScaled: kernelC([1e6, 0]),
  besselK1ComplexScaled: kernelC([1e6, 0]),
  besselJ0Complex: kernelC([2.404825557695773, 0]),
  besselJ1Complex: kernelC([1, 0]),
  besselI1OverI0Complex: kernelC([1e4, 1e4]),
  besselIKComplexScaled: kernelC([1, 1]),
  besselJ0: kernel1(1),
  besselJ1: kernel1(1),
  besselY0: kernel1(1),
  besselY1: kernel1(1),
  besselI0: kernel1(1),
  besselI1: kernel1(1),
  besselI0Scaled: kernel1(0),
  besselI1Scaled: kernel1(1),
  besselK0: kernel1(1),
  besselK1: kernel1(1),
  besselK0Scaled: kernel1(1),
  besselK1Scaled: kernel1(1),
  brentRoot: { kind: "kernel", args: () => [(t: number) => Math.cos(t) - t, 0, 1] },
  solveDense: { kind: "kernel", args: () => [2, Float64Array.from([2, 1, 1, 3]), Float64Array.from([3, 5])] },
  complex: { kind: "kernel", args: () => [1, -2] },
  cAdd: kernelC([1, 2], [3, -1]),
  cSub: kernelC([1, 2], [3, -1]),
  cMul: kernelC([1, 2], [3, 4]),
  cDiv: kernelC([-5, 10], [3, 4]),
  cScale: { kind: "kernel", args: () => [cx(1, -2), 3] },
  cNeg: kernelC([1, -2]),
  cConj: kernelC([1, -2]),
  cAbs: kernelC([3, 4]),
  cArg: kernelC([0, 1]),
  cSqrt: kernelC([-4, 0]),
  cExp: kernelC([0, Math.PI]),
  cLog: kernelC([-1, 0]),
  cSinh: kernelC([0, Math.PI / 2]),
  cCosh: kernelC([0, 0]),
  cTanh: kernelC([1000, 1]),
  cCoth: kernelC([-1000, 2]),
  ellipticK: kernel1(0.5),
  ellipticE: kernel1(0.5),
  ellipticKFromComplement: kernel1(1e-20),
  ellipticEFromComplement: kernel1(0),
  integrateAdaptive: { kind: "kernel", args: () => [Math.sin, 0, Math.PI] },
  integrateToInfinity: {
    kind: "kernel",
    args: () => [(x: number) => (x === 0 ? 1 : Math.sin(x) / x), 0, { intervalLength: Math.PI }],
  },
  kelvinFunctions: kernel1(1),
  kelvinFunctionsScaled: kernel1(5000),
  kelvinBer: kernel1(2),
  kelvinBei: kernel1(2),
  kelvinKer: kernel1(1),
  kelvinKei: kernel1(1),
  kelvinBerPrime: kernel1(1),
  kelvinBeiPrime: kernel1(1),
  kelvinKerPrime: kernel1(1),
  kelvinKeiPrime: kernel1(1),
  solveOde: {
    kind: "kernel",
    args: () => [
      (_t: number, y: Float64Array, dy: Float64Array) => {
        dy[0] = -y[0]!;
      },
      [1],
      { end: 10, event: (_t: number, y: Float64Array) => y[0]! - 0.5 },
    ],
    nonFinite: { sample: "null unless dense output was asked for (documented)" },
  },

  factorComplexSymmetric: {
    kind: "kernel",
    args: () => [
      {
        size: 2,
        columnStarts: Int32Array.from([0, 2, 4]),
        rowIndices: Int32Array.from([0, 1, 0, 1]),
        re: Float64Array.from([4, 1, 1, 3]),
        im: Float64Array.from([0, 1, 1, 0]),
      },
    ],
  },
  latticeNestedDissection: { kind: "kernel", args: () => [{ columns: 5, rows: 4, step: 2 }] },

  // ---------------------------------------------------------------- materials
  specificEnthalpyChange: { args: () => [lowCarbonSteel, { fromTemperature: celsius(20), toTemperature: celsius(200) }] },
  relativePermeabilityAt: {
    args: () => [lowCarbonSteel, { temperature: celsius(20), fieldStrengthPeak: 1e5 }],
    allow: [
      { paths: ["1.fieldStrengthPeak"], kinds: ["undefined"], reason: OPTIONAL },
      { paths: ["1.fieldStrengthPeak"], kinds: ["zero"], reason: "zero field is in the domain (initial permeability)" },
    ],
  },
  saturationFluxDensityAt: { args: () => [lowCarbonSteel, celsius(20)] },
  resistivityAt: { args: () => [copper, celsius(100)] },
  specificHeatAt: { args: () => [lowCarbonSteel, celsius(735)] },
  thermalConductivityAt: { args: () => [austeniticStainless, 600] },

  // ---------------------------------------------------------------- inductance
  coaxialCoilMutualInductance: {
    args: () => [
      { kind: "spiral", innerRadius: 0.01, outerRadius: 0.04, turns: 12 },
      { kind: "solenoid", radius: 0.02, length: 0.01, turns: 8 },
      0.015,
    ],
    variants: [
      () => [{ kind: "loop", radius: 0.03, turns: 2 }, { kind: "multilayer", innerRadius: 0.02, outerRadius: 0.03, length: 0.02, turns: 50 }, 0.02],
      () => [{ kind: "flatSpiral", innerTurnRadius: 0.01, outerTurnRadius: 0.04, turns: 12, position: 0.002 }, { kind: "flatSpiral", innerEdgeRadius: 0.005, outerEdgeRadius: 0.05, turns: 6, position: -0.01 }, 0.015],
    ],
    allow: [
      { paths: ["2"], kinds: ["zero"], reason: "coplanar coils (axial distance 0) are in the domain" },
      { paths: ["0.position", "1.position"], kinds: ["zero", "negative", "undefined"], reason: "a coil's axial position is signed and optional (default 0, documented)" },
      { paths: ["1.innerEdgeRadius"], kinds: ["zero"], reason: "a spiral's inner edge is ≥ 0 (documented)" },
      { paths: ["0.turns"], kinds: ["undefined"], reason: OPTIONAL + " (a loop of one turn)" },
    ],
  },
  couplingCoefficient: {
    args: () => [{ mutualInductance: 2e-6, selfInductance1: 4e-6, selfInductance2: 9e-6 }],
    allow: [{ paths: ["0.mutualInductance"], kinds: ["zero", "negative"], reason: "mutual inductance is signed (winding sense); k carries the sign" }],
  },
  loopInductance: {
    args: () => [{ loopRadius: 0.05, wireRadius: 0.001, currentDistribution: "surface" }],
    allow: [],
  },
  loopMutualInductance: {
    args: () => [{ radius1: 0.1, radius2: 0.1, axialDistance: 0.1 }],
    variants: [() => [{ radius1: 0.1, radius2: 0.08, axialDistance: 0.05, lateralOffset: 0.04, tilt: 0.3 }]],
    allow: [
      { paths: ["0.lateralOffset"], kinds: ["zero", "undefined"], reason: "optional, domain ≥ 0 (0 is the coaxial case)" },
      { paths: ["0.axialDistance"], kinds: ["zero"], reason: "coplanar filaments of different radii (or offset) are valid; only coinciding ones throw" },
      { paths: ["0.tilt"], kinds: ["zero", "negative", "undefined"], reason: "optional angle in [−π, π]; 0 and negative tilts are valid" },
    ],
  },
  multilayerCoilInductance: { args: () => [{ innerRadius: 0.02, outerRadius: 0.03, length: 0.025, turns: 200 }] },
  multilayerCoilInductanceWheeler: { args: () => [{ innerRadius: 0.02, outerRadius: 0.03, length: 0.025, turns: 200 }] },
  brooksCoilInductance: { args: () => [{ sideLength: 0.01, turns: 100 }] },
  rosaCorrectionA: { args: () => [1] },
  rosaCorrectionB: { args: () => [2] },
  nagaokaCoefficient: { args: () => [1] },
  solenoidInductance: {
    args: () => [{ radius: 0.025, length: 0.03, turns: 20, wireDiameter: 0.001 }],
    allow: [{ paths: ["0.wireDiameter"], kinds: ["undefined"], reason: OPTIONAL + " (current sheet)" }],
  },
  solenoidInductanceWheeler: { args: () => [{ radius: 0.025, length: 0.03, turns: 20 }] },
  spiralCoilInductance: {
    args: () => [{ innerRadius: 0.02, outerRadius: 0.062, turns: 15, wireDiameter: 0.002 }],
    allow: [
    ],
  },
  spiralCoilInductanceWheeler: {
    args: () => [{ innerRadius: 0.02, outerRadius: 0.062, turns: 15 }],
  },
  spiralCoilInductanceMohan: {
    args: () => [{ innerRadius: 0.02, outerRadius: 0.062, turns: 15 }],
  },

  // ---------------------------------------------------------------- conductors
  wireDcResistance: { args: () => [{ resistivity: 1.7241e-8, length: 10, diameter: 1e-3 }] },
  wireDcResistanceAt: { args: () => [{ material: copper, temperature: celsius(100), length: 10, diameter: 1e-3 }] },
  dowellFactor: { args: () => [{ penetrationRatio: 1, layers: 3 }] },
  litzWindingAcRatio: {
    args: () => [{ strands: 100, strandDiameter: 0.1e-3, turns: 20, windowBreadth: 20e-3, frequency: 100e3, resistivity: 1.7241e-8 }],
  },
  optimalLitzStrandCount: {
    args: () => [{ strandDiameter: 0.1e-3, turns: 20, windowBreadth: 20e-3, frequency: 100e3, resistivity: 1.7241e-8 }],
  },
  litzGeometry: {
    args: () => [
      { strands: 100, strandDiameter: 0.1e-3, strandOuterDiameter: 0.115e-3, bundleLevels: [5, 5, 4], twistPitch: 25e-3, servingThickness: 0.05e-3 },
    ],
    allow: [
      { paths: ["0.strandOuterDiameter", "0.bundleLevels", "0.twistPitch", "0.servingThickness"], kinds: ["undefined"], reason: OPTIONAL },
      { paths: ["0.servingThickness"], kinds: ["zero"], reason: "no serving is a valid construction (thickness ≥ 0)" },
    ],
  },
  litzDcResistance: {
    args: () => [{ construction: { strands: 100, strandDiameter: 0.1e-3, bundleLevels: [10, 10] }, resistivity: 1.7241e-8, length: 1 }],
    allow: [{ paths: ["0.construction.bundleLevels"], kinds: ["undefined"], reason: OPTIONAL }],
  },
  litzAcRatio: {
    args: () => [
      { construction: { strands: 100, strandDiameter: 0.1e-3, strandOuterDiameter: 0.115e-3 }, frequency: 100e3, resistivity: 1.7241e-8, turns: 20, windowBreadth: 20e-3 },
    ],
    allow: [{ paths: ["0.construction.strandOuterDiameter"], kinds: ["undefined"], reason: OPTIONAL }],
  },
  roundWireWindingAcRatioFerreira: {
    args: () => [{ wireDiameter: 0.5e-3, frequency: 100e3, resistivity: 1.7241e-8, layers: 4, turnsPerLayer: 12, windowBreadth: 8e-3 }],
  },
  roundWireWindingAcRatio: {
    args: () => [{ wireDiameter: 0.5e-3, frequency: 100e3, resistivity: 1.7241e-8, layers: 4, turnsPerLayer: 12, windowBreadth: 8e-3 }],
  },
  roundWireAcRatio: { args: () => [{ diameter: 2e-3, frequency: 20e3, resistivity: 1.7241e-8 }] },
  roundWireAcRatioSweep: { args: () => [{ diameter: 2e-3, frequencies: [1e3, 20e3, 1e6], resistivity: 1.7241e-8 }] },
  skinDepth: { args: () => [{ resistivity: 1.7241e-8, frequency: 20e3 }] },
  tubeAcResistance: { args: () => [{ outerDiameter: 6e-3, wallThickness: 1e-3, frequency: 20e3, resistivity: 1.7241e-8 }] },
  leadImpedance: {
    args: () => [{ lead: { shape: "round-pair", diameter: 6e-3, wallThickness: 1e-3, spacing: 12e-3 }, length: 0.4, frequency: 50e3, resistivity: 1.7241e-8 }],
    allow: [{ paths: ["0.lead.wallThickness"], kinds: ["undefined"], reason: OPTIONAL + " (a solid conductor)" }],
  },
  roundWireWindingValidity: {
    args: () => [{ wireDiameter: 1e-3, frequency: 100e3, resistivity: 1.7241e-8, layers: 4, turnsPerLayer: 8, windowBreadth: 10e-3 }],
  },
  litzWindingValidity: {
    args: () => [{ strands: 100, strandDiameter: 0.1e-3, turns: 20, windowBreadth: 20e-3, frequency: 100e3, resistivity: 1.7241e-8 }],
  },
  workCoilResistanceCurrentSheet: {
    args: () => [{ innerDiameter: 0.06, coilLength: 0.08, turns: 8, spaceFactor: 0.75, frequency: 20e3, resistivity: 1.86e-8 }],
  },

  // ---------------------------------------------------------------- coreloss
  toroidCoreGeometry: { args: () => [{ innerDiameter: 0.02, outerDiameter: 0.04, height: 0.01 }] },
  rodCoreGeometry: { args: () => [{ diameter: 0.01, length: 0.1 }] },
  coreLossPower: {
    args: () => [{ lossDensity: 200e3, effectiveVolume: 8e-6 }],
    allow: [{ paths: ["0.lossDensity"], kinds: ["zero"], reason: "zero loss density is in the domain (≥ 0)" }],
  },
  fitSteinmetz: {
    args: () => [
      [25e3, 50e3, 100e3, 200e3].flatMap((frequency) =>
        [0.05, 0.1, 0.2].map((fluxDensityPeak) => ({
          frequency,
          fluxDensityPeak,
          lossDensity: 2.5 * frequency ** 1.45 * fluxDensityPeak ** 2.55,
        })),
      ),
    ],
  },
  igseCoefficient: { args: () => [{ k: 2.5, alpha: 1.45, beta: 2.55 }] },
  igseLoss: { args: () => [{ k: 2.5, alpha: 1.45, beta: 2.55, period: FLUX.period, flux: FLUX }] },
  steinmetzLoss: { args: () => [{ k: 2.5, alpha: 1.45, beta: 2.55, frequency: 100e3, fluxDensityPeak: 0.1 }], allow: [{ paths: ["0.fluxDensityPeak"], kinds: ["zero"], reason: "no flux, no loss: B ≥ 0" }] },
  steinmetzTemperatureFactor: {
    args: () => [{ referenceTemperature: 373.15, linear: 2e-3, quadratic: 1e-4 }, 363.15],
    allow: [{ paths: ["0.linear", "0.quadratic"], kinds: ["zero", "negative"], reason: SIGNED + " (fitted coefficients)" }],
  },
  fluxDensityFromVoltSeconds: {
    args: () => [{ voltSeconds: 48 * 5e-6, turns: 6, coreArea: 1e-4 }],
    allow: [{ paths: ["0.voltSeconds"], kinds: ["zero"], reason: "volt-seconds ≥ 0 (documented)" }],
  },
  sinusoidalPeakFluxDensity: {
    args: () => [{ voltageRms: 230, frequency: 50, turns: 500, coreArea: 20e-4 }],
    allow: [{ paths: ["0.voltageRms"], kinds: ["zero"], reason: "RMS voltage ≥ 0 (documented)" }],
  },
  fluxWaveformFromVoltage: {
    args: () => [{ time: [0, 10e-6, 20e-6], voltage: [100, -100], turns: 10, coreArea: 1e-4 }],
    allow: [
      { paths: ["0.voltage.1"], kinds: ["negative"], reason: SIGNED + " (voltage samples; this one is negative already)" },
      { paths: ["0.time.0"], kinds: ["zero"], reason: "the time axis may start at 0; only its increase is required" },
    ],
  },
  sinusoidalFluxWaveform: { args: () => [{ fluxDensityPeak: 0.1, frequency: 50e3, samples: 8 }], allow: [{ paths: ["0.fluxDensityPeak"], kinds: ["zero"], reason: "peak flux density ≥ 0 (zero flux: no loss)" }, { paths: ["0.samples"], kinds: ["undefined"], reason: OPTIONAL }] },
  triangularFluxWaveform: { args: () => [{ fluxDensityPeak: 0.2, frequency: 20e3, dutyCycle: 0.25 }], allow: [{ paths: ["0.fluxDensityPeak"], kinds: ["zero"], reason: "peak flux density ≥ 0 (zero flux: no loss)" }, { paths: ["0.dutyCycle"], kinds: ["undefined"], reason: OPTIONAL }] },
  trapezoidalFluxWaveform: { args: () => [{ fluxDensityPeak: 0.1, frequency: 1e3, dutyCycle: 0.5 }], allow: [{ paths: ["0.fluxDensityPeak"], kinds: ["zero"], reason: "peak flux density ≥ 0 (zero flux: no loss)" }] },

  // ---------------------------------------------------------------- tank
  capacitorBank: {
    args: () => [{ capacitance: 2e-6, voltageRms: 600, currentRms: 300, frequency: 40e3, series: "E12", unitVoltageRmsRating: 400, unitCurrentRmsRating: 60 }],
    allow: [{ paths: ["0.unitVoltageRmsRating", "0.unitCurrentRmsRating"], kinds: ["undefined"], reason: OPTIONAL + " (no rating limit)" }],
  },
  currentFedParallelInverter: {
    args: () => [{ supplyVoltage: 24, inductance: 1e-6, capacitance: 2e-6, coilResistance: 0.01 }],
    nonFinite: { chokeRipplePeakToPeak: "null for an infinite choke, i.e. none given (documented)" },
  },
  resistorElement: { args: () => [8], allow: [{ paths: ["0"], kinds: ["zero"], reason: "resistance ≥ 0 (0 is a short circuit, documented)" }] },
  inductorElement: { args: () => [1e-3, 2], allow: [{ paths: ["1"], kinds: ["undefined", "zero"], reason: "series resistance is optional and ≥ 0 (default 0)" }] },
  capacitorElement: { args: () => [1e-6, 0.01], allow: [{ paths: ["1"], kinds: ["undefined", "zero"], reason: "series resistance is optional and ≥ 0 (default 0)" }] },
  seriesNetwork: { args: () => [R1, R2] },
  parallelNetwork: { args: () => [opaque(resistorElement(6)), opaque(resistorElement(3))] },
  lclNetwork: {
    args: () => [{ seriesInductance: 10e-6, inductance: 10e-6, capacitance: 1e-6, coilResistance: 0.05 }],
    allow: [{ paths: ["0.coilResistance"], kinds: ["zero"], reason: "work-coil resistance ≥ 0 (documented)" }],
  },
  lccNetwork: { args: () => [{ seriesInductance: 100e-6, seriesCapacitance: 100e-9, parallelCapacitance: 100e-9, load: R50 }] },
  tankImpedance: { args: () => [SERIES_TANK, SERIES_TANK.undampedFrequency] },
  tankImpedanceSweep: { args: () => [PARALLEL_TANK, [1e4, 1e5, 1e6]] },
  logSpacedFrequencies: { args: () => [10, 1000, 3] },
  parallelTank: {
    args: () => [{ inductance: 1e-6, capacitance: 2e-6, coilResistance: 0.01 }],
    nonFinite: {
      parallelResistance: "null when no parallel resistance was given (documented)",
      zeroPhaseFrequency: "null when the coil Q ≤ 1: no zero-phase point (documented)",
      maxImpedanceFrequency: "null when the impedance has no peak (documented)",
      maxImpedance: "null when the impedance has no peak (documented)",
    },
  },
  capacitorSeriesResistance: {
    args: () => [{ capacitance: 1e-6, dissipationFactor: 0.001, frequency: 50e3 }],
    allow: [{ paths: ["0.dissipationFactor"], kinds: ["zero"], reason: "a lossless capacitor (tan δ = 0) is in the domain" }],
  },
  seriesInverterWithSource: {
    args: () => [{ sourceVoltage: 24, sourceResistance: 0.5, bridge: "full", inductance: 20e-6, capacitance: 1.5e-6, resistance: 0.3, power: 100 }],
    allow: [{ paths: ["0.sourceResistance"], kinds: ["zero"], reason: "an ideal source (R = 0) is in the domain" }],
  },
  currentFedParallelInverterWithSource: {
    args: () => [{ sourceVoltage: 24, sourceResistance: 0.05, switchOnResistance: 0.01, inductance: 1e-6, capacitance: 2e-6, coilResistance: 0.01 }],
    allow: [
      { paths: ["0.sourceResistance", "0.switchOnResistance"], kinds: ["zero"], reason: "ideal source and switches (R = 0) are in the domain" },
      { paths: ["0.switchOnResistance"], kinds: ["undefined"], reason: OPTIONAL },
    ],
    nonFinite: { chokeRipplePeakToPeak: "null for an infinite choke, i.e. none given (documented)" },
  },
  seriesInverter: { args: () => [{ supplyVoltage: 325, bridge: "half", inductance: 100e-6, capacitance: 0.2e-6, resistance: 4, switchingFrequency: 38e3 }] },
  frequencyForPower: { args: () => [{ supplyVoltage: 325, bridge: "half", inductance: 100e-6, capacitance: 0.2e-6, resistance: 4, power: 2000 }] },
  seriesTank: {
    args: () => [{ inductance: 100e-6, capacitance: 1e-6, resistance: 0.5 }],
    nonFinite: { dampedFrequency: "null when Q ≤ 1/2: an over-damped tank does not ring (documented)" },
  },
  llcGain: { args: () => [{ inductanceRatio: 6, qualityFactor: 0.4, normalisedFrequency: 0.7 }] },
  seriesResonantGain: { args: () => [{ qualityFactor: 1, normalisedFrequency: 1.2 }] },
  parallelResonantGain: { args: () => [{ qualityFactor: 0.5, normalisedFrequency: 1 }] },
  lccGain: { args: () => [{ qualityFactor: 1, normalisedFrequency: 1.2, capacitanceRatio: 1 }] },
  llcOperatingPoint: {
    args: () => [{ bridge: "half", inputVoltage: 390, turnsRatio: 8, resonantInductance: 60e-6, resonantCapacitance: 24e-9, magnetisingInductance: 360e-6, switchingFrequency: 110e3, loadResistance: 5 }],
    variants: [() => [{ bridge: "full", inputVoltage: 48, turnsRatio: 2, resonantInductance: 12e-6, resonantCapacitance: 90e-9, magnetisingInductance: 60e-6, switchingFrequency: 160e3, loadResistance: 3, rectifier: "centre-tap", deadTime: 100e-9, switchCapacitance: 200e-12 }]],
    allow: [{ paths: ["0.deadTime", "0.switchCapacitance"], kinds: ["zero", "undefined"], reason: "optional, domain ≥ 0 (zero dead time or capacitance is a valid ideal case)" }],
  },
  seriesSeriesSplitting: {
    args: () => [{ primaryInductance: 60e-6, secondaryInductance: 40e-6, mutualInductance: 14.7e-6, secondaryResistance: 0.08, loadResistance: 5, resonantFrequency: 100e3 }],
    allow: [{ paths: ["0.secondaryResistance"], kinds: ["zero"], reason: "domain ≥ 0 (a lossless secondary coil)" }],
  },
  lccSplitting: {
    args: () => [{ compensation: "lcc-series", primaryInductance: 60e-6, secondaryInductance: 40e-6, mutualInductance: 14.7e-6, primaryFilterInductance: 10e-6, primaryResistance: 0.05, secondaryResistance: 0.05, loadResistance: 5, resonantFrequency: 100e3 }],
    variants: [() => [{ compensation: "double-lcc", primaryInductance: 60e-6, secondaryInductance: 40e-6, mutualInductance: 14.7e-6, primaryFilterInductance: 10e-6, secondaryFilterInductance: 8e-6, primaryResistance: 0.05, secondaryResistance: 0.05, loadResistance: 5, resonantFrequency: 100e3 }]],
    allow: [
      { paths: ["0.primaryResistance", "0.secondaryResistance"], kinds: ["zero"], reason: "domain ≥ 0 (lossless coils)" },
      { paths: ["0.secondaryFilterInductance"], kinds: ["undefined"], reason: "only for double-lcc (absent in the lcc-series example)" },
    ],
  },
  linkFrequencySweep: {
    args: () => [{ primaryInductance: 60e-6, secondaryInductance: 40e-6, mutualInductance: 14.7e-6, primaryResistance: 0.1, secondaryResistance: 0.08, frequency: 100e3, compensation: "series-series", loadResistance: 5, sourceVoltage: 10 }, [90e3, 100e3, 115e3]],
    allow: [{ paths: ["0.primaryResistance", "0.secondaryResistance"], kinds: ["zero"], reason: "domain ≥ 0 (lossless coils)" }],
  },
  padMutualInductance: {
    args: () => [{ pad1: { innerRadius: 0.05, outerRadius: 0.09, turns: 3 }, pad2: { innerRadius: 0.04, outerRadius: 0.08, turns: 2 }, axialDistance: 0.03, lateralOffset: 0.04 }],
    variants: [
      () => [{ pad1: { innerRadius: 0.05, outerRadius: 0.09, turns: 3 }, pad2: { innerRadius: 0.04, outerRadius: 0.08, turns: 2 }, axialDistance: 0.03, backingPlate: { material: "ferrite", gap: 0.005, relativePermeability: 1000 } }],
      () => [{ pad1: { innerRadius: 0.05, outerRadius: 0.05, turns: 1 }, pad2: { innerRadius: 0.04, outerRadius: 0.08, turns: 2 }, axialDistance: 0.03, lateralOffset: 0.02, backingPlate: { material: "aluminium", gap: 0.01 } }],
    ],
    allow: [
      { paths: ["0.lateralOffset"], kinds: ["zero", "undefined"], reason: "optional, domain ≥ 0 (0 is the coaxial case)" },
      { paths: ["0.backingPlate", "0.backingPlate.relativePermeability"], kinds: ["undefined"], reason: "optional: no plate; ferrite µr defaults to 2000" },
    ],
  },
  llcDesign: {
    args: () => [{ inputVoltage: { min: 340, nominal: 390, max: 410 }, outputVoltage: 19.5, outputPower: 65, resonantFrequency: 100e3, bridge: "half" }],
    variants: [() => [{ inputVoltage: { min: 40, nominal: 48, max: 56 }, outputVoltage: 12, outputPower: 300, resonantFrequency: 200e3, bridge: "full", inductanceRatio: 4, gainMargin: 1.15, lightLoadFraction: 0.3, capacitorSeries: "E12", rectifier: "centre-tap", deadTime: 100e-9, switchCapacitance: 300e-12 }]],
    allow: [
      { paths: ["0.deadTime", "0.switchCapacitance"], kinds: ["zero", "undefined"], reason: "optional, domain ≥ 0 (zero dead time or capacitance is a valid ideal case)" },
      { paths: ["0.inductanceRatio", "0.gainMargin", "0.lightLoadFraction"], kinds: ["undefined"], reason: "optional with documented defaults (6, 1.1, 0.2)" },
    ],
  },
  seriesResonantOperatingPoint: {
    args: () => [{ bridge: "full", inputVoltage: 48, turnsRatio: 2, resonantInductance: 20e-6, resonantCapacitance: 100e-9, switchingFrequency: 130e3, loadResistance: 6 }],
    nonFinite: { inductanceRatio: "no magnetising branch: L_m/L_r is infinite by definition (documented)" },
  },
  parallelResonantOperatingPoint: {
    args: () => [{ bridge: "half", inputVoltage: 400, turnsRatio: 4, resonantInductance: 100e-6, parallelCapacitance: 25e-9, switchingFrequency: 110e3, loadResistance: 12 }],
  },
  lccOperatingPoint: {
    args: () => [{ bridge: "half", inputVoltage: 400, turnsRatio: 4, resonantInductance: 100e-6, seriesCapacitance: 25e-9, parallelCapacitance: 25e-9, switchingFrequency: 150e3, loadResistance: 12 }],
  },
  parallelResonantOperatingPointCapacitiveFilter: {
    args: () => [{ bridge: "half", inputVoltage: 400, turnsRatio: 4, resonantInductance: 100e-6, parallelCapacitance: 25e-9, switchingFrequency: 110e3, loadResistance: 12 }],
  },
  lccOperatingPointCapacitiveFilter: {
    args: () => [{ bridge: "half", inputVoltage: 400, turnsRatio: 4, resonantInductance: 100e-6, seriesCapacitance: 25e-9, parallelCapacitance: 25e-9, switchingFrequency: 150e3, loadResistance: 12 }],
  },
  lccFrequencySweep: {
    args: () => [{ bridge: "half", inputVoltage: 400, turnsRatio: 4, resonantInductance: 100e-6, seriesCapacitance: 25e-9, parallelCapacitance: 25e-9, loadResistance: 12, frequencies: [120e3, 150e3, 200e3], outputFilter: "capacitive" }],
    variants: [() => [{ bridge: "full", inputVoltage: 48, turnsRatio: 0.5, resonantInductance: 8e-6, seriesCapacitance: 200e-9, parallelCapacitance: 100e-9, loadResistance: 2, frequencies: new Float64Array([130e3, 140e3]) }]],
    allow: [{ paths: ["0.outputFilter"], kinds: ["undefined"], reason: "optional: the inductive output filter by default" }],
  },
  inductiveLink: {
    args: () => [{ primaryInductance: 24e-6, secondaryInductance: 12e-6, mutualInductance: 4e-6, primaryResistance: 0.1, secondaryResistance: 0.08, frequency: 140e3, compensation: "series-series", loadResistance: 5, sourceVoltage: 10 }],
    variants: [
      () => [{ primaryInductance: 24e-6, secondaryInductance: 12e-6, mutualInductance: 4e-6, primaryResistance: 0.1, secondaryResistance: 0.08, frequency: 140e3, compensation: "parallel-parallel", loadResistance: 5, sourceVoltage: 10, primaryCapacitance: 50e-9, secondaryCapacitance: 100e-9 }],
      () => [{ primaryInductance: 24e-6, secondaryInductance: 12e-6, mutualInductance: 4e-6, primaryResistance: 0.1, secondaryResistance: 0.08, frequency: 140e3, compensation: "double-lcc", loadResistance: 5, sourceVoltage: 10, primaryFilterInductance: 6e-6, secondaryFilterInductance: 4e-6 }],
    ],
    allow: [
      { paths: ["0.primaryResistance", "0.secondaryResistance"], kinds: ["zero"], reason: "lossless coils are allowed (domain ≥ 0)" },
      { paths: ["0.primaryCapacitance", "0.secondaryCapacitance"], kinds: ["undefined"], reason: "optional: sized by the documented rule when absent" },
    ],
  },
  maximumLinkEfficiency: { args: () => [{ couplingCoefficient: 0.2, primaryQuality: 200, secondaryQuality: 150 }] },
  optimalLoadResistance: { args: () => [{ couplingCoefficient: 0.2, primaryQuality: 200, secondaryQuality: 150, secondaryResistance: 0.05 }] },
  tankStresses: { args: () => [SERIES_TANK, { frequency: SERIES_TANK.undampedFrequency, voltageRms: 10 }] },
  tankToleranceAnalysis: {
    // the @example uses 20000 samples; 2000 keep the suite quick and exercise the same code
    args: () => [{ inductance: 10e-6, capacitance: 1e-6, resistance: 0.1, inductanceTolerance: 0.05, capacitanceTolerance: 0.1, samples: 2000, seed: 7 }],
    allow: [
      { paths: ["0.seed", "0.samples"], kinds: ["undefined"], reason: OPTIONAL },
      { paths: ["0.inductanceTolerance", "0.capacitanceTolerance"], kinds: ["zero"], reason: "an exact component (tolerance 0) is in the domain" },
      { paths: ["0.seed"], kinds: ["zero", "negative"], reason: "any integer seeds the generator" },
    ],
  },

  // ---------------------------------------------------------------- workpiece
  bakerFunctions: { args: () => [2.5], allow: [{ paths: ["0"], kinds: ["zero"], reason: "radius / skin depth ≥ 0 (p = 0 at the DC limit)" }] },
  bakerFunctionsAsymptotic: { args: () => [10] },
  coilOverPlate: {
    args: () => [
      {
        coil: { innerRadius: 0.01, outerRadius: 0.03, liftOff: 0.004, length: 0.01, turns: 20 },
        plate: { thickness: 0.003, resistivity: 3e-8, relativePermeability: 1 },
        frequency: 2e4,
      },
    ],
    variants: [
      () => [
        {
          coil: { innerRadius: 0.01, outerRadius: 0.03, liftOff: 0.004, length: 0.01, turns: 20 },
          plate: [
            { thickness: 0.0005, resistivity: 1.7e-8, relativePermeability: 1 },
            { thickness: Infinity, resistivity: 2e-7, relativePermeability: 50 },
          ],
          frequency: 2e4,
        },
      ],
    ],
    allow: [
      { paths: ["0.coil.innerRadius", "0.coil.liftOff"], kinds: ["zero"], reason: "a coil may start at the axis and rest on the plate (≥ 0)" },
      { paths: ["0.plate.thickness", "0.plate.1.thickness"], kinds: ["Infinity"], reason: "Infinity is a half-space (documented)" },
    ],
  },
  coilOverPlateTruncatedRegion: {
    args: () => [
      {
        coil: { innerRadius: 0.01, outerRadius: 0.03, liftOff: 0.004, length: 0.01, turns: 20 },
        plate: { thickness: 0.003, resistivity: 3e-8, relativePermeability: 1 },
        frequency: 2e4,
      },
    ],
    allow: [
      { paths: ["0.coil.innerRadius", "0.coil.liftOff"], kinds: ["zero"], reason: "a coil may start at the axis and rest on the plate (≥ 0)" },
      { paths: ["0.plate.thickness"], kinds: ["Infinity"], reason: "Infinity is a half-space (documented)" },
    ],
  },
  coilEfficiency: {
    args: () => [{ coilResistance: 0.01, reflectedResistance: 0.03 }],
    allow: [
      { paths: ["0.reflectedResistance"], kinds: ["zero"], reason: "an empty coil (no reflected resistance) is in the domain: efficiency 0" },
      { paths: ["0.coilResistance"], kinds: ["zero"], reason: "a lossless coil is in the domain: efficiency 1" },
    ],
  },
  powerInPart: {
    args: () => [{ coilCurrentRms: 200, reflectedResistance: 0.05 }],
    allow: [{ paths: ["0.coilCurrentRms", "0.reflectedResistance"], kinds: ["zero"], reason: "no current or no part: zero power is in the domain" }],
  },
  workCoilImpedance: {
    args: () => [
      {
        coil: { shape: "solenoid", radius: 0.02, length: 0.012, turns: 2, conductor: { kind: "round", diameter: 0.002 }, resistivity: 1.75e-8 },
        frequency: 1e3,
        part: { shape: "bar", radius: 0.01, length: 0.2, resistivity: 2e-7, relativePermeability: 50 },
      },
    ],
    variants: [
      () => [
        {
          coil: { shape: "pancake", innerRadius: 0.01, pitch: 0.004, turns: 2, conductor: { kind: "tube", outerDiameter: 0.003, wallThickness: 0.001 }, resistivity: 1.75e-8 },
          frequency: 1e3,
          part: { shape: "plate", radius: 0.05, thickness: 0.002, gap: 0.003, resistivity: 4e-8, relativePermeability: 1 },
        },
      ],
      () => [
        {
          coil: { shape: "solenoid", radius: 0.02, length: 0.01, turns: 2, conductor: { kind: "strip", width: 0.003, thickness: 0.001 }, resistivity: 1.75e-8 },
          frequency: 1e3,
          part: { shape: "tube", radius: 0.012, innerRadius: 0.01, length: 0.2, resistivity: 7e-7, relativePermeability: 20 },
          refinement: 0.5,
        },
      ],
      () => [
        {
          coil: { shape: "solenoid", radius: 0.02, length: 0.01, turns: 2, conductor: { kind: "litz", strands: 20, strandDiameter: 0.0002 }, resistivity: 1.75e-8 },
          frequency: 1e3,
        },
      ],
    ],
    allow: [
      { paths: ["0.part"], kinds: ["undefined"], reason: OPTIONAL + " (the empty coil)" },
      { paths: ["0.refinement"], kinds: ["undefined"], reason: OPTIONAL },
    ],
  },
  prepareWorkCoil: {
    args: () => [
      {
        coil: { shape: "solenoid", radius: 0.02, length: 0.012, turns: 2, conductor: { kind: "round", diameter: 0.002 }, resistivity: 1.75e-8 },
        frequency: 1e3,
      },
    ],
  },
  workpieceGeometry: {
    args: () => [{ shape: "tube", outerRadius: 0.062, innerRadius: 0.05, length: 0.03 }],
    allow: [{ paths: ["0.innerRadius"], kinds: ["zero"], reason: "a tube with no bore is a bar (inner radius ≥ 0)" }],
  },
  prepareEncirclingCoilOverRod: {
    args: () => [{ coil: { innerRadius: 0.02, outerRadius: 0.025, length: 0.05, turns: 10 }, rod: { radius: 0.015, innerRadius: 0.005 } }],
    allow: [{ paths: ["0.rod.innerRadius"], kinds: ["undefined", "zero"], reason: OPTIONAL + " (a solid rod)" }],
  },
  encirclingCoilOverRod: {
    args: () => [
      {
        coil: { innerRadius: 0.02, outerRadius: 0.025, length: 0.05, turns: 10 },
        rod: { radius: 0.015, resistivity: 3e-8, relativePermeability: 1 },
        frequency: 1e3,
      },
    ],
  },
  barInLongCoil: {
    args: () => [
      {
        coil: { innerRadius: 0.03, length: 0.3, turns: 20 },
        bar: { radius: 0.02, resistivity: 1.2e-6, relativePermeability: 1 },
        frequency: 1e4,
        coilResistance: 0.01,
      },
    ],
    allow: [{ paths: ["0.coilResistance"], kinds: ["undefined", "zero"], reason: OPTIONAL + " (efficiency needs it; ≥ 0)" }],
  },
  tubeInLongCoil: {
    args: () => [
      {
        coil: { innerRadius: 0.035, length: 0.4, turns: 25 },
        tube: { outerRadius: 0.025, innerRadius: 0.022, resistivity: 7.2e-7, relativePermeability: 1 },
        frequency: 2e4,
      },
    ],
    nonFinite: { efficiency: "null when no coilResistance is given (documented)" },
    allow: [{ paths: ["0.tube.innerRadius"], kinds: ["zero"], reason: "bore radius ≥ 0 (0 is a solid bar, documented)" }],
  },
  slabInTangentialField: {
    args: () => [{ thickness: 0.01, resistivity: 3e-8, relativePermeability: 1, frequency: 1e4, fieldStrengthRms: 1e4 }],
    allow: [
      { paths: ["0.fieldStrengthRms"], kinds: ["zero"], reason: "zero field is in the domain (no power)" },
      { paths: ["0.thickness"], kinds: ["Infinity"], reason: "Infinity is a half-space heated from one face (documented)" },
    ],
  },
  layeredCylinderInLongCoil: {
    args: () => [
      {
        coil: { innerRadius: 0.03, length: 0.3, turns: 20 },
        frequency: 1e4,
        radii: [0.018, 0.02],
        resistivities: [6e-7, 1.15e-6],
        relativePermeabilities: [30, 1],
      },
    ],
    variants: [
      () => [
        {
          coil: { innerRadius: 0.03, length: 0.3, turns: 20 },
          frequency: 1e4,
          innerRadius: 0.01,
          radii: [0.018, 0.02],
          resistivities: [6e-7, 1.15e-6],
          relativePermeabilities: [1, 1],
        },
      ],
    ],
    allow: [
      { paths: ["0.innerRadius"], kinds: ["zero", "undefined"], reason: "bore radius ≥ 0, optional (0: a solid cylinder, documented)" },
    ],
  },
  workpieceCouplingAtTemperature: {
    args: () => [
      { material: lowCarbonSteel, temperature: celsius(20), part: { kind: "bar", radius: 0.02, coil: { innerRadius: 0.03, length: 0.3, turns: 20 } }, frequency: 1e4 },
    ],
    variants: [
      () => [
        { material: austeniticStainless, temperature: celsius(20), part: { kind: "tube", outerRadius: 0.025, innerRadius: 0.022, coil: { innerRadius: 0.035, length: 0.4, turns: 25 } }, frequency: 2e4 },
      ],
      () => [
        {
          material: lowCarbonSteel,
          temperature: celsius(20),
          part: { kind: "plate", thickness: 0.003, coil: { innerRadius: 0.01, outerRadius: 0.03, liftOff: 0.004, length: 0.01, turns: 20 } },
          frequency: 2e4,
        },
      ],
    ],
    allow: [
      { paths: ["0.part.innerRadius"], kinds: ["zero"], reason: "bore radius ≥ 0 (0 is a solid bar, documented)" },
      { paths: ["0.part.thickness"], kinds: ["Infinity"], reason: "Infinity is a half-space (documented)" },
      { paths: ["0.part.coil.innerRadius", "0.part.coil.liftOff"], kinds: ["zero"], reason: "a pancake coil may start at the axis and rest on the plate (≥ 0)" },
    ],
  },

  // ---------------------------------------------------------------- thermal
  lumpedHeatUp: {
    args: () => [
      { mass: 0.05, specificHeat: 490, power: 200, surfaceArea: 0.003, convectionCoefficient: 10, emissivity: 0.5, ambientTemperature: 293.15, targetTemperature: 333.15 },
    ],
    allow: [
      { paths: ["0.convectionCoefficient", "0.emissivity"], kinds: ["zero"], reason: "convection and emissivity (0 … 1) are ≥ 0 (documented); with power 0 and no duration the span cannot be chosen (throws, documented)" },
      { paths: ["0.targetTemperature"], kinds: ["undefined"], reason: OPTIONAL + " (no target: timeToTarget null)" },
    ],
    nonFinite: {
      biotNumber: "null when no thermal conductivity or size is known for a Biot check (documented)",
      timeToTarget: "null when no target was given or it is not reached (documented)",
    },
  },
  radialHeatUp: {
    args: () => [
      {
        geometry: "cylinder",
        radius: 0.01,
        length: 0.1,
        power: 1000,
        skinDepth: 0.001,
        density: 7850,
        specificHeat: 480,
        thermalConductivity: 45,
        convectionCoefficient: 10,
        emissivity: 0,
        ambientTemperature: 293.15,
        duration: 10,
      },
    ],
    variants: [
      () => [
        {
          geometry: "slab",
          thickness: 0.01,
          faceArea: 0.01,
          power: 1000,
          skinDepth: 0.001,
          density: 7850,
          specificHeat: 480,
          thermalConductivity: 45,
          convectionCoefficient: 10,
          emissivity: 0,
          ambientTemperature: 293.15,
          duration: 10,
        },
      ],
    ],
    allow: [
      { paths: ["0.convectionCoefficient", "0.emissivity", "0.power"], kinds: ["zero"], reason: "convection, emissivity (0 … 1) and power are ≥ 0 (documented)" },
      { paths: ["0.skinDepth"], kinds: ["undefined"], reason: OPTIONAL + " (surface heating)" },
    ],
    nonFinite: RADIAL_NULLS,
  },
  steadyStateTemperature: {
    args: () => [{ power: 100, surfaceArea: 0.01, convectionCoefficient: 20, emissivity: 0, ambientTemperature: 293.15 }],
    allow: [{ paths: ["0.emissivity", "0.power"], kinds: ["zero"], reason: "emissivity (0 … 1) and power are ≥ 0 (documented); with emissivity 0 already, zero convection leaves no loss and throws" }],
  },

  // ---------------------------------------------------------------- field
  solveAxisymmetricField: {
    args: () => [
      {
        frequency: 2e4,
        accuracy: 0.1,
        coils: [
          {
            name: "coil",
            current: 10,
            resistivity: 1.75e-8,
            model: "solid",
            turns: [{ kind: "circle", r: 0.02, z: 0.004, radius: 0.002, innerRadius: 0.001 }],
          },
        ],
        regions: [
          {
            name: "plate",
            shape: { kind: "rectangle", rMin: 0, rMax: 0.05, zMin: -0.005, zMax: 0 },
            resistivity: 2e-7,
            relativePermeability: 10,
          },
        ],
      },
    ],
    variants: [
      () => [
        {
          frequency: 5e3,
          accuracy: 0.1,
          coils: [
            {
              name: "block",
              current: 2,
              resistivity: 1.75e-8,
              model: "stranded",
              turns: { shape: { kind: "rectangle", rMin: 0.01, rMax: 0.02, zMin: 0.002, zMax: 0.006 }, count: 12 },
            },
          ],
        },
      ],
      () => [
        {
          frequency: 2e4,
          accuracy: 0.1,
          coils: [{ name: "coil", current: 5, resistivity: 1.75e-8, model: "stranded", turns: { shape: { kind: "rectangle", rMin: 0.012, rMax: 0.014, zMin: -0.004, zMax: 0.004 }, count: 4 } }],
          regions: [
            {
              name: "pin",
              shape: { kind: "rectangle", rMin: 0, rMax: 0.006, zMin: -0.01, zMax: 0.01 },
              resistivity: 2e-7,
              magnetisation: { curve: [{ fieldStrength: 300, fluxDensity: 0.8 }, { fieldStrength: 3000, fluxDensity: 1.5 }, { fieldStrength: 30000, fluxDensity: 1.9 }] },
            },
          ],
        },
      ],
    ],
    allow: [
      { paths: ["0.accuracy", "0.regions", "0.regions.0.resistivity", "0.regions.0.relativePermeability", "0.regions.0.magnetisation", "0.coils.0.turns.0.innerRadius"], kinds: ["undefined"], reason: OPTIONAL },
      { paths: ["0.coils.0.current"], kinds: ["zero"], reason: "an open-circuited coil (zero current) is in the domain" },
      { paths: ["0.coils.0.turns.0.innerRadius", "0.regions.0.shape.rMin", "0.coils.0.turns.shape.rMin"], kinds: ["zero"], reason: "a solid round conductor / a body reaching the axis" },
      {
        paths: ["0.coils.0.turns.0.z", "0.coils.0.turns.shape.zMin", "0.coils.0.turns.shape.zMax", "0.regions.0.shape.zMin", "0.regions.0.shape.zMax"],
        kinds: ["zero", "negative"],
        reason: "axial positions may be any real number",
      },
    ],
  },

  axisymmetricHeatConduction: {
    args: () => [
      {
        shape: { kind: "rectangle", rMin: 0, rMax: 0.02, zMin: 0, zMax: 0.05 },
        material: austeniticStainless,
        cells: { radial: 3, axial: 2 },
        surface: { convectionCoefficient: 10, emissivity: 0.5, ambientTemperature: celsius(20) },
        powerDensity: 1e6,
        duration: 5,
      },
    ],
    allow: [
      { paths: ["0.cells"], kinds: ["undefined"], reason: OPTIONAL },
      { paths: ["0.shape.rMin", "0.powerDensity", "0.surface.convectionCoefficient", "0.surface.emissivity"], kinds: ["zero"], reason: "a part reaching the axis, no heating, no convection or no radiation are in the domain" },
      { paths: ["0.shape.zMin"], kinds: ["zero", "negative"], reason: "axial positions may be any real number" },
    ],
    nonFinite: { targetReachedAt: "null when no target was given or it was not reached (documented)" },
  },
  fieldHeatUp: {
    args: () => [
      {
        frequency: 1e3,
        accuracy: 0.1,
        coils: [
          {
            name: "coil",
            current: 200,
            resistivity: 1.75e-8,
            model: "stranded",
            turns: { shape: { kind: "rectangle", rMin: 0.012, rMax: 0.014, zMin: -0.01, zMax: 0.01 }, count: 5 },
          },
        ],
        part: { name: "slug", shape: { kind: "rectangle", rMin: 0, rMax: 0.008, zMin: -0.008, zMax: 0.008 }, material: austeniticStainless, cells: { radial: 2, axial: 1 } },
        surface: { convectionCoefficient: 10, emissivity: 0.5, ambientTemperature: celsius(20) },
        duration: 1,
        resolveStep: 500,
      },
    ],
    skip: { paths: ["0.part.cells*"], reason: "cell counts set the size of the field problem (up to 400 bodies, minutes per call when scaled up); their checks are tested in test/field/field-heat-up.test.ts" },
    allow: [
      { paths: ["0.accuracy", "0.resolveStep"], kinds: ["undefined"], reason: OPTIONAL },
      { paths: ["0.coils.0.current"], kinds: ["zero"], reason: "a coil without current (no heating) is in the domain" },
      { paths: ["0.part.shape.rMin", "0.surface.convectionCoefficient", "0.surface.emissivity"], kinds: ["zero"], reason: "a part reaching the axis, no convection or no radiation are in the domain" },
      {
        paths: ["0.coils.0.turns.shape.zMin", "0.coils.0.turns.shape.zMax", "0.part.shape.zMin", "0.part.shape.zMax"],
        kinds: ["zero", "negative"],
        reason: "axial positions may be any real number",
      },
    ],
    nonFinite: { targetReachedAt: "null when no target was given or it was not reached (documented)" },
  },

  // ---------------------------------------------------------------- safety
  voltageCaution: {
    args: () => [{ voltage: 230, waveform: "ac", location: "tank" }],
    allow: [{ paths: ["0.voltage"], kinds: ["zero", "negative"], reason: "its magnitude is used (documented)" }],
    nonFinite: { "": "null when there is nothing to caution about (documented)" },
  },
  storedEnergyCaution: {
    args: () => [{ capacitance: 10e-6, voltagePeak: 400 }],
    allow: [{ paths: ["0.voltagePeak"], kinds: ["zero", "negative"], reason: "its magnitude is used (documented)" }],
    nonFinite: { "": "null when there is nothing to caution about (documented)" },
  },
  contactBurnThreshold: { args: () => [60] },
  surfaceTemperatureCaution: { args: () => [{ temperature: celsius(200) }], nonFinite: { "": "null when there is nothing to caution about (documented)" } },
  audibleFrequencyCaution: { args: () => [12000], nonFinite: { "": "null when there is nothing to caution about (documented)" } },
  exposureCaution: {
    args: () => [{ fluxDensityRms: 1e-4, frequency: 30000 }],
    allow: [{ paths: ["0.fluxDensityRms"], kinds: ["zero"], reason: "RMS flux density ≥ 0" }],
    nonFinite: { "": "null when there is nothing to caution about (documented)" },
  },
  safetyCautions: {
    args: () => [{ tankVoltageRms: 180, surfaceTemperature: celsius(250), frequency: 25000 }],
    allow: [
      { paths: ["0.tankVoltageRms", "0.surfaceTemperature", "0.frequency"], kinds: ["undefined"], reason: OPTIONAL + " (each check runs only when its inputs are given)" },
      { paths: ["0.tankVoltageRms"], kinds: ["zero", "negative"], reason: "passed to voltageCaution, which uses the magnitude (documented)" },
    ],
  },
  fieldOnAxis: {
    args: () => [{ coil: [{ radius: 0.05 }], current: 10, axialPosition: 0 }],
    variants: [() => [[{ radius: 0.05 }], 10, 0]],
    allow: [
      { paths: ["0.current", "0.axialPosition", "1", "2"], kinds: ["zero", "negative"], reason: SIGNED + " (current sense, axial position)" },
      { paths: ["0.coil.0.position"], kinds: ["zero", "negative", "undefined"], reason: "a loop's axial position is signed and optional (default 0)" },
      { paths: ["0.coil.0.turns"], kinds: ["undefined"], reason: OPTIONAL + " (1 turn)" },
    ],
  },
  fieldNearCoil: {
    args: () => [{ kind: "solenoid", radius: 0.04, length: 0.08, turns: 10 }, 20, { radialDistance: 0.1, axialPosition: 0 }],
    variants: [
      () => [{ kind: "spiral", innerRadius: 0.01, outerRadius: 0.04, turns: 12, position: 0.005 }, 20, { radialDistance: 0.1, axialPosition: 0.02 }],
      () => [[{ radius: 0.05, position: 0.01, turns: 2 }], 20, { radialDistance: 0.1, axialPosition: 0.02 }],
      () => [{ kind: "flatSpiral", innerEdgeRadius: 0.01, outerEdgeRadius: 0.04, turns: 12, position: 0.005 }, 20, { radialDistance: 0.1, axialPosition: 0.02 }],
      () => [{ kind: "flatSpiral", innerTurnRadius: 0.01, outerTurnRadius: 0.04, turns: 12 }, 20, { radialDistance: 0.1, axialPosition: 0.02 }],
      () => [{ kind: "loop", radius: 0.05, turns: 3, position: -0.01 }, 20, { radialDistance: 0.1, axialPosition: 0.02 }],
    ],
    allow: [
      { paths: ["1", "2.axialPosition"], kinds: ["zero", "negative"], reason: SIGNED + " (current sense, axial position)" },
      { paths: ["2.radialDistance"], kinds: ["zero"], reason: "on the axis is in the domain (radial distance ≥ 0)" },
      { paths: ["0.position", "0.0.position"], kinds: ["zero", "negative", "undefined"], reason: "axial position of a coil or loop is signed and optional (default 0, documented)" },
      { paths: ["0.innerRadius", "0.innerEdgeRadius"], kinds: ["zero"], reason: "a spiral's inner edge is ≥ 0 (documented)" },
      { paths: ["0.0.turns", "0.turns"], kinds: ["undefined"], reason: OPTIONAL + " (1 turn)" },
    ],
  },
  icnirpReferenceLevel: { args: () => [25000, "general-public"] },
  exposureCheck: {
    args: () => [{ fluxDensityRms: 54e-6, frequency: 30000, population: "general-public" }],
    allow: [{ paths: ["0.fluxDensityRms"], kinds: ["zero"], reason: "RMS flux density ≥ 0" }],
  },

  // ---------------------------------------------------------------- study
  HeaterDescriptionError: { kind: "class", args: () => [[new InputError("readHeaterDescription", "coil.turns", 0, "", "an integer ≥ 1")]] },
  readHeaterDescription: {
    args: () => [heater()],
    variants: [() => [loadExample("study-bearing-race.json")], () => [loadExample("study-forging-bar.json")], () => [loadExample("study-plate-warmer.json")]],
    quantityStrings: true,
    badString: "12 parsecs",
    allow: STUDY_ALLOW,
    nonFinite: DESCRIPTION_NULLS,
  },
  studyHeater: {
    // the @example with heatUp on (few grid points, to test heatUpPoints) and the slow scans off
    args: () => [heater(), { heatUp: true, heatUpPoints: 4, temperatureScan: false, impedanceSweep: false }],
    quantityStrings: true,
    badString: "12 parsecs",
    allow: [
      ...STUDY_ALLOW,
      { paths: ["1", "1.heatUpPoints"], kinds: ["undefined"], reason: OPTIONAL },
    ],
    nonFinite: {
      ...Object.fromEntries(Object.entries(DESCRIPTION_NULLS).map(([k, v]) => [`description.${k}`, v])),
      "emptyCoil.partSkinDepth": "null for the empty coil: there is no part (documented)",
      "emptyCoil.zeroVoltageSwitching": "null for a current-fed inverter: not applicable (documented)",
      "operating.zeroVoltageSwitching": "null for a current-fed inverter: not applicable (documented)",
      "atTarget.zeroVoltageSwitching": "null for a current-fed inverter: not applicable (documented)",
      "heatUp.points[].zeroVoltageSwitching": "null for a current-fed inverter: not applicable (documented)",
      "heatUp.curieCrossingTime": "null when the part does not cross its Curie point (120 °C target, documented)",
      "heatUp.radial": "null for parts other than bars and tubes in a solenoid (a ring here, documented)",
      temperatureScan: "null when not asked for (documented)",
      impedance: "null when not asked for (documented)",
      field: "null with the closed-form model (documented)",
    },
  },
  inductionRadialHeatUp: {
    args: () => [
      {
        part: { shape: "bar", radius: 0.015 },
        material: lowCarbonSteel,
        coil: { innerRadius: 0.025, length: 0.2, turns: 40 },
        frequency: 1e4,
        coilCurrentRms: 600,
        convectionCoefficient: 10,
        emissivity: 0.8,
        ambientTemperature: celsius(20),
        duration: 1,
        cells: 8,
      },
    ],
    variants: [
      () => [
        {
          part: { shape: "tube", radius: 0.015, innerRadius: 0.01 },
          material: austeniticStainless,
          coil: { innerRadius: 0.025, length: 0.2, turns: 40 },
          frequency: 1e4,
          power: 5000,
          convectionCoefficient: 10,
          emissivity: 0.8,
          ambientTemperature: celsius(20),
          duration: 1,
          targetTemperature: celsius(100),
          targetLocation: "core",
          soakBand: 5,
          hardeningTemperature: celsius(60),
          cells: 8,
        },
      ],
    ],
    allow: [
      { paths: ["0.convectionCoefficient", "0.emissivity", "0.coilCurrentRms", "0.power"], kinds: ["zero"], reason: "convection, emissivity (0 … 1), current and power are ≥ 0 (documented)" },
      { paths: ["0.part.innerRadius"], kinds: ["zero"], reason: "bore radius ≥ 0 (documented)" },
      { paths: ["0.soakBand", "0.hardeningTemperature", "0.targetTemperature", "0.cells"], kinds: ["undefined"], reason: OPTIONAL },
    ],
    nonFinite: RADIAL_NULLS,
  },
  sweepHeater: {
    args: () => [heater(), { field: "coil.turns", values: [5, 6], heatUp: false }],
    skip: { paths: ["0.*"], reason: "the description goes through the same reader as studyHeater, checked there" },
    allow: [
      { paths: ["1.values.*"], kinds: ["NaN", "Infinity", "-Infinity", "string", "zero", "negative"], reason: "a value the study rejects is reported in its row's `problem` (documented), not thrown" },
      { paths: ["1.heatUp"], kinds: ["undefined"], reason: OPTIONAL },
    ],
    nonFinite: {
      "rows[].value": "echoes the swept value as given, also a rejected one (its row carries the problem)",
      "rows[].summary": "null for a row whose value was rejected (documented)",
      "rows[].summary.timeToTarget": "null when the heat-up is not run (heatUp: false)",
      "rows[].problem": "null when the row's study succeeded (documented)",
    },
    quantityStrings: true,
    badString: "12 parsecs",
  },
  sweepHeaterStream: {
    args: () => [heater(), { field: "coil.turns", values: [5, 6], heatUp: false }, { workers: 0, shard: { index: 1, count: 2 } }],
    skip: { paths: ["0.*"], reason: "the description goes through the same reader as studyHeater, checked there" },
    allow: [
      { paths: ["1.values.*"], kinds: ["NaN", "Infinity", "-Infinity", "string", "zero", "negative"], reason: "a value the study rejects is reported in its row's `problem` (documented), not thrown" },
      { paths: ["1.heatUp", "2.shard"], kinds: ["undefined"], reason: OPTIONAL },
      { paths: ["2.workers"], kinds: ["zero"], reason: "workers: 0 runs on the calling thread (documented)" },
    ],
    quantityStrings: true,
    badString: "12 parsecs",
  },
  optimiseHeater: {
    args: () => [heater(), { targetPower: "1 kW", limits: { minFrequency: "20 kHz" }, keep: 3 }, {}],
    skip: { paths: ["0.*"], reason: "the description goes through the same reader as studyHeater, checked there" },
    allow: [
      { paths: ["1.limits", "1.limits.minFrequency", "1.keep", "2"], kinds: ["undefined"], reason: OPTIONAL },
    ],
    nonFinite: {
      "best[].switchingFrequency": "null unless the inverter runs at a fixed frequency (documented)",
      "best[].summary.timeToTarget": "null for a power goal: no heat-up is run (documented)",
    },
    quantityStrings: true,
    badString: "12 parsecs",
  },

  optimiseHeaterShard: {
    args: () => [heater(), { targetPower: "1 kW", limits: { minFrequency: "20 kHz" }, keep: 3 }, { shard: { index: 1, count: 2 } }],
    skip: { paths: ["0.*"], reason: "the description goes through the same reader as studyHeater, checked there" },
    allow: [{ paths: ["1.limits", "1.limits.minFrequency", "1.keep"], kinds: ["undefined"], reason: OPTIONAL }],
    nonFinite: {
      "finalists[].switchingFrequency": "null unless the inverter runs at a fixed frequency (documented)",
      "finalists[].timeToTarget": "null for a power goal: no heat-up is run (documented)",
      "finalists[].summary.timeToTarget": "null for a power goal: no heat-up is run (documented)",
    },
    quantityStrings: true,
    badString: "12 parsecs",
  },
  mergeHeaterOptimisationShards: {
    args: () => {
      const goal = { targetPower: "1 kW", keep: 2 };
      return [[1, 2].map((index) => api.optimiseHeaterShard(heater() as never, goal, { shard: { index, count: 2 } }))];
    },
    skip: { paths: ["0.*"], reason: "shard outputs are data written by optimiseHeaterShard: their identity fields are checked (tested in optimise-shards.test.ts), their numbers passed through" },
    nonFinite: {
      "best[].switchingFrequency": "null unless the inverter runs at a fixed frequency (documented)",
      "best[].summary.timeToTarget": "null for a power goal: no heat-up is run (documented)",
    },
  },

  // ---------------------------------------------------------------- cores
  effectiveCoreParameters: { args: () => [{ sections: [{ length: 0.04, area: 1e-4 }, { length: 0.02, area: 2e-4 }] }] },
  toroidCore: { args: () => [{ innerDiameter: 0.02, outerDiameter: 0.04, height: 0.01 }] },
  eCore: { args: () => [{ width: 0.042, height: 0.021, depth: 0.015, windowWidth: 0.03, centreLegWidth: 0.012, windowHeight: 0.015 }] },
  planarECore: {
    args: () => [{ width: 0.043, height: 0.0095, depth: 0.028, windowWidth: 0.035, centreLegWidth: 0.0081, windowHeight: 0.0054, mate: "plate", plateThickness: 0.0041 }],
    variants: [() => [{ width: 0.043, height: 0.0095, depth: 0.028, windowWidth: 0.035, centreLegWidth: 0.0081, windowHeight: 0.0054 }]],
    allow: [{ paths: ["0.mate", "0.plateThickness"], kinds: ["undefined"], reason: OPTIONAL + " (mate E; plate as thick as the yoke)" }],
  },
  roundLegECore: { args: () => [{ width: 0.039, height: 0.02, depth: 0.0128, windowWidth: 0.03, centreLegWidth: 0.0128, windowHeight: 0.0142 }] },
  potCore: {
    args: () => [{ outerDiameter: 0.022, windowOuterDiameter: 0.018, postDiameter: 0.0092, postHoleDiameter: 0.002, height: 0.0058, windowHeight: 0.0036 }],
    allow: [
      { paths: ["0.postHoleDiameter"], kinds: ["undefined", "zero"], reason: OPTIONAL + " (solid post; a hole of 0 is a solid post)" },
    ],
  },
  uCore: { args: () => [{ width: 0.06, height: 0.03, depth: 0.016, legWidth: 0.016, windowHeight: 0.02 }] },
  naturalConvectionCoefficient: {
    args: () => [{ height: 0.71, surfaceTemperature: 505, ambientTemperature: 296, air: { kinematicViscosity: 26.41e-6, thermalConductivity: 0.0338, thermalDiffusivity: 38.3e-6 } }],
    allow: [{ paths: ["0.air"], kinds: ["undefined"], reason: OPTIONAL + " (dry air table)" }],
  },
  gappedInductor: {
    args: () => [{ core: { effectiveArea: 9.7e-5, effectivePathLength: 0.0686, relativePermeability: 2000, gapArea: 9.6e-5, legShape: "round", legWidth: 0.0111, windowHeight: 0.0222, saturationFluxDensity: 0.35 }, turns: 30, gapLength: 0.8e-3, fringing: "muhlethaler", current: 4 }],
    variants: [
      () => [{ core: { effectiveArea: 1e-4, effectivePathLength: 0.08, relativePermeability: 2500, legShape: "rectangular", legWidth: 0.01, legDepth: 0.01, windowHeight: 0.02 }, turns: 20, gapLength: 1e-3, fringing: "muhlethaler" }],
      () => [{ core: { effectiveArea: 1e-4, effectivePathLength: 0.08, relativePermeability: 2500, windowHeight: 0.02 }, turns: 20, gapLength: 1e-3, fringing: "mclyman" }],
      () => [{ core: { effectiveArea: 1e-4, effectivePathLength: 0.08, relativePermeability: 2500 }, turns: 20, gapLength: 1e-3, fringing: "none" }],
    ],
    allow: [
      { paths: ["0.gapLength", "0.current"], kinds: ["zero"], reason: "no gap and no current are in the domain (≥ 0)" },
      { paths: ["0.current", "0.core.gapArea", "0.core.legShape", "0.core.saturationFluxDensity", "0.core.legDepth", "0.core.windowHeight", "0.core.legWidth"], kinds: ["undefined"], reason: OPTIONAL + " (no flux or saturation current; gap area = A_e; rectangular leg); leg and window only needed by the fringing models" },
    ],
    nonFinite: {
      peakFluxDensity: "null without a current (documented)",
      saturationCurrent: "null without a saturation flux density (documented)",
    },
  },
  gapLengthForInductance: {
    args: () => [{ core: { effectiveArea: 9.7e-5, effectivePathLength: 0.0686, relativePermeability: 2000, legShape: "round", legWidth: 0.0111, windowHeight: 0.0222 }, turns: 30, inductance: 150e-6, fringing: "muhlethaler" }],
    allow: [
      { paths: ["0.core.legShape"], kinds: ["undefined"], reason: OPTIONAL + " (rectangular: then legDepth is needed and its absence throws)" },
    ],
  },
  inductorDesign: {
    args: () => [{
      inductance: 100e-6, frequency: 100e3, material: inventedExampleFerrite, ambientTemperature: 313.15, maxFluxDensityRatio: 0.7,
      core: eCore({ width: 0.042, height: 0.021, depth: 0.015, windowWidth: 0.03, centreLegWidth: 0.012, windowHeight: 0.015 }),
      current: { kind: "triangular", average: 5, ripple: 2, dutyCycle: 0.4 },
      conductor: { kind: "litz", strands: 105, strandDiameter: 0.1e-3, outerDiameter: 1.4e-3 },
    }],
    variants: [
      () => [{
        inductance: 100e-6, frequency: 100e3, material: inventedExampleFerrite, ambientTemperature: 313.15,
        core: eCore({ width: 0.042, height: 0.021, depth: 0.015, windowWidth: 0.03, centreLegWidth: 0.012, windowHeight: 0.015 }),
        current: { kind: "samples", time: [0, 4e-6, 1e-5], current: [4, 6, 4] },
        conductor: { kind: "round", diameter: 1e-3 },
      }],
      () => [{
        inductance: 100e-6, frequency: 100e3, material: inventedExampleFerrite, ambientTemperature: 313.15,
        core: eCore({ width: 0.042, height: 0.021, depth: 0.015, windowWidth: 0.03, centreLegWidth: 0.012, windowHeight: 0.015 }),
        current: { kind: "triangular", average: 5, ripple: 2, dutyCycle: 0.4 },
        conductor: { kind: "foil", thickness: 0.1e-3 },
      }],
    ],
    skip: { paths: ["0.material*"], reason: "a material record passed through (checked by the materials suite)" },
    allow: [
      { paths: ["0.current.average"], kinds: ["zero", "negative"], reason: SIGNED + " (the DC level of the current)" },
      { paths: ["0.current.ripple", "0.windingClearance", "0.conductor.insulationThickness"], kinds: ["zero"], reason: "no ripple, a winding on the leg and no interlayer insulation are in the domain (≥ 0)" },
      { paths: ["0.maxFluxDensityRatio", "0.turns", "0.fringing", "0.maxWindowFill", "0.windingClearance", "0.emissivity", "0.maxSurfaceTemperature", "0.conductor.outerDiameter", "0.conductor.resistivity", "0.conductor.insulationThickness"], kinds: ["undefined"], reason: OPTIONAL },
      { paths: ["0.emissivity"], kinds: ["zero"], reason: "a non-radiating surface is in the domain (0 … 1)" },
      { paths: ["0.current.current.0", "0.current.time.1", "0.current.current.1"], kinds: ["zero", "negative"], reason: SIGNED + " (a sample of the current, or an interior time keeping the order)" },
      { paths: ["0.current.time.0"], kinds: ["zero"], reason: "the first time is 0 by definition" },
      { paths: ["0.core.c1", "0.core.c2", "0.core.minimumArea"], kinds: ["undefined"], reason: OPTIONAL + " (core constants not used; narrowest section = A_e)" },
    ],
  },
  inductorCoreSearch: {
    args: () => [{
      specification: {
        inductance: 100e-6, frequency: 100e3, material: inventedExampleFerrite, ambientTemperature: 313.15, maxFluxDensityRatio: 0.7,
        current: { kind: "triangular", average: 5, ripple: 2, dutyCycle: 0.4 },
        conductor: { kind: "litz", strands: 105, strandDiameter: 0.1e-3, outerDiameter: 1.4e-3 },
      },
      cores: [{ name: "large", core: eCore({ width: 0.042, height: 0.021, depth: 0.015, windowWidth: 0.03, centreLegWidth: 0.012, windowHeight: 0.015 }) }],
    }],
    skip: { paths: ["0.specification*", "0.cores.0.core*"], reason: "each candidate goes through inductorDesign, checked there; a bad specification rejects the candidate with the reason (documented)" },
    allow: [
      { paths: ["0.rankBy", "0.maxTemperatureRise"], kinds: ["undefined"], reason: OPTIONAL },
    ],
  },
  inductorTurnsSweep: {
    args: () => [{
      design: {
        inductance: 100e-6, frequency: 100e3, material: inventedExampleFerrite, ambientTemperature: 313.15, maxFluxDensityRatio: 0.7,
        core: eCore({ width: 0.042, height: 0.021, depth: 0.015, windowWidth: 0.03, centreLegWidth: 0.012, windowHeight: 0.015 }),
        current: { kind: "triangular", average: 5, ripple: 2, dutyCycle: 0.4 },
        conductor: { kind: "litz", strands: 105, strandDiameter: 0.1e-3, outerDiameter: 1.4e-3 },
      },
      minTurns: 10,
      maxTurns: 16,
    }],
    skip: { paths: ["0.design*"], reason: "the specification goes through inductorDesign, checked there" },
    allow: [
      { paths: ["0.minTurns", "0.maxTurns"], kinds: ["undefined"], reason: OPTIONAL + " (half and three times the design's turns)" },
    ],
    nonFinite: { leastLoss: "null when no swept turn count is usable (documented)" },
  },
  componentTemperatureRise: {
    args: () => [{ power: 2, ambientTemperature: 313.15, surfaceArea: 0.006, height: 0.03, emissivity: 0.9 }],
    variants: [() => [{ power: 2, ambientTemperature: 313.15, thermalResistance: 20 }]],
    allow: [
      { paths: ["0.power", "0.emissivity"], kinds: ["zero"], reason: "no loss and a non-radiating surface are in the domain (≥ 0)" },
      { paths: ["0.emissivity", "0.air"], kinds: ["undefined"], reason: OPTIONAL + " (emissivity 0.9, dry air table)" },
    ],
    nonFinite: {
      convectionCoefficient: "null when a thermal resistance replaces the surface model (documented)",
      convectedPower: "null when a thermal resistance replaces the surface model (documented)",
      radiatedPower: "null when a thermal resistance replaces the surface model (documented)",
    },
  },
  leakageInductance: {
    args: () => [{ turns: 20, meanTurnLength: 0.07, windowBreadth: 0.02, layers: [{ winding: 0, thickness: 0.5e-3 }, { winding: 0, thickness: 0.5e-3 }, { winding: 1, thickness: 1e-3 }], spacers: [0.05e-3, 0.2e-3] }],
    variants: [() => [{ turns: 15, meanTurnLength: 0.05, windowBreadth: 0.01, layers: [{ winding: 0, thickness: 0.3e-3, turns: 10 }, { winding: 1, thickness: 0.2e-3, turns: 2 }, { winding: 0, thickness: 0.3e-3, turns: 5 }], spacers: [0.1e-3, 0.1e-3] }]],
    allow: [
      { paths: ["0.spacers.*"], kinds: ["zero"], reason: "touching layers (no gap) are in the domain (≥ 0)" },
      { paths: ["0.layers.*"], kinds: ["zero"], reason: "winding 0 is the primary: zero is a valid winding index" },
      { paths: ["0.layers.*"], kinds: ["undefined"], reason: OPTIONAL + " (equal shares when no layer of the winding gives turns)" },
    ],
  },
  transformerWindingResistance: {
    args: () => [{ frequency: 100e3, resistivity: 1.72e-8, windowBreadth: 8e-3, meanTurnLength: 0.05,
      layers: [{ winding: 0, turns: 8, conductor: { kind: "round", diameter: 0.4e-3, outerDiameter: 0.45e-3 } }, { winding: 1, turns: 1, conductor: { kind: "foil", thickness: 0.1e-3, width: 7e-3 } },
        { winding: 1, turns: 1, conductor: { kind: "litz", construction: { strands: 20, strandDiameter: 0.1e-3 } } }, { winding: 0, turns: 8, conductor: { kind: "round", diameter: 0.4e-3 }, meanTurnLength: 0.06 }],
      spacers: [0.1e-3, 0.03e-3, 0.1e-3] }],
    allow: [
      { paths: ["0.spacers.*"], kinds: ["zero"], reason: "touching layers (no gap) are in the domain (≥ 0)" },
      { paths: ["0.layers.*"], kinds: ["zero"], reason: "winding 0 is the primary: zero is a valid winding index" },
      { paths: ["0.layers.*"], kinds: ["undefined"], reason: OPTIONAL + " (outer diameter = bare, foil as wide as the window, stack turn length, litz defaults)" },
    ],
  },
  transformerTurns: { args: () => [{ voltSeconds: 200 * 2.5e-6, maxFluxDensity: 0.1, effectiveArea: 1e-4 }] },
  transformerFluxOptimum: {
    args: () => [{ voltSeconds: 200 * 2.5e-6, frequency: 200e3, effectiveArea: 1e-4, effectiveVolume: 5e-6, windowArea: 1e-4, meanTurnLength: 0.06, fillFactor: 0.3, resistivity: 2.2e-8, totalCurrentRms: 6, coreLoss: { k: 3, alpha: 1.4, beta: 2.6 }, acFactor: 1.2, maxFluxDensity: 0.2 }],
    allow: [{ paths: ["0.acFactor", "0.maxFluxDensity"], kinds: ["undefined"], reason: OPTIONAL + " (AC factor 1, no flux limit)" }],
  },
  windowFill: {
    args: () => [{ windowArea: 1e-4, windings: [{ turns: 20, copperArea: 0.5e-6, conductorArea: 0.8e-6 }, { turns: 5, copperArea: 2e-6 }] }],
    allow: [{ paths: ["0.windings.*"], kinds: ["undefined"], reason: OPTIONAL + " (conductor area = copper area)" }],
  },
  transformerDesign: {
    args: () => [{ frequency: 200e3, voltSeconds: 200 * 2.5e-6, primaryCurrentRms: 2, turnsRatio: 8,
      core: { effectiveArea: 1e-4, effectiveVolume: 5e-6, windowHeight: 12e-3, windowWidth: 5e-3, meanTurnLength: 0.06 },
      coreLoss: { k: 3, alpha: 1.4, beta: 2.6 }, maxFluxDensity: 0.15,
      primary: { conductor: { kind: "litz", construction: { strands: 60, strandDiameter: 0.08e-3 } } },
      secondary: { conductor: { kind: "foil", thickness: 0.2e-3, width: 11e-3 } },
      sections: [0, 1, 0], layerInsulation: 0.05e-3, sectionInsulation: 0.2e-3,
      resistivity: 2.2e-8, ambientTemperature: 313.15, thermal: { thermalResistance: 20 } }],
    variants: [() => [{ frequency: 200e3, voltSeconds: 200 * 2.5e-6, voltageWaveform: "sinusoidal", primaryCurrentRms: 2, secondaryCurrentRms: 15, turnsRatio: 8, turns: { primary: 24, secondary: 3 },
      core: { effectiveArea: 1e-4, effectiveVolume: 5e-6, windowHeight: 12e-3, windowWidth: 5e-3, meanTurnLength: 0.06 },
      coreLoss: { k: 3, alpha: 1.4, beta: 2.6 }, maxFluxDensity: 0.15,
      primary: { conductor: { kind: "round", diameter: 0.3e-3 } }, secondary: { conductor: { kind: "foil", thickness: 0.2e-3 } },
      resistivity: 2.2e-8, ambientTemperature: 313.15, thermal: { surfaceArea: 0.004, height: 0.03 } }]],
    allow: [
      { paths: ["0.layerInsulation", "0.sectionInsulation"], kinds: ["zero", "undefined"], reason: OPTIONAL + " (no insulation, domain ≥ 0)" },
      { paths: ["0.sections", "0.voltageWaveform", "0.secondaryCurrentRms", "0.turns", "0.thermal.*", "0.primary.conductor.*", "0.secondary.conductor.*"], kinds: ["undefined"], reason: OPTIONAL + " (P|S, square wave, balanced current, searched turns, defaults of the parts)" },
      { paths: ["0.sections.*"], kinds: ["zero"], reason: "section 0 is the primary: zero is a valid winding index" },
      { paths: ["0.thermal.emissivity"], kinds: ["zero"], reason: "a non-radiating surface is in the domain (0 … 1)" },
    ],
    nonFinite: {
      "temperature.convectionCoefficient": "null when a thermal resistance replaces the surface model (documented)",
      "temperature.convectedPower": "null when a thermal resistance replaces the surface model (documented)",
      "temperature.radiatedPower": "null when a thermal resistance replaces the surface model (documented)",
      "candidates[].totalLoss": "null for a rejected candidate (documented)",
      "candidates[].rejected": "null for a feasible candidate (documented)",
    },
  },
};
