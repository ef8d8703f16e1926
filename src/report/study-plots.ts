/**
 * The plots of a heater study report (impedance, heat-up, operating point against part
 * temperature, loss breakdown, field picture), each an SVG string with its caption.
 *
 * @packageDocumentation
 */
import type { HeaterStudy } from "../study/index.js";
import { ZERO_CELSIUS } from "../units/index.js";
import { barChart, lineChart } from "./chart.js";
import type { ChartReferenceLine, ChartSeries } from "./chart.js";
import { requireStudy } from "./checks.js";
import { POWER_DENSITY_DECADES, fieldPictureSvg } from "./field-picture.js";
import { celsiusText, duration, q } from "./format.js";
import { lossEntries } from "./text-report.js";

const toC = (k: number): number => k - ZERO_CELSIUS;
const degrees = (rad: number): number => (rad * 180) / Math.PI;

/**
 * One plot of a study report.
 *
 * @category Reports and charts
 */
export interface StudyPlot {
  /** The plot, an `<svg>` element as text. */
  readonly svg: string;
  /** What it shows, one paragraph. */
  readonly caption: string;
}

/** Tank impedance magnitude and phase against frequency, when the study swept the impedance. */
function impedancePlots(study: HeaterStudy, plots: StudyPlot[]): void {
  const refs: ChartReferenceLine[] = [
    { axis: "x", value: study.emptyCoil.frequency, label: "empty" },
    { axis: "x", value: study.operating.frequency, label: "loaded" },
  ];
  if (study.impedance !== null) {
    const z = study.impedance;
    plots.push({
      svg: lineChart({
        title: "Tank impedance seen by the inverter",
        xLabel: "frequency",
        yLabel: "|Z|",
        xUnit: "Hz",
        yUnit: "Ω",
        xLog: true,
        yLog: true,
        series: [
          { name: "empty coil", x: z.frequencies, y: z.magnitudeEmpty },
          { name: `with part at ${celsiusText(study.operating.partTemperature)}`, x: z.frequencies, y: z.magnitudeLoaded },
        ],
        referenceLines: refs,
        idPrefix: "impedance-magnitude",
      }),
      caption: "Magnitude of the tank impedance against frequency, with the empty coil and with the part in place (its coupling re-evaluated at each frequency). Dashed lines: operating frequencies.",
    });
    plots.push({
      svg: lineChart({
        title: "Tank impedance phase",
        xLabel: "frequency",
        yLabel: "phase",
        xUnit: "Hz",
        yUnit: "°",
        xLog: true,
        series: [
          { name: "empty coil", x: z.frequencies, y: z.phaseEmpty.map(degrees) },
          { name: `with part at ${celsiusText(study.operating.partTemperature)}`, x: z.frequencies, y: z.phaseLoaded.map(degrees) },
        ],
        referenceLines: refs,
        yRange: [-90, 90],
        idPrefix: "impedance-phase",
      }),
      caption: "Phase of the tank impedance (positive: inductive). The self-oscillating inverter runs where the phase crosses zero; a series inverter switches at zero voltage on the inductive side.",
    });
  }
}

/** Part temperature and frequency during the heat-up, and surface and core temperature from the radial model. */
function heatUpPlots(study: HeaterStudy, plots: StudyPlot[], curie: number | null): void {
  if (study.heatUp !== null) {
    const h = study.heatUp;
    const refLines: ChartReferenceLine[] = [{ axis: "y", value: toC(study.description.part.targetTemperature), label: "target" }];
    if (curie !== null) refLines.push({ axis: "y", value: toC(curie), label: "Curie point" });
    plots.push({
      svg: lineChart({
        title: "Heat-up: part temperature and operating frequency",
        xLabel: "time",
        yLabel: "part temperature",
        xUnit: "s",
        yUnit: "°C",
        series: [
          { name: "part temperature", x: h.times, y: h.temperatures.map(toC), markers: false },
          { name: "operating frequency", x: h.times, y: h.frequencies, axis: "secondary", markers: false },
        ],
        secondaryAxis: { label: "frequency", unit: "Hz" },
        referenceLines: refLines,
        idPrefix: "heat-up",
      }),
      caption: `Part temperature (left axis) and operating frequency (right axis) against time, from the electro-thermal heat-up${h.curieCrossingTime === null ? "" : `; the part crosses its Curie point at ${duration(h.curieCrossingTime)}`}.`,
    });
    const r = h.radial;
    if (r !== null) {
      plots.push({
        svg: lineChart({
          title: "Heat-up: surface and core temperature",
          xLabel: "time",
          yLabel: "temperature",
          xUnit: "s",
          yUnit: "°C",
          series: [
            { name: "surface", x: r.times, y: r.surfaceTemperatures.map(toC), markers: false },
            { name: "core", x: r.times, y: r.coreTemperatures.map(toC), markers: false },
            { name: "mean", x: r.times, y: r.meanTemperatures.map(toC), markers: false },
          ],
          referenceLines: refLines,
          idPrefix: "surface-core",
        }),
        caption: `Surface, core and mean temperature against time from the radial model (power by depth from the exact field in the part, re-solved as each shell heats)${r.surfaceCoreDifferenceAtTarget === null ? "" : `; surface − core ${r.surfaceCoreDifferenceAtTarget.toFixed(1)} K when the heating stops`}${r.soakTime === null ? "" : `, within ${(r.soakBand ?? 0).toFixed(0)} K after a ${duration(r.soakTime)} soak`}${r.hardeningDepth === null ? "" : `; heated above the hardening temperature to ${(r.hardeningDepth * 1000).toFixed(2)} mm`}.`,
      });
    }
  }
}

/** Power and frequency against part temperature, one line per solved stretch of the temperature scan. */
function scanPowerPlot(study: HeaterStudy, plots: StudyPlot[], curie: number | null): void {
  if (study.temperatureScan !== null) {
    const s = study.temperatureScan;
    // one segment per solved stretch: no line is drawn across a band without an operating point
    const series: ChartSeries[] = [];
    const bands = s.unsolvedBands;
    const cuts = [-Infinity, ...bands.map((b) => b.from), Infinity];
    for (let k = 0; k + 1 < cuts.length; k++) {
      const lo = k === 0 ? -Infinity : (bands[k - 1]?.to ?? -Infinity);
      const hi = cuts[k + 1] ?? Infinity;
      const idx = s.temperatures.flatMap((t, i) => (t >= lo && t <= hi ? [i] : []));
      if (idx.length === 0) continue;
      const suffix = k === 0 ? "" : ` (above ${celsiusText(lo)})`;
      series.push({ name: `power into part${suffix}`, x: idx.map((i) => toC(s.temperatures[i] ?? 0)), y: idx.map((i) => s.partPowers[i] ?? 0), markers: false });
      series.push({ name: `operating frequency${suffix}`, x: idx.map((i) => toC(s.temperatures[i] ?? 0)), y: idx.map((i) => s.frequencies[i] ?? 0), axis: "secondary", markers: false });
    }
    const scanRefs: ChartReferenceLine[] = curie === null ? [] : [{ axis: "x", value: toC(curie), label: "Curie point" }];
    for (const b of bands) {
      scanRefs.push({ axis: "x", value: toC(b.from), label: "no operating point from" });
      scanRefs.push({ axis: "x", value: toC(b.to), label: "to" });
    }
    plots.push({
      svg: lineChart({
        title: "Operating point against part temperature",
        xLabel: "part temperature",
        yLabel: "power",
        xUnit: "°C",
        yUnit: "W",
        series,
        secondaryAxis: { label: "frequency", unit: "Hz" },
        referenceLines: scanRefs,
        idPrefix: "temperature-scan",
      }),
      caption: `Power into the part (left axis) and operating frequency (right axis) against part temperature, each point a solved operating point; past the Curie point a steel part is no longer magnetic, which shows as a step in both.${bands.length === 0 ? "" : ` The heater has no operating point at ${bands.map((b) => `${celsiusText(b.from)}–${celsiusText(b.to)}`).join(", ")}: no line is drawn there and the heat-up counts no power.`}`,
    });
  }
}

/** Coil current, tank voltage, efficiency and permeability against part temperature. */
function scanStressPlots(study: HeaterStudy, plots: StudyPlot[], curie: number | null): void {
  if (study.temperatureScan !== null && study.temperatureScan.temperatures.length > 1) {
    const s = study.temperatureScan;
    const t = s.temperatures.map(toC);
    const curieLine: ChartReferenceLine[] = curie === null ? [] : [{ axis: "x", value: toC(curie), label: "Curie point" }];
    plots.push({
      svg: lineChart({
        title: "Coil current and tank voltage against part temperature",
        xLabel: "part temperature",
        yLabel: "coil current (RMS)",
        xUnit: "°C",
        yUnit: "A",
        series: [
          { name: "coil current (RMS)", x: t, y: s.coilCurrentsRms, markers: false },
          { name: "tank voltage (peak)", x: t, y: s.tankVoltagesPeak, axis: "secondary", markers: false },
        ],
        secondaryAxis: { label: "tank voltage (peak)", unit: "V" },
        referenceLines: curieLine,
        idPrefix: "current-voltage-scan",
      }),
      caption: "RMS coil current (left axis) and peak tank voltage (right axis) against part temperature: the stresses on the coil, capacitors and switches as the part heats.",
    });
    plots.push({
      svg: lineChart({
        title: "Efficiency and permeability against part temperature",
        xLabel: "part temperature",
        yLabel: "efficiency",
        xUnit: "°C",
        yUnit: "%",
        series: [
          { name: "efficiency (part / input)", x: t, y: s.efficiencies.map((e) => 100 * e), markers: false },
          { name: "relative permeability μr", x: t, y: s.relativePermeabilities, axis: "secondary", markers: false },
        ],
        secondaryAxis: { label: "μr", unit: "" },
        yRange: [0, 100],
        referenceLines: curieLine,
        idPrefix: "efficiency-scan",
      }),
      caption: "Overall efficiency (left axis) and the part's relative permeability used for the coupling (right axis) against part temperature; μr falls to 1 at the Curie point.",
    });
  }
}

/** Where the power goes at the cold operating point. */
function lossPlot(study: HeaterStudy, plots: StudyPlot[]): void {
  const losses = lossEntries(study.operating, study.description.concentrator !== null);
  plots.push({
    svg: barChart({
      title: `Where the power goes (part at ${celsiusText(study.operating.partTemperature)})`,
      valueLabel: "power",
      unit: "W",
      bars: losses.map(([label, value]) => ({ label, value })),
      showShare: true,
    }),
    caption: `Loss breakdown at the cold operating point; the places add up to the input power ${q(study.operating.inputPower, "W")}.`,
  });
}

/** The field picture, when the study computed one. */
function fieldPlot(study: HeaterStudy, plots: StudyPlot[]): void {
  const picture = study.field?.picture ?? null;
  if (picture !== null) {
    plots.push({
      svg: fieldPictureSvg(picture),
      caption: `The field of the coil with the part at ${celsiusText(picture.temperature)} from the field model (solveAxisymmetricField): contours of |B| (RMS) in the r–z half-plane (the axis on the left, geometric levels), and the time-average power density of the eddy currents in the part on a logarithmic colour scale (${POWER_DENSITY_DECADES} decades below its peak), on cells graded into the skin depth. The coil's turns are drawn in copper.`,
    });
  }
}

/**
 * The plots of a study report, as SVG strings with captions: tank impedance magnitude and
 * phase, the heat-up, power and frequency, coil current and tank voltage, efficiency and
 * permeability against part temperature, and where the power goes. Plots whose data the study
 * did not compute (`heatUp`, `temperatureScan`, `impedance` off) are left out.
 *
 * @param study - a result of `studyHeater`
 * @returns the plots, each an `<svg>` string and a one-paragraph caption
 * @throws {@link InputError} when `study` is not a study result
 * @example
 * ```ts
 * import { studyHeater } from "fluxwright";
 * import type { HeaterDescription } from "fluxwright";
 * import { studyPlots } from "fluxwright/report";
 * const design: HeaterDescription = {
 *   supply: { kind: "battery", voltage: "48 V" },
 *   inverter: { kind: "current-fed-parallel", chokeInductance: "100 µH", switchOnResistance: "8 mΩ" },
 *   coil: { shape: "solenoid", radius: "75 mm", length: "48 mm", turns: 6,
 *     conductor: { kind: "tube", outerDiameter: "6 mm", wallThickness: "1 mm" } },
 *   capacitor: { capacitance: "4 µF" },
 *   part: { shape: "ring", material: "lowCarbonSteel", outerRadius: "62 mm", innerRadius: "50 mm",
 *     height: "30 mm", targetTemperature: "120 °C" },
 * };
 * const plots = studyPlots(studyHeater(design, { heatUp: false }));
 * console.log(plots.length, plots[0]?.svg.startsWith("<svg")); // 6 true
 * ```
 * @category Reports and charts
 */
export function studyPlots(study: HeaterStudy): StudyPlot[] {
  requireStudy("studyPlots", study);
  const plots: StudyPlot[] = [];
  impedancePlots(study, plots);
  const curie = study.part.curieTemperature;
  heatUpPlots(study, plots, curie);
  scanPowerPlot(study, plots, curie);
  scanStressPlots(study, plots, curie);
  lossPlot(study, plots);
  fieldPlot(study, plots);
  return plots;
}
