import "server-only";
import { bindModels } from "./db";
import { MailMessage } from "@/models";

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
