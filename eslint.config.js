import js from "@eslint/js";
import tseslint from "typescript-eslint";
import globals from "globals";
import reactHooks from "eslint-plugin-react-hooks";

const engineMustStayPure =
  "src/engine is a pure computation core (plain data in, plain data out): it must not depend on UI, state, I/O or parsing libraries.";

export default tseslint.config(
  { ignores: ["dist/", "dist-*/", "node_modules/", "e2e-artifacts/", "test-results/", "bench-results/"] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.browser, ...globals.node } },
    rules: {
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_" }],
    },
  },
  {
    files: ["src/ui/**/*.tsx", "src/ui/**/*.ts", "src/state/**/*.ts"],
    plugins: { "react-hooks": reactHooks },
    rules: { ...reactHooks.configs.recommended.rules },
  },
  {
    files: ["src/engine/**/*.ts"],
    rules: {
      "no-restricted-imports": [
        "error",
        {
          paths: ["react", "react-dom", "zustand", "papaparse", "recharts", "idb-keyval", "fs", "node:fs", "path", "node:path"].map(
            (name) => ({ name, message: engineMustStayPure }),
          ),
          patterns: [
            { group: ["**/ui/**", "**/state/**", "**/catalog/**", "**/report/**", "**/cli/**", "**/worker/**", "node:*"], message: engineMustStayPure },
          ],
        },
      ],
    },
  },
  {
    files: ["src/catalog/**/*.ts", "src/report/**/*.ts"],
    rules: {
      "no-restricted-imports": [
        "error",
        {
          paths: ["react", "react-dom", "zustand"].map((name) => ({ name, message: "catalog and report are pure modules shared by the browser, the worker and the CLI." })),
          patterns: [{ group: ["**/ui/**", "**/state/**", "**/cli/**"], message: "catalog and report sit beside the engine and must not depend on the UI, state or CLI." }],
        },
      ],
    },
  },
);
