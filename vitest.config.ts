import { defineConfig } from "vitest/config";
import path from "node:path";

const alias = {
  "@": path.resolve(__dirname),
  "server-only": path.resolve(__dirname, "tests/support/empty-module.ts"),
};

export default defineConfig({
  resolve: { alias },
  test: {
    reporters: ["default", "./tests/support/summary-reporter.ts"],
    projects: [
      {
        resolve: { alias },
        test: {
          name: "unit",
          include: ["tests/unit/**/*.test.ts", "tests/unit/**/*.test.tsx"],
          environment: "node",
          setupFiles: ["tests/support/fast-check-setup.ts"],
        },
      },
      {
        resolve: { alias },
        test: {
          name: "integration",
          include: ["tests/integration/**/*.test.ts"],
          environment: "node",
          globalSetup: ["tests/support/db-global-setup.ts"],
          setupFiles: ["tests/support/use-test-db.ts"],
          fileParallelism: false,
          testTimeout: 30000,
          hookTimeout: 60000,
        },
      },
      {
        resolve: { alias },
        test: {
          name: "e2e",
          include: ["tests/e2e/**/*.test.ts"],
          environment: "node",
          globalSetup: ["tests/support/e2e-global-setup.ts"],
          setupFiles: ["tests/support/use-test-db.ts"],
          fileParallelism: false,
          testTimeout: 90000,
          hookTimeout: 180000,
        },
      },
    ],
  },
});
