import { randomUUID } from "node:crypto";
import bcrypt from "bcryptjs";
import { db } from "@/lib/server/db";
import { Membership, Organisation, User } from "@/models";
import type { Role } from "@/lib/auth/permissions";
import { settingsOf, type Actor } from "@/lib/server/session";
import { assertTestDatabase } from "./global-setup";

/** The app's own cached instance, pointed at the test database. */
export function testDb() {
  assertTestDatabase();
  return db();
}

/** A fresh organisation with one member per role; unique names so tests never collide. */
export async function makeOrganisation(label = "Test org") {
  testDb();
  const org = await Organisation.create({ name: `${label} ${randomUUID().slice(0, 8)}` });
  const hash = await bcrypt.hash("test-password-1", 4);
  const actors = {} as Record<Role, Actor>;
  for (const role of ["admin", "designer", "engineer", "installer"] as Role[]) {
    const email = `${role}.${randomUUID().slice(0, 8)}@test.example`;
    const user = await User.create({ email, name: `Test ${role}`, passwordHash: hash });
    await Membership.create({ organisationId: org.id, userId: user.id, role });
    actors[role] = { userId: user.id, organisationId: org.id, organisationName: org.name, role, name: user.name, email, settings: settingsOf(org) };
  }
  return { org, actors };
}
