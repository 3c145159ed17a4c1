import { expect, test, type Page } from "@playwright/test";
import { hydrated, password } from "./helpers";

// The machine running these is small and shared: every wait is generous.
test.setTimeout(300_000);
test.use({ navigationTimeout: 90_000, actionTimeout: 60_000 });
const slow = { timeout: 60_000 };

/** A new account signed in through the sign-up form, with a project and a scenario made through the API. */
async function editorWithScenario(page: Page) {
  const stamp = Date.now();
  await page.goto("/sign-up");
  await hydrated(page);
  await page.getByLabel("Name").fill("Bench Physicist");
  await page.getByLabel("E-mail").fill(`bench-${stamp}@example.test`);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign up" }).last().click();
  await expect(page).toHaveURL(/\/projects$/, slow);
  const project = await (await page.request.post("/api/projects", { data: { name: "Sequencer bench" } })).json();
  const scenario = await (await page.request.post(`/api/projects/${project.project.id}/scenarios`, { data: { title: "Bench run" } })).json();
  return { projectId: project.project.id as string, scenarioId: scenario.scenario.id as string };
}

const csv = (text: string, name: string) => ({ name, mimeType: "text/csv", buffer: Buffer.from(text) });

test("a sequencer file with a bad row says which row; a good one previews and becomes the protocol", async ({ page }) => {
  const { projectId, scenarioId } = await editorWithScenario(page);
  await page.goto(`/projects/${projectId}/scenarios/${scenarioId}/files`);
  await hydrated(page);
  await page.getByRole("button", { name: "Import a measured profile…" }).click();
  const dialog = page.getByRole("dialog", { name: "Measured profile from a sequencer CSV" });
  await expect(dialog).toBeVisible();

  await dialog.getByLabel("Sequencer CSV").setInputFiles(csv("t [ms],separation [um]\n0,0\n10,1.5\n20,abc\n30,0\n", "bad-run.csv"));
  await expect(dialog.getByText("Row 4: separation 'abc' is not a number.")).toBeVisible(slow);
  await expect(dialog.getByRole("button", { name: "Use this profile" })).toBeDisabled();

  // No units in the header: the dialog asks for them, then reads the file.
  await dialog.getByLabel("Sequencer CSV").setInputFiles(csv("time,separation\n0,0\n10,1.5\n20,3\n30,3\n40,0\n", "good-run.csv"));
  await expect(dialog.getByText("The header names no time unit: choose one.")).toBeVisible(slow);
  await dialog.getByLabel("Time unit").selectOption("ms");
  await dialog.getByLabel("Separation unit").selectOption("um");
  await expect(dialog.getByTestId("profile-rows")).toHaveText("5", slow);
  await expect(dialog.getByRole("definition").filter({ hasText: "40.0 ms" })).toBeVisible();
  await expect(dialog.getByRole("definition").filter({ hasText: "3.00 µm" })).toBeVisible();
  await expect(dialog.getByRole("cell", { name: "10.0 ms" })).toBeVisible();
  await page.screenshot({ path: "test-results/uploads-sequencer-preview.png", fullPage: true });
  await dialog.getByRole("button", { name: "Use this profile" }).click();
  await expect(page.getByText(/Saved version 2: 5 samples over 40\.0 ms, up to 3\.00 µm/)).toBeVisible(slow);

  const stored = await (await page.request.get(`/api/projects/${projectId}/scenarios/${scenarioId}`)).json();
  expect(stored.scenario.document.protocol.kind).toBe("sampled");
  expect(stored.scenario.document.protocol.samples).toHaveLength(5);
});

test("files: add one with progress, refuse one whose content is not what its name says, download and delete", async ({ page }) => {
  const { projectId, scenarioId } = await editorWithScenario(page);
  await page.goto(`/projects/${projectId}/scenarios/${scenarioId}/files`);
  await hydrated(page);
  await expect(page.getByText("No files yet")).toBeVisible(slow);

  await page.getByLabel("File to add").setInputFiles({ name: "figure.png", mimeType: "image/png", buffer: Buffer.from("%PDF-1.4\n%%EOF\n") });
  await expect(page.getByText("“figure.png” was not added.")).toBeVisible(slow);
  await expect(page.getByText(/named as a PNG image but its content is a PDF/)).toBeVisible();

  const run = "t [ms],separation [um]\n0,0\n5,2\n10,0\n";
  await page.getByLabel("File to add").setInputFiles(csv(run, "run-0412.csv"));
  await expect(page.getByText("Added “run-0412.csv”.")).toBeVisible(slow);
  const row = page.getByRole("row", { name: /run-0412\.csv/ });
  await expect(row.getByRole("cell", { name: "CSV", exact: true })).toBeVisible();
  await expect(row.getByText(`${Buffer.byteLength(run)} B`)).toBeVisible();
  await page.screenshot({ path: "test-results/uploads-files.png", fullPage: true });

  const download = page.waitForEvent("download");
  await row.getByRole("link", { name: "Download", exact: true }).click();
  const file = await download;
  expect(file.suggestedFilename()).toBe("run-0412.csv");

  await row.getByRole("button", { name: "Delete run-0412.csv" }).click();
  await page.getByRole("button", { name: "Delete the file" }).click();
  await expect(page.getByText("No files yet")).toBeVisible(slow);
});

test("importing a scenario file lists what is wrong, or opens the new scenario", async ({ page }) => {
  const { projectId } = await editorWithScenario(page);
  await page.goto(`/projects/${projectId}`);
  await hydrated(page);
  const input = page.getByTestId("import-scenario-input");
  await input.setInputFiles({ name: "broken.json", mimeType: "application/json", buffer: Buffer.from(JSON.stringify({ format: "branchline-scenario", formatVersion: 1, title: "", document: { schemaVersion: 1 } })) });
  await expect(page.getByText("“broken.json” was not imported.")).toBeVisible(slow);
  const problems = page.getByRole("list", { name: "Problems found" });
  await expect(problems.getByText("Title must not be empty.")).toBeVisible();
  await expect(problems.getByText("document.background", { exact: true })).toBeVisible();
  await page.screenshot({ path: "test-results/uploads-import-problems.png", fullPage: true });

  const exported = await (await page.request.get(`/api/projects/${projectId}/scenarios?page=1&pageSize=10&sort=title&order=asc`)).json();
  const first = await (await page.request.get(`/api/projects/${projectId}/scenarios/${exported.items[0].id}`)).json();
  const file = { format: "branchline-scenario", formatVersion: 1, title: "Imported bench run", document: first.scenario.document };
  await input.setInputFiles({ name: "bench.json", mimeType: "application/json", buffer: Buffer.from(JSON.stringify(file)) });
  await expect(page).toHaveURL(/\/scenarios\/[0-9a-f-]{36}$/, slow);
  await expect(page.getByRole("heading", { name: "Imported bench run" }).first()).toBeVisible(slow);
});
