"use client";

import { useState } from "react";
import { roles, roleLabels, type Role } from "@/lib/auth/permissions";
import { inviteSchema, roleChangeSchema } from "@/lib/members/member-schema";
import { describeError, sendJson } from "@/lib/client/fetcher";
import { useMembers, type MemberList } from "@/lib/client/use-members";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { Field } from "@/components/ui/field";
import { useFormat } from "@/components/format/format-provider";

/** zod issues keyed by their first path segment, for the line under each field. */
function fieldErrors(issues: { path: PropertyKey[]; message: string }[]): Record<string, string> {
  const out: Record<string, string> = {};
  for (const i of issues) {
    const key = String(i.path[0] ?? "");
    out[key] = out[key] ? `${out[key]}; ${i.message}` : i.message;
  }
  return out;
}

export function MemberAdmin({ initial, selfUserId }: { initial: MemberList; selfUserId: number }) {
  const fmt = useFormat();
  const { members, invitations, error: loadError, mutate } = useMembers(initial);
  const [message, setMessage] = useState<{ kind: "ok" | "error"; text: string } | null>(null);
  const [inviteErrors, setInviteErrors] = useState<Record<string, string>>({});

  async function invite(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const target = e.currentTarget;
    setMessage(null);
    const parsed = inviteSchema.safeParse({ email: form.get("email"), role: form.get("role") });
    if (!parsed.success) {
      setInviteErrors(fieldErrors(parsed.error.issues));
      return;
    }
    setInviteErrors({});
    try {
      const r = await sendJson<{ email: string; role: Role }>("/api/members", "POST", parsed.data);
      setMessage({ kind: "ok", text: `Invitation sent to ${r.email}.` });
      target.reset();
      await mutate();
    } catch (err) {
      setMessage({ kind: "error", text: describeError(err) });
    }
  }

  async function setRole(membershipId: number, role: Role) {
    setMessage(null);
    try {
      await sendJson(`/api/members/${membershipId}`, "PATCH", roleChangeSchema.parse({ role }));
      setMessage({ kind: "ok", text: "Role changed." });
      await mutate();
    } catch (err) {
      setMessage({ kind: "error", text: describeError(err) });
    }
  }

  return (
    <div className="grid grid-cols-1 gap-6 lg:grid-cols-3">
      <Card className="lg:col-span-2">
        {loadError ? (
          <p role="alert" className="mb-3 text-sm text-fault">
            The list could not be refreshed: {describeError(loadError)}
          </p>
        ) : null}
        <div className="relative overflow-x-auto">
          <table className="w-full text-sm">
            <thead className="text-left text-slate-500">
              <tr>
                <th className="py-2">Name</th>
                <th>E-mail</th>
                <th>Role</th>
              </tr>
            </thead>
            <tbody>
              {members.map((m) => (
                <tr key={m.membershipId} className="border-t border-line">
                  <td className="py-2">{m.name}</td>
                  <td>{m.email}</td>
                  <td>
                    <select aria-label={`Role of ${m.name}`} className="rounded border border-line px-2 py-1" value={m.role} disabled={m.userId === selfUserId} onChange={(e) => setRole(m.membershipId, e.target.value as Role)}>
                      {roles.map((r) => (
                        <option key={r} value={r}>
                          {roleLabels[r]}
                        </option>
                      ))}
                    </select>
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
        {invitations.length ? (
          <>
            <h2 className="mt-6 font-semibold">Open invitations</h2>
            <ul className="mt-2 text-sm">
              {invitations.map((i) => (
                <li key={i.id}>
                  {i.email} — {roleLabels[i.role]} (until {fmt.date(i.expiresAt)})
                </li>
              ))}
            </ul>
          </>
        ) : null}
      </Card>
      <Card>
        <h2 className="mb-3 font-semibold">Invite by e-mail</h2>
        <form onSubmit={invite} className="space-y-3">
          <Field label="E-mail" name="email" type="email" required error={inviteErrors.email} />
          <label className="block text-sm" htmlFor="invite-role">
            <span className="font-medium">Invite as</span>
            <select id="invite-role" name="role" className="mt-1 block w-full rounded-md border border-line bg-white px-3 py-2" defaultValue="designer">
              {roles.map((r) => (
                <option key={r} value={r}>
                  {roleLabels[r]}
                </option>
              ))}
            </select>
            {inviteErrors.role ? <span className="mt-1 block text-xs text-fault">{inviteErrors.role}</span> : null}
          </label>
          <Button type="submit">Send invitation</Button>
        </form>
        {message ? (
          <p role={message.kind === "error" ? "alert" : "status"} className={`mt-3 text-sm ${message.kind === "error" ? "text-fault" : "text-signal"}`}>
            {message.text}
          </p>
        ) : null}
      </Card>
    </div>
  );
}
