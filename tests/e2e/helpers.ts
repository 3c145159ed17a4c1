/** What the browser tests share: accounts of our own, a horizon scenario, and waiting for React. */
import { expect, type Browser, type Page } from "@playwright/test";

export const password = "a long enough password";

/** A researcher of our own (the e2e database has no demo data), signed up through the API and in through the sign-in page. */
export async function signedInAs(browser: Browser, name: string, email: string): Promise<Page> {
  const context = await browser.newContext();
  const page = await context.newPage();
  expect((await page.request.post("/api/users", { data: { email, name, password } })).status()).toBe(201);
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: /sign in/i }).first().click();
  await expect(page).toHaveURL(/\/projects/, { timeout: 60_000 });
  return page;
}

/** A lab at five horizon radii from a 10 M☉ black hole (invented): both a far-field and a horizon count. */
export function blackHoleScenario(split: "symmetric" | "one-branch-stays" = "symmetric") {
  return {
    schemaVersion: 1,
    background: { kind: "schwarzschild", massKg: 1.988_409_870_698_051e31 },
    lab: { placement: "areal-radius", arealRadiusMetres: 1.5e5 },
    source: { chargeCoulombs: 1.602_176_634e-17, massKg: 1e-14, labMassKg: null },
    separation: { axis: "radial", split, distanceMetres: 1e-5 },
    protocol: {
      kind: "segments",
      separation: { durationSeconds: 0.05, shape: "minimum-jerk" },
      hold: { durationSeconds: 1 },
      recombination: { durationSeconds: 0.05, shape: "minimum-jerk" },
    },
    display: { theme: "light", showGrid: true },
    numerics: { kinkTimeResolutionSeconds: null },
  };
}

/**
 * Waits until React has hydrated the page's controls: on a loaded machine a click that comes earlier is a plain
 * form submission (a reload that drops what was typed), not the app's own handler.
 */
export async function hydrated(page: Page): Promise<void> {
  await page.waitForFunction(
    () => {
      const control = document.querySelector("main button");
      return control !== null && Object.keys(control).some((key) => key.startsWith("__reactProps"));
    },
    undefined,
    { timeout: 90_000 },
  );
}
