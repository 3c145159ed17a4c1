/**
 * Sessions and sign-in against the production build: a cookie kept from before a sign-out is refused, the
 * development mailbox is only for a site administrator, and the server records sign-in attempts under the
 * socket's address, whatever X-Forwarded-For says.
 */
import { expect, request as playwrightRequest, test } from "@playwright/test";
import pg from "pg";
import { hydrated, password, signedInAs } from "./helpers";

async function query<T>(text: string, values: unknown[]): Promise<T[]> {
  const client = new pg.Client({ connectionString: process.env.E2E_DATABASE_URL });
  await client.connect();
  try {
    return (await client.query(text, values)).rows as T[];
  } finally {
    await client.end();
  }
}

test("a session cookie kept from before signing out is refused by the API with 401", async ({ browser, baseURL }) => {
  const email = `leaver-${Date.now()}@example.test`;
  const page = await signedInAs(browser, "Careful Leaver", email);
  const cookies = await page.context().cookies();
  const session = cookies.find((c) => c.name.endsWith("next-auth.session-token"));
  expect(session).toBeTruthy();
  const kept = await playwrightRequest.newContext({ baseURL, extraHTTPHeaders: { cookie: `${session!.name}=${session!.value}` } });
  expect((await kept.get("/api/account")).status()).toBe(200);

  await hydrated(page);
  await page.getByRole("button", { name: "Sign out" }).click();
  await expect(page.getByRole("link", { name: "Sign in" })).toBeVisible();
  expect((await kept.get("/api/account")).status()).toBe(401);
  await kept.dispose();
  await page.context().close();
});

test("the account page's \"Sign out everywhere\" ends the sessions of other browsers too", async ({ browser, baseURL }) => {
  const email = `everywhere-${Date.now()}@example.test`;
  const page = await signedInAs(browser, "Two Browsers", email);
  // A second browser, signed in as the same person.
  const other = await browser.newContext();
  const otherPage = await other.newPage();
  await otherPage.goto("/sign-in");
  await hydrated(otherPage);
  await otherPage.getByLabel("E-mail").fill(email);
  await otherPage.getByLabel("Password").fill(password);
  await otherPage.getByRole("button", { name: /sign in/i }).first().click();
  await expect(otherPage).toHaveURL(/\/projects/, { timeout: 60_000 });

  await page.goto("/account");
  await hydrated(page);
  await page.getByRole("button", { name: "Sign out everywhere" }).click();
  await expect(page).toHaveURL(/\/sign-in/);
  expect((await otherPage.request.get(`${baseURL}/api/account`)).status()).toBe(401);
  await other.close();
  await page.context().close();
});

test("the development mailbox is 404 signed out and for a member, and shown to a site administrator", async ({ browser, page }) => {
  expect((await page.goto("/dev/mailbox"))!.status()).toBe(404);

  const email = `mail-reader-${Date.now()}@example.test`;
  const member = await signedInAs(browser, "Curious Member", email);
  expect((await member.goto("/dev/mailbox"))!.status()).toBe(404);

  await query("update users set site_role = 'admin' where email = $1", [email]);
  const shown = await member.goto("/dev/mailbox");
  expect(shown!.status()).toBe(200);
  await expect(member.getByRole("heading", { name: "Development mailbox" })).toBeVisible();
  await member.context().close();
});

test("a sign-in attempt is recorded under the socket's address, not a forged X-Forwarded-For", async ({ request }) => {
  const email = `forged-${Date.now()}@example.test`;
  const { csrfToken } = (await (await request.get("/api/auth/csrf")).json()) as { csrfToken: string };
  const answer = await request.post("/api/auth/callback/credentials", {
    form: { csrfToken, email, password: "not the password", json: "true" },
    headers: { "x-forwarded-for": "192.0.2.77" },
  });
  expect(answer.status()).toBeLessThan(500);
  const rows = await query<{ address: string }>("select address from sign_in_attempts where email = $1", [email]);
  expect(rows).toHaveLength(1);
  expect(["127.0.0.1", "::1"]).toContain(rows[0].address);
});

test("a personal API token made on the account page is shown once, works as a Bearer token within its scope, and stops when revoked", async ({ browser, baseURL }) => {
  const email = `notebook-${Date.now()}@example.test`;
  const page = await signedInAs(browser, "Notebook Keeper", email);
  await page.goto("/account");
  await hydrated(page);
  const panel = page.getByRole("region", { name: "API tokens" });
  await panel.getByLabel("Name").fill("e2e notebook");
  await panel.getByLabel("Access").selectOption("read");
  await panel.getByRole("button", { name: "Create token" }).click();
  const shown = panel.getByLabel("New API token");
  await expect(shown).toHaveValue(/^bltok_/);
  const token = await shown.inputValue();
  await expect(panel.getByRole("row", { name: /e2e notebook/ })).toContainText("Read");

  // Over HTTP to the production server, without the cookie: the token reads, and is refused a change.
  const script = await playwrightRequest.newContext({ baseURL, extraHTTPHeaders: { authorization: `Bearer ${token}` } });
  expect((await script.get("/api/projects")).status()).toBe(200);
  expect((await script.post("/api/projects", { data: { name: "From a script" } })).status()).toBe(403);

  // Shown once: after a reload the page no longer holds it.
  await page.reload();
  await hydrated(page);
  await expect(page.getByRole("row", { name: /e2e notebook/ })).toBeVisible();
  expect(await page.content()).not.toContain(token);

  await page.getByRole("button", { name: "Revoke “e2e notebook”" }).click();
  await page.getByRole("button", { name: "Revoke token" }).click();
  await expect(page.getByRole("row", { name: /e2e notebook/ })).toContainText("revoked");
  expect((await script.get("/api/projects")).status()).toBe(401);
  await script.dispose();
  await page.context().close();
});
