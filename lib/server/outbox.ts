import "server-only";
import { bindModels } from "./db";
import { env } from "./env";
import { currentActor } from "./session";
import { MailMessage } from "@/models";
import { can } from "@/lib/auth/permissions";

/**
 * The development outbox lists invitation links and serves mailed PDFs, so it exists only outside a production
 * build, with LOOPWRIGHT_DEV_OUTBOX=1, and for a signed-in member who may manage members (an admin).
 * Anyone else — and everyone in production — gets the same 404 as for an address that does not exist.
 * Demo and browser-test mail is read from the mail sink's own loopback page instead (scripts/mail-sink.ts).
 */
export async function outboxAllowed(): Promise<boolean> {
  if (process.env.NODE_ENV === "production" || env().LOOPWRIGHT_DEV_OUTBOX !== "1") return false;
  const actor = await currentActor();
  return !!actor && can(actor.role, "members:manage");
}

export async function listOutbox(limit = 100) {
  bindModels();
  const rows = await MailMessage.findAll({ order: [["id", "DESC"]], limit });
  return rows.map((m) => ({
    id: m.id,
    to: m.envelopeTo,
    subject: m.subject,
    text: m.text,
    receivedAt: m.receivedAt.toISOString(),
    attachments: m.attachments.map(({ filename, contentType, size }) => ({ filename, contentType, size })),
  }));
}

export async function outboxAttachment(mailId: number, index: number) {
  if (!Number.isInteger(mailId) || !Number.isInteger(index)) return null;
  bindModels();
  const m = await MailMessage.findByPk(mailId);
  return m?.attachments[index] ?? null;
}
