import { defineConfig } from "vitest/config";
import path from "node:path";

// Three projects: pure unit tests (models, parsers), ngspice comparisons
// (need the ngspice binary) and integration tests (need the PostgreSQL,
// SMTP and S3 fakes that scripts/stack.ts starts on the test ports).
export default defineConfig({
  resolve: {
    alias: {
      "@": path.resolve(import.meta.dirname),
      "server-only": path.resolve(import.meta.dirname, "tests/support/server-only-stub.ts"),
    },
  },
  test: {
    projects: [
      {
        extends: true,
        test: {
          name: "unit",
          include: ["tests/unit/**/*.test.ts"],
          environment: "node",
        },
      },
      {
        extends: true,
        test: {
          name: "spice",
          include: ["tests/spice/**/*.test.ts"],
          environment: "node",
          testTimeout: 60_000,
        },
      },
      {
        extends: true,
        test: {
          name: "integration",
          include: ["tests/integration/**/*.test.ts"],
          environment: "node",
          testTimeout: 30_000,
          hookTimeout: 60_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
