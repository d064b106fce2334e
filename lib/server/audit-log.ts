import "server-only";
import { bindModels } from "./db";
import { AuditEntry, User } from "@/models";

export async function listAudit(organisationId: number, limit = 200) {
  bindModels();
  const rows = await AuditEntry.findAll({ where: { organisationId }, order: [["id", "DESC"]], limit });
  const users = new Map((await User.findAll({ where: { id: [...new Set(rows.map((r) => r.userId).filter((x): x is number => x != null))] }, attributes: ["id", "name"] })).map((u) => [u.id, u.name]));
  return rows.map((r) => ({ id: r.id, createdAt: r.createdAt.toISOString(), userName: r.userId ? (users.get(r.userId) ?? null) : null, action: r.action, entityType: r.entityType, entityId: r.entityId }));
}
