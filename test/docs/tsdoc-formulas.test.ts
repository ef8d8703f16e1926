import { describe, it, expect } from "vitest";
import { mkdtempSync, mkdirSync, readFileSync, readdirSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
// @ts-expect-error -- a plain-JS TypeDoc plugin without type declarations
import { KATEX_LAYOUT_CSS, load } from "../../scripts/typedoc-katex.mjs";

const root = fileURLToPath(new URL("../../", import.meta.url));

function sources(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) => (e.isDirectory() ? sources(join(dir, e.name)) : e.name.endsWith(".ts") ? [join(dir, e.name)] : []));
}

describe("formulas in TSDoc render", () => {
  it("no inline $…$ formula is broken across a comment line (it would render as raw text)", () => {
    const broken: string[] = [];
    for (const file of sources(join(root, "src"))) {
      const lines = readFileSync(file, "utf8").split("\n");
      lines.forEach((line, i) => {
        if (!/^\s*\*/u.test(line) || /\$\$/u.test(line)) return;
        const dollars = (line.replace(/\\\$/gu, "").replace(/`[^`]*`/gu, "").match(/\$/gu) ?? []).length;
        if (dollars % 2 === 1) broken.push(`${file.slice(root.length)}:${i + 1}: ${line.trim()}`);
      });
    }
    expect(broken).toEqual([]);
  });

  it("the docs plugin makes display formulas scroll in their own box (no sideways page scroll at 390 px)", () => {
    const out = mkdtempSync(join(tmpdir(), "fluxwright-docs-"));
    mkdirSync(join(out, "assets"));
    writeFileSync(join(out, "assets", "custom.css"), "/* katex */\n");
    let handler: ((e: { outputDirectory: string }) => void) | undefined;
    (load as (app: unknown) => void)({ renderer: { on: (_: string, h: typeof handler) => (handler = h) }, logger: { error: () => undefined } });
    handler?.({ outputDirectory: out });
    const css = readFileSync(join(out, "assets", "custom.css"), "utf8");
    expect(css).toContain(KATEX_LAYOUT_CSS as string);
    expect(css).toMatch(/\.katex-display \{ overflow-x: auto;/u);
  });
});
