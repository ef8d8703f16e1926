import { defineConfig } from "tsup";

/** The module folders published as subpaths (`fluxwright/<name>`), besides the root. */
export const modules = [
  "core", "units", "special", "materials", "inductance", "conductors", "coreloss",
  "tank", "workpiece", "thermal", "field", "safety", "converters", "links", "study", "cores",
  "transformers",
] as const;

const entry: Record<string, string> = { index: "src/index.ts" };
for (const m of modules) entry[`${m}/index`] = `src/${m}/index.ts`;

export default defineConfig([
  {
    entry,
    format: ["esm", "cjs"],
    dts: { compilerOptions: { ignoreDeprecations: "6.0" } },
    sourcemap: true,
    clean: true,
    target: "es2022",
    treeshake: true,
    splitting: true,
  },
  {
    entry: { "cli/main": "src/cli/main.ts" },
    format: ["esm"],
    sourcemap: true,
    clean: false,
    target: "es2022",
    platform: "node",
    banner: { js: "#!/usr/bin/env node" },
  },
]);
