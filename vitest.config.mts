import path from "node:path";
import { defineConfig } from "vitest/config";
import { BaseSequencer, type TestSpecification } from "vitest/node";

/**
 * The accessibility crawl runs first among the files: it must find the demo as seeded (a run waiting for
 * review, a draft certificate), before other end-to-end journeys approve or issue them.
 */
class AccessibilityFirst extends BaseSequencer {
  override async sort(files: TestSpecification[]) {
    const sorted = await super.sort(files);
    const first = sorted.filter((f) => f.moduleId.endsWith("/e2e/accessibility.test.ts"));
    return [...first, ...sorted.filter((f) => !first.includes(f))];
  }
}

// One runner, three projects: `npm test` runs them all; `vitest --project unit` runs one.
const alias = {
  "@": path.resolve(import.meta.dirname),
  // lib/server modules carry the "server-only" marker; outside Next.js it has nothing to guard.
  "server-only": path.resolve(import.meta.dirname, "tests/support/server-only-stub.ts"),
};

export default defineConfig({
  resolve: { alias },
  test: {
    sequence: { sequencer: AccessibilityFirst },
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
