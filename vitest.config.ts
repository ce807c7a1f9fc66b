import { defineConfig } from "vitest/config";
import path from "node:path";

const alias = { "@": path.resolve(import.meta.dirname) };

// Two projects: "unit" runs api-core on its own; "http" runs against the real built server
// (started once by tests/http/global-setup.ts on a temporary database).
export default defineConfig({
  resolve: { alias },
  test: {
    reporters: ["default", "./tests/summary-reporter.ts"],
    projects: [
      {
        resolve: { alias },
        test: { name: "unit", include: ["tests/**/*.test.ts"], exclude: ["tests/http/**", "tests/browser/**"] },
      },
      {
        resolve: { alias },
        test: {
          name: "http",
          include: ["tests/http/**/*.test.ts", "tests/browser/**/*.test.ts"],
          globalSetup: ["tests/http/global-setup.ts"],
          testTimeout: 60_000,
          hookTimeout: 60_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
