import path from "node:path";
import { defineConfig } from "vitest/config";

// One runner, three projects: `npm test` runs them all; `vitest --project unit` runs one.
const alias = {
  "@": path.resolve(import.meta.dirname),
  // lib/server modules carry the "server-only" marker; outside Next.js it has nothing to guard.
  "server-only": path.resolve(import.meta.dirname, "tests/support/server-only-stub.ts"),
};

export default defineConfig({
  resolve: { alias },
  test: {
    projects: [
      {
        resolve: { alias },
        test: {
          name: "unit",
          include: ["tests/unit/**/*.test.ts"],
          environment: "node",
        },
      },
      {
        resolve: { alias },
        test: {
          name: "integration",
          include: ["tests/integration/**/*.test.ts"],
          environment: "node",
          globalSetup: ["tests/integration/global-setup.ts"],
          setupFiles: ["tests/integration/setup-env.ts"],
          testTimeout: 30_000,
          hookTimeout: 60_000,
          fileParallelism: false,
        },
      },
      {
        resolve: { alias },
        test: {
          name: "e2e",
          include: ["e2e/**/*.test.ts"],
          environment: "node",
          globalSetup: ["e2e/global-setup.ts"],
          testTimeout: 90_000,
          hookTimeout: 600_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
