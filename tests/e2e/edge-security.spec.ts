import { test, expect } from "@playwright/test";
import { baseURL } from "./support-api";
import { DEMO_PASSWORD, demo, signIn, signedInAs } from "./support";

// The production build seen from Chromium: the development outbox does not exist, a hostile callbackUrl
// cannot take the browser to another host after sign-in, pages carry a nonce-based CSP and still hydrate,
// and authenticated API answers are not cached.

const origin = new URL(baseURL).origin;

test("the development outbox is a 404 in the production build, signed out", async ({ request }) => {
  for (const path of ["/dev/outbox", "/dev/outbox/1/attachments/0"]) expect((await request.get(path)).status(), `${path} signed out`).toBe(404);
});

test.describe("as an admin", () => {
  test.use(signedInAs("admin"));
  test("the development outbox is a 404 in the production build", async ({ page }) => {
    const res = await page.goto("/dev/outbox");
    expect(res?.status()).toBe(404);
    await expect(page.getByText("Development outbox")).toHaveCount(0);
    expect((await page.request.get("/dev/outbox/1/attachments/0")).status(), "attachment as admin").toBe(404);
  });
});

for (const callbackUrl of ["/\\evil.example", "//evil.example", "https://evil.example/sites"]) {
  test(`after sign-in with callbackUrl ${JSON.stringify(callbackUrl)} the browser stays on the app's origin`, async ({ page }) => {
    const left: string[] = [];
    page.on("request", (r) => {
      if (r.isNavigationRequest() && new URL(r.url()).origin !== origin) left.push(r.url());
    });
    await page.goto(`/sign-in?callbackUrl=${encodeURIComponent(callbackUrl)}`);
    await page.getByLabel("E-mail").fill(demo.designer);
    await page.getByLabel("Password").fill(DEMO_PASSWORD);
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect(page.getByRole("button", { name: "Sign in" })).toHaveCount(0);
    await page.waitForLoadState("load");
    expect(new URL(page.url()).origin, page.url()).toBe(origin);
    expect(left, "navigations to another origin").toEqual([]);
  });
}

test("pages carry a fresh script nonce and no 'unsafe-inline' scripts, and still hydrate and respond to clicks", async ({ page }) => {
  const violations: string[] = [];
  page.on("console", (m) => {
    if (/Content Security Policy/i.test(m.text())) violations.push(m.text());
  });
  const first = await page.goto("/sign-in");
  const csp = first!.headers()["content-security-policy"];
  const scriptSrc = csp.split(";").map((d) => d.trim()).find((d) => d.startsWith("script-src "))!;
  expect(scriptSrc).toMatch(/'nonce-[A-Za-z0-9+/=]{16,}'/);
  expect(scriptSrc).not.toContain("'unsafe-inline'");
  expect(csp).toContain("frame-ancestors 'none'");
  expect(first!.headers()["cache-control"]).toMatch(/no-store/);
  const again = await page.request.get("/sign-in");
  expect(again.headers()["content-security-policy"]).not.toBe(csp);

  // signing in runs the form's client code (a native submit would reload the sign-in page)
  await signIn(page, "designer");
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Loop bench" }).click();
  await expect(page.getByRole("heading", { name: "Loop bench" })).toBeVisible();
  // the bench computes in the browser: a short at the detector end with the resistor there reads "short"
  await page.getByLabel("Input type", { exact: true }).selectOption({ label: "2.2 kΩ input" });
  await page.getByRole("radio", { name: "single end-of-line", exact: true }).check();
  await expect(page.getByTestId("panel-report")).toHaveText("normal");
  await page.getByRole("radio", { name: "resistor at the detector", exact: true }).check();
  await page.getByRole("radio", { name: "short at the detector end", exact: true }).check();
  await expect(page.getByTestId("panel-report")).toHaveText("short");
  expect(violations, "scripts blocked by the CSP").toEqual([]);
});

test.describe("as a designer", () => {
  test.use(signedInAs("designer"));
  test("authenticated API answers are private and not stored", async ({ page }) => {
    const res = await page.request.get("/api/sites");
    expect(res.status()).toBe(200);
    expect(res.headers()["cache-control"]).toBe("private, no-store");
  });
});
