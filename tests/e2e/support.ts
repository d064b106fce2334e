import { expect, type Page } from "@playwright/test";

export const DEMO_PASSWORD = "loop-demo-2026";
export const demo = {
  admin: "admin@quillfen.example",
  designer: "designer@quillfen.example",
  engineer: "engineer@quillfen.example",
  installer: "installer@quillfen.example",
} as const;
export type DemoRole = keyof typeof demo;

/** The mail sink's own page (scripts/mail-sink.ts): one above its SMTP port, which is 1000 above the app's. */
export const mailPage = `http://127.0.0.1:${Number(process.env.E2E_PORT ?? 3100) + 1001}/`;

export async function signIn(page: Page, role: DemoRole, password = DEMO_PASSWORD) {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(demo[role]);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByTestId("whoami")).toBeVisible();
}
