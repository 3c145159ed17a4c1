import { expect, test, type Browser, type Page } from "@playwright/test";
import { blackHoleScenario, signedInAs } from "./helpers";

const editorPath = (projectId: string, scenarioId: string) => `/projects/${projectId}/scenarios/${scenarioId}`;

async function currentBudget(page: Page) {
  await expect(page.getByTestId("budget")).toHaveAttribute("data-state", "current");
  const read = async (testId: string) => Number(await page.getByTestId(testId).getAttribute("data-value"));
  // Near a black hole the ramps' quanta go partly to ℐ⁺ and partly into the horizon: the Budget counts them as
  // ramp-driven, beside the hold's quanta into the horizon.
  return { ramps: await read("budget-electromagnetic-ramp"), horizon: await read("budget-electromagnetic-horizon") };
}

async function dragHandle(page: Page, handle: string, dx: number) {
  const lab = page.getByTestId("offsets");
  await lab.scrollIntoViewIfNeeded();
  const handles = JSON.parse((await lab.getAttribute("data-handles")) ?? "[]") as { id: string; x: number }[];
  const target = handles.find((h) => h.id === handle);
  expect(target, `the ${handle} handle is on screen`).toBeTruthy();
  const box = (await lab.boundingBox())!;
  const y = box.y + box.height / 2;
  await page.mouse.move(box.x + target!.x, y);
  await page.mouse.down();
  for (let i = 1; i <= 12; i++) await page.mouse.move(box.x + target!.x + (dx * i) / 12, y);
  await page.mouse.up();
}

/** A researcher of our own in a new project with one scenario, signed in; `scenarioIn` adds another to that project. */
async function ownerWithScenario(browser: Browser, who: string, projectName: string, title: string, document: object = blackHoleScenario()) {
  const stamp = Date.now();
  const owner = await signedInAs(browser, `${who} Owner`, `${who.toLowerCase()}-owner-${stamp}@example.test`);
  const project = (await (await owner.request.post("/api/projects", { data: { name: projectName } })).json()).project as { id: string };
  const scenarioIn = async (scenarioTitle: string, scenarioDocument: object) =>
    (await (await owner.request.post(`/api/projects/${project.id}/scenarios`, { data: { title: scenarioTitle, document: scenarioDocument } })).json()).scenario as { id: string; version: number };
  return { stamp, owner, project, scenario: await scenarioIn(title, document), scenarioIn };
}

test("dragging the recombination handle trades the ramps' quanta for the horizon's; undo, saving and reload keep the numbers; a viewer gets no handles", async ({ browser }) => {
  const { stamp, owner, project, scenario } = await ownerWithScenario(browser, "Editor", "Horizon budget", "Hovering lab");

  await owner.goto(editorPath(project.id, scenario.id));
  await expect(owner.getByTestId("offsets")).toBeVisible();
  const first = await currentBudget(owner);
  expect(first.ramps).toBeGreaterThan(0);
  expect(first.horizon).toBeGreaterThan(0);
  const recombinationEnd = owner.getByTestId("handle-field-recombination-end");
  const endBefore = await recombinationEnd.inputValue();

  await dragHandle(owner, "recombination-end", 120);
  await expect(recombinationEnd).not.toHaveValue(endBefore);
  const slower = await currentBudget(owner);
  expect(slower.ramps).toBeLessThan(first.ramps);
  expect(slower.horizon).toBeGreaterThan(first.horizon);
  const endAfter = await recombinationEnd.inputValue();

  await owner.getByRole("button", { name: /^Undo/ }).click();
  await expect(recombinationEnd).toHaveValue(endBefore);
  expect(await currentBudget(owner)).toEqual(first);

  await owner.keyboard.press("Control+Shift+Z");
  await expect(recombinationEnd).toHaveValue(endAfter);
  expect(await currentBudget(owner)).toEqual(slower);
  await expect(owner.getByTestId("save-state")).toHaveAttribute("data-saved", "true");

  await owner.reload();
  await expect(owner.getByTestId("handle-field-recombination-end")).toHaveValue(endAfter);
  expect(await currentBudget(owner)).toEqual(slower);

  const viewerEmail = `editor-viewer-${stamp}@example.test`;
  const viewer = await signedInAs(browser, "Editor Viewer", viewerEmail);
  expect((await owner.request.post(`/api/projects/${project.id}/members`, { data: { email: viewerEmail, role: "viewer" } })).status()).toBe(201);
  await viewer.goto(editorPath(project.id, scenario.id));
  await expect(viewer.getByTestId("read-only")).toBeVisible();
  await expect(viewer.getByTestId("offsets")).toHaveAttribute("data-handles", "[]");
  await expect(viewer.getByTestId("handle-field-recombination-end")).toBeDisabled();
  await expect(viewer.getByRole("button", { name: /^Undo/ })).toHaveCount(0);
});

test("a save that meets someone else's newer version asks what to do, and keeping mine makes a new scenario without touching theirs", async ({ browser }) => {
  const { owner, project, scenario } = await ownerWithScenario(browser, "Conflict", "Conflicts", "Shared lab");
  await owner.goto(editorPath(project.id, scenario.id));
  await expect(owner.getByTestId("offsets")).toBeVisible();

  // Someone else saves first (here, a rename through the API from the same account).
  const elsewhere = await owner.request.put(`/api/projects/${project.id}/scenarios/${scenario.id}`, { data: { version: scenario.version, title: "Shared lab, renamed" } });
  expect(elsewhere.status()).toBe(200);

  const hold = owner.getByTestId("duration-hold");
  await hold.fill("2.5 s");
  await hold.press("Enter");
  const dialog = owner.getByRole("dialog", { name: "Someone else saved this scenario" });
  await expect(dialog).toBeVisible();
  await expect(owner.getByTestId("save-state")).toContainText("Not saved");
  const box = (await dialog.boundingBox())!;
  const viewport = owner.viewportSize()!;
  expect(Math.abs(box.x + box.width / 2 - viewport.width / 2)).toBeLessThan(2);
  expect(Math.abs(box.y + box.height / 2 - viewport.height / 2)).toBeLessThan(2);

  await dialog.getByRole("button", { name: "Save my edits as a copy" }).click();
  await expect(owner).not.toHaveURL(new RegExp(scenario.id));
  await expect(owner.getByTestId("duration-hold")).toHaveValue("2.500 s");
  const theirs = (await (await owner.request.get(`/api/projects/${project.id}/scenarios/${scenario.id}`)).json()).scenario;
  expect(theirs.title).toBe("Shared lab, renamed");
  expect(theirs.document.protocol.hold.durationSeconds).toBe(1);
});

test("a newer version saved elsewhere is announced before any save meets it, and loading it shows its values", async ({ browser }) => {
  const { owner, project, scenario } = await ownerWithScenario(browser, "Newer", "Newer versions", "Watched lab");
  await owner.goto(editorPath(project.id, scenario.id));
  await expect(owner.getByTestId("save-state")).toHaveText(`Saved · v${scenario.version}`);
  await expect(owner.getByTestId("newer-version")).toHaveCount(0);

  const base = blackHoleScenario();
  const document = { ...base, protocol: { ...base.protocol, hold: { durationSeconds: 3 } } };
  const elsewhere = await owner.request.put(`/api/projects/${project.id}/scenarios/${scenario.id}`, { data: { version: scenario.version, document } });
  expect(elsewhere.status()).toBe(200);

  const banner = owner.getByTestId("newer-version");
  await expect(banner).toContainText(`Version ${scenario.version + 1} was saved`, { timeout: 25_000 });
  await banner.getByRole("button", { name: "Load the newer version" }).click();
  await expect(owner.getByTestId("duration-hold")).toHaveValue("3.000 s");
  await expect(banner).toHaveCount(0);
  await expect(owner.getByTestId("save-state")).toHaveText(`Saved · v${scenario.version + 1}`);
});

test("the keyboard walks the Offsets panel's handles in protocol order, naming each, and a formula profile is edited in the Protocol", async ({ browser }) => {
  const { owner, project, scenario: segments, scenarioIn } = await ownerWithScenario(browser, "Keyboard", "Keyboard and formulas", "Hovering lab");

  await owner.goto(editorPath(project.id, segments.id));
  const lab = owner.getByTestId("offsets");
  await expect(lab).toBeVisible();
  await lab.focus();
  const walked: string[] = [];
  for (let i = 0; i < 5; i++) {
    await owner.keyboard.press("Tab");
    walked.push((await lab.getAttribute("data-selected")) ?? "");
  }
  expect(walked).toEqual(["separation-start", "separation-end", "separation-size", "hold-end", "recombination-end"]);
  await expect(owner.getByTestId("offsets-selection")).toHaveText("End of recombination selected: 1.100 s from the start of the separation.");
  await owner.keyboard.press("ArrowRight");
  await expect(owner.getByTestId("handle-field-recombination-end")).not.toHaveValue("1.100 s");
  await owner.keyboard.press("Escape");
  await expect(lab).toHaveAttribute("data-selected", "");

  const formulaDocument = { ...blackHoleScenario(), protocol: { kind: "formula", expression: "sin(pi * t / 0.4)^2", durationSeconds: 0.4 } };
  const formula = await scenarioIn("Formula lab", formulaDocument);
  await owner.goto(editorPath(project.id, formula.id));
  const expression = owner.getByTestId("formula-expression");
  const first = await currentBudget(owner);
  await expression.fill("sin(pi * y)");
  await expression.press("Enter");
  await expect(owner.getByTestId("formula-profile")).toContainText('unknown symbol "y"');
  await expression.fill("sin(pi * t / 0.4)^4");
  await expression.press("Enter");
  await expect(owner.getByTestId("formula-profile")).not.toContainText("unknown symbol");
  await owner.getByTestId("formula-duration").fill("800 ms");
  await owner.getByTestId("formula-duration").press("Enter");
  await expect(owner.getByTestId("save-state")).toHaveAttribute("data-saved", "true");
  expect(await currentBudget(owner)).not.toEqual(first);
  const saved = (await (await owner.request.get(`/api/projects/${project.id}/scenarios/${formula.id}`)).json()).scenario;
  expect(saved.document.protocol).toEqual({ kind: "formula", expression: "sin(pi * t / 0.4)^4", durationSeconds: 0.8 });

  await owner.getByRole("button", { name: /^Undo/ }).click();
  await expect(owner.getByTestId("formula-duration")).toHaveValue("400.0 ms");
});

test("a sweep of the recombination time marks the scenario's value, follows a drag without re-running, and a click on a point sets it in one undo step", async ({ browser }) => {
  const { owner, project, scenario } = await ownerWithScenario(browser, "Sweep", "Sweeps", "Swept lab");
  await owner.goto(editorPath(project.id, scenario.id));
  await expect(owner.getByTestId("offsets")).toBeVisible();
  await currentBudget(owner);

  await owner.getByTestId("run-sweep").click();
  const now = owner.getByTestId("sweep-now");
  await expect(now).toHaveAttribute("data-value", "0.05");
  await expect(owner.getByText(/Smallest decoherence on this sweep/)).toBeVisible();

  // The marker follows the scenario; the curve stays and is marked as computed for an earlier version.
  await dragHandle(owner, "recombination-end", 120);
  await expect(now).not.toHaveAttribute("data-value", "0.05");
  await expect(owner.getByText(/Computed for an earlier version of the scenario/)).toBeVisible();
  await owner.getByRole("button", { name: /^Undo/ }).click();
  await expect(now).toHaveAttribute("data-value", "0.05");

  // A click on the curve a quarter of the way along sets the recombination time to that point's value.
  const recombination = owner.getByTestId("duration-recombination");
  const before = await recombination.inputValue();
  await owner.getByTestId("sweep-chart").scrollIntoViewIfNeeded();
  const chart = (await owner.getByTestId("sweep-chart").boundingBox())!;
  await owner.mouse.move(chart.x + chart.width * 0.3, chart.y + chart.height / 2);
  await owner.mouse.click(chart.x + chart.width * 0.3, chart.y + chart.height / 2);
  await expect(recombination).not.toHaveValue(before);
  const set = Number(await now.getAttribute("data-value"));
  expect(set).toBeLessThan(0.05);
  await expect(owner.getByRole("button", { name: "Undo Set recombination time from the sweep" })).toBeVisible();
  await owner.getByRole("button", { name: /^Undo/ }).click();
  await expect(recombination).toHaveValue(before);
});

test("the lab's mass is typed with its unit, saved, and cleared by emptying the field", async ({ browser }) => {
  const { owner, project, scenario } = await ownerWithScenario(browser, "Recoil", "Recoil", "Light lab");
  await owner.goto(editorPath(project.id, scenario.id));
  const labMass = owner.getByTestId("lab-mass");
  await expect(labMass).toHaveValue("");
  await labMass.fill("2.5 g");
  await labMass.press("Enter");
  await expect(owner.getByTestId("save-state")).toHaveText(`Saved · v${scenario.version + 1}`);
  const stored = async () => (await (await owner.request.get(`/api/projects/${project.id}/scenarios/${scenario.id}`)).json()).scenario.document.source.labMassKg;
  expect(await stored()).toBeCloseTo(2.5e-3, 12);
  await labMass.fill("");
  await labMass.press("Enter");
  await expect(owner.getByTestId("save-state")).toHaveText(`Saved · v${scenario.version + 2}`);
  expect(await stored()).toBeNull();
});
