import { defineConfig } from "@playwright/test";
import { CHROMIUM_FLAGS, findChromium } from "./findChromium.ts";

const PORT = 4179;

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
    command: `npx vite preview --host 127.0.0.1 --port ${PORT} --strictPort`,
    url: `http://127.0.0.1:${PORT}`,
    cwd: "..",
    reuseExistingServer: false,
    timeout: 60_000,
  },
});
