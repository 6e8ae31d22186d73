import { defineConfig, devices } from "@playwright/test";

const baseURL = process.env.E2E_BASE_URL ?? "http://localhost:3100";
const launchOptions = {
  executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
  args: [
    "--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update",
    "--disable-sync", "--no-first-run", "--disable-quic", "--use-angle=swiftshader", "--enable-unsafe-swiftshader",
  ],
};

export default defineConfig({
  testDir: "tests/e2e",
  timeout: 60_000,
  expect: { timeout: 10_000 },
  workers: 2,
  retries: 0,
  reporter: [["list"], ["json", { outputFile: ".data/reports/playwright.json" }]],
  // The app takes changes only from its own pages; API calls made from a test stand in for those pages and
  // so name the app's origin, as the browser does for the pages' own fetches. Tests of refusals override it.
  use: { baseURL, extraHTTPHeaders: { origin: new URL(baseURL).origin }, trace: "retain-on-failure", screenshot: "only-on-failure" },
  outputDir: ".data/test-results",
  projects: [
    { name: "desktop", use: { ...devices["Desktop Chrome"], launchOptions } },
    { name: "phone", use: { ...devices["Pixel 7"], launchOptions } },
  ],
});
