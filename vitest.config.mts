import path from "node:path";
import { defineConfig } from "vitest/config";

const alias = { "@": path.resolve(import.meta.dirname, ".") };

// Three suites: unit (pure, no services), integration (real PostgreSQL, route handlers in-process),
// e2e (a built app under `next start`, driven by Debian's Chromium).
export default defineConfig({
  resolve: { alias },
  test: {
    projects: [
      { resolve: { alias }, test: { name: "unit", include: ["tests/unit/**/*.test.ts"], environment: "node" } },
      {
        resolve: { alias },
        test: {
          name: "integration",
          include: ["tests/integration/**/*.test.ts"],
          globalSetup: ["tests/helpers/global-db.ts", "tests/helpers/global-smtp.ts"],
          setupFiles: ["tests/helpers/integration-env.ts"],
          fileParallelism: false,
          hookTimeout: 60_000,
          testTimeout: 30_000,
        },
      },
      {
        resolve: { alias },
        test: {
          name: "e2e",
          include: ["tests/e2e/**/*.test.ts"],
          globalSetup: ["tests/helpers/global-db.ts", "tests/helpers/global-smtp.ts", "tests/helpers/global-app.ts"],
          setupFiles: ["tests/helpers/integration-env.ts"],
          fileParallelism: false,
          hookTimeout: 120_000,
          testTimeout: 60_000,
        },
      },
    ],
  },
});
