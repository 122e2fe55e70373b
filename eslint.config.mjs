// Lint rules for the whole project: the recommended JavaScript and TypeScript sets, with the
// project's own habits (no unused code, no stray console output in the core).
import js from "@eslint/js";
import globals from "globals";
import tseslint from "typescript-eslint";

export default tseslint.config(
  { ignores: ["dist/", "node_modules/", ".test-artifacts/", "tests/fixtures/", "examples/"] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.node } },
    rules: {
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_", caughtErrors: "none" }],
      "@typescript-eslint/no-non-null-assertion": "off",
      eqeqeq: ["error", "always"],
      "prefer-const": "error",
    },
  },
  {
    // The core is pure: it reports through its results, never by printing.
    files: ["shared/src/**/*.ts"],
    rules: { "no-console": "error" },
  },
  {
    // The 3D view page runs in the webview, a browser.
    files: ["client/media/**/*.js"],
    languageOptions: { globals: { ...globals.browser, acquireVsCodeApi: "readonly" } },
  },
);
