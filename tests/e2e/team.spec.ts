import { expect, test, type APIRequestContext, type Page } from "@playwright/test";
import { hydrated, password } from "./helpers";

const mailbox = process.env.BRANCHLINE_MAILBOX_URL ?? `http://127.0.0.1:${process.env.MAILBOX_PORT ?? 2526}`;

// The machine running these is small and shared: every wait is generous.
test.setTimeout(300_000);
test.use({ navigationTimeout: 90_000, actionTimeout: 60_000 });
const slow = { timeout: 60_000 };

async function fillSignUp(page: Page, name: string, email: string): Promise<void> {
  await hydrated(page);
  await page.getByLabel("Name").fill(name);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign up" }).last().click();
}

/** The newest link to an invitation in the fake SMTP server's mailbox for this address. */
async function invitationLink(request: APIRequestContext, address: string): Promise<string> {
  let link: string | undefined;
  await expect
    .poll(
      async () => {
        const { messages } = (await (await request.get(`${mailbox}/messages`)).json()) as { messages: { to: string[]; text: string }[] };
        link = messages.find((m) => m.to.includes(address))?.text.match(/https?:\/\/\S+\/invitations\/[A-Za-z0-9_-]+/)?.[0];
        return Boolean(link);
      },
      { timeout: 60_000 },
    )
    .toBe(true);
  return link!;
}

test("an owner invites a viewer by e-mail, who signs up from the link and may look but not change; a share link works until revoked", async ({ page, browser }) => {
  const stamp = Date.now();
  const viewerEmail = `referee-${stamp}@example.test`;

  // The owner signs up, makes a project and a scenario.
  await page.goto("/sign-up");
  await fillSignUp(page, "Group Lead", `lead-${stamp}@example.test`);
  await expect(page).toHaveURL(/\/projects$/, slow);
  await hydrated(page);
  await page.getByLabel("Project name").fill("Referee copy");
  await page.getByRole("button", { name: "Create project" }).click();
  await expect(page).toHaveURL(/\/projects\/[0-9a-f-]{36}$/, slow);
  const projectUrl = page.url();
  await hydrated(page);
  await page.getByLabel("Title").fill("Slow recombination");
  await page.getByRole("button", { name: "New scenario" }).click();
  await expect(page).toHaveURL(/\/scenarios\/[0-9a-f-]{36}$/, slow);
  await expect(page.getByRole("heading", { name: "Slow recombination" })).toBeVisible(slow);

  // The invitation goes out through the fake SMTP server.
  await page.goto(`${projectUrl}/members`);
  await hydrated(page);
  await page.getByLabel("E-mail", { exact: true }).fill(viewerEmail);
  await page.getByLabel("Role", { exact: true }).selectOption("viewer");
  await page.getByRole("button", { name: "Send invitation" }).click();
  await expect(page.getByText(`is on its way to ${viewerEmail}`)).toBeVisible(slow);
  await expect(page.getByRole("cell", { name: viewerEmail, exact: true })).toBeVisible(slow);
  const link = await invitationLink(page.request, viewerEmail);

  // The invited person, in a browser of their own, follows the link, signs up and accepts.
  const viewerContext = await browser.newContext();
  const viewer = await viewerContext.newPage();
  await viewer.goto(link);
  await expect(viewer.getByRole("heading", { name: "Join “Referee copy”" })).toBeVisible(slow);
  await viewer.getByRole("link", { name: "Create an account" }).click();
  await expect(viewer).toHaveURL(/\/sign-up\?callbackUrl=/, slow);
  await expect(viewer.getByLabel("E-mail")).toHaveValue(viewerEmail);
  await fillSignUp(viewer, "Invited Referee", viewerEmail);
  await expect(viewer).toHaveURL(/\/invitations\//, slow);
  await hydrated(viewer);
  await viewer.getByRole("button", { name: "Accept" }).click();
  await expect(viewer).toHaveURL(projectUrl, slow);

  // They see the scenario read-only, and the API refuses them a change.
  await viewer.getByRole("table").getByRole("link", { name: "Slow recombination" }).click();
  await expect(viewer).toHaveURL(/\/scenarios\/[0-9a-f-]{36}/, slow);
  await expect(viewer.getByRole("heading", { name: "Slow recombination" })).toBeVisible(slow);
  await expect(viewer.getByText(/read-only/i).first()).toBeVisible(slow);
  const scenarioId = viewer.url().match(/\/scenarios\/([0-9a-f-]{36})/)![1];
  const scenarioApi = `${projectUrl.replace("/projects/", "/api/projects/")}/scenarios/${scenarioId}`;
  const put = await viewer.request.put(scenarioApi, { data: { version: 1, title: "Changed by the referee" } });
  expect(put.status()).toBe(403);
  expect((await put.json()).error.code).toBe("forbidden");
  // The link is used up.
  expect((await viewer.goto(link))?.status()).toBe(404);
  await viewerContext.close();

  // The owner makes a share link; a signed-out visitor sees the scenario with its Budget.
  await page.goto(`${projectUrl}/members`);
  await page.getByRole("link", { name: "Share links of Slow recombination" }).click();
  await expect(page.getByRole("heading", { name: /Share links/ })).toBeVisible(slow);
  await hydrated(page);
  await page.getByLabel("Label", { exact: true }).fill("for the referee");
  await page.getByRole("button", { name: "Create link" }).click();
  const shareUrl = await page.getByLabel("Share link URL").inputValue(slow);
  expect(shareUrl).toMatch(/\/share\/[A-Za-z0-9_-]{22,}$/);

  const outsiderContext = await browser.newContext();
  const outsider = await outsiderContext.newPage();
  const opened = await outsider.goto(shareUrl);
  expect(opened?.status()).toBe(200);
  await expect(outsider.getByRole("heading", { name: "Slow recombination" })).toBeVisible(slow);
  await expect(outsider.getByText("Shared scenario · read-only")).toBeVisible();
  await expect(outsider.getByRole("heading", { name: "Budget" })).toBeVisible();
  await expect(outsider.getByText("Referee copy")).toHaveCount(0);

  // The owner sees the view counted; after revoking, the same link is not found.
  await page.reload();
  await hydrated(page);
  await expect(page.getByRole("row", { name: /for the referee/ }).getByRole("cell", { name: "1", exact: true })).toBeVisible(slow);
  await page.getByRole("button", { name: "Revoke “for the referee”" }).click();
  await page.getByRole("dialog").getByRole("button", { name: "Revoke link" }).click();
  await expect(page.getByRole("row", { name: /for the referee/ }).getByText("revoked")).toBeVisible(slow);
  const revoked = await outsider.goto(shareUrl);
  expect(revoked?.status()).toBe(404);
  await expect(outsider.getByText(/not found/i).first()).toBeVisible();
  await outsiderContext.close();
});
