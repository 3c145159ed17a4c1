/**
 * A fake SMTP server for the demo and the tests, on loopback only. It accepts every message, keeps the newest
 * 500 in memory, and serves them as JSON over HTTP (the mailbox API of lib/mailbox.ts).
 * Ports: SMTP_FAKE_PORT (default 2525) and MAILBOX_PORT (default 2526).
 */
import http from "node:http";
import { simpleParser } from "mailparser";
import { SMTPServer } from "smtp-server";
import type { MailboxMessage } from "../lib/mailbox";

const smtpPort = Number(process.env.SMTP_FAKE_PORT ?? 2525);
const httpPort = Number(process.env.MAILBOX_PORT ?? 2526);
const messages: MailboxMessage[] = [];
let nextId = 1;

const smtp = new SMTPServer({
  authOptional: true,
  disabledCommands: ["STARTTLS"],
  logger: false,
  size: 5 * 1024 * 1024,
  onData(stream, session, callback) {
    simpleParser(stream)
      .then((mail) => {
        messages.unshift({
          id: nextId++,
          from: mail.from?.text ?? session.envelope.mailFrom?.toString() ?? "",
          to: session.envelope.rcptTo.map((r) => r.address),
          subject: mail.subject ?? "",
          text: mail.text ?? "",
          receivedAt: new Date().toISOString(),
        });
        messages.splice(500);
        callback();
      })
      .catch((err: Error) => callback(err));
  },
});

const api = http.createServer((req, res) => {
  if (req.url?.startsWith("/messages")) {
    if (req.method === "GET") {
      res.writeHead(200, { "content-type": "application/json" });
      res.end(JSON.stringify({ messages }));
      return;
    }
    if (req.method === "DELETE") {
      messages.length = 0;
      res.writeHead(204).end();
      return;
    }
  }
  res.writeHead(404, { "content-type": "application/json" }).end(JSON.stringify({ error: "not found" }));
});

smtp.listen(smtpPort, "127.0.0.1", () => {
  api.listen(httpPort, "127.0.0.1", () => console.log(`[smtp-fake] SMTP on 127.0.0.1:${smtpPort}, mailbox on http://127.0.0.1:${httpPort}/messages`));
});

const stop = () => smtp.close(() => api.close(() => process.exit(0)));
process.on("SIGTERM", stop);
process.on("SIGINT", stop);
