import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, type TestApp } from "../../tests/support/app";
import { startSmtpFake, type SmtpFake } from "../../fakes/smtp/smtp-fake";
import { createMailer } from "../adapters/mailer";
import { deliverDueMail, enqueueMail, retryDelaySeconds } from "./outbox";

let t: TestApp;
let smtp: SmtpFake;
beforeAll(async () => {
  smtp = await startSmtpFake();
  t = await createTestApp({ SMTP_URL: smtp.smtpUrl });
});
afterAll(async () => {
  await t.close();
  await smtp.close();
});

async function queue(subject: string) {
  const em = t.orm.em.fork();
  enqueueMail(em, { to: "keeper@example.test", subject, text: `body of ${subject}`, topic: "test" });
  await em.flush();
}

const statusOf = async (subject: string) =>
  (await t.ctx.pool.query("SELECT status, attempts, last_error FROM outbox_message WHERE subject = $1", [subject]))
    .rows[0];

describe("outbox", () => {
  it("delivers queued mail through SMTP to the fake", async () => {
    await queue("first delivery");
    const mailer = createMailer(smtp.smtpUrl, "Hatchway <no-reply@hatchway.test>");
    const result = await deliverDueMail(t.orm, mailer);
    expect(result.sent).toBeGreaterThanOrEqual(1);
    const got = await smtp.waitFor((m) => m.subject === "first delivery");
    expect(got.to).toEqual(["keeper@example.test"]);
    expect(got.text).toContain("body of first delivery");
    expect((await statusOf("first delivery")).status).toBe("sent");
  });

  it("keeps mail through an SMTP outage and sends it when the server is back", async () => {
    await smtp.goDown();
    await queue("during outage");
    const mailer = createMailer(smtp.smtpUrl, "Hatchway <no-reply@hatchway.test>");
    const down = await deliverDueMail(t.orm, mailer);
    expect(down.failed).toBe(1);
    const pending = await statusOf("during outage");
    expect(pending).toMatchObject({ status: "pending", attempts: 1 });
    expect(pending.last_error).toBeTruthy();

    await smtp.comeBack();
    // The retry is scheduled in the future; bring it forward instead of waiting.
    await t.ctx.pool.query("UPDATE outbox_message SET next_attempt_at = now() WHERE subject = $1", ["during outage"]);
    const up = await deliverDueMail(t.orm, mailer);
    expect(up.sent).toBe(1);
    await smtp.waitFor((m) => m.subject === "during outage");
    expect(await statusOf("during outage")).toMatchObject({ status: "sent", attempts: 2 });
  });

  it("sends each message once even when two workers run at the same time", async () => {
    for (let i = 0; i < 6; i++) await queue(`parallel ${i}`);
    const mailer = createMailer(smtp.smtpUrl, "Hatchway <no-reply@hatchway.test>");
    await Promise.all([deliverDueMail(t.orm, mailer), deliverDueMail(t.orm, mailer)]);
    for (let i = 0; i < 6; i++) expect(smtp.messages.filter((m) => m.subject === `parallel ${i}`)).toHaveLength(1);
  });

  it("backs off exponentially with a ceiling", () => {
    expect([1, 2, 3, 4].map(retryDelaySeconds)).toEqual([2, 4, 8, 16]);
    expect(retryDelaySeconds(30)).toBe(600);
  });
});
