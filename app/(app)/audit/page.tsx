import type { Metadata } from "next";
import { pageActor } from "@/lib/server/session";
import { listAudit } from "@/lib/server/audit-log";
import { makeFormat } from "@/lib/format/format";
import { PageHeader } from "@/components/ui/page-header";
import { Refusal } from "@/components/ui/refusal";
import { Card } from "@/components/ui/card";
import { AUDIT_ACTION_WORDS, AUDIT_ENTITY_WORDS } from "@/lib/vocabulary/words";

export const metadata: Metadata = { title: "Audit log" };

export default async function AuditPage() {
  const { actor, allowed, reason } = await pageActor("audit:read", "/audit");
  if (!allowed) return <Refusal reason={reason} />;
  const entries = await listAudit(actor.organisationId);
  const fmt = makeFormat(actor.settings);
  return (
    <>
      <PageHeader title="Audit log" subtitle="Who changed what, and when (newest first)." />
      <Card>
        <div className="relative overflow-x-auto" tabIndex={0} role="region" aria-label="Audit log entries">
          <table className="w-full text-sm">
            <thead className="text-left text-slate-600">
              <tr>
                <th className="py-2">When ({actor.settings.timeZone})</th>
                <th>Who</th>
                <th>What</th>
                <th>Item</th>
              </tr>
            </thead>
            <tbody>
              {entries.map((e) => (
                <tr key={e.id} className="border-t border-line align-top">
                  <td className="py-2 whitespace-nowrap">{fmt.dateTime(e.createdAt)}</td>
                  <td>{e.userName ?? "—"}</td>
                  <td>{AUDIT_ACTION_WORDS[e.action] ?? e.action.replace(/[._]/g, " ")}</td>
                  <td className="break-words">
                    {AUDIT_ENTITY_WORDS[e.entityType] ?? e.entityType.replace(/_/g, " ")} {e.entityId}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </Card>
    </>
  );
}
