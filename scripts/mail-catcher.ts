// A local SMTP catcher: accepts every message on SMTP_PORT and lists them as JSON on
// MAIL_HTTP_PORT (GET /messages, DELETE /messages) so tests and people can read them back.
import http from "node:http";
import { simpleParser } from "mailparser";
import { SMTPServer } from "smtp-server";

const smtpPort = Number(process.env.SMTP_PORT ?? 1025);
const httpPort = Number(process.env.MAIL_HTTP_PORT ?? 1080);

type CaughtMessage = {
  id: number;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
  attachments: { filename: string; contentType: string; size: number; contentBase64: string }[];
};

const messages: CaughtMessage[] = [];
let nextId = 1;

const smtp = new SMTPServer({
  authOptional: true,
  disabledCommands: ["STARTTLS"],
  onData(stream, session, callback) {
    simpleParser(stream)
      .then((mail) => {
        messages.push({
          id: nextId++,
          receivedAt: new Date().toISOString(),
          from: mail.from?.text ?? "",
          to: session.envelope.rcptTo.map((r) => r.address),
          subject: mail.subject ?? "",
          text: mail.text ?? "",
          html: typeof mail.html === "string" ? mail.html : "",
          attachments: mail.attachments.map((a) => ({
            filename: a.filename ?? "",
            contentType: a.contentType,
            size: a.size,
            contentBase64: a.content.toString("base64"),
          })),
        });
        if (messages.length > 1000) messages.shift();
        callback();
      })
      .catch(callback);
  },
});
smtp.on("error", (err) => console.error("smtp error:", err.message));
smtp.listen(smtpPort, "127.0.0.1");

const web = http.createServer((req, res) => {
  const url = new URL(req.url ?? "/", `http://127.0.0.1:${httpPort}`);
  if (url.pathname !== "/messages") {
    res.writeHead(404).end();
    return;
  }
  if (req.method === "DELETE") {
    messages.length = 0;
    res.writeHead(204).end();
    return;
  }
  const to = url.searchParams.get("to");
  const list = to ? messages.filter((m) => m.to.includes(to)) : messages;
  res.writeHead(200, { "content-type": "application/json" }).end(JSON.stringify(list));
});
web.listen(httpPort, "127.0.0.1");

function shutdown() {
  web.close();
  smtp.close(() => process.exit(0));
  setTimeout(() => process.exit(0), 1000).unref();
}
process.on("SIGTERM", shutdown);
process.on("SIGINT", shutdown);
