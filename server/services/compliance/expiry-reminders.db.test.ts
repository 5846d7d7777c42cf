import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { formatDate } from "@shared/dates";
import { addDays } from "@shared/temperature/zoned-time";
import { createTestApp, signIn, type TestApp } from "../../../tests/support/app";
import { buildOrganization, buildUser } from "../../../tests/factories";
import { runTask } from "../scheduler";
import { EXPIRY_REMINDER_TASK } from "./expiry-reminders";

let t: TestApp;
const em = () => t.orm.em.fork();
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const today = new Date().toISOString().slice(0, 10);

async function mailTo(email: string) {
  const { rows } = await t.ctx.pool.query<{ subject: string; text_body: string }>(
    "SELECT subject, text_body FROM outbox_message WHERE to_address = $1 AND topic = 'document.expiring' ORDER BY created_at",
    [email],
  );
  return rows;
}

describe("expiry reminders (scheduled task)", () => {
  it("e-mails each active member of the holding organisation once, 30 days ahead, and again after a new end date", async () => {
    // [published] Gregorian calendar day counts; the 30-day notice is the requirement
    const org = await buildOrganization(em(), { name: "Demo Basking Rock Keepers" });
    const first = await buildUser(em(), { organization: org });
    const second = await buildUser(em(), { organization: org });
    const gone = await buildUser(em(), { organization: org, disabled: true });
    const client = await signIn(t.app, first.email);
    const permit = (number: string, validTo: string) =>
      client.post("/api/documents", {
        kind: "possession_permit",
        jurisdiction: "TN",
        number,
        holderName: org.name,
        speciesCovered: [],
        validFrom: null,
        validTo,
        issuedOn: null,
        veterinarianName: null,
        veterinarianAccredited: null,
        inspectionDate: null,
        statements: [],
        animalsCovered: [],
      });
    const soon = await permit("DEMO-TN-30", addDays(today, 30));
    await permit("DEMO-TN-31", addDays(today, 31));
    await permit("DEMO-TN-PAST", addDays(today, -1));

    expect(await runTask(t.ctx, EXPIRY_REMINDER_TASK)).toBe(true);
    for (const member of [first, second]) {
      const mails = await mailTo(member.email);
      expect(mails.map((m) => m.subject)).toEqual([
        `Possession permit or licence DEMO-TN-30 expires on ${formatDate(addDays(today, 30))}`,
      ]);
      // One date format for people (shared/dates): weekday, month, day, year; never the ISO form.
      expect(mails[0]!.subject).toMatch(/expires on (Mon|Tue|Wed|Thu|Fri|Sat|Sun), [A-Z][a-z]{2} \d{1,2}, \d{4}$/);
      expect(mails[0]!.text_body).toContain("in 30 days");
      expect(mails[0]!.text_body).toContain("/permits");
    }
    expect(await mailTo(gone.email)).toEqual([]);

    await runTask(t.ctx, EXPIRY_REMINDER_TASK);
    expect(await mailTo(first.email)).toHaveLength(1);

    // A renewed end date, still within the window, earns a new reminder.
    await client.patch(`/api/documents/${soon.body.document.id}`, { validTo: addDays(today, 5) });
    await runTask(t.ctx, EXPIRY_REMINDER_TASK);
    expect((await mailTo(first.email)).map((m) => m.subject)).toEqual([
      `Possession permit or licence DEMO-TN-30 expires on ${formatDate(addDays(today, 30))}`,
      `Possession permit or licence DEMO-TN-30 expires on ${formatDate(addDays(today, 5))}`,
    ]);
  });
});
