import { katexMarkdownItLoader } from "./scripts/typedoc-katex.mjs";

/** @type {Partial<import("typedoc").TypeDocOptions>} */
const config = {
  entryPoints: ["src/index.ts"],
  out: "docs/api",
  name: "fluxwright",
  readme: "none",
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
