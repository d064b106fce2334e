import { expect, type Page } from "@playwright/test";

export const DEMO_PASSWORD = "loop-demo-2026";
export const demo = {
  admin: "admin@quillfen.example",
  designer: "designer@quillfen.example",
  engineer: "engineer@quillfen.example",
  installer: "installer@quillfen.example",
} as const;
export type DemoRole = keyof typeof demo;

export async function signIn(page: Page, role: DemoRole, password = DEMO_PASSWORD) {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(demo[role]);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByTestId("whoami")).toBeVisible();
}
