import { test, expect, type Browser, type BrowserContext, type Page } from "@playwright/test";
import AxeBuilder from "@axe-core/playwright";
import { demoRoles, signedInAs, signedOut, type DemoRole } from "./support";
import { demoSiteName, openDb } from "./support-api";

// Every page as every role, on a desktop (1440 × 900) and a phone (390 × 844): no console error, no page error
// (React's hydration errors #418 and the like land there), no serious or critical axe violation, and no page wider
// than the screen. One browser context and one tab per role; each page is checked at both sizes.
// Pages a role may not open are visited too: the refusal is a page people read.

const viewports = [
  { name: "desktop", width: 1440, height: 900 },
  { name: "phone", width: 390, height: 844 },
] as const;

/** Every app/**\/page.tsx, with placeholders for the demo ids; the development outbox is a 404 in a build and is left out. */
const layoutPages = (id: string) => [`/sites/:site/layouts/${id}`, `/sites/:site/layouts/${id}/review`, `/sites/:site/layouts/${id}/sheet`, `/sites/:site/layouts/${id}/zones`, `/sites/:site/layouts/${id}/commissioning`];
const signedInRoutes = [
  "/",
  "/catalog",
  "/catalog/input-5k6",
  "/catalog/panel-compact-8",
  "/catalog/smoke-4wire-nc",
  "/loop-bench",
  "/members",
  "/audit",
  "/sites/:site",
  "/sites/:site/schedule",
  "/sites/:site/plans",
  "/sites/:site/layouts",
  "/sites/:site/compare?ids=:first,:second",
  ...layoutPages(":first"),
  ...layoutPages(":approved"),
];
const withIds = (route: string) =>
  route
    .replace(":site", String(ids.siteId))
    .replace(":first", String(ids.layoutIds[0]))
    .replace(":second", String(ids.layoutIds[1]))
    .replace(":approved", String(ids.approvedLayoutId));
const signedOutRoutes = ["/sign-in", "/invite/not-a-real-invitation-token"];

interface Ids {
  siteId: number;
  layoutIds: number[];
  /** A layout made and approved for this spec, so that the sheet and commissioning pages show an approved revision. */
  approvedLayoutId: number;
}
let ids: Ids;
const CHECK_LAYOUT = "Every page check";

async function approvedLayout(browser: Browser, siteId: number, existing: number | undefined): Promise<number> {
  if (existing !== undefined) return existing; // made by an earlier worker of this run
  const designer = await browser.newContext(signedInAs("designer"));
  const made = await designer.request.post(`/api/sites/${siteId}/layouts`, { data: { name: CHECK_LAYOUT, suggestion: { allowShared: false, busCableM: 120 } } });
  expect(made.status(), await made.text()).toBe(200);
  const id = ((await made.json()) as { layout: { id: number } }).layout.id;
  expect((await designer.request.post(`/api/layouts/${id}/review`, { data: { action: "submit" } })).status()).toBe(200);
  await designer.close();
  const engineer = await browser.newContext(signedInAs("engineer"));
  const approve = await engineer.request.post(`/api/layouts/${id}/review`, { data: { action: "approve" } });
  expect(approve.status(), await approve.text()).toBe(200);
  await engineer.close();
  return id;
}

test.beforeAll(async ({ browser }) => {
  const conn = await openDb();
  try {
    const [site] = await conn.query("SELECT id FROM sites WHERE name = ? ORDER BY id LIMIT 1", [demoSiteName]);
    const layouts = (await conn.query("SELECT id, name FROM layouts WHERE site_id = ? ORDER BY id", [site.id])) as { id: number; name: string }[];
    const demoLayouts = layouts.filter((l) => l.name !== CHECK_LAYOUT).slice(0, 2);
    expect(demoLayouts.length, "the demo's two layouts").toBe(2);
    const made = layouts.find((l) => l.name === CHECK_LAYOUT)?.id;
    ids = { siteId: site.id, layoutIds: demoLayouts.map((l) => l.id), approvedLayoutId: await approvedLayout(browser, site.id, made) };
  } finally {
    await conn.end();
  }
});

test.afterAll(async ({ browser }) => {
  if (!ids?.approvedLayoutId) return;
  const designer = await browser.newContext(signedInAs("designer"));
  await designer.request.delete(`/api/layouts/${ids.approvedLayoutId}`);
  await designer.close();
});

/** Problems on one page at one size, as lines a reader can act on. */
async function checkPage(page: Page, path: string, problems: string[]): Promise<string[]> {
  const found: string[] = [];
  problems.length = 0;
  const res = await page.goto(path, { waitUntil: "load" });
  // SWR requests settle; pages that keep a request open are checked after the wait anyway
  await page.waitForLoadState("networkidle", { timeout: 3_000 }).catch(() => undefined);
  if (!res || res.status() >= 400) found.push(`answered ${res?.status() ?? "nothing"}`);
  found.push(...problems);
  const width = await page.evaluate(() => {
    const inner = window.innerWidth;
    // the outermost elements that reach past the right edge, to say what makes the page too wide
    const past = [...document.body.querySelectorAll("*")].filter((e) => e.getBoundingClientRect().right > inner + 1 && !(e.parentElement && e.parentElement.getBoundingClientRect().right > inner + 1));
    const name = (e: Element) => `${e.tagName.toLowerCase()}${e.id ? `#${e.id}` : ""}${e.getAttribute("data-testid") ? `[data-testid=${e.getAttribute("data-testid")}]` : ""}.${[...e.classList].slice(0, 4).join(".")}`;
    return { scroll: document.documentElement.scrollWidth, inner, culprits: past.slice(0, 3).map((e) => `${name(e)} (${Math.round(e.getBoundingClientRect().right)} px)`) };
  });
  if (width.scroll > width.inner) found.push(`wider than the screen: ${width.scroll} px in ${width.inner} px, from ${width.culprits.join(" | ")}`);
  const axe = await new AxeBuilder({ page }).analyze();
  for (const v of axe.violations.filter((x) => x.impact === "serious" || x.impact === "critical"))
    found.push(`axe ${v.impact} ${v.id}: ${v.help} — ${v.nodes.slice(0, 3).map((n) => n.target.join(" ")).join(" | ")}${v.nodes.length > 3 ? ` (+${v.nodes.length - 3})` : ""}`);
  return found;
}

/** One tab for a role, kept across its pages; console and page errors are collected per page. */
function describeRole(title: string, state: () => Parameters<Browser["newContext"]>[0], routes: readonly string[]) {
  test.describe(title, () => {
    let context: BrowserContext;
    let page: Page;
    const problems: string[] = [];
    test.beforeAll(async ({ browser }) => {
      context = await browser.newContext(state());
      page = await context.newPage();
      page.on("console", (m) => {
        if (m.type() === "error") problems.push(`console error: ${m.text().slice(0, 300)}`);
      });
      page.on("pageerror", (e) => problems.push(`page error: ${e.message.slice(0, 300)}`));
    });
    test.afterAll(async () => {
      await context?.close();
    });
    for (const route of routes)
      test(route, async () => {
        test.setTimeout(180_000); // a long terminal sheet takes axe a while on a busy machine
        const path = withIds(route);
        const failures: string[] = [];
        for (const vp of viewports) {
          await page.setViewportSize({ width: vp.width, height: vp.height });
          for (const f of await checkPage(page, path, problems)) failures.push(`${vp.name} ${path}: ${f}`);
        }
        expect(failures, failures.join("\n")).toEqual([]);
      });
  });
}

for (const role of demoRoles) describeRole(`as the ${role}`, () => signedInAs(role as DemoRole), signedInRoutes);
describeRole("signed out", () => ({ storageState: signedOut }), signedOutRoutes);
