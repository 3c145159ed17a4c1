import { expect, test, type Page } from "@playwright/test";
import { blackHoleScenario, password } from "./helpers";

/*
 * A phone, 390 CSS pixels wide: no page scrolls sideways, and the editor's fields show their whole value (a
 * duration's unit is not cut off). On a failure the test names the elements that stick out, so the fix is findable.
 */
test.use({ viewport: { width: 390, height: 844 } });

async function overflow(page: Page): Promise<{ scrollWidth: number; width: number; culprits: string[] }> {
  return page.evaluate(() => {
    const width = document.documentElement.clientWidth;
    const culprits: string[] = [];
    for (const element of Array.from(document.querySelectorAll("body *"))) {
      const box = element.getBoundingClientRect();
      if (box.width === 0 || box.right <= width + 1) continue;
      // Only the outermost element that sticks out, inside a region that does not scroll on its own.
      let scrolls = false;
      for (let up = element.parentElement; up; up = up.parentElement) {
        const style = getComputedStyle(up);
        if (["auto", "scroll", "hidden", "clip"].includes(style.overflowX) && up !== document.body && up !== document.documentElement) scrolls = true;
      }
      if (scrolls) continue;
      const parent = element.parentElement;
      if (parent && parent.getBoundingClientRect().right > width + 1) continue;
      culprits.push(`${element.tagName.toLowerCase()}${element.id ? "#" + element.id : ""}.${String(element.className).split(" ").slice(0, 4).join(".")} right=${Math.round(box.right)}`);
    }
    if (culprits.length === 0) {
      // Nothing sticks out in plain sight: name the furthest-reaching elements, wherever they are.
      const widest = Array.from(document.querySelectorAll("body *"))
        .map((element) => ({ element, right: element.getBoundingClientRect().right }))
        .filter(({ right }) => right > width + 1)
        .sort((a, b) => b.right - a.right)
        .slice(0, 8);
      for (const { element, right } of widest) culprits.push(`${element.tagName.toLowerCase()}.${String(element.className).split(" ").slice(0, 4).join(".")} right=${Math.round(right)} (inside a clipped or scrolling box)`);
    }
    return { scrollWidth: document.documentElement.scrollWidth, width, culprits: culprits.slice(0, 8) };
  });
}

test("at 390 px no main page scrolls sideways, and the editor's fields show their whole value", async ({ browser }) => {
  test.setTimeout(300_000);
  const stamp = Date.now();
  const context = await browser.newContext({ viewport: { width: 390, height: 844 } });
  const page = await context.newPage();
  const email = `phone-${stamp}@example.test`;
  expect((await page.request.post("/api/users", { data: { email, name: "Pocket Reader", password } })).status()).toBe(201);

  const signedOut = ["/sign-in", "/sign-up", "/methods", "/api-reference"];
  const problems: string[] = [];
  const check = async (name: string) => {
    const found = await overflow(page);
    if (found.scrollWidth > found.width + 1) problems.push(`${name}: ${found.scrollWidth} px wide in ${found.width} px — ${found.culprits.join("; ")}`);
  };
  for (const path of signedOut) {
    await page.goto(path);
    await page.waitForLoadState("networkidle");
    await check(path);
  }

  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: /sign in/i }).first().click();
  await expect(page).toHaveURL(/\/projects/, { timeout: 60_000 });

  const project = (await (await page.request.post("/api/projects", { data: { name: "A narrow screen with a long project name that wraps" } })).json()).project as { id: string };
  const scenario = (await (await page.request.post(`/api/projects/${project.id}/scenarios`, { data: { title: "Hovering lab near a black hole, held for a long while", document: blackHoleScenario() } })).json()).scenario as { id: string };
  const shared = (await (await page.request.post(`/api/projects/${project.id}/scenarios/${scenario.id}/share-links`, { data: { label: "for a referee" } })).json()) as { url: string };
  const token = shared.url.split("/").pop()!;

  const pages: [string, string][] = [
    ["/projects", "main"],
    [`/projects/${project.id}`, "table"],
    [`/projects/${project.id}/members`, "main"],
    [`/projects/${project.id}/scenarios/${scenario.id}/history`, "main"],
    [`/projects/${project.id}/scenarios/${scenario.id}/sharing`, "main"],
    [`/projects/${project.id}/scenarios/${scenario.id}/files`, "main"],
    ["/account", "main"],
    [`/share/${token}`, "[data-testid=diagram]"],
    [`/projects/${project.id}/scenarios/${scenario.id}`, "[data-testid=budget]"],
  ];
  for (const [path, ready] of pages) {
    await page.goto(path);
    await expect(page.locator(ready).first()).toBeVisible({ timeout: 60_000 });
    await page.waitForLoadState("networkidle");
    await check(path);
  }

  // The editor is the last page open: every text field shows its whole value.
  const clipped = await page.evaluate(() =>
    Array.from(document.querySelectorAll<HTMLInputElement>("main input[type=text], main input:not([type])"))
      .filter((input) => input.offsetParent !== null && input.scrollWidth > input.clientWidth + 1)
      .map((input) => `${input.getAttribute("aria-label") ?? input.name ?? input.id}: "${input.value}" needs ${input.scrollWidth} px, has ${input.clientWidth} px`),
  );
  expect(problems).toEqual([]);
  expect(clipped).toEqual([]);
});
