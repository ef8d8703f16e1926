import { katexMarkdownItLoader } from "./scripts/typedoc-katex.mjs";

/**
 * One page per module, in dependency order (the order a reader meets them: units before the
 * study), each named by the subpath it is imported from (`@module fluxwright/<name>` in its
 * index.ts) and carrying its guide from docs/ (`@document`). The README is the landing page.
 */
const modules = ["core", "units", "special", "materials", "inductance", "conductors", "coreloss", "cores", "transformers", "tank", "converters", "links", "workpiece", "field", "thermal", "safety", "study", "report"];

/** Categories in the order a designer needs them: the study first, special functions last. */
const categoryOrder = [
  "Guide", "Heater study", "Reports and charts", "Tanks", "Networks", "Inverters", "Capacitor banks", "Tolerances", "Workpiece", "Thermal",
  "Cautions", "Exposure", "Field", "Inductance", "Conductors", "Core loss", "Core materials", "Materials",
  "Parsing and formatting", "Conversions", "Unit types", "Constants", "Wire gauges", "Errors", "Validation",
  "Quadrature", "ODE", "Root finding", "Complex arithmetic", "Elliptic integrals", "Kelvin functions", "Bessel functions", "*",
];

/** @type {Partial<import("typedoc").TypeDocOptions>} */
const config = {
  entryPoints: modules.map((m) => `src/${m}/index.ts`),
  out: "docs/api",
  name: "fluxwright",
  readme: "README.md",
  categoryOrder,
  // only the module guides (docs/*.md, attached with @document) have no @category
  defaultCategory: "Guide",
  sortEntryPoints: false,
  sort: ["kind", "instance-first", "alphabetical-ignoring-documents"],
  navigation: { includeCategories: true, includeGroups: false, compactFolders: false },
  searchInComments: true,
  tsconfig: "tsconfig.json",
  excludePrivate: true,
  disableSources: true,
  excludeInternal: true,
  treatWarningsAsErrors: true,
  validation: { notExported: true, invalidLink: true, notDocumented: true },
  categorizeByGroup: false,
  plugin: ["./scripts/typedoc-katex.mjs"],
  customCss: "node_modules/katex/dist/katex.min.css",
  markdownItLoader: katexMarkdownItLoader,
};

export default config;
