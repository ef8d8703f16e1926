// A small TypeDoc plugin: renders $…$ and $$…$$ in doc comments to HTML + MathML with KaTeX at
// build time (no script, no CDN in the output), fails the build on a formula KaTeX rejects, and
// copies KaTeX's fonts beside the custom stylesheet.
import { cpSync } from "node:fs";
import { createRequire } from "node:module";
import { dirname, join } from "node:path";
import katex from "katex";
import texmath from "markdown-it-texmath";

const require = createRequire(import.meta.url);
const formulaErrors = [];

const strictKatex = {
  renderToString(tex, options) {
    try {
      return katex.renderToString(tex, { ...options, throwOnError: true });
    } catch (error) {
      formulaErrors.push(`${error instanceof Error ? error.message : String(error)} in: ${tex}`);
      return `<code>${tex}</code>`;
    }
  },
};

/** TypeDoc `markdownItLoader`: adds the TeX rule to TypeDoc's markdown-it parser. */
export function katexMarkdownItLoader(parser) {
  parser.use(texmath, { engine: strictKatex, delimiters: "dollars" });
}

/** TypeDoc plugin entry. */
export function load(app) {
  app.renderer.on("endRender", (event) => {
    for (const message of formulaErrors) app.logger.error(`KaTeX: ${message}`);
    const fonts = join(dirname(require.resolve("katex/package.json")), "dist", "fonts");
    cpSync(fonts, join(event.outputDirectory, "assets", "fonts"), { recursive: true });
  });
}
