import type { Transaction } from "sequelize";
import { Area, AuditEntry, Floor, Membership, Organisation, Room, Site, SiteInstaller, User } from "@/models";
import type { Role } from "@/lib/auth/permissions";
import { shippedCatalog } from "@/lib/catalog/shipped";
import { seedDemoDesign } from "./seed-demo-design";

// A scenario of our own: every name, address and address book entry here is invented.
export const DEMO_PASSWORD = "loop-demo-2026";
export const demoUsers: { email: string; name: string; role: Role }[] = [
  { email: "admin@quillfen.example", name: "Demo Admin", role: "admin" },
  { email: "designer@quillfen.example", name: "Demo Designer", role: "designer" },
  { email: "engineer@quillfen.example", name: "Demo Engineer", role: "engineer" },
  { email: "installer@quillfen.example", name: "Demo Installer", role: "installer" },
];

export const demoBuilding = {
  name: "Marrowbank Community Library",
  address: "12 Tallow Lane, Eastmere",
  description:
    "Two-storey lending library with a basement archive. Intruder detection on all openings and open areas, hold-up buttons at the issue desk, flood detection in the archive, and smoke detection in the archive and plant room.",
  areas: [
    { name: "Basement", rooms: ["Archive", "Plant room", "Stair B"] },
    { name: "Ground floor", rooms: ["Entrance lobby", "Issue desk", "Lending hall", "Children's corner", "Staff kitchen"] },
    { name: "First floor", rooms: ["Reading room", "Study rooms", "Office", "Store"] },
  ],
};

export interface DemoIds {
  organisationId: number;
  siteId: number;
  users: Record<Role, number>;
}

export async function seedDemo(transaction: Transaction, hash: (password: string) => Promise<string>): Promise<DemoIds> {
  const org = await Organisation.create({ name: "Quillfen Security Design" }, { transaction });
  const passwordHash = await hash(DEMO_PASSWORD);
  const users = {} as Record<Role, number>;
  for (const u of demoUsers) {
    const user = await User.create({ email: u.email, name: u.name, passwordHash }, { transaction });
    await Membership.create({ organisationId: org.id, userId: user.id, role: u.role }, { transaction });
    users[u.role] = user.id;
  }
  const site = await Site.create(
    { organisationId: org.id, name: demoBuilding.name, address: demoBuilding.address, description: demoBuilding.description, contactName: "Facilities desk", contactPhone: "", contactEmail: "facilities@quillfen-library.example", securityGrade: 2 },
    { transaction },
  );
  await SiteInstaller.create({ siteId: site.id, userId: users.installer }, { transaction });
  // each storey is a floor holding one area of its name: the schedule names the storey as the detector's area
  for (const [position, a] of demoBuilding.areas.entries()) {
    const floor = await Floor.create({ siteId: site.id, name: a.name, position }, { transaction });
    const area = await Area.create({ siteId: site.id, floorId: floor.id, name: a.name, position: 0 }, { transaction });
    await Room.bulkCreate(a.rooms.map((name, i) => ({ areaId: area.id, name, position: i })), { transaction });
  }
  await seedDemoDesign(transaction, { organisationId: org.id, siteId: site.id, userId: users.designer }, shippedCatalog().catalog);
  await AuditEntry.create({ organisationId: org.id, userId: users.admin, action: "demo.seed", entityType: "organisation", entityId: String(org.id), detail: null }, { transaction });
  return { organisationId: org.id, siteId: site.id, users };
}
