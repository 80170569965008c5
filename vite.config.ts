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
    // expect.poll waits for pages and queues; its one-second default is too short for a loaded machine.
    expect: { poll: { timeout: 30_000, interval: 100 } },
    // Every timeout leaves a busy 2-core machine room to spare; no outcome may depend on the machine's speed.
    projects: [
      {
        extends: true,
        test: {
          name: "unit",
          include: ["app/**/*.test.ts", "app/**/*.test.tsx", "db/**/*.test.ts"],
          exclude: ["**/*.heavy.test.ts"],
          environment: "node",
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        extends: true,
        test: {
          // Pure tests on big inputs (100k-row files), kept apart so the unit project stays quick.
          name: "heavy",
          include: ["app/**/*.heavy.test.ts"],
          environment: "node",
          testTimeout: 300_000,
          hookTimeout: 300_000,
        },
      },
      {
        extends: true,
        test: {
          name: "reference",
          include: ["tests/reference/**/*.test.ts"],
          environment: "node",
          testTimeout: 180_000,
          hookTimeout: 180_000,
        },
      },
      {
        extends: true,
        test: {
          name: "integration",
          include: ["tests/integration/**/*.test.ts"],
          environment: "node",
          testTimeout: 240_000,
          hookTimeout: 300_000,
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
          testTimeout: 300_000,
          hookTimeout: 300_000,
          fileParallelism: false,
          globalSetup: ["tests/setup/global-e2e.ts"],
        },
      },
    ],
  },
}));
