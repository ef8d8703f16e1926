import { defineConfig } from "tsup";

/** The module folders published as subpaths (`fluxwright/<name>`), besides the root. */
export const modules = [
  "core", "units", "special", "materials", "inductance", "conductors", "coreloss",
  "tank", "workpiece", "thermal", "field", "safety", "converters", "links", "study", "report", "cores",
  "transformers",
] as const;

const entry: Record<string, string> = { index: "src/index.ts" };

/**
 * What ships (see DEVELOPERS.md, "What the package ships"): readable, unminified ESM and CJS
 * with `.d.ts` carrying the TSDoc, and no source maps (they pointed at `src/`, which does not
 * ship, and were two thirds of the unpacked size). The command line imports the library's own
 * module entries (`../study/index.js`, …) instead of bundling a second copy of them.
 */
const libraryImportsStayExternal = {
  name: "library-imports-stay-external",
  setup(build: { onResolve: (o: { filter: RegExp }, f: (a: { path: string }) => { path: string; external: boolean }) => void }) {
    // src/cli/*.ts reach the library only through `../<module>/index.js`, which dist/ has too
    build.onResolve({ filter: /^\.\.\/[a-z]+\/index\.js$/ }, (a) => ({ path: a.path, external: true }));
  },
};
for (const m of modules) entry[`${m}/index`] = `src/${m}/index.ts`;

export default defineConfig([
  {
    entry,
    format: ["esm", "cjs"],
    dts: { entry: { ...entry, "study/heater-worker": "src/study/heater-worker.ts" }, compilerOptions: { ignoreDeprecations: "6.0" } },
    sourcemap: false,
    clean: true,
    target: "es2022",
    treeshake: true,
    splitting: true,
    // the worker pool finds its worker script from import.meta.url, which CJS gets from __filename
    shims: true,
  },
  {
    // the worker pool's script (loaded by URL, never imported): one self-contained ESM file that
    // runs as a node:worker_threads worker and as a module Web Worker; published as the subpath
    // `fluxwright/worker` (its empty .d.ts comes from the first block's declaration build, which
    // clears dist's .d.ts files when it starts)
    entry: { "study/heater-worker": "src/study/heater-worker.ts" },
    format: ["esm"],
    sourcemap: false,
    clean: false,
    target: "es2022",
    platform: "neutral",
    splitting: false,
    treeshake: true,
  },
  {
    entry: { "cli/main": "src/cli/main.ts" },
    format: ["esm"],
    sourcemap: false,
    clean: false,
    target: "es2022",
    platform: "node",
    banner: { js: "#!/usr/bin/env node" },
    esbuildPlugins: [libraryImportsStayExternal],
  },
]);
