import nodemailer from "nodemailer";

export type OutgoingMail = { to: string; subject: string; text: string };
export type Mailer = { send(mail: OutgoingMail): Promise<void>; close(): void };

/** The one module that talks SMTP. In development and tests the URL points at fakes/smtp. */
export function createMailer(smtpUrl: string, from: string): Mailer {
  const url = new URL(smtpUrl);
  const secure = url.protocol === "smtps:";
  const transport = nodemailer.createTransport({
    host: url.hostname,
    port: Number(url.port || (secure ? 465 : 25)),
    secure,
    auth: url.username ? { user: decodeURIComponent(url.username), pass: decodeURIComponent(url.password) } : undefined,
    // The fake on loopback offers no TLS; a real relay is reached over smtps:// or STARTTLS.
    ignoreTLS: url.hostname === "127.0.0.1" || url.hostname === "localhost",
    connectionTimeout: 5_000,
    greetingTimeout: 5_000,
    socketTimeout: 10_000,
  });
  return {
    async send(mail) {
      await transport.sendMail({ from, to: mail.to, subject: mail.subject, text: mail.text });
    },
    close() {
      transport.close();
    },
  };
}
