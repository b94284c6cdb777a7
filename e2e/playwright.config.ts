import { defineConfig } from "@playwright/test";
import { CHROMIUM_FLAGS, findChromium } from "./findChromium.ts";

// Overridable so that two checkouts (or two people) can run the suite side by side.
const PORT = Number(process.env.E2E_PORT ?? 4179);
const OUT_DIR = process.env.E2E_OUTDIR ?? "dist";

export default defineConfig({
  testDir: ".",
  testMatch: /.*\.e2e\.ts/,
  outputDir: "../test-results",
  timeout: 60_000,
  retries: 0,
  workers: 1,
  reporter: [["list"]],
  use: {
    baseURL: `http://127.0.0.1:${PORT}`,
    viewport: { width: 1280, height: 800 },
    launchOptions: { executablePath: findChromium(), args: CHROMIUM_FLAGS },
  },
  webServer: {
    command: `npx vite preview --host 127.0.0.1 --port ${PORT} --strictPort --outDir ${OUT_DIR}`,
    url: `http://127.0.0.1:${PORT}`,
    cwd: "..",
    reuseExistingServer: false,
    timeout: 60_000,
  },
});
