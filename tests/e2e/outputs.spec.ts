import { expect, test, type Page } from "@playwright/test";
import { readFile } from "node:fs/promises";
import { createServer } from "node:http";
import type { AddressInfo } from "node:net";
import { FIGURE_PALETTES } from "@/canvas/theme";
import { blackHoleScenario, signedInAs } from "./helpers";

// The machine running these is small and shared: every wait is generous.
test.setTimeout(300_000);
test.use({ navigationTimeout: 90_000, actionTimeout: 60_000 });
const slow = { timeout: 60_000 };

/** How many pixels of a canvas differ from its top-left pixel (the ground): a drawn figure has many. */
const inkedPixels = (canvas: HTMLCanvasElement) => {
  const context = canvas.getContext("2d")!;
  const { data } = context.getImageData(0, 0, canvas.width, canvas.height);
  let count = 0;
  for (let i = 0; i < data.length; i += 4) if (data[i] !== data[0] || data[i + 1] !== data[1] || data[i + 2] !== data[2]) count++;
  return count;
};

test("a share link shows the Diagram signed out and exports a vector figure; its embed draws inside another site's frame, with a time scrubber", async ({ browser, baseURL }) => {
  const stamp = Date.now();
  const owner = await signedInAs(browser, "Figure Owner", `figure-owner-${stamp}@example.test`);
  const project = (await (await owner.request.post("/api/projects", { data: { name: "Talk figures" } })).json()).project;
  const scenario = (await (await owner.request.post(`/api/projects/${project.id}/scenarios`, { data: { title: "Hovering lab", document: blackHoleScenario("one-branch-stays") } })).json()).scenario;
  const created = await owner.request.post(`/api/projects/${project.id}/scenarios/${scenario.id}/share-links`, { data: { label: "for the colloquium" } });
  expect(created.status()).toBe(201);
  const { url, link } = (await created.json()) as { url: string; link: { id: string } };
  const token = url.split("/").pop()!;

  // Signed out: the share page draws the Diagram, with the Protocol and the Budget.
  const outsiderContext = await browser.newContext({ acceptDownloads: true });
  const outsider = await outsiderContext.newPage();
  // Nothing on the share page or the embed ever writes: no request but GET or HEAD leaves it.
  const writes: string[] = [];
  outsider.on("request", (r) => {
    if (r.method() !== "GET" && r.method() !== "HEAD") writes.push(`${r.method()} ${r.url()}`);
  });
  // The pages' Content-Security-Policy (proxy.ts) must let the Diagram, the Budget and the figure export work.
  const cspViolations: string[] = [];
  outsider.on("console", (m) => {
    if (/Content Security Policy/i.test(m.text())) cspViolations.push(m.text());
  });
  const opened = await outsider.goto(`/share/${token}`);
  expect(opened?.status()).toBe(200);
  expect(opened?.headers()["content-security-policy"]).toContain("frame-ancestors 'none'");
  expect(opened?.headers()["content-security-policy"]).toMatch(/script-src [^;]*'nonce-/);
  expect(opened?.headers()["x-frame-options"]).toBe("DENY");
  const diagram = outsider.getByTestId("diagram").locator("canvas").first();
  await expect(diagram).toBeVisible(slow);
  await expect.poll(() => diagram.evaluate(inkedPixels), slow).toBeGreaterThan(2000);
  await expect(outsider.getByRole("heading", { name: "Protocol", exact: true })).toBeVisible();
  await expect(outsider.getByTestId("budget")).toHaveAttribute("data-state", "current", slow);
  await expect(outsider.getByTestId("duration-hold")).toBeDisabled();

  // Export the SVG through the menu; the downloaded file parses as XML and names both branches.
  await outsider.getByRole("button", { name: "Export ▾" }).click();
  const [svgDownload] = await Promise.all([outsider.waitForEvent("download"), outsider.getByRole("button", { name: "Download Diagram SVG" }).click()]);
  expect(svgDownload.suggestedFilename()).toBe("hovering-lab-diagram.svg");
  const svgText = await readFile((await svgDownload.path())!, "utf8");
  const parsed = await outsider.evaluate((text) => {
    const doc = new DOMParser().parseFromString(text, "image/svg+xml");
    const path = (id: string) => doc.querySelector(`g#${id} path`)?.getAttribute("d") ?? null;
    return {
      error: doc.querySelector("parsererror")?.textContent ?? null,
      root: doc.documentElement.localName,
      branchA: path("branch-a"),
      branchB: path("branch-b"),
      labels: [...doc.querySelectorAll("g#labels text")].map((t) => t.textContent),
      legend: [...doc.querySelectorAll("g#legend text")].map((t) => t.textContent),
      caption: [...doc.querySelectorAll("g#caption text")].map((t) => t.textContent).join(" "),
      fontFaces: (doc.querySelector("style")?.textContent ?? "").match(/@font-face/g)?.length ?? 0,
    };
  }, svgText);
  expect(parsed.error).toBeNull();
  expect(parsed.root).toBe("svg");
  expect(parsed.branchA).toMatch(/^M[\d.]+ [\d.]+ L/);
  expect(parsed.branchB).toMatch(/^M[\d.]+ [\d.]+ L/);
  expect(parsed.labels).toEqual(expect.arrayContaining(["H⁺", "ℐ⁺"]));
  // It stands alone: a legend, a caption line in SI with units, and the fonts it uses carried inside.
  expect(parsed.legend).toEqual(expect.arrayContaining(["branch A (solid)", "branch B (dashed)"]));
  expect(parsed.caption).toMatch(/^Schwarzschild, M = .* kg .*lab at r = .* km.*separation d = .*protocol: separation/);
  expect(parsed.fontFaces).toBe(3);

  // The vector PDF of the same figure.
  const [pdfDownload] = await Promise.all([outsider.waitForEvent("download"), outsider.getByRole("button", { name: "Download Diagram PDF" }).click()]);
  expect(pdfDownload.suggestedFilename()).toBe("hovering-lab-diagram.pdf");
  const pdf = await readFile((await pdfDownload.path())!);
  expect(pdf.subarray(0, 5).toString("latin1")).toBe("%PDF-");

  // Without legend and caption, a PNG at 2× is twice the stage in each direction (read from the file's IHDR chunk,
  // PNG spec §11.2.2); with them it is as wide and taller.
  await outsider.getByLabel("2×").check();
  const [withBand] = await Promise.all([outsider.waitForEvent("download"), outsider.getByRole("button", { name: "Download Diagram PNG" }).click()]);
  const banded = await readFile((await withBand.path())!);
  await outsider.getByLabel("Legend").uncheck();
  await outsider.getByLabel("Caption").uncheck();
  const [pngDownload] = await Promise.all([outsider.waitForEvent("download"), outsider.getByRole("button", { name: "Download Diagram PNG" }).click()]);
  expect(pngDownload.suggestedFilename()).toBe("hovering-lab-diagram-2x.png");
  const png = await readFile((await pngDownload.path())!);
  expect(png.subarray(1, 4).toString("ascii")).toBe("PNG");
  const stage = (await diagram.boundingBox())!;
  expect(png.readUInt32BE(16)).toBe(2 * Math.round(stage.width));
  expect(png.readUInt32BE(20)).toBe(2 * Math.round(stage.height));
  expect(banded.readUInt32BE(16)).toBe(2 * Math.round(stage.width));
  expect(banded.readUInt32BE(20)).toBeGreaterThan(2 * Math.round(stage.height) + 100);

  // The embed answers any origin's frame, and draws inside a page of another site.
  const embedAnswer = await outsider.request.get(`/embed/${token}`);
  expect(embedAnswer.status()).toBe(200);
  expect(embedAnswer.headers()["content-security-policy"]).toContain("frame-ancestors *");
  expect(embedAnswer.headers()["content-security-policy"]).not.toContain("frame-ancestors 'none'");
  expect(embedAnswer.headers()["x-frame-options"]).toBeUndefined();
  // The slides come from another origin: a tiny page served on loopback at a port of its own (a page served by
  // Playwright itself counts as public, and Chromium keeps public pages from framing loopback addresses).
  const slides = createServer((_req, res) => {
    res.writeHead(200, { "content-type": "text/html; charset=utf-8" });
    res.end(`<!doctype html><title>Slides</title><iframe src="${baseURL}/embed/${token}?theme=dark&amp;type=large&amp;scrub=1" width="720" height="560"></iframe>`);
  });
  await new Promise<void>((resolve) => slides.listen(0, "127.0.0.1", resolve));
  await outsider.goto(`http://127.0.0.1:${(slides.address() as AddressInfo).port}/`);
  const frame = outsider.frameLocator("iframe");
  // Seen once in CI: the frame held two copies of the embed for a moment while the streamed page replaced its
  // loading text. Wait for the one embed (a lasting second copy still fails here), then read it.
  await expect(frame.getByTestId("embed")).toHaveCount(1, slow);
  await expect(frame.getByTestId("embed")).toHaveAttribute("data-theme", "dark", slow);
  const frameCanvas = frame.getByTestId("embed-diagram").locator("canvas").first();
  await expect(frameCanvas).toBeVisible(slow);
  await expect.poll(() => frameCanvas.evaluate(inkedPixels), slow).toBeGreaterThan(2000);
  await expect(frame.getByRole("banner")).toHaveCount(0);

  // Dark, with large labels: the Diagram's canvas is the frame's size (the controls lie over its edge, the figure
  // keeps clear of them), and the key's swatches and words are the dark figure palette's.
  const fit = await frameCanvas.evaluate((canvas) => ({ width: canvas.clientWidth, height: canvas.clientHeight, frameWidth: innerWidth, frameHeight: innerHeight }));
  expect(Math.abs(fit.width - fit.frameWidth)).toBeLessThanOrEqual(2);
  expect(Math.abs(fit.height - fit.frameHeight)).toBeLessThanOrEqual(2);
  const key = frame.getByTestId("diagram-legend");
  const swatches = await key.locator("[data-swatch]").evaluateAll((nodes) => nodes.map((n) => n.getAttribute("data-swatch")));
  const dark = FIGURE_PALETTES.dark;
  expect(swatches.slice(0, 2)).toEqual([dark.branchA, dark.branchB]);
  expect(swatches).toContain(dark.horizonTint);
  expect(swatches).not.toContain(FIGURE_PALETTES.light.branchB);
  const inkOf = (hex: string) => `rgb(${[1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16)).join(", ")})`;
  await expect(key).toHaveCSS("color", inkOf(dark.inkSoft));

  // Scrubbing back to the middle of the hold: the ramps' quanta and the hold's into H⁺, fewer than at the end.
  const slider = frame.getByLabel("Lab time");
  const atEnd = Number(await frame.getByTestId("running-horizon").getAttribute("data-log10"));
  await slider.fill("500");
  await expect(frame.getByTestId("scrub-time")).toContainText("τ = 550 ms");
  const midHorizon = Number(await frame.getByTestId("running-horizon").getAttribute("data-log10"));
  const midRamps = Number(await frame.getByTestId("running-ramp").getAttribute("data-log10"));
  expect(midHorizon).toBeLessThan(atEnd);
  expect(Number.isFinite(midRamps)).toBe(true);
  await expect(frame.getByText(/approximation/)).toBeVisible();
  await frame.getByRole("button", { name: /Play/ }).click();
  await expect(frame.getByRole("button", { name: /Pause/ })).toBeVisible();

  expect(writes).toEqual([]);
  expect(cspViolations).toEqual([]);

  // Revoked, the embed is not found too.
  expect((await owner.request.delete(`/api/projects/${project.id}/scenarios/${scenario.id}/share-links/${link.id}`)).status()).toBe(204);
  expect((await outsider.request.get(`/embed/${token}`)).status()).toBe(404);
  await outsiderContext.close();
  await owner.context().close();
  slides.close();
});

test("an editor's toolbar exports the scenario file and the Budget as CSV", async ({ browser }) => {
  const stamp = Date.now();
  const owner = await signedInAs(browser, "Export Owner", `export-owner-${stamp}@example.test`);
  const project = (await (await owner.request.post("/api/projects", { data: { name: "Exports" } })).json()).project;
  const scenario = (await (await owner.request.post(`/api/projects/${project.id}/scenarios`, { data: { title: "Hovering lab", document: blackHoleScenario("one-branch-stays") } })).json()).scenario;
  await owner.goto(`/projects/${project.id}/scenarios/${scenario.id}`);
  await expect(owner.getByTestId("budget")).toHaveAttribute("data-state", "current", slow);
  await owner.getByRole("button", { name: "Export ▾" }).click();

  const [file] = await Promise.all([owner.waitForEvent("download"), owner.getByRole("button", { name: "Download scenario file (JSON)" }).click()]);
  expect(file.suggestedFilename()).toBe("hovering-lab.json");
  const scenarioFile = JSON.parse(await readFile((await file.path())!, "utf8"));
  // The file carries the document as read: upgraded to the current schema version (3, with no environment).
  expect(scenarioFile).toMatchObject({ format: "branchline-scenario", formatVersion: 1, title: "Hovering lab", document: { ...blackHoleScenario("one-branch-stays"), schemaVersion: 3, environment: null } });

  const [csv] = await Promise.all([owner.waitForEvent("download"), owner.getByRole("button", { name: "Download Budget (CSV)" }).click()]);
  expect(csv.suggestedFilename()).toBe("hovering-lab-budget.csv");
  const lines = (await readFile((await csv.path())!, "utf8")).split("\r\n");
  // The scenario's inputs come first, then the numbers, then the flags once each.
  expect(lines[0]).toBe("# schemaVersion: 3");
  expect(lines).toContain("# background.kind: schwarzschild");
  expect(lines).toContain("quantity,value,unit,source");
  expect(lines).toContain("flag,status,message");
  const horizon = lines.find((l) => l.startsWith("Quanta into the horizon (electromagnetic),"))!;
  const shown = Number(await owner.getByTestId("budget-electromagnetic-horizon").getAttribute("data-value"));
  expect(Number(horizon.split(",")[1])).toBe(shown);

  // The Budget as a picture for a slide: a PNG at 2× (the table's width twice over, and more than a blank image
  // weighs) and an SVG, light or dark, with the caption line.
  await owner.keyboard.press("Escape");
  const table = (await owner.getByTestId("budget").locator("table").first().boundingBox())!;
  await owner.getByRole("button", { name: "Picture ▾" }).click();
  const picture = owner.getByRole("group", { name: "Budget picture" });
  await picture.getByLabel("dark").check();
  const [budgetPng] = await Promise.all([owner.waitForEvent("download"), picture.getByRole("button", { name: "Budget PNG" }).click()]);
  expect(budgetPng.suggestedFilename()).toBe("hovering-lab-budget.png");
  const budgetPngBytes = await readFile((await budgetPng.path())!);
  expect(budgetPngBytes.subarray(0, 8)).toEqual(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]));
  expect(budgetPngBytes.readUInt32BE(16)).toBeGreaterThanOrEqual(2 * Math.floor(table.width));
  // Drawn, not blank: thousands of pixels differ from the ground.
  const inked = await owner.evaluate(async (base64) => {
    const image = new Image();
    image.src = `data:image/png;base64,${base64}`;
    await image.decode();
    const canvas = document.createElement("canvas");
    [canvas.width, canvas.height] = [image.width, image.height];
    canvas.getContext("2d")!.drawImage(image, 0, 0);
    const { data } = canvas.getContext("2d")!.getImageData(0, 0, canvas.width, canvas.height);
    let count = 0;
    for (let i = 0; i < data.length; i += 4) if (data[i] !== data[0] || data[i + 1] !== data[1] || data[i + 2] !== data[2]) count++;
    return count;
  }, budgetPngBytes.toString("base64"));
  expect(inked).toBeGreaterThan(5_000);
  const [budgetSvg] = await Promise.all([owner.waitForEvent("download"), picture.getByRole("button", { name: "Budget SVG" }).click()]);
  expect(budgetSvg.suggestedFilename()).toBe("hovering-lab-budget.svg");
  const svgFile = await readFile((await budgetSvg.path())!, "utf8");
  expect(svgFile).toMatch(/^<svg /);
  expect(svgFile).toContain("Into the horizon");
  expect(svgFile).toContain("Schwarzschild, M = ");
  expect(svgFile.length).toBeGreaterThan(5_000);
  await owner.context().close();
});
