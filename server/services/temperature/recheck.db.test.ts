import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { adviceMessage } from "@shared/temperature/advice";
import { createTestApp, type TestApp } from "../../../tests/support/app";
import { actorOf, buildTransfer, markReviewed, type TransferCast } from "../../../tests/factories";
import { startOpenMeteoFake, type OpenMeteoFake } from "../../../fakes/open-meteo/server";
import { startSmtpFake, type SmtpFake } from "../../../fakes/smtp/smtp-fake";
import { deliverDueMail } from "../outbox";
import { runTask } from "../scheduler";
import { transitionTransfer } from "../transfers/transition";

// The fake's weather is a function of the date, so the clock is fixed: Tuesday 7 July 2026,
// 13:00 EDT. Only Date is faked; timers, sockets and the weather worker run as usual.
const T0 = Date.parse("2026-07-07T17:00:00Z");
const HOUR_MS = 3_600_000;
const DEPARTURE = new Date(T0 + 20 * HOUR_MS);

let t: TestApp;
let fake: OpenMeteoFake;
let smtp: SmtpFake;
let cast: TransferCast;
let idle: TransferCast;
const em = () => t.orm.em.fork();
const at = (hoursAfterT0: number) => vi.setSystemTime(T0 + hoursAfterT0 * HOUR_MS);

beforeAll(async () => {
  vi.useFakeTimers({ toFake: ["Date"], now: T0 });
  [fake, smtp] = await Promise.all([startOpenMeteoFake(), startSmtpFake()]);
  t = await createTestApp({ WEATHER_URL: fake.url, SMTP_URL: smtp.smtpUrl });
  // Knoxville, TN → Eugene, OR overnight; two corn snakes in an EPS box (the factory's transfer)
  cast = await buildTransfer(em(), { status: "awaiting_receiver" });
  idle = await buildTransfer(em(), { status: "awaiting_receiver" });
  // The route's rules reviewed (federal, TN, OR by air), so the rules check, which runs first, is clear (D25).
  await markReviewed(em(), ["US", "TN", "OR"]);
  await transitionTransfer({
    em: em(),
    actor: await actorOf(em(), cast.receiver),
    transferId: cast.transfer.id,
    input: { to: "ready" },
    gates: t.ctx.readyGates,
    links: t.ctx.links,
  });
  await t.ctx.pool.query("UPDATE transfer SET planned_departure_at = $1 WHERE id = ANY($2::uuid[])", [
    DEPARTURE,
    [cast.transfer.id, idle.transfer.id],
  ]);
});
afterAll(async () => {
  vi.useRealTimers();
  await t.close();
  await Promise.all([fake.close(), smtp.close()]);
});

const checksOf = async (transferId: string) =>
  (
    await t.ctx.pool.query<{ mark: string; advice_code: string }>(
      "SELECT mark, advice_code FROM temperature_check WHERE transfer_id = $1 ORDER BY checked_at, id",
      [transferId],
    )
  ).rows;
const alertsOf = async (transferId: string) =>
  (
    await t.ctx.pool.query("SELECT previous_advice_code, advice_code FROM temperature_alert WHERE transfer_id = $1", [
      transferId,
    ])
  ).rows;
const queuedMail = async () =>
  (
    await t.ctx.pool.query<{ to_address: string }>(
      "SELECT to_address FROM outbox_message WHERE topic = 'transfer.temperature_changed'",
    )
  ).rows;

describe("the re-check 24 h and 4 h before departure", () => {
  it("keeps each result; a normal → heat-wave change flags the transfer and e-mails both parties", async () => {
    // A cold pack for a light box on a July day in Tennessee (the gate's check, which let it pass)
    expect(await checksOf(cast.transfer.id)).toEqual([{ mark: "gate", advice_code: "add_cold_pack" }]);

    at(1); // 19 h before departure
    expect(await runTask(t.ctx, "temperature-recheck")).toBe(true);
    expect(await checksOf(cast.transfer.id)).toEqual([
      { mark: "gate", advice_code: "add_cold_pack" },
      { mark: "24h", advice_code: "add_cold_pack" },
    ]);
    expect(await alertsOf(cast.transfer.id)).toEqual([]);
    expect(await queuedMail()).toEqual([]);
    // only transfers cleared to ship are re-checked
    expect(await checksOf(idle.transfer.id)).toEqual([]);

    at(2); // a second round in the same window adds nothing
    await runTask(t.ctx, "temperature-recheck");
    expect(await checksOf(cast.transfer.id)).toHaveLength(2);

    at(17); // 3 h before departure; the cached forecast is 16 h old, so the heat wave is fetched
    fake.setScenario("heat_wave");
    fake.clearRequests();
    await runTask(t.ctx, "temperature-recheck");
    expect(fake.requests).toHaveLength(1);
    // [practice] REPTILES magazine shipping guide: above 95 °F do not ship (a +8 °C heat wave on a Tennessee July afternoon)
    expect((await checksOf(cast.transfer.id)).at(-1)).toEqual({ mark: "4h", advice_code: "postpone" });
    expect(await alertsOf(cast.transfer.id)).toEqual([
      { previous_advice_code: "add_cold_pack", advice_code: "postpone" },
    ]);

    const recipients = (await queuedMail()).map((m) => m.to_address).sort();
    expect(recipients).toEqual([cast.sender.email, cast.receiver.email].sort());
    await deliverDueMail(t.orm, t.ctx.adapters.mailer);
    const subject = `Transfer ${cast.transfer.number}: the temperature advice changed`;
    const toReceiver = await smtp.waitFor((m) => m.subject === subject && m.to.includes(cast.receiver.email));
    await smtp.waitFor((m) => m.subject === subject && m.to.includes(cast.sender.email));
    expect(toReceiver.text).toContain("4 hours before departure");
    expect(toReceiver.text).toContain(`Before: ${adviceMessage("add_cold_pack", "cold")}`);
    expect(toReceiver.text).toContain(`Now: ${adviceMessage("postpone", null)}`);
    expect(toReceiver.text).toContain(`${t.env.PUBLIC_URL}/transfers/${cast.transfer.id}`);
  });
});
