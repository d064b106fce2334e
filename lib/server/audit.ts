import "server-only";
import type { Transaction } from "sequelize";
import { AuditEntry } from "@/models";

export interface AuditInput {
  organisationId: number | null;
  userId: number | null;
  action: string;
  entityType: string;
  entityId?: string | number | null;
  detail?: unknown;
}

/** Every change of a design, a role or a catalog is written here, inside the change's own transaction. */
export async function audit(entry: AuditInput, transaction?: Transaction) {
  await AuditEntry.create(
    { ...entry, entityId: entry.entityId == null ? null : String(entry.entityId), detail: entry.detail ?? null },
    { transaction },
  );
}
