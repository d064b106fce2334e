import { describe, expect, it } from "vitest";
import { randomUUID } from "node:crypto";
import { makeOrganisation, testDb } from "./support";
import { Membership, User } from "@/models";
import { changeRole } from "@/lib/server/members";
import { ApiError } from "@/lib/server/errors";
import type { Actor } from "@/lib/server/session";

/** An organisation with two admins (the support's one plus another). */
async function twoAdmins() {
  const { org, actors } = await makeOrganisation("Last admin");
  const user = await User.create({ email: `admin2.${randomUUID().slice(0, 8)}@test.example`, name: "Second admin", passwordHash: null });
  const second = await Membership.create({ organisationId: org.id, userId: user.id, role: "admin" });
  const first = (await Membership.findOne({ where: { organisationId: org.id, userId: actors.admin.userId } }))!;
  const secondActor: Actor = { ...actors.admin, userId: user.id, name: user.name, email: user.email };
  return { org, actors, first, second, firstActor: actors.admin, secondActor };
}

const adminsOf = (organisationId: number) => Membership.count({ where: { organisationId, role: "admin" } });

describe("never an organisation without an admin", () => {
  it("two admins demoting each other at once: exactly one succeeds, the other is refused with a reason", async () => {
    testDb();
    for (let round = 0; round < 3; round++) {
      const { org, first, second, firstActor, secondActor } = await twoAdmins();
      const results = await Promise.allSettled([changeRole(firstActor, second.id, "designer"), changeRole(secondActor, first.id, "designer")]);
      const ok = results.filter((r) => r.status === "fulfilled");
      const refused = results.filter((r): r is PromiseRejectedResult => r.status === "rejected");
      expect(ok).toHaveLength(1);
      expect(refused).toHaveLength(1);
      const e = refused[0].reason as ApiError;
      expect(e).toBeInstanceOf(ApiError);
      expect(e.status).toBe(409);
      expect(e.message).toMatch(/without an admin/);
      expect(await adminsOf(org.id)).toBe(1);
    }
  });

  it("allows demotions one at a time while another admin remains", async () => {
    testDb();
    const { org, actors, second, firstActor } = await twoAdmins();
    await changeRole(firstActor, second.id, "engineer");
    expect(await adminsOf(org.id)).toBe(1);
    // Promote back, then a third admin makes a demotion safe.
    await changeRole(firstActor, second.id, "admin");
    expect(await adminsOf(org.id)).toBe(2);
    const designer = (await Membership.findOne({ where: { organisationId: org.id, userId: actors.designer.userId } }))!;
    await changeRole(firstActor, designer.id, "admin");
    await changeRole(firstActor, second.id, "installer");
    expect(await adminsOf(org.id)).toBe(2);
  });

  it("refuses a change by an admin whose own role was taken away meanwhile", async () => {
    testDb();
    const { org, actors, first, second, secondActor, firstActor } = await twoAdmins();
    const designer = (await Membership.findOne({ where: { organisationId: org.id, userId: actors.designer.userId } }))!;
    await changeRole(firstActor, designer.id, "admin");
    await changeRole(firstActor, second.id, "designer");
    // secondActor still holds an Actor object saying admin (read before the change).
    await expect(changeRole(secondActor, first.id, "designer")).rejects.toMatchObject({ status: 403 });
    expect(await adminsOf(org.id)).toBe(2);
  });
});
