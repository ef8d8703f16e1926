/**
 * Reports and charts of heater studies: the text report, the self-contained HTML report with
 * SVG plots, sweep tables (text and CSV), optimisation summaries, and the dependency-free line
 * and bar charts they are drawn with, for apps and notebooks that want the same output as the
 * command line. Every builder returns a string; nothing here does I/O.
 *
 * Import from `fluxwright/report`. (Not re-exported from `fluxwright`: the root holds the
 * formulas and the study; rendering is opt-in.)
 *
 * @module fluxwright/report
 */
export { lineChart, barChart } from "./chart.js";
export type { ChartSeries, ChartReferenceLine, ChartSecondaryAxis, LineChartOptions, ChartBar, BarChartOptions } from "./chart.js";
export { studyPlots, studyHtmlReport } from "./html-report.js";
export type { StudyPlot } from "./html-report.js";
export { studyTextReport, sweepTextReport, sweepCsv, optimisationTextReport } from "./text-report.js";
export { inductorPlots, inductorHtmlReport, transformerPlots, transformerHtmlReport } from "./component-report.js";
export type { ComponentPlot } from "./component-report.js";
