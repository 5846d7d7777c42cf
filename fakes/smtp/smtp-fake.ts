/**
 * A real SMTP server on loopback (smtp-server + mailparser) that keeps what it receives,
 * so tests and the demo can read the mail Hatchway sent. An HTTP side lists the messages.
 */
import http from "node:http";
import type { AddressInfo } from "node:net";
import { SMTPServer } from "smtp-server";
import { simpleParser } from "mailparser";

export type CaughtMail = { id: number; from: string; to: string[]; subject: string; text: string; receivedAt: string };

export type SmtpFake = {
  smtpPort: number;
  httpPort: number;
  smtpUrl: string;
  inboxUrl: string;
  messages: CaughtMail[];
  clear(): void;
  /** Stops accepting SMTP connections (an outage) while keeping the HTTP inbox up. */
  goDown(): Promise<void>;
  comeBack(): Promise<void>;
  waitFor(predicate: (m: CaughtMail) => boolean, timeoutMs?: number): Promise<CaughtMail>;
  close(): Promise<void>;
};

export async function startSmtpFake(options: { smtpPort?: number; httpPort?: number } = {}): Promise<SmtpFake> {
  const messages: CaughtMail[] = [];
  let nextId = 1;

  const makeSmtp = () =>
    new SMTPServer({
      authOptional: true,
      disabledCommands: ["STARTTLS"],
      logger: false,
      onData(stream, session, callback) {
        simpleParser(stream)
          .then((parsed) => {
            messages.push({
              id: nextId++,
              from: session.envelope.mailFrom ? session.envelope.mailFrom.address : "",
              to: session.envelope.rcptTo.map((r) => r.address),
              subject: parsed.subject ?? "",
              text: parsed.text ?? "",
              receivedAt: new Date().toISOString(),
            });
            callback();
          })
          .catch(callback);
      },
    });

  let smtp = makeSmtp();
  const listenSmtp = (port: number) =>
    new Promise<number>((resolve, reject) => {
      smtp.once("error", reject);
      smtp.listen(port, "127.0.0.1", () => resolve((smtp.server.address() as AddressInfo).port));
    });
  const smtpPort = await listenSmtp(options.smtpPort ?? 0);
  let up = true;

  const web = http.createServer((req, res) => {
    if (req.url === "/messages" && req.method === "GET") {
      res.setHeader("Content-Type", "application/json");
      res.end(JSON.stringify({ messages: [...messages].reverse() }));
    } else if (req.url === "/messages" && req.method === "DELETE") {
      messages.length = 0;
      res.statusCode = 204;
      res.end();
    } else {
      res.statusCode = 404;
      res.end();
    }
  });
  const httpPort = await new Promise<number>((resolve) =>
    web.listen(options.httpPort ?? 0, "127.0.0.1", () => resolve((web.address() as AddressInfo).port)),
  );

  const fake: SmtpFake = {
    smtpPort,
    httpPort,
    smtpUrl: `smtp://127.0.0.1:${smtpPort}`,
    inboxUrl: `http://127.0.0.1:${httpPort}/messages`,
    messages,
    clear: () => void (messages.length = 0),
    async goDown() {
      if (!up) return;
      up = false;
      await new Promise<void>((resolve) => smtp.close(() => resolve()));
    },
    async comeBack() {
      if (up) return;
      smtp = makeSmtp();
      await listenSmtp(smtpPort);
      up = true;
    },
    async waitFor(predicate, timeoutMs = 10_000) {
      const deadline = Date.now() + timeoutMs;
      for (;;) {
        const hit = messages.find(predicate);
        if (hit) return hit;
        if (Date.now() > deadline) throw new Error("the SMTP fake did not receive the expected message in time");
        await new Promise((r) => setTimeout(r, 50));
      }
    },
    async close() {
      await fake.goDown();
      await new Promise<void>((resolve) => web.close(() => resolve()));
    },
  };
  return fake;
}
