// A small TypeDoc plugin: renders $…$ and $$…$$ in doc comments to HTML + MathML with KaTeX at
// build time (no script, no CDN in the output), fails the build on a formula KaTeX rejects, and
// copies KaTeX's fonts beside the custom stylesheet.
import { appendFileSync, cpSync } from "node:fs";
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

/**
 * Layout rules appended to the custom stylesheet: a display formula wider than its column
 * scrolls inside its own box instead of overflowing the column (at 1200 px) or making the whole
 * page scroll sideways (at 390 px).
 */
export const KATEX_LAYOUT_CSS = `
/* fluxwright: display formulas scroll inside their own box */
.katex-display { overflow-x: auto; overflow-y: hidden; max-width: 100%; padding: 0.2em 0; }
.katex-display > .katex { white-space: nowrap; }
.katex { max-width: 100%; }
.tsd-comment, .tsd-panel, .col-content { min-width: 0; overflow-wrap: anywhere; }
`;

/** TypeDoc plugin entry. */
export function load(app) {
  // One page per module: a `{@link InputError}` in another module's comment names a declaration
  // of `fluxwright/core`, which TypeDoc looks for only in the comment's own module. Resolve such
  // names across the modules (each public name is exported by exactly one module).
  app.converter?.addUnknownSymbolResolver?.((ref, reflection) => {
    const path = ref.symbolReference?.path;
    if (ref.moduleSource !== undefined || path === undefined || path.length === 0) return undefined;
    for (const module of reflection.project.children ?? []) {
      const hit = module.getChildByName(path.map((p) => p.path));
      if (hit !== undefined) return { target: hit, caption: path.map((p) => p.path).join(".") };
    }
    return undefined;
  });
  app.renderer.on("endRender", (event) => {
    appendFileSync(join(event.outputDirectory, "assets", "custom.css"), KATEX_LAYOUT_CSS);
    for (const message of formulaErrors) app.logger.error(`KaTeX: ${message}`);
    const fonts = join(dirname(require.resolve("katex/package.json")), "dist", "fonts");
    cpSync(fonts, join(event.outputDirectory, "assets", "fonts"), { recursive: true });
  });
}
