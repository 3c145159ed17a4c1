import { expect, test, type Page } from "@playwright/test";
import { blackHoleScenario, hydrated, signedInAs } from "./helpers";

interface SavedDocument {
  separation: { distanceMetres: number };
  protocol: { kind: string; expression?: string; samples?: { separationMetres: number }[] };
}

async function savedDocument(page: Page, projectId: string, scenarioId: string): Promise<SavedDocument> {
  await expect(page.getByTestId("save-state")).toHaveAttribute("data-saved", "true");
  return (await (await page.request.get(`/api/projects/${projectId}/scenarios/${scenarioId}`)).json()).scenario.document;
}

const peakSample = (doc: SavedDocument) => Math.max(...doc.protocol.samples!.map((s) => Math.abs(s.separationMetres)));

test("the Protocol switches between ramps, a formula and a measured profile, one undo step each, keeping the peak separation; d rescales a measured profile; a formula outside [0, 1] is flagged", async ({ browser }) => {
  const stamp = Date.now();
  const owner = await signedInAs(browser, "Protocol Owner", `protocol-owner-${stamp}@example.test`);
  const project = (await (await owner.request.post("/api/projects", { data: { name: "Protocol kinds" } })).json()).project as { id: string };
  const scenario = (await (await owner.request.post(`/api/projects/${project.id}/scenarios`, { data: { title: "Switching lab", document: blackHoleScenario() } })).json())
    .scenario as { id: string };
  await owner.goto(`/projects/${project.id}/scenarios/${scenario.id}`);
  await hydrated(owner);

  const kinds = owner.getByRole("radiogroup", { name: "Kind of protocol" });
  await expect(kinds.getByRole("radio", { name: "Ramps" })).toBeChecked();
  await expect(owner.getByTestId("segment-hold")).toBeVisible();

  await kinds.getByRole("radio", { name: "Formula σ(t)" }).check();
  await expect(owner.getByTestId("formula-expression")).toHaveValue(/^t < 0\.05 \?/);
  let saved = await savedDocument(owner, project.id, scenario.id);
  expect(saved.protocol.kind).toBe("formula");
  expect(saved.separation.distanceMetres).toBeCloseTo(1e-5, 15);

  await kinds.getByRole("radio", { name: "Measured profile" }).check();
  await expect(owner.getByTestId("sampled-profile")).toContainText("samples");
  await expect(owner.getByText("The measured profile's peak: a new value rescales the profile's samples.")).toBeVisible();
  saved = await savedDocument(owner, project.id, scenario.id);
  expect(saved.protocol.kind).toBe("sampled");
  expect(peakSample(saved)).toBeCloseTo(1e-5, 15);

  const d = owner.getByTestId("separation-distance");
  await d.fill("20 um");
  await d.press("Enter");
  await expect(d).toHaveValue("20.00 µm");
  saved = await savedDocument(owner, project.id, scenario.id);
  expect(peakSample(saved)).toBeCloseTo(2e-5, 15);

  const undo = owner.getByRole("button", { name: /^Undo/ });
  await undo.click();
  await expect(d).toHaveValue("10.00 µm");
  await undo.click();
  await expect(kinds.getByRole("radio", { name: "Formula σ(t)" })).toBeChecked();
  await undo.click();
  await expect(kinds.getByRole("radio", { name: "Ramps" })).toBeChecked();
  await expect(owner.getByTestId("duration-hold")).toHaveValue("1.000 s");

  await kinds.getByRole("radio", { name: "Formula σ(t)" }).check();
  const expression = owner.getByTestId("formula-expression");
  await expression.fill("3 * sin(pi * t / 1.1)^2");
  await expression.press("Enter");
  await expect(owner.getByTestId("flag-profile-range")).toContainText("σ(t) reaches 3");
  await expect(owner.getByTestId("flag-profile-range")).toContainText("Invalid");
});
