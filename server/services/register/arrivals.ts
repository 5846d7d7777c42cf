import type { EntityManager } from "@mikro-orm/postgresql";
import type { RegisterCondition } from "@shared/constants";
import type { LedgerEvent } from "@shared/register/ledger";
import type { Actor } from "../../auth/actor";
import { RegisterEntrySchema } from "../../db/entities/check-in.entity";
import type { Organization } from "../../db/entities/organization.entity";
import type { Animal, Transfer } from "../../db/entities/transfer.entity";
import { appendEvent, ledgerEventsOf, startQuarantine } from "./ledger";

export type ArrivalLine = {
  animal: Animal;
  counts: Record<RegisterCondition, number>;
  notes: Record<RegisterCondition, string | null>;
  weightG: number | null;
};

const addressOf = (organization: Organization) =>
  `${organization.street}, ${organization.city}, ${organization.state} ${organization.zip}`;

/**
 * What a signed check-in writes to the register (issue 15 §1, §2): for each animal line and each
 * way the animals arrived, an entry in the receiver's register carrying what is known of the
 * animal (species, sex, identifier, origin, hatch date, size) and the sender as its source, with
 * its events — acquired by transfer; dead on arrival as acquired and died the same day; missing as
 * never received. Animals accepted alive start the receiver's quarantine. A line started from the
 * sender's register continues that entry: the new entry points back at it, and the sender's entry
 * gets a "transferred out" event naming the receiver and the transfer.
 */
export async function recordArrivals(
  tx: EntityManager,
  {
    actor,
    transfer,
    sender,
    receiver,
    lines,
    arrivedOn,
    departedOn,
  }: {
    actor: Actor;
    transfer: Transfer;
    sender: Organization;
    receiver: Organization;
    lines: ArrivalLine[];
    arrivedOn: string;
    departedOn: string | null;
  },
) {
  const senderParty = { name: sender.name, address: addressOf(sender), permitNumber: null };
  for (const { animal, counts, notes, weightG } of lines) {
    // What the sender's register knew of the animal fills what the line left blank.
    const before = animal.registerEntryId
      ? await tx.findOne(RegisterEntrySchema, { id: animal.registerEntryId, organization: sender.id })
      : null;
    for (const condition of ["well", "problem", "dead_on_arrival", "missing"] as const) {
      const count = counts[condition];
      if (count === 0) continue;
      const entry = tx.create(RegisterEntrySchema, {
        organization: receiver,
        kind: count === 1 && animal.identifier ? "individual" : "group",
        taxon: animal.taxon,
        sex: animal.sex,
        count,
        identifier: animal.identifier ?? before?.identifier ?? null,
        identifierKind: animal.identifierKind ?? before?.identifierKind ?? null,
        origin: animal.origin ?? before?.origin ?? null,
        hatchDate: animal.hatchDate ?? before?.hatchDate ?? null,
        dateAcquired: arrivedOn,
        acquiredHow: "transfer",
        sourceOrganization: sender,
        sourceOrganizationName: sender.name,
        transfer,
        transferNumber: transfer.number,
        animal,
        condition,
        notes: notes[condition],
        weightG: weightG ?? animal.weightG ?? null,
        lengthMm: animal.lengthMm ?? null,
        previousEntryId: before?.id ?? null,
        countInCare: 0,
        status: "in_care",
        createdById: actor.id,
      });
      const known: LedgerEvent[] = [];
      const base = { on: arrivedOn, count, transferId: transfer.id, note: notes[condition] };
      if (condition === "missing") {
        await appendEvent(tx, entry, actor, { ...base, kind: "missing_on_arrival" }, { known });
        continue;
      }
      await appendEvent(
        tx,
        entry,
        actor,
        { ...base, kind: "acquired", acquiredHow: "transfer", counterparty: senderParty, weightG },
        { known },
      );
      if (condition === "dead_on_arrival")
        await appendEvent(tx, entry, actor, { ...base, kind: "died", cause: "Dead on arrival" }, { known });
      else {
        // New arrivals start the receiver's quarantine at check-in [practice: SOURCES.md].
        await startQuarantine(tx, entry, arrivedOn);
      }
    }
    if (animal.registerEntryId)
      await markTransferredOut(tx, animal, { transfer, sender, receiver, on: departedOn ?? arrivedOn });
  }
}

/** The sender's entry a line was started from: "transferred out" to the receiver, for the animals it still held. */
async function markTransferredOut(
  tx: EntityManager,
  animal: Animal,
  { transfer, sender, receiver, on }: { transfer: Transfer; sender: Organization; receiver: Organization; on: string },
) {
  const entry = await tx.findOne(RegisterEntrySchema, { id: animal.registerEntryId!, organization: sender.id });
  if (!entry) return;
  const events = await ledgerEventsOf(tx, [entry.id]);
  const count = Math.min(animal.count, entry.countInCare);
  if (count <= 0) return;
  const begins = events.find((event) => event.kind !== "voided")?.on ?? on;
  await appendEvent(
    tx,
    entry,
    { id: null, displayName: `Hatchway, from ${receiver.name}'s check-in` },
    {
      kind: "transferred_out",
      on: on < begins ? begins : on,
      count,
      transferId: transfer.id,
      counterparty: { name: receiver.name, address: addressOf(receiver), permitNumber: null },
      note: `Transfer ${transfer.number}`,
    },
    { known: events },
  );
}
