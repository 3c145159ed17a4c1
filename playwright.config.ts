import { defineConfig } from "@playwright/test";

const port = Number(process.env.E2E_PORT ?? 3100);
const baseURL = `http://localhost:${port}`;

export default defineConfig({
  testDir: "tests/e2e",
  timeout: 120_000,
  // A page on a busy 2-core machine can take longer than 10 s to hydrate; a real failure still fails, later.
  expect: { timeout: 20_000 },
  fullyParallel: false,
  workers: 1,
  reporter: [["list"]],
  use: {
    baseURL,
    trace: "retain-on-failure",
    launchOptions: {
      executablePath: "/usr/bin/chromium",
      args: ["--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run", "--disable-quic"],
    },
  },
  webServer: {
    command: `node_modules/.bin/next start -p ${port}`,
    url: `${baseURL}/`,
    timeout: 120_000,
    reuseExistingServer: false,
    env: {
      DATABASE_URL: process.env.E2E_DATABASE_URL ?? "",
      NEXTAUTH_URL: baseURL,
      NEXTAUTH_SECRET: "e2e-secret-not-for-production",
      SMTP_URL: `smtp://127.0.0.1:${process.env.SMTP_FAKE_PORT ?? 2525}`,
      BRANCHLINE_MAILBOX_URL: `http://127.0.0.1:${process.env.MAILBOX_PORT ?? 2526}`,
    },
  },
});
