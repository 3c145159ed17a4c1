import { expect, test } from "@playwright/test";
import { blackHoleScenario, signedInAs } from "./helpers";

const slow = { timeout: 60_000 };

test("a preset puts the lab's environment in the Budget: every channel with its share, the dominant one in words, the margins; a pressure edit scales the gas channel; undo takes the preset back in one step", async ({ browser }) => {
  const stamp = Date.now();
  const owner = await signedInAs(browser, "Budget Owner", `budget-env-${stamp}@example.test`);
  const project = (await (await owner.request.post("/api/projects", { data: { name: "Environment budget" } })).json()).project as { id: string };
  const scenario = (await (await owner.request.post(`/api/projects/${project.id}/scenarios`, { data: { title: "Hovering lab in a vacuum", document: blackHoleScenario() } })).json()).scenario as { id: string };
  await owner.goto(`/projects/${project.id}/scenarios/${scenario.id}`);
  const budget = owner.getByTestId("budget");
  await expect(budget).toHaveAttribute("data-state", "current", slow);
  // An isolated body first: the body's own fields alone, named as such.
  await expect(owner.getByTestId("budget-isolated")).toBeVisible();
  await expect(owner.getByTestId("budget-channel-row-horizon")).toBeVisible();

  await owner.getByTestId("environment-preset").selectOption("room-temperature-lab-vacuum");
  await expect(owner.getByTestId("budget-channel-row-gas")).toBeVisible(slow);
  await expect(budget).toHaveAttribute("data-state", "current", slow);
  for (const channel of ["thermal-scattering", "thermal-absorption", "thermal-emission"]) await expect(owner.getByTestId(`budget-channel-row-${channel}`)).toBeVisible();

  // The dominant channel in words, in the caption and on its row (not by colour alone).
  await expect(owner.getByTestId("budget-dominant")).toContainText("Dominant channel:");
  const dominantRow = budget.locator('tr[data-dominant="true"]');
  await expect(dominantRow).toHaveCount(1);
  await expect(dominantRow).toContainText("(dominant)");
  const dominantWords = (await dominantRow.locator("th").innerText()).replace("(dominant)", "").trim();
  await expect(owner.getByTestId("budget-dominant")).toContainText(dominantWords);

  // The margins: one line per environmental channel, each a number with its unit or an outcome in words.
  const margins = owner.getByTestId("budget-margins");
  await expect(margins.getByRole("listitem")).toHaveCount(4);
  await expect(margins).toContainText("gas pressure now");
  await expect(owner.getByTestId("budget-margin-gas-now")).toContainText("Pa");
  for (const channel of ["gas", "thermal-scattering", "thermal-absorption", "thermal-emission"]) {
    await expect(owner.getByTestId(`budget-margin-${channel}`)).toHaveText(/(\d.*(Pa|K))|already below|not reachable/);
  }

  // A thousandfold pressure gives a thousandfold gas count (Λ and γ ∝ P: Joos & Zeh, Z. Phys. B 59, 223 (1985)).
  const gasCount = async () => Number(await owner.getByTestId("budget-channel-gas").getAttribute("data-value"));
  const before = await gasCount();
  const pressure = owner.getByTestId("environment-gas-pressure");
  await pressure.fill("1e-3 Pa");
  await pressure.press("Enter");
  await expect(pressure).toHaveValue("0.001000 Pa");
  await expect.poll(gasCount, slow).not.toBe(before);
  await expect(budget).toHaveAttribute("data-state", "current", slow);
  expect((await gasCount()) / before).toBeCloseTo(1000, 6);

  // Each edit is one undo step: the pressure, then the whole preset.
  await owner.getByRole("button", { name: /^Undo Set gas pressure/ }).click();
  await expect.poll(gasCount, slow).toBeCloseTo(before, 12);
  await owner.getByRole("button", { name: /^Undo Environment: room-temperature lab vacuum/ }).click();
  await expect(owner.getByTestId("budget-isolated")).toBeVisible(slow);
  await expect(owner.getByTestId("budget-channel-row-gas")).toHaveCount(0);
  await owner.context().close();
});

test("at 390 px the Budget's numbers stay on one line and nothing scrolls sideways", async ({ browser }) => {
  const stamp = Date.now();
  const owner = await signedInAs(browser, "Narrow Owner", `budget-narrow-${stamp}@example.test`);
  const project = (await (await owner.request.post("/api/projects", { data: { name: "Narrow budget" } })).json()).project as { id: string };
  const withEnvironment = {
    ...blackHoleScenario(),
    schemaVersion: 2,
    environment: {
      body: { radiusMetres: 1e-6, material: "fused-silica", internalTemperatureKelvin: 12 },
      gas: { pressurePascals: 1e-10, temperatureKelvin: 4, species: "He" },
      radiation: { surroundingsTemperatureKelvin: 4 },
      surface: { distanceMetres: 4e-5, resistivityOhmMetres: 5e-9, temperatureKelvin: 4, orientation: "parallel" },
    },
  };
  const scenario = (await (await owner.request.post(`/api/projects/${project.id}/scenarios`, { data: { title: "Chip in a cryostat", document: withEnvironment } })).json()).scenario as { id: string };
  await owner.setViewportSize({ width: 390, height: 844 });
  await owner.goto(`/projects/${project.id}/scenarios/${scenario.id}`);
  const budget = owner.getByTestId("budget");
  await expect(budget).toHaveAttribute("data-state", "current", slow);
  await expect(owner.getByTestId("budget-channel-row-surface")).toBeVisible();
  await budget.scrollIntoViewIfNeeded();

  const lines = await budget.evaluate((section) =>
    [...section.querySelectorAll<HTMLElement>("a[data-testid^='budget-']")].map((link) => ({ id: link.dataset.testid, text: link.innerText, boxes: link.getClientRects().length })),
  );
  expect(lines.length).toBeGreaterThan(20);
  for (const line of lines) expect(line.boxes, `${line.id} "${line.text}" on one line`).toBe(1);
  const widths = await owner.evaluate(() => {
    // What sticks out past the right edge, deepest first, to name it when the check fails.
    const outside = [...document.querySelectorAll<HTMLElement>("body *")].filter((el) => el.getBoundingClientRect().right > window.innerWidth + 0.5 && ![...el.children].some((c) => c.getBoundingClientRect().right > window.innerWidth + 0.5));
    return { page: document.documentElement.scrollWidth, view: window.innerWidth, outside: outside.slice(0, 8).map((el) => `${el.tagName.toLowerCase()}${el.dataset.testid ? `[${el.dataset.testid}]` : ""}.${el.className.toString().slice(0, 60)} → ${Math.round(el.getBoundingClientRect().right)}`) };
  });
  expect(widths.page, widths.outside.join("\n")).toBeLessThanOrEqual(widths.view);
  await owner.context().close();
});
