import js from "@eslint/js";
import { defineConfig } from "eslint/config";
import globals from "globals";
import tseslint from "typescript-eslint";

/**
 * Layers of src/, lowest first (DEVELOPERS.md, "Dependencies between modules flow one way"): a
 * module may import from a lower layer, never from its own layer or a higher one. A folder not
 * listed here is not checked (add new modules to their layer).
 */
const LAYERS = [
  ["core"],
  ["units"],
  ["special"],
  ["materials"],
  ["inductance", "conductors", "coreloss"],
  ["tank", "workpiece", "thermal", "safety"],
  ["converters", "links", "field", "cores"],
  ["study"],
  ["report"],
  ["cli"],
];

const layering = LAYERS.flatMap((layer, level) =>
  layer.map((folder) => {
    const forbidden = LAYERS.slice(level).flat().filter((other) => other !== folder);
    return {
      files: [`src/${folder}/**/*.ts`],
      rules: {
        "no-restricted-imports": [
          "error",
          {
            patterns: [
              {
                regex: `^(\\.\\./)+(${forbidden.join("|")})/`,
                message: `src/${folder} may import only from a lower layer (DEVELOPERS.md: core, units, special ← materials ← inductance, conductors, coreloss ← tank, workpiece, thermal, safety ← converters, links, field, cores ← study ← report ← cli).`,
              },
            ],
          },
        ],
      },
    };
  }),
);

export default defineConfig(
  { ignores: ["dist/**", "docs/api/**", "coverage/**", "node_modules/**", ".scratch/**", "browser-check/**", "notebook-out/**"] },
  js.configs.recommended,
  tseslint.configs.strictTypeChecked,
  {
    languageOptions: {
      parserOptions: { projectService: true, tsconfigRootDir: import.meta.dirname },
    },
    rules: {
      "@typescript-eslint/restrict-template-expressions": ["error", { allowNumber: true }],
      "@typescript-eslint/no-unnecessary-condition": "off",
      // Numerical kernels index arrays under noUncheckedIndexedAccess, where `a[i]!` after a
      // bounds-checked loop is the plain statement of an invariant.
      "@typescript-eslint/no-non-null-assertion": "off",
    },
  },
  {
    // Coefficient tables keep the digits of their published source (Gauss–Kronrod nodes,
    // Cephes polynomials); the compiler rounds them to the nearest double, which is intended.
    files: ["src/special/**", "test/special/**"],
    rules: { "no-loss-of-precision": "off" },
  },
  ...layering,
  {
    files: ["**/*.{js,mjs,cjs}"],
    extends: [tseslint.configs.disableTypeChecked],
    languageOptions: { globals: globals.node },
  },
);
