import type { Transaction } from "sequelize";
import { Area, Floor, Membership, Organisation, Room, Site, SiteInstaller, User } from "@/models";
import type { Role } from "@/lib/auth/permissions";

// Test-only: a second fictional organisation, so the browser tests can check that one organisation never
// reaches another's objects. Seeded only when LOOPWRIGHT_SEED_RIVAL=1 (scripts/serve-e2e.sh sets it).
export const RIVAL_PASSWORD = "rival-demo-2026";
export const rivalOrganisationName = "Brackenlow Alarm Works";
export const rivalUsers: { email: string; name: string; role: Role }[] = [
  { email: "admin@brackenlow.example", name: "Rival Admin", role: "admin" },
  { email: "designer@brackenlow.example", name: "Rival Designer", role: "designer" },
  { email: "engineer@brackenlow.example", name: "Rival Engineer", role: "engineer" },
  { email: "installer@brackenlow.example", name: "Rival Installer", role: "installer" },
];
export const rivalSiteName = "Tiller Street Workshop";

export interface RivalIds {
  organisationId: number;
  siteId: number;
  users: Record<Role, number>;
}

/** The rival organisation: one member per role and one site with a floor and two rooms. */
export async function seedRivalOrganisation(transaction: Transaction, hash: (password: string) => Promise<string>): Promise<RivalIds> {
  const org = await Organisation.create({ name: rivalOrganisationName }, { transaction });
  const passwordHash = await hash(RIVAL_PASSWORD);
  const users = {} as Record<Role, number>;
  for (const u of rivalUsers) {
    const user = await User.create({ email: u.email, name: u.name, passwordHash }, { transaction });
    await Membership.create({ organisationId: org.id, userId: user.id, role: u.role }, { transaction });
    users[u.role] = user.id;
  }
  const site = await Site.create(
    { organisationId: org.id, name: rivalSiteName, address: "4 Tiller Street, Westmere", description: "Single-storey joinery workshop (test data of the rival organisation)."},
    { transaction },
  );
  await SiteInstaller.create({ siteId: site.id, userId: users.installer }, { transaction });
  const floor = await Floor.create({ siteId: site.id, name: "Ground floor", position: 0 }, { transaction });
  const area = await Area.create({ siteId: site.id, floorId: floor.id, name: "Ground floor", position: 0 }, { transaction });
  await Room.bulkCreate([{ areaId: area.id, name: "Workshop" }, { areaId: area.id, name: "Office" }], { transaction });
  return { organisationId: org.id, siteId: site.id, users };
}
