import { test as setup, expect } from "@playwright/test";
import { RIVAL_PASSWORD, rivalUsers } from "@/scripts/demo/seed-rival";
import { authFile, demoRoles, signIn } from "./support";
import { signInApi } from "./support-api";

// The setup project (playwright.config.ts): each demo role signs in once through the form, each role of the
// rival organisation once through next-auth's credentials endpoint; the specs start from these saved states.

for (const role of demoRoles) {
  setup(`sign in as the demo ${role}`, async ({ page }) => {
    await signIn(page, role);
    await expect(page.getByTestId("whoami")).toContainText(role, { ignoreCase: true });
    await page.context().storageState({ path: authFile(role) });
  });
}

for (const role of demoRoles) {
  setup(`sign in as the rival ${role}`, async ({ playwright }) => {
    const user = rivalUsers.find((u) => u.role === role);
    expect(user, `a rival ${role} in lib/demo/seed-rival.ts`).toBeDefined();
    const api = await signInApi(playwright, user!.email, RIVAL_PASSWORD);
    await api.storageState({ path: authFile(`rival-${role}`) });
    await api.dispose();
  });
}
