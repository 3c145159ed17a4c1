import { expect, test, type Page } from "@playwright/test";

const password = "a long enough password";

async function signUp(page: Page, name: string, email: string): Promise<void> {
  await page.goto("/sign-up");
  await page.getByLabel("Name").fill(name);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign up" }).last().click();
  await expect(page).toHaveURL(/\/projects$/);
}

test("a new researcher signs up, creates a project and a scenario, renames it, and signs out", async ({ page, browser }) => {
  const stamp = Date.now();
  await signUp(page, "First Researcher", `first-${stamp}@example.test`);

  await page.getByLabel("Project name").fill("Interferometer budget");
  await page.getByRole("button", { name: "Create project" }).click();
  await expect(page).toHaveURL(/\/projects\/[0-9a-f-]{36}$/);
  await expect(page.getByRole("heading", { name: "Interferometer budget" })).toBeVisible();
  const projectUrl = page.url();

  await page.getByLabel("Title").fill("Slow recombination");
  await page.getByRole("button", { name: "New scenario" }).click();
  await expect(page).toHaveURL(/\/scenarios\/[0-9a-f-]{36}$/);
  await page.goto(projectUrl);
  const table = page.getByRole("table");
  await expect(table.getByRole("link", { name: "Slow recombination" })).toBeVisible();

  await table.getByRole("row", { name: /Slow recombination/ }).getByRole("button", { name: "Rename" }).click();
  await page.getByLabel("New title").fill("Slower recombination");
  await page.getByLabel("New title").press("Enter");
  await expect(table.getByRole("link", { name: "Slower recombination" })).toBeVisible();

  expect((await page.request.get(`${projectUrl}/scenarios/00000000-0000-4000-8000-000000000000`)).status()).toBe(404);
  await page.getByRole("button", { name: "Sign out" }).click();
  await expect(page.getByRole("link", { name: "Sign in" })).toBeVisible();
  const signedOut = await page.request.get(`${projectUrl}/members`, { maxRedirects: 0 });
  expect(signedOut.status()).toBe(307);
  expect(signedOut.headers()["location"]).toContain(`/sign-in?callbackUrl=${encodeURIComponent(new URL(`${projectUrl}/members`).pathname)}`);
  await page.goto(projectUrl);
  await expect(page).toHaveURL(/\/sign-in\?callbackUrl=/);

  // Another researcher must not learn that the project exists.
  const other = await browser.newContext();
  const otherPage = await other.newPage();
  await signUp(otherPage, "Second Researcher", `second-${stamp}@example.test`);
  expect((await otherPage.goto(projectUrl))?.status()).toBe(404);
  await expect(otherPage.getByText(/not found/i).first()).toBeVisible();
  await expect(otherPage.getByText("Interferometer budget")).toHaveCount(0);
  const api = await otherPage.request.get(projectUrl.replace("/projects/", "/api/projects/"));
  expect(api.status()).toBe(404);
  await other.close();
});

test("an e-mailed sign-in link arrives at the fake SMTP server and signs the person in", async ({ page, request }) => {
  const email = `magic-${Date.now()}@example.test`;
  await page.goto("/sign-in");
  await page.getByText("No password? Sign in with a link by e-mail").click();
  await page.getByLabel("Address to send the link to").fill(email);
  await page.getByRole("button", { name: "E-mail me a sign-in link" }).click();
  await expect(page).toHaveURL(/check-email/);

  const mailbox = process.env.BRANCHLINE_MAILBOX_URL ?? `http://127.0.0.1:${process.env.MAILBOX_PORT ?? 2526}`;
  let link: string | undefined;
  await expect
    .poll(async () => {
      const { messages } = (await (await request.get(`${mailbox}/messages`)).json()) as { messages: { to: string[]; text: string }[] };
      link = messages.find((m) => m.to.includes(email))?.text.match(/https?:\/\/\S+/)?.[0];
      return Boolean(link);
    })
    .toBe(true);
  await page.goto(link!);
  await expect(page.getByRole("link", { name: email.split("@")[0] })).toBeVisible();
});
