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
): Promise<{ detailId: string; reportPermitId: string }> {
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
      links,
    });
    await assignLegs({
      em: em.fork(),
      actor: s,
      transferId: t.id,
      input: { legs: couriers.map((c) => ({ courierId: c.id })) },
      links,
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
    // The register grows with the bulk rows: 100,000 entries and 500 report animals for the benchmark, a few for tests.
    const reportPermitId = await seedRegister(conn, sender.organization!.id, sender.id, species, {
      listEntries: bulkTransfers,
      reportAnimals: Math.min(500, bulkTransfers),
    });
    await conn.execute("ANALYZE");
    return { detailId: t.id, reportPermitId };
  } finally {
    await orm.close();
  }
}

/** The period the register benchmark's yearly report covers. */
export const BENCH_REPORT_PERIOD = { from: "2025-01-01", to: "2025-12-31" };

/**
 * The sender's register (issue 15 §6): 100,000 entries of one species, each with its acquired
 * event, for the register's first page; and 500 animals of another species under one permit with
 * 20,000 events between them (a group of 100 acquired, then 39 ins and outs of one animal each,
 * spread over 2024–2026), for the yearly report.
 */
async function seedRegister(
  conn: ReturnType<ReturnType<Awaited<ReturnType<typeof initORM>>["em"]["fork"]>["getConnection"]>,
  organizationId: string,
  userId: string,
  species: string[],
  sizes: { listEntries: number; reportAnimals: number },
): Promise<string> {
  const [listTaxon, reportTaxon] = await Promise.all(
    [species[0]!, species[1]!].map(
      async (name) =>
        ((await conn.execute("SELECT id FROM taxon WHERE scientific_name = ?", [name])) as { id: string }[])[0]!.id,
    ),
  );
  await conn.execute(
    `INSERT INTO register_entry (id, organization_id, kind, taxon_id, sex, count, date_acquired, acquired_how, source_organization_name,
        count_in_care, status, created_at)
     SELECT gen_random_uuid(), ?, 'group', ?, 'unknown', 1 + g % 5, date '2026-06-01' - (g % 3000), 'purchase', 'Bench source ' || (g % 97),
        1 + g % 5, 'in_care', now()
       FROM generate_series(1, ?) g`,
    [organizationId, listTaxon, sizes.listEntries],
  );
  await conn.execute(
    `INSERT INTO register_event (id, entry_id, organization_id, kind, "on", count, acquired_how, counterparty_name, recorded_by_name, created_at)
     SELECT gen_random_uuid(), id, organization_id, 'acquired', date_acquired, count, 'purchase', source_organization_name, 'Bench loader', now()
       FROM register_entry WHERE organization_id = ? AND taxon_id = ?`,
    [organizationId, listTaxon],
  );
  const permitId = crypto.randomUUID();
  await conn.execute(
    `INSERT INTO permit_document (id, organization_id, kind, jurisdiction, number, holder_name, species_covered, created_by_id, created_at, updated_at,
        report_start_month, report_due_month, report_due_day)
     VALUES (?, ?, 'possession_permit', 'IL', 'BENCH-IL-1', 'Bench keeper', ARRAY[?]::text[], ?, now(), now(), 1, 1, 31)`,
    [permitId, organizationId, species[1]!, userId],
  );
  await conn.execute(
    `INSERT INTO register_entry (id, organization_id, kind, taxon_id, sex, count, date_acquired, acquired_how, source_organization_name,
        identifier, count_in_care, status, permit_ids, created_at)
     SELECT gen_random_uuid(), ?, 'group', ?, 'unknown', 100, date '2024-01-01' + (g % 200), 'purchase', 'Bench breeder', 'BENCH-' || g,
        100, 'in_care', ARRAY[?]::uuid[], now()
       FROM generate_series(1, ?) g`,
    [organizationId, reportTaxon, permitId, sizes.reportAnimals],
  );
  await conn.execute(
    `INSERT INTO register_event (id, entry_id, organization_id, kind, "on", count, counterparty_name, counterparty_permit_number, recorded_by_name, created_at)
     SELECT gen_random_uuid(), e.id, e.organization_id,
            CASE WHEN k = 0 THEN 'acquired' ELSE (ARRAY['sold','died','hatched','given','escaped','acquired','transferred_out','released'])[1 + k % 8] END,
            e.date_acquired + k * 18, CASE WHEN k = 0 THEN 100 ELSE 1 END, 'Bench counterparty ' || (k % 13), 'BENCH-P-' || (k % 13), 'Bench loader', now()
       FROM register_entry e CROSS JOIN generate_series(0, 39) k
      WHERE e.organization_id = ? AND e.taxon_id = ?`,
    [organizationId, reportTaxon],
  );
  return permitId;
}
