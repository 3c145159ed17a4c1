/**
 * What every response says about itself, on a real `next start`: nosniff and a Referrer-Policy everywhere, a
 * Content-Security-Policy with a script nonce on pages (and the pages still run: signing in needs React's scripts),
 * and 400 or 404 — never 500 — for a path whose percent-encoding does not decode, on every dynamic route.
 * Header meanings: Fetch standard (X-Content-Type-Options), Referrer Policy (W3C), CSP Level 3 (W3C).
 */
import { expect, test } from "@playwright/test";
import { signedInAs } from "./helpers";

test("every response carries nosniff and a Referrer-Policy; pages a nonce CSP with object-src and base-uri", async ({ request }) => {
  for (const path of ["/", "/sign-in", "/methods", "/api/projects", "/api/share/not-a-token"]) {
    const res = await request.get(path, { maxRedirects: 0 });
    expect(res.status(), path).toBeLessThan(500);
    expect(res.headers()["x-content-type-options"], path).toBe("nosniff");
    expect(res.headers()["referrer-policy"], path).toBe("strict-origin-when-cross-origin");
  }
  const page = await request.get("/sign-in");
  const policy = page.headers()["content-security-policy"];
  expect(policy).toMatch(/script-src [^;]*'nonce-[A-Za-z0-9+/=]+'/);
  expect(policy).toContain("object-src 'none'");
  expect(policy).toContain("base-uri 'self'");
  expect(policy).toContain("frame-ancestors 'none'");
  const nonce = /'nonce-([^']+)'/.exec(policy)![1];
  // Next.js stamps the nonce on its own scripts.
  expect(await page.text()).toContain(`nonce="${nonce}"`);
});

test("pages run under the policy: a researcher signs up and in with no CSP violation", async ({ browser }) => {
  const violations: string[] = [];
  const page = await signedInAs(browser, "Policy Reader", `policy-reader-${Date.now()}@example.test`);
  page.on("console", (m) => {
    if (/Content Security Policy/i.test(m.text())) violations.push(m.text());
  });
  await page.goto("/methods");
  await expect(page.locator(".katex").first()).toBeVisible({ timeout: 30_000 });
  await page.goto("/projects");
  await expect(page.getByRole("heading").first()).toBeVisible();
  expect(violations).toEqual([]);
  await page.context().close();
});

test("an undecodable path segment answers 400 or 404 on every dynamic route, never 500", async ({ request }) => {
  const id = "00000000-0000-4000-8000-000000000000";
  const paths = [
    "/share/%ff",
    "/embed/%ff",
    "/invitations/%ff",
    "/projects/%ff",
    `/projects/${id}/scenarios/%ff`,
    `/projects/${id}/scenarios/%ff/history`,
    "/api/share/%ff",
    "/api/share/%ff/export?what=scenario",
    "/api/projects/%ff",
    `/api/projects/${id}/scenarios/%ff`,
    `/api/projects/${id}/members/%ff`,
    `/api/projects/${id}/scenarios/${id}/revisions/%ff`,
    "/api/invitations/%ff/accept",
    "/api/admin/users/%ff",
  ];
  for (const path of paths) {
    const res = await request.get(path, { maxRedirects: 0 });
    expect([400, 404], `${path} answered ${res.status()}`).toContain(res.status());
  }
  const post = await request.post("/api/invitations/%ff/accept");
  expect([400, 401, 404]).toContain(post.status());
});
