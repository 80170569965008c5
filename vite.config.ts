import { reactRouter } from "@react-router/dev/vite";
import tailwindcss from "@tailwindcss/vite";
import { defineConfig } from "vitest/config";

// One config for the app build and for Vitest; the React Router plugin is left out under Vitest.
const underVitest = Boolean(process.env.VITEST);

export default defineConfig(({ isSsrBuild }) => ({
  plugins: underVitest ? [] : [tailwindcss(), reactRouter()],
  server: { host: "127.0.0.1" },
  // The server build's entry is our HTTP layer (headers, origin check, body limits), which imports React Router's build.
  build: isSsrBuild ? { rollupOptions: { input: "./app/ops/http-app.server.ts" } } : undefined,
  test: {
    setupFiles: ["tests/setup/console-guard.ts"],
    projects: [
      {
        extends: true,
        test: {
          name: "unit",
          include: ["app/**/*.test.ts", "app/**/*.test.tsx", "db/**/*.test.ts"],
          environment: "node",
        },
      },
      {
        extends: true,
        test: {
          name: "reference",
          include: ["tests/reference/**/*.test.ts"],
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
          testTimeout: 60_000,
          hookTimeout: 120_000,
          fileParallelism: false,
          globalSetup: ["tests/setup/global-integration.ts"],
        },
      },
      {
        extends: true,
        test: {
          name: "e2e",
          include: ["tests/e2e/**/*.test.ts"],
          environment: "node",
          testTimeout: 120_000,
          hookTimeout: 180_000,
          fileParallelism: false,
          globalSetup: ["tests/setup/global-e2e.ts"],
        },
      },
    ],
  },
}));
