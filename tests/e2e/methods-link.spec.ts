import { expect, test } from "@playwright/test";
import { blackHoleScenario, hydrated, signedInAs } from "./helpers";

test("a Budget number opens its formula on the Methods page in a new tab, echoing the number and the scenario's inputs, and the editor stays", async ({ browser }) => {
  const stamp = Date.now();
  const owner = await signedInAs(browser, "Methods Reader", `methods-reader-${stamp}@example.test`);
  const project = (await (await owner.request.post("/api/projects", { data: { name: "Formulas beside" } })).json()).project as { id: string };
  const scenario = (await (await owner.request.post(`/api/projects/${project.id}/scenarios`, { data: { title: "Hovering lab", document: blackHoleScenario() } })).json())
    .scenario as { id: string };
  const editorUrl = `/projects/${project.id}/scenarios/${scenario.id}`;
  await owner.goto(editorUrl);
  await hydrated(owner);

  const total = owner.getByTestId("budget-whole-total");
  await expect(total).toHaveAttribute("target", "_blank");
  const [methods] = await Promise.all([owner.context().waitForEvent("page"), total.click()]);
  await methods.waitForLoadState();
  expect(new URL(methods.url()).pathname).toBe("/methods");
  await expect(methods.getByText(/Total ⟨N⟩, every channel/).first()).toBeVisible();
  // The inputs, as the figure caption writes them: the background and the lab's radius.
  await expect(methods.getByText(/from Schwarzschild, M = .*lab at r = 150 km/).first()).toBeVisible();
  expect(new URL(owner.url()).pathname).toBe(editorUrl);
});
