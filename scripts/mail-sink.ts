// Local fake SMTP server on loopback: accepts every message and stores it in the database's
// mail_messages table, which the development outbox page lists. Never relays anything.
import { SMTPServer } from "smtp-server";
import { simpleParser } from "mailparser";
import { Sequelize } from "sequelize";
import * as mariadb from "mariadb";
import { initModels, MailMessage } from "../models";

const url = process.env.DATABASE_URL;
if (!url) throw new Error("DATABASE_URL is not set");
const port = Number(process.env.SMTP_PORT ?? 2525);
const sequelize = new Sequelize(url, { dialect: "mariadb", dialectModule: mariadb, logging: false, define: { underscored: true } });
initModels(sequelize);

const server = new SMTPServer({
  authOptional: true,
  disabledCommands: ["STARTTLS", "AUTH"],
  size: 25 * 1024 * 1024,
  async onData(stream, session, callback) {
    try {
      const parsed = await simpleParser(stream);
      await MailMessage.create({
        envelopeTo: session.envelope.rcptTo.map((r) => r.address).join(", "),
        envelopeFrom: session.envelope.mailFrom ? session.envelope.mailFrom.address : "",
        subject: parsed.subject ?? "(no subject)",
        text: parsed.text ?? "",
        html: typeof parsed.html === "string" ? parsed.html : null,
        attachments: parsed.attachments.map((a) => ({ filename: a.filename ?? "attachment", contentType: a.contentType, size: a.size, contentBase64: a.content.toString("base64") })),
      });
      callback();
    } catch (e) {
      callback(e as Error);
    }
  },
});
server.on("error", (e) => console.error("mail sink:", e.message));
server.listen(port, "127.0.0.1", () => console.log(`mail sink listening on 127.0.0.1:${port}`));
const stop = () => server.close(() => sequelize.close().then(() => process.exit(0)));
process.on("SIGTERM", stop);
process.on("SIGINT", stop);
