import { test, expect } from "@playwright/test";
import { mailPage } from "./support";

// A new firm starts from the sign-in page: signs an organisation up, is refused until the e-mail is confirmed,
// confirms from the mail sink, signs in as the organisation's admin and sets the organisation's currency.

test("an organisation signs up from the sign-in page, confirms its e-mail from the outbox, signs in and changes its currency", async ({ page }) => {
  const stamp = Date.now().toString(36);
  const email = `founder.${stamp}@ferncastle.example`;
  const password = "copper-heron-lantern-42";

  await page.goto("/sign-in");
  await page.getByRole("link", { name: "Start a new organisation" }).click();
  await expect(page).toHaveURL(/\/sign-up$/);
  await page.getByLabel("Organisation name", { exact: true }).fill(`Ferncastle Alarm Works ${stamp}`);
  await page.getByLabel("Your name", { exact: true }).fill("Isolde Marrow");
  await page.getByLabel("E-mail", { exact: true }).fill(email);
  await page.getByLabel("Password").fill("short");
  await page.getByRole("button", { name: "Start the organisation" }).click();
  // the shared schema's message, beside the field
  await expect(page.getByText("Use at least 10 characters")).toBeVisible();
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Start the organisation" }).click();
  // the strength dictionaries load when the form is sent, and the server hashes the password: give it time on a busy machine
  await expect(page.getByRole("status")).toContainText(email, { timeout: 30_000 });

  // Not confirmed yet: the right password is refused with the reason and a way to get the link again.
  await page.goto("/sign-in");
  await page.getByLabel("E-mail", { exact: true }).fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByText("Confirm your e-mail address first")).toBeVisible({ timeout: 15_000 });
  await expect(page.getByRole("button", { name: "Send the link again" })).toBeVisible();
  await expect(page.getByTestId("whoami")).toHaveCount(0);

  await page.goto(mailPage);
  const mail = page.locator("#messages > li").filter({ hasText: email }).first();
  await expect(mail).toBeVisible();
  await mail.getByRole("link", { name: /\/confirm-email\// }).click();
  await page.getByRole("button", { name: "Confirm my e-mail address" }).click();
  await expect(page.getByRole("status")).toContainText(`${email} is confirmed`);

  await page.getByRole("link", { name: "Sign in" }).click();
  await page.getByLabel("E-mail", { exact: true }).fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByTestId("whoami")).toContainText(`Isolde Marrow · Admin · Ferncastle Alarm Works ${stamp}`);

  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Settings" }).click();
  await expect(page.getByLabel("Currency")).toHaveValue("EUR");
  await page.getByLabel("Currency").fill("QQX");
  await page.getByRole("button", { name: "Save settings" }).click();
  await expect(page.getByText("Enter a three-letter ISO 4217 currency code")).toBeVisible();
  await page.getByLabel("Currency").fill("gbp");
  await page.getByRole("button", { name: "Save settings" }).click();
  await expect(page.getByRole("status")).toHaveText("Settings saved.");
  // every price is now written in pounds, through Intl with the organisation's locale
  await expect(page.getByTestId("format-sample")).toContainText("£1,234.50");
  await page.reload();
  await expect(page.getByLabel("Currency")).toHaveValue("GBP");
});
