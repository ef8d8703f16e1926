import js from "@eslint/js";
import { defineConfig } from "eslint/config";
import globals from "globals";
import tseslint from "typescript-eslint";

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
  {
    files: ["**/*.{js,mjs,cjs}"],
    extends: [tseslint.configs.disableTypeChecked],
    languageOptions: { globals: globals.node },
  },
);
