// Local fake SMTP server on loopback: accepts every message and stores it in the database's
// mail_messages table. Never relays anything. Its own small web page, on loopback one port above the
// SMTP port (MAIL_WEB_PORT), lists what arrived — the way to read demo and test mail, since the app's
// development outbox does not exist in a production build.
import { createServer, type IncomingMessage, type ServerResponse } from "node:http";
import { SMTPServer } from "smtp-server";
import { simpleParser } from "mailparser";
import { Sequelize } from "sequelize";
import * as mariadb from "mariadb";
import { initModels, MailMessage } from "../models";

const url = process.env.DATABASE_URL;
if (!url) throw new Error("DATABASE_URL is not set");
const port = Number(process.env.SMTP_PORT ?? 2525);
const webPort = Number(process.env.MAIL_WEB_PORT ?? port + 1);
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

// ---------------------------------------------------------------------------------------------
// The mail page: read-only, loopback only, plain HTML without scripts.

const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
const linkify = (text: string) =>
  text
    .split(/(https?:\/\/[^\s<>"']+)/g)
    .map((part) => (/^https?:\/\//.test(part) ? `<a href="${escapeHtml(part)}">${escapeHtml(part)}</a>` : escapeHtml(part)))
    .join("");

function send(res: ServerResponse, status: number, type: string, body: string | Buffer, extra: Record<string, string> = {}) {
  res.writeHead(status, { "content-type": type, "cache-control": "no-store", "x-content-type-options": "nosniff", "content-security-policy": "default-src 'none'; style-src 'unsafe-inline'", ...extra });
  res.end(body);
}

async function mailPage(): Promise<string> {
  const rows = await MailMessage.findAll({ order: [["id", "DESC"]], limit: 100 });
  const items = rows.map(
    (m) => `<li data-mail-id="${m.id}">
  <p class="meta">${escapeHtml(m.receivedAt.toISOString())} · to ${escapeHtml(m.envelopeTo)}</p>
  <p class="subject">${escapeHtml(m.subject)}</p>
  <pre>${linkify(m.text)}</pre>
  ${m.attachments.length ? `<ul>${m.attachments.map((a, i) => `<li><a href="/messages/${m.id}/attachments/${i}">${escapeHtml(a.filename)}</a> (${escapeHtml(a.contentType)}, ${Math.round(a.size / 1024)} KiB)</li>`).join("")}</ul>` : ""}
</li>`,
  );
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Mail sink</title>
<style>body{font:14px system-ui,sans-serif;max-width:60rem;margin:2rem auto;padding:0 1rem}li[data-mail-id]{border:1px solid #ccc;border-radius:6px;padding:.5rem 1rem;margin:.75rem 0;list-style:none}.meta{color:#666;font-size:12px}.subject{font-weight:600}pre{white-space:pre-wrap;font:inherit}</style></head>
<body><h1>Mail sink</h1><p>Messages the local fake SMTP server on port ${port} received. Nothing here left this machine.</p>
${items.length ? `<ol id="messages">${items.join("\n")}</ol>` : "<p>No messages yet.</p>"}</body></html>`;
}

async function handle(req: IncomingMessage, res: ServerResponse) {
  // Only loopback names: a page elsewhere that rebinds its own name to 127.0.0.1 sends that name as Host.
  if (!new Set([`127.0.0.1:${webPort}`, `localhost:${webPort}`]).has(req.headers.host ?? "")) return send(res, 421, "text/plain", "Use http://127.0.0.1:" + webPort);
  if (req.method !== "GET") return send(res, 405, "text/plain", "Read only.", { allow: "GET" });
  const path = new URL(req.url ?? "/", `http://127.0.0.1:${webPort}`).pathname;
  if (path === "/") return send(res, 200, "text/html; charset=utf-8", await mailPage());
  const m = /^\/messages\/(\d+)\/attachments\/(\d+)$/.exec(path);
  const a = m ? (await MailMessage.findByPk(Number(m[1])))?.attachments[Number(m[2])] : undefined;
  if (!a) return send(res, 404, "text/plain", "Not found.");
  const ascii = a.filename.replace(/[^A-Za-z0-9._\-()+ ]/g, "_");
  return send(res, 200, a.contentType, Buffer.from(a.contentBase64, "base64"), { "content-disposition": `attachment; filename="${ascii}"` });
}

const web = createServer((req, res) => {
  handle(req, res).catch((e: Error) => {
    console.error("mail page:", e.message);
    if (!res.headersSent) send(res, 500, "text/plain", "The mail page could not read the database.");
  });
});

server.on("error", (e) => console.error("mail sink:", e.message));
web.on("error", (e) => console.error("mail page:", e.message));
server.listen(port, "127.0.0.1", () =>
  web.listen(webPort, "127.0.0.1", () => console.log(`mail sink listening on 127.0.0.1:${port}; read the mail at http://127.0.0.1:${webPort}/`)),
);
const stop = () => {
  web.closeAllConnections();
  web.close(() => server.close(() => sequelize.close().then(() => process.exit(0))));
};
process.on("SIGTERM", stop);
process.on("SIGINT", stop);
