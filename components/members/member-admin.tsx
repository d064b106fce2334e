"use client";

import { useState } from "react";
import { roles, roleLabels, type Role } from "@/lib/auth/permissions";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { Field } from "@/components/ui/field";

interface Data {
  members: { membershipId: number; userId: number; name: string; email: string; role: Role }[];
  invitations: { id: number; email: string; role: Role; expiresAt: string }[];
}

async function send(url: string, method: string, body: unknown) {
  const res = await fetch(url, { method, headers: { "content-type": "application/json" }, body: JSON.stringify(body) });
  const json = await res.json().catch(() => ({ error: "The server sent an unreadable answer." }));
  if (!res.ok) throw new Error(json.issues?.length ? `${json.error} ${json.issues.map((i: { message: string }) => i.message).join("; ")}` : json.error);
  return json;
}

export function MemberAdmin({ initial, selfUserId }: { initial: Data; selfUserId: number }) {
  const [data, setData] = useState(initial);
  const [message, setMessage] = useState<{ kind: "ok" | "error"; text: string } | null>(null);

  async function refresh() {
    setData(await (await fetch("/api/members")).json());
  }

  async function invite(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const target = e.currentTarget;
    try {
      const r = await send("/api/members", "POST", { email: form.get("email"), role: form.get("role") });
      setMessage({ kind: "ok", text: `Invitation sent to ${r.email}.` });
      target.reset();
      await refresh();
    } catch (err) {
      setMessage({ kind: "error", text: (err as Error).message });
    }
  }

  async function setRole(membershipId: number, role: Role) {
    try {
      await send(`/api/members/${membershipId}`, "PATCH", { role });
      setMessage({ kind: "ok", text: "Role changed." });
      await refresh();
    } catch (err) {
      setMessage({ kind: "error", text: (err as Error).message });
    }
  }

  return (
    <div className="grid gap-6 lg:grid-cols-3">
      <Card className="lg:col-span-2">
        <table className="w-full text-sm">
          <thead className="text-left text-slate-500">
            <tr>
              <th className="py-2">Name</th>
              <th>E-mail</th>
              <th>Role</th>
            </tr>
          </thead>
          <tbody>
            {data.members.map((m) => (
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
        {data.invitations.length ? (
          <>
            <h2 className="mt-6 font-semibold">Open invitations</h2>
            <ul className="mt-2 text-sm">
              {data.invitations.map((i) => (
                <li key={i.id}>
                  {i.email} — {roleLabels[i.role]} (until {new Date(i.expiresAt).toLocaleDateString()})
                </li>
              ))}
            </ul>
          </>
        ) : null}
      </Card>
      <Card>
        <h2 className="mb-3 font-semibold">Invite by e-mail</h2>
        <form onSubmit={invite} className="space-y-3">
          <Field label="E-mail" name="email" type="email" required />
          <label className="block text-sm" htmlFor="invite-role">
            <span className="font-medium">Invite as</span>
            <select id="invite-role" name="role" className="mt-1 block w-full rounded-md border border-line bg-white px-3 py-2" defaultValue="designer">
              {roles.map((r) => (
                <option key={r} value={r}>
                  {roleLabels[r]}
                </option>
              ))}
            </select>
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
