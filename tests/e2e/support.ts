import { expect, type Page } from "@playwright/test";
import { fileURLToPath } from "node:url";

export const DEMO_PASSWORD = "loop-demo-2026";
export const demo = {
  admin: "admin@quillfen.example",
  designer: "designer@quillfen.example",
  engineer: "engineer@quillfen.example",
  installer: "installer@quillfen.example",
} as const;
export type DemoRole = keyof typeof demo;
export const demoRoles = Object.keys(demo) as DemoRole[];

export const port = Number(process.env.E2E_PORT ?? 3100);
export const baseURL = `http://localhost:${port}`;
/** The mail sink's own page (scripts/mail-sink.ts): one above its SMTP port, which is 1000 above the app's. */
export const mailPage = `http://127.0.0.1:${port + 1001}/`;

/** Signs in through the sign-in form. Specs that do not test the form itself start from a saved state instead (`signedInAs`). */
export async function signIn(page: Page, role: DemoRole, password = DEMO_PASSWORD) {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(demo[role]);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByTestId("whoami")).toBeVisible({ timeout: 20_000 });
}

// Signed-in states saved once per run by the setup project (support-auth.setup.ts), in the git-ignored .auth/
// folder; one folder per port, so that parallel runs (E2E_PORT) keep their own.
export type SavedState = DemoRole | `rival-${DemoRole}`;
export const authFile = (who: SavedState) => fileURLToPath(new URL(`../../.auth/e2e-${port}/${who}.json`, import.meta.url));

/** For `test.use(...)`: every page, browser context and request context of the test starts signed in as `role`. */
export const signedInAs = (role: DemoRole) => ({ storageState: authFile(role) });

/** An empty state: a context that must be signed out even where `signedInAs` is in use. */
export const signedOut = { cookies: [], origins: [] };

/** The home page (the site list) of a context started from a saved state, where a sign-in through the form would land. */
export async function openHome(page: Page) {
  await page.goto("/");
  await expect(page.getByTestId("whoami")).toBeVisible();
}
