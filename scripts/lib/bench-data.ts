/**
 * Bench data: a transfer with 50 animals in 10 boxes and 11 custody entries, walked through
 * the real services, and 100,000 more transfers for the sender inserted in bulk. The detail
 * transfer passes "ready to ship" through gatesForLoadedData, so its custody log says the
 * compliance and temperature checks were not run; the bulk rows never reach a gate at all.
 */
import { initORM } from "../../server/db/orm";
import { UserSchema } from "../../server/db/entities/user.entity";
import { OrganizationSchema } from "../../server/db/entities/organization.entity";
import { CustodyEntrySchema } from "../../server/db/entities/custody-entry.entity";
import { TaxonSchema } from "../../server/db/entities/taxon.entity";
import { actorOf, buildUser, transferInput } from "../../tests/factories";
import { createTransfer } from "../../server/services/transfers/write-transfer";
import { transitionTransfer } from "../../server/services/transfers/transition";
import { assignLegs } from "../../server/services/transfers/legs";
import { recordHandoff } from "../../server/services/transfers/handoff";
import { ContainerSchema } from "../../server/db/entities/transfer.entity";
import { gatesForLoadedData } from "../../server/composition";
import { createLinks } from "../../server/mail/links";

export async function seedBenchData(
  /** The owner role's URL (D18): the bulk insert ends with ANALYZE, which only the owner may run. */
  databaseUrl: string,
  publicUrl: string,
  bulkTransfers = 100_000,
): Promise<{ detailId: string }> {
  const orm = await initORM(databaseUrl, { poolMax: 4 });
  const links = createLinks(publicUrl);
  const gates = gatesForLoadedData("bench");
  try {
    const em = orm.em.fork();
    const sender = await em.findOneOrFail(
      UserSchema,
      { email: "sender@demo.hatchway.test" },
      { populate: ["organization"] },
    );
    const receiver = await em.findOneOrFail(
      UserSchema,
      { email: "receiver@demo.hatchway.test" },
      { populate: ["organization"] },
    );
    const couriers = [
      await em.findOneOrFail(UserSchema, { email: "courier@demo.hatchway.test" }),
      ...(await Promise.all([1, 2, 3].map(() => buildUser(em, { role: "courier" })))),
    ];
    const species = (
      await em.find(TaxonSchema, { rank: "species" }, { limit: 10, orderBy: { scientificName: "asc" } })
    ).map((t) => t.scientificName);
    const animals = Array.from({ length: 50 }, (_, i) => ({
      taxon: species[i % 10]!,
      count: 1 + (i % 3),
      sex: (["male", "female", "unknown"] as const)[i % 3],
      box: `B${i % 10}`,
    }));
    const input = await transferInput(em, receiver.organization!.id, { animals, daysAhead: 2 });
    const s = await actorOf(em, sender);
    const r = await actorOf(em, receiver);
    const t = await createTransfer({ em: em.fork(), actor: s, input });
    await transitionTransfer({
      em: em.fork(),
      actor: s,
      transferId: t.id,
      input: { to: "awaiting_receiver" },
      gates,
      links,
    });
    await transitionTransfer({ em: em.fork(), actor: r, transferId: t.id, input: { to: "ready" }, gates, links });
    await assignLegs({
      em: em.fork(),
      actor: s,
      transferId: t.id,
      input: { legs: couriers.slice(0, 2).map((c) => ({ courierId: c.id })) },
    });
    await assignLegs({
      em: em.fork(),
      actor: s,
      transferId: t.id,
      input: { legs: couriers.map((c) => ({ courierId: c.id })) },
    });
    const containers = await em.fork().find(ContainerSchema, { transfer: t.id });
    for (let i = 0; i < 4; i++) {
      await recordHandoff({
        em: em.fork(),
        actor: await actorOf(em, couriers[i]!),
        transferId: t.id,
        input: {
          handoffIndex: i,
          boxesCounted: containers.length,
          seals: [],
          boxTempF: 70,
          place: { text: `Stop ${i}` },
          releasedByName: "A",
          receivedByName: "B",
          notes: null,
          acknowledged: true,
        } as never,
        links,
        checks: { loadedAs: "bench" },
      });
    }
    const entries = await em.fork().count(CustodyEntrySchema, { transfer: t.id });
    // Ten from the steps above and one saying the checks were not run.
    if (entries !== 11) throw new Error(`bench detail transfer has ${entries} custody entries, expected 11`);

    const receiverOrg = await em.findOneOrFail(OrganizationSchema, { id: receiver.organization!.id });
    const conn = em.getConnection();
    const taxon = await em.findOneOrFail(TaxonSchema, { scientificName: species[0]! });
    // Bulk rows: same shape as real ones, numbers in a range the real generator never makes.
    await conn.execute(
      `INSERT INTO transfer (id, number, status, version, sender_organization_id, sender_contact_id, receiver_organization_id, receiver_contact_id,
          origin_street, origin_city, origin_state, origin_zip, destination_street, destination_city, destination_state, destination_zip,
          mode, planned_departure_at, expected_arrival_at, purpose, sale, created_by_id, created_at, updated_at)
       SELECT gen_random_uuid(), 'HW-BENCH-' || g, (ARRAY['draft','awaiting_receiver','ready','in_transit','checked_in','closed'])[1 + g % 6], 1, ?, ?, ?, NULL,
          '1 Bench Road', 'Knoxville', 'TN', '37917', '2 Bench Road', 'Eugene', 'OR', '97401',
          'overnight_air', now() - (g || ' minutes')::interval, now() - (g || ' minutes')::interval + interval '20 hours', 'breeding', false, ?, now(), now()
         FROM generate_series(1, ?) g`,
      [sender.organization!.id, sender.id, receiverOrg.id, sender.id, bulkTransfers],
    );
    await conn.execute(
      `INSERT INTO animal (id, transfer_id, position, taxon_id, count, sex, origin)
       SELECT gen_random_uuid(), id, 0, ?, 1 + (random() * 4)::int, 'unknown', 'captive_bred' FROM transfer WHERE number LIKE 'HW-BENCH-%'`,
      [taxon.id],
    );
    await conn.execute("ANALYZE");
    return { detailId: t.id };
  } finally {
    await orm.close();
  }
}
