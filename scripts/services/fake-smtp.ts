/**
 * A local stand-in for the mail provider: an SMTP server that accepts every message and an HTTP
 * API on loopback to read them back (the admin outbox page and the tests use it).
 *   SMTP_PORT (2525)   OUTBOX_PORT (2526)   OUTBOX_FILE (optional: keep messages across restarts)
 * HTTP: GET /messages, GET /messages/:id, GET /messages/:id/attachments/:n, DELETE /messages
 */
import { createServer } from "node:http";
import { randomUUID } from "node:crypto";
import { existsSync, readFileSync, writeFileSync } from "node:fs";
import { SMTPServer } from "smtp-server";
import { simpleParser } from "mailparser";
import type { OutboxMessage } from "../../lib/platform/mail/outbox";

// The outbox API serves what the app's outbox reader expects, plus the attachment bytes kept here.
type Stored = Omit<OutboxMessage, "attachments"> & {
  attachments: (OutboxMessage["attachments"][number] & { base64: string })[];
};

const smtpPort = Number(process.env.SMTP_PORT ?? 2525);
const httpPort = Number(process.env.OUTBOX_PORT ?? 2526);
const file = process.env.OUTBOX_FILE;
const MAX_KEPT = 500;

let messages: Stored[] = file && existsSync(file) ? (JSON.parse(readFileSync(file, "utf8")) as Stored[]) : [];
const persist = () => {
  if (file) writeFileSync(file, JSON.stringify(messages));
};

const smtp = new SMTPServer({
  authOptional: true,
  disabledCommands: ["STARTTLS"],
  size: 25 * 1024 * 1024,
  onData(stream, session, callback) {
    simpleParser(stream)
      .then((mail) => {
        const to = session.envelope.rcptTo.map((r) => r.address);
        messages.unshift({
          id: randomUUID(),
          receivedAt: new Date().toISOString(),
          from: session.envelope.mailFrom ? session.envelope.mailFrom.address : "",
          to,
          subject: mail.subject ?? "",
          text: mail.text ?? "",
          html: typeof mail.html === "string" ? mail.html : null,
          attachments: mail.attachments.map((a, index) => ({
            index,
            filename: a.filename ?? `attachment-${index}`,
            contentType: a.contentType,
            size: a.size,
            base64: a.content.toString("base64"),
          })),
        });
        messages = messages.slice(0, MAX_KEPT);
        persist();
        callback();
      })
      .catch((e: Error) => callback(e));
  },
});

const http = createServer((req, res) => {
  const url = new URL(req.url ?? "/", "http://localhost");
  const parts = url.pathname.split("/").filter(Boolean);
  const send = (status: number, body: unknown, type = "application/json") => {
    res.writeHead(status, { "Content-Type": type });
    res.end(type === "application/json" ? JSON.stringify(body) : (body as Buffer));
  };
  if (parts[0] !== "messages") return send(404, { error: "not found" });
  if (req.method === "DELETE" && parts.length === 1) {
    messages = [];
    persist();
    return send(200, { ok: true });
  }
  if (req.method !== "GET") return send(405, { error: "method not allowed" });
  const strip = (m: Stored) => ({ ...m, attachments: m.attachments.map(({ base64: _b, ...rest }) => rest) });
  if (parts.length === 1) {
    const to = url.searchParams.get("to")?.toLowerCase();
    return send(200, messages.filter((m) => !to || m.to.some((t) => t.toLowerCase() === to)).map(strip));
  }
  const msg = messages.find((m) => m.id === parts[1]);
  if (!msg) return send(404, { error: "no such message" });
  if (parts.length === 2) return send(200, strip(msg));
  if (parts[2] === "attachments" && parts[3] !== undefined) {
    const att = msg.attachments[Number(parts[3])];
    if (!att) return send(404, { error: "no such attachment" });
    return send(200, Buffer.from(att.base64, "base64"), att.contentType);
  }
  return send(404, { error: "not found" });
});

smtp.listen(smtpPort, "127.0.0.1", () => {
  http.listen(httpPort, "127.0.0.1", () => {
    console.log(`fake SMTP on 127.0.0.1:${smtpPort}, outbox API on http://127.0.0.1:${httpPort}/messages`);
  });
});

const stop = () => {
  smtp.close(() => http.close(() => process.exit(0)));
  setTimeout(() => process.exit(0), 2000).unref();
};
process.on("SIGINT", stop);
process.on("SIGTERM", stop);
