import { readFileSync } from "node:fs";
import { expect, test, type Page } from "@playwright/test";
import { blackHoleScenario, signedInAs } from "./helpers";

/*
 * axe-core (Deque's accessibility engine, from npm) over every main page, for the WCAG 2.0 and 2.1 A and AA rules:
 * no serious or critical violation. The engine is evaluated in the page through the DevTools protocol, so the
 * page's own Content-Security-Policy is left as it is.
 */
const axeSource = readFileSync(require.resolve("axe-core/axe.min.js"), "utf8");

interface AxeViolation {
  id: string;
  impact: string | null;
  help: string;
  nodes: { target: string[] }[];
}

async function seriousViolations(page: Page): Promise<string[]> {
  await page.evaluate(axeSource);
  const violations = await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run(context: Document, options: object): Promise<{ violations: AxeViolation[] }> } }).axe;
    const result = await axe.run(document, { runOnly: { type: "tag", values: ["wcag2a", "wcag2aa", "wcag21a", "wcag21aa"] } });
    return result.violations;
  });
  return violations
    .filter((v) => v.impact === "serious" || v.impact === "critical")
    .map((v) => `${v.id} (${v.impact}): ${v.help} — ${v.nodes.slice(0, 5).map((n) => n.target.join(" ")).join(", ")}${v.nodes.length > 5 ? ` and ${v.nodes.length - 5} more` : ""}`);
}

test("every main page passes axe-core's WCAG 2 A and AA rules with no serious or critical violation", async ({ browser }) => {
  test.setTimeout(480_000); // nine pages, each read whole by the engine
  const stamp = Date.now();
  const owner = await signedInAs(browser, "Access Owner", `access-owner-${stamp}@example.test`);
  const project = (await (await owner.request.post("/api/projects", { data: { name: "Readable pages" } })).json()).project as { id: string };
  const scenario = (await (await owner.request.post(`/api/projects/${project.id}/scenarios`, { data: { title: "Hovering lab", document: blackHoleScenario() } })).json()).scenario as { id: string };
  const shared = (await (await owner.request.post(`/api/projects/${project.id}/scenarios/${scenario.id}/share-links`, { data: { label: "for a referee" } })).json()) as { url: string };
  const token = shared.url.split("/").pop()!;

  const pages: [string, string, string][] = [
    ["projects", "/projects", "main"],
    ["project", `/projects/${project.id}`, "table"],
    ["editor", `/projects/${project.id}/scenarios/${scenario.id}`, "[data-testid=budget]"],
    ["members", `/projects/${project.id}/members`, "main"],
    ["history", `/projects/${project.id}/scenarios/${scenario.id}/history`, "main"],
    ["account", "/account", "main"],
    ["methods", "/methods", "main"],
    ["share page", `/share/${token}`, "[data-testid=diagram]"],
  ];
  const found: string[] = [];
  for (const [name, path, ready] of pages) {
    await owner.goto(path);
    await expect(owner.locator(ready).first()).toBeVisible({ timeout: 60_000 });
    await owner.waitForLoadState("networkidle");
    for (const violation of await seriousViolations(owner)) found.push(`${name}: ${violation}`);
  }
  const signedOut = await (await browser.newContext()).newPage();
  await signedOut.goto("/sign-in");
  for (const violation of await seriousViolations(signedOut)) found.push(`sign-in: ${violation}`);
  expect(found).toEqual([]);
});
