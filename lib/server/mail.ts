import "server-only";
import nodemailer from "nodemailer";
import { env } from "./env";

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
  attachments?: { filename: string; content: Buffer; contentType: string }[];
}

let transport: nodemailer.Transporter | undefined;

export async function sendMail(mail: OutgoingMail): Promise<void> {
  const e = env();
  transport ??= nodemailer.createTransport({ host: e.SMTP_HOST, port: e.SMTP_PORT, secure: false, ignoreTLS: true, connectionTimeout: 5000 });
  await transport.sendMail({ from: e.MAIL_FROM, ...mail });
}
