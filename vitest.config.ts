import { defineConfig } from "vitest/config";
import { fileURLToPath } from "node:url";

const root = fileURLToPath(new URL(".", import.meta.url));
const shared = {
  resolve: {
    alias: {
      "@/": root,
      // "server-only" throws outside React Server Components; tests import db modules directly.
      "server-only": fileURLToPath(new URL("./tests/support/empty-module.ts", import.meta.url)),
    },
  },
};

export default defineConfig({
  ...shared,
  test: {
    projects: [
      { ...shared, test: { name: "unit", include: ["tests/unit/**/*.test.ts"], environment: "node" } },
      {
        ...shared,
        test: {
          name: "integration",
          include: ["tests/integration/**/*.test.ts"],
          setupFiles: ["tests/support/isolated-database.ts"],
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        ...shared,
        test: {
          name: "e2e",
          include: ["tests/e2e/**/*.test.ts"],
          fileParallelism: false,
          testTimeout: 120_000,
          hookTimeout: 120_000,
        },
      },
    ],
  },
});
