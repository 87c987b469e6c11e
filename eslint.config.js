// ESLint flat config: TypeScript (typescript-eslint) and Svelte 5 (eslint-plugin-svelte).
import js from "@eslint/js";
import globals from "globals";
import tseslint from "typescript-eslint";
import svelte from "eslint-plugin-svelte";

export default tseslint.config(
  {
    ignores: [
      "node_modules/",
      "**/dist/",
      "dashboard/dist/",
      ".vitest-out/",
      "tests/e2e/screenshots/",
      "coverage/",
      "**/*.d.ts",
      "**/*.svelte.test.ts.snap",
    ],
  },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  ...svelte.configs["flat/recommended"],
  {
    languageOptions: {
      ecmaVersion: 2023,
      sourceType: "module",
      globals: { ...globals.node, ...globals.browser },
    },
    rules: {
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_" }],
      "@typescript-eslint/consistent-type-imports": ["error", { fixStyle: "inline-type-imports" }],
      // State holds immutable values replaced whole ($state.raw, new Set on every change),
      // so plain Map/Set are intended; the reactive wrappers would hide that contract.
      "svelte/prefer-svelte-reactivity": "off",
    },
  },
  {
    files: ["**/*.svelte", "**/*.svelte.ts"],
    languageOptions: {
      parserOptions: {
        parser: tseslint.parser,
        extraFileExtensions: [".svelte"],
      },
    },
  },
  {
    // The analysis core is typed strictly: no `any`, no default exports.
    files: ["analysis/**/*.ts"],
    rules: {
      "@typescript-eslint/no-explicit-any": "error",
      "no-restricted-syntax": [
        "error",
        { selector: "ExportDefaultDeclaration", message: "analysis/ uses named exports only." },
      ],
    },
  },
  {
    // Elsewhere `any` is discouraged but tolerated at library boundaries.
    files: ["dashboard/**", "cli/**", "bench/**", "tests/**", "scripts/**", "data-demo/**"],
    ignores: ["analysis/**"],
    rules: { "@typescript-eslint/no-explicit-any": "warn" },
  },
);
