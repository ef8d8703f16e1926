/**
 * Plots and self-contained HTML reports of magnetic components: an inductor from
 * `inductorDesign`'s specification (loss against turns, flux density and gap with the optimum
 * marked, temperature rise, the current and flux over a period, where the loss goes) and a
 * transformer from `transformerDesign`'s (loss against flux density with the optimum marked, the
 * MMF diagram across the window, losses by place).
 *
 * The inductor's report is in `inductor-report.ts`, the transformer's in
 * `transformer-report.ts`, the page parts they share in `component-page.ts`.
 *
 * @packageDocumentation
 */
export type { ComponentPlot } from "./component-page.js";
export { inductorPlots, inductorHtmlReport } from "./inductor-report.js";
export { transformerPlots, transformerHtmlReport } from "./transformer-report.js";
