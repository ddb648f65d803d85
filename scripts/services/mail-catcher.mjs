// The local SMTP catcher: accepts every message on loopback, keeps it as a
// JSON file and lists the caught messages over a small HTTP API that the
// app's mailbox page reads (only when MAILBOX_URL is set).
import { createServer } from "node:http";
import { mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { randomUUID } from "node:crypto";
import path from "node:path";
import { SMTPServer } from "smtp-server";
import { simpleParser } from "mailparser";

function readAll(directory) {
  return readdirSync(directory)
    .filter((name) => name.endsWith(".json"))
    .map((name) => JSON.parse(readFileSync(path.join(directory, name), "utf8")))
    .sort((a, b) => b.receivedAt.localeCompare(a.receivedAt));
}

export async function startMailCatcher({ smtpPort, httpPort, directory }) {
  mkdirSync(directory, { recursive: true });
  const smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    logger: false,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((mail) => {
          const id = `${Date.now()}-${randomUUID().slice(0, 8)}`;
          const message = {
            id,
            // The app's Message-ID names its outbox row, which tells the mailbox page whose mail it is.
            messageId: mail.messageId ?? "",
            receivedAt: new Date().toISOString(),
            from: mail.from?.text ?? "",
            to: session.envelope.rcptTo.map((r) => r.address),
            subject: mail.subject ?? "",
            text: mail.text ?? "",
            html: typeof mail.html === "string" ? mail.html : "",
            // Names, types and sizes only: enough to see that a receipt was attached.
            attachments: (mail.attachments ?? []).map((a) => ({
              fileName: a.filename ?? "",
              contentType: a.contentType,
              sizeBytes: a.size,
            })),
          };
          writeFileSync(path.join(directory, `${id}.json`), JSON.stringify(message));
          callback();
        })
        .catch((error) => callback(error));
    },
  });
  await new Promise((resolve, reject) => {
    smtp.once("error", reject);
    smtp.listen(smtpPort, "127.0.0.1", resolve);
  });

  const http = createServer((req, res) => {
    const url = new URL(req.url ?? "/", "http://127.0.0.1");
    const send = (status, body) => {
      res.writeHead(status, { "content-type": "application/json" });
      res.end(JSON.stringify(body));
    };
    if (req.method === "GET" && url.pathname === "/messages") return send(200, readAll(directory));
    if (req.method === "DELETE" && url.pathname === "/messages") {
      for (const name of readdirSync(directory)) rmSync(path.join(directory, name));
      return send(200, { deleted: true });
    }
    const match = url.pathname.match(/^\/messages\/([\w-]+)$/);
    if (req.method === "GET" && match) {
      const found = readAll(directory).find((m) => m.id === match[1]);
      return found ? send(200, found) : send(404, { error: "not found" });
    }
    send(404, { error: "not found" });
  });
  await new Promise((resolve, reject) => {
    http.once("error", reject);
    http.listen(httpPort, "127.0.0.1", resolve);
  });

  return {
    stop: async () => {
      await new Promise((resolve) => smtp.close(resolve));
      await new Promise((resolve) => http.close(resolve));
    },
  };
}
