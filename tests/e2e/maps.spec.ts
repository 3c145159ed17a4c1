import { type ChildProcess, spawn } from "node:child_process";
import path from "node:path";
import { expect, test, type Browser } from "@playwright/test";
import { blackHoleScenario, signedInAs } from "./helpers";

/**
 * The Map panel end to end: a map of the saved scenario waits in the queue (its progress bar at 0 rows) until a
 * worker process — `npm run worker`'s script, started here against the browser tests' database — computes it; the
 * heat map appears, and a click on it sets the scenario to that point in one undo step.
 */
const editorPath = (projectId: string, scenarioId: string) => `/projects/${projectId}/scenarios/${scenarioId}`;
let worker: ChildProcess | null = null;

function startWorker(): ChildProcess {
  const root = path.resolve(__dirname, "../..");
  const child = spawn(process.execPath, ["--conditions", "react-server", "--import", "tsx", "scripts/worker.ts"], {
    cwd: root,
    env: { ...process.env, DATABASE_URL: process.env.E2E_DATABASE_URL ?? "", BRANCHLINE_WORKER_QUIET: "1" },
    stdio: "ignore",
  });
  return child;
}

test.afterAll(async () => {
  if (worker && worker.exitCode === null) {
    const exited = new Promise((resolve) => worker!.once("exit", resolve));
    worker.kill("SIGTERM");
    await Promise.race([exited, new Promise((r) => setTimeout(r, 10_000))]);
    if (worker.exitCode === null) worker.kill("SIGKILL");
  }
});

async function ownerWithScenario(browser: Browser) {
  const stamp = Date.now();
  const owner = await signedInAs(browser, "Map Owner", `map-owner-${stamp}@example.test`);
  const project = (await (await owner.request.post("/api/projects", { data: { name: "Maps" } })).json()).project as { id: string };
  const scenario = (await (await owner.request.post(`/api/projects/${project.id}/scenarios`, { data: { title: "Mapped lab", document: blackHoleScenario() } })).json()).scenario as { id: string };
  return { owner, project, scenario };
}

test("a map waits for a worker with its progress shown, is drawn when done, and a click on it sets the scenario in one undo step", async ({ browser }) => {
  const { owner, project, scenario } = await ownerWithScenario(browser);
  await owner.goto(editorPath(project.id, scenario.id));
  const panel = owner.getByTestId("map");
  await panel.scrollIntoViewIfNeeded();
  await owner.getByLabel("Map x points (2 to 200)").fill("6");
  await owner.getByLabel("Map y points (2 to 200)").fill("5");
  await expect(panel.getByText("30 points of the saved scenario")).toBeVisible();
  await owner.getByTestId("start-map").click();

  // No worker yet: the map is queued, its progress bar at 0 of 5 rows.
  const progress = owner.getByTestId("map-progress");
  await expect(progress).toContainText("0 of 5 rows (queued)");
  await expect(progress.getByRole("progressbar", { name: "Map progress" })).toHaveAttribute("max", "5");

  worker = startWorker();
  const figure = owner.getByTestId("map-figure");
  await expect(figure).toBeVisible({ timeout: 90_000 });
  await expect(progress).toHaveCount(0);
  await expect(panel.getByText(/Maps kept with this scenario \(1\)/)).toBeVisible();

  // A click inside the plot, a third of the way across and up, sets both parameters at once.
  const recombination = owner.getByTestId("duration-recombination");
  const before = await recombination.inputValue();
  await figure.scrollIntoViewIfNeeded();
  const box = (await figure.boundingBox())!;
  // The plot sits inside the figure's margins (84 px left, 112 right, 24 top, 56 bottom of 640 × 460).
  const plotX = box.x + (box.width * (84 + (640 - 84 - 112) / 3)) / 640;
  const plotY = box.y + (box.height * (460 - 56 - (460 - 24 - 56) / 3)) / 460;
  await owner.mouse.click(plotX, plotY);
  await expect(owner.getByRole("button", { name: "Undo Set recombination time and hold time from the map" })).toBeVisible();
  await expect(recombination).not.toHaveValue(before);
  await owner.getByRole("button", { name: /^Undo/ }).click();
  await expect(recombination).toHaveValue(before);
});
