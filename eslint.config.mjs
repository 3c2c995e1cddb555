// ESLint: the framework's own flat configs (Next's core-web-vitals rules and
// its TypeScript config, which brings typescript-eslint's recommended rules)
// plus Heatsplit's house plan (eslint/plugin.mjs): imports point down the
// layers, and the server-only marker sits where it belongs. Run by npm test
// (scripts/lib/test-runners.ts, suite "lint").
import { defineConfig, globalIgnores } from "eslint/config";
import nextVitals from "eslint-config-next/core-web-vitals";
import nextTs from "eslint-config-next/typescript";
import heatsplit from "./eslint/plugin.mjs";

export default defineConfig([
  ...nextVitals,
  ...nextTs,
  {
    plugins: { heatsplit },
    rules: {
      "heatsplit/layers": "error",
      "heatsplit/server-only": "error",
      // Unused names are errors, except the ones a signature must name (`_prev`, `_req`).
      "@typescript-eslint/no-unused-vars": ["error", { argsIgnorePattern: "^_", varsIgnorePattern: "^_", caughtErrors: "none" }],
    },
  },
  {
    // Tests read untyped JSON answers and build hostile bodies on purpose.
    files: ["tests/**"],
    rules: { "@typescript-eslint/no-explicit-any": "off" },
  },
  globalIgnores([".next/**", ".next-*/**", ".data/**", "node_modules/**", "next-env.d.ts", "public/**", "docs/**"]),
]);
