/**
 * The validity notes and cautions of a {@link radialHeatUp} run, and its Biot number.
 *
 * @packageDocumentation
 */
import { DEFER_TO_CODES } from "../core/index.js";
import type { Caution, ValidityNote } from "../core/index.js";
import type { ConductiveMaterial } from "../materials/index.js";
import { ZERO_CELSIUS } from "../units/index.js";
import { effectiveCoefficient } from "./surface-loss.js";

/** What the notes are judged on: the input and the end state of a run. */
export interface RadialRunSummary {
  readonly kAt: (t: number) => number;
  readonly hottest: number;
  readonly ambient: number;
  readonly convection: number;
  readonly emissivity: number;
  readonly span: number;
  readonly size: number;
  readonly x: Float64Array;
  readonly n: number;
  readonly skinDepth: number;
  readonly material: ConductiveMaterial | undefined;
  readonly initial: number;
  /** Final temperatures as offsets from `initial`. */
  readonly T: Float64Array;
  /** Highest absolute temperature of each node over the run. */
  readonly peak: Float64Array;
  readonly surfaceTemperatures: readonly number[];
  readonly coreTemperatures: readonly number[];
}

/** The Biot number at the hottest surface temperature, the validity notes and the cautions of a run. */
export function radialRunNotes(run: RadialRunSummary): { biotNumber: number; validity: ValidityNote[]; cautions: Caution[] } {
  const { kAt, hottest, ambient, convection, emissivity, span, size, x, n, skinDepth, material, initial, T, peak, surfaceTemperatures, coreTemperatures } = run;
  const kSurface = kAt(hottest);
  const biotNumber = (effectiveCoefficient(hottest, ambient, convection, emissivity) * span) / kSurface;
  const validity: ValidityNote[] = [];
  const surfaceCell = size - x[n - 1]!;
  if (skinDepth > 0 && surfaceCell > 0.5 * skinDepth) {
    validity.push({
      code: "grid-coarser-than-skin",
      message: `The outer cell (${surfaceCell.toPrecision(3)} m) is wider than half the skin depth: the surface temperature is an average over the outer cell; raise cells for a sharper surface peak.`,
      value: surfaceCell,
      limit: 0.5 * skinDepth,
    });
  }
  if (material !== undefined) {
    let lowest = Infinity;
    let highest = -Infinity;
    for (let i = 0; i <= n; i++) {
      lowest = Math.min(lowest, initial + T[i]!);
      highest = Math.max(highest, peak[i]!);
    }
    for (const v of surfaceTemperatures) lowest = Math.min(lowest, v);
    for (const v of coreTemperatures) lowest = Math.min(lowest, v);
    if (highest > material.temperatureRange.max || lowest < material.temperatureRange.min) {
      validity.push({
        code: "material-data-range",
        message: `Temperatures leave the range of the material data (${material.temperatureRange.min}–${material.temperatureRange.max} K); end values are held there.`,
        value: highest > material.temperatureRange.max ? highest : lowest,
        limit: highest > material.temperatureRange.max ? material.temperatureRange.max : material.temperatureRange.min,
      });
    }
  }

  const cautions: Caution[] = [];
  if (material !== undefined) {
    let highest = -Infinity;
    for (let i = 0; i <= n; i++) highest = Math.max(highest, peak[i]!);
    if (highest >= material.meltingTemperature) {
      cautions.push({
        code: "part-above-melting",
        severity: "danger",
        message:
          `The part reaches ${(highest - ZERO_CELSIUS).toFixed(0)} °C, at or above the melting temperature of ${material.name} (${(material.meltingTemperature - ZERO_CELSIUS).toFixed(0)} °C): molten metal can drip, spatter and burn (the model has no phase change, so the temperatures above melting are not physical). ` +
          `Switch off earlier (stopAt, a temperature-controlled or timed cut-off) or lower the power. ${DEFER_TO_CODES}`,
        value: highest,
        limit: material.meltingTemperature,
        unit: "K",
        source: `the melting temperature of the material (${material.id})`,
      });
    }
  }
  return { biotNumber, validity, cautions };
}
