import { test, expect } from "@playwright/test";
import { demo, mailPage, signIn, signedInAs, signedOut, type DemoRole } from "./support";

test("signed-out visitors are sent to the sign-in page, the API answers 401", async ({ page, request }) => {
  await page.goto("/members");
  await expect(page).toHaveURL(/\/sign-in/);
  const res = await request.get("/api/sites");
  expect(res.status()).toBe(401);
  expect((await res.json()).error).toMatch(/sign in/i);
});

test("wrong credentials give a clear message", async ({ page }) => {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(demo.designer);
  await page.getByLabel("Password").fill("not-the-password-1");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByRole("alert").filter({ hasText: "do not match" })).toBeVisible();
});

// What each role may see: the nav links and the members page.
const expectations: Record<DemoRole, { members: boolean; audit: boolean }> = {
  admin: { members: true, audit: true },
  designer: { members: false, audit: false },
  engineer: { members: false, audit: true },
  installer: { members: false, audit: false },
};

for (const role of Object.keys(expectations) as DemoRole[]) {
  test(`${role} signs in and sees what the role allows`, async ({ page }) => {
    await signIn(page, role);
    await expect(page.getByTestId("whoami")).toContainText(role, { ignoreCase: true });
    await expect(page.getByTestId("site-list")).toContainText("Marrowbank Community Library");
    const nav = page.getByRole("navigation", { name: "Main" });
    await expect(nav.getByRole("link", { name: "Members" })).toHaveCount(expectations[role].members ? 1 : 0);
    await expect(nav.getByRole("link", { name: "Audit log" })).toHaveCount(expectations[role].audit ? 1 : 0);
    await page.goto("/members");
    if (expectations[role].members) await expect(page.getByRole("heading", { name: "Members" })).toBeVisible();
    else await expect(page.getByTestId("refusal")).toContainText(`Your role (${role}) cannot see the member list`);
    const api = await page.request.get("/api/members");
    expect(api.status()).toBe(expectations[role].members ? 200 : 403);
  });
}

test.describe(() => {
  test.use(signedInAs("admin"));
  test("an admin invites a member by e-mail; the invitee sets a password from the mailed link and signs in", async ({ page, browser }) => {
    await page.goto("/members");
    const email = `new.installer.${Date.now()}@quillfen.example`;
    await page.getByLabel("E-mail").fill(email);
    await page.getByRole("combobox", { name: "Invite as" }).selectOption("installer");
    await page.getByRole("button", { name: "Send invitation" }).click();
    await expect(page.getByRole("status")).toContainText(`Invitation sent to ${email}`);

    const other = await browser.newContext({ storageState: signedOut });
    const invitee = await other.newPage();
    await invitee.goto(mailPage);
    const mail = invitee.locator("#messages > li").filter({ hasText: email }).first();
    await expect(mail).toBeVisible();
    await mail.getByRole("link", { name: /\/invite\// }).click();
    await invitee.getByLabel("Your name").fill("New Installer");
    await invitee.getByLabel("Password").fill("short");
    await invitee.getByRole("button", { name: "Set password and join" }).click();
    await expect(invitee.getByText("Use at least 10 characters")).toBeVisible();
    await invitee.getByLabel("Password").fill("wire-and-meter-77");
    await invitee.getByRole("button", { name: "Set password and join" }).click();
    await invitee.getByRole("link", { name: "Sign in" }).click();
    await invitee.getByLabel("E-mail").fill(email);
    await invitee.getByLabel("Password").fill("wire-and-meter-77");
    await invitee.getByRole("button", { name: "Sign in" }).click();
    await expect(invitee.getByTestId("whoami")).toContainText("Installer");
    await other.close();
  });
});

test("responses carry the security headers and the session cookie is httpOnly and SameSite", async ({ page, request }) => {
  const res = await request.get("/sign-in");
  const h = res.headers();
  expect(h["content-security-policy"]).toContain("frame-ancestors 'none'");
  expect(h["x-frame-options"]).toBe("DENY");
  expect(h["x-content-type-options"]).toBe("nosniff");
  await signIn(page, "designer");
  const cookie = (await page.context().cookies()).find((c) => c.name === "loopwright.session");
  expect(cookie?.httpOnly).toBe(true);
  expect(cookie?.sameSite).toBe("Lax");
});
