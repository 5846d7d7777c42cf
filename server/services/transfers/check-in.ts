import type { EntityManager } from "@mikro-orm/postgresql";
import { ref } from "@mikro-orm/core";
import type { z } from "zod";
import type { checkInInputSchema } from "@shared/schemas/transfer";
import { computeDiscrepancies, outcomeTotal } from "@shared/checkin/discrepancy";
import type { Actor } from "../../auth/actor";
import { AnimalSchema } from "../../db/entities/transfer.entity";
import { CheckInExtraSchema, CheckInItemSchema, CheckInSchema } from "../../db/entities/check-in.entity";
import { recordArrivals } from "../register/arrivals";
import { TaxonSchema } from "../../db/entities/taxon.entity";
import { OrganizationSchema } from "../../db/entities/organization.entity";
import { UserSchema } from "../../db/entities/user.entity";
import { conflict, forbidden, invalidField } from "../../http/errors";
import { mayCheckIn, transferAbilities } from "../../policies/transfer.policy";
import { checkBoxReading } from "../temperature/readings";
import { appendCustody } from "./custody";
import { loadTransferForActor } from "./load";
import { notifyParty } from "./notify";
import type { AppLinks } from "../../mail/links";

type CheckInParsed = z.output<typeof checkInInputSchema>;

function describe(rows: ReturnType<typeof computeDiscrepancies>): string {
  const sum = (k: "arrivedWell" | "arrivedProblem" | "deadOnArrival" | "missing" | "extra") =>
    rows.reduce((n, r) => n + r[k], 0);
  const parts = [`${sum("arrivedWell")} arrived well`];
  if (sum("arrivedProblem")) parts.push(`${sum("arrivedProblem")} with a problem`);
  if (sum("deadOnArrival")) parts.push(`${sum("deadOnArrival")} dead on arrival`);
  if (sum("missing")) parts.push(`${sum("missing")} missing`);
  if (sum("extra")) parts.push(`${sum("extra")} not on the manifest`);
  return `${parts.join(", ")}.`;
}

/**
 * What a register entry says besides its condition: the problem for an animal that arrived with one;
 * for a loss, the line's notes (or the check-in's when the line has none). An animal that arrived
 * well carries no note: the line's notes may be about the ones lost.
 */
function registerNotes(
  condition: "well" | "problem" | "dead_on_arrival" | "missing",
  item: CheckInParsed["items"][number],
  checkInNotes: string | null,
): string | null {
  if (condition === "well") return null;
  if (condition === "problem") return item.problem?.trim() || null;
  return item.notes?.trim() || checkInNotes;
}

/**
 * The receiver's signed check-in: an outcome for every animal on the manifest, animals that
 * came but were not listed, and the discrepancy against the manifest. Every animal enters the
 * receiver's collection register: accepted ones as held, dead-on-arrival and missing ones as losses
 * (with the line's notes and weight); the sender is told.
 */
export async function checkInTransfer({
  em,
  actor,
  transferId,
  input,
  links,
}: {
  em: EntityManager;
  actor: Actor;
  transferId: string;
  /** Where the e-mails this step queues link to (the app's public URL). */
  links: AppLinks;
  input: CheckInParsed;
}) {
  return em.transactional(async (tx) => {
    const { transfer: t, role, facts } = await loadTransferForActor(tx, transferId, actor, { lock: true });
    if (!mayCheckIn(role)) throw forbidden("Only a member of the receiving organisation can check the animals in.");
    if (t.status !== "delivered")
      throw conflict(
        t.status === "checked_in" || t.status === "closed"
          ? "This transfer is already checked in."
          : "Check-in opens once the delivery to the receiver is recorded.",
      );
    if (!transferAbilities(actor, role, facts).checkIn)
      throw forbidden("Only a member of the receiving organisation can check the animals in.");

    const animals = await tx.find(AnimalSchema, { transfer: t }, { orderBy: { position: "asc" }, populate: ["taxon"] });
    const byId = new Map(animals.map((a) => [a.id, a]));
    const seen = new Set<string>();
    input.items.forEach((item, i) => {
      const animal = byId.get(item.animalId);
      if (!animal) throw invalidField(["items", i, "animalId"], "this is not an animal line of this transfer");
      if (seen.has(item.animalId)) throw invalidField(["items", i, "animalId"], "this animal line is listed twice");
      seen.add(item.animalId);
      if (outcomeTotal(item) !== animal.count) {
        throw invalidField(
          ["items", i],
          `the outcomes add up to ${outcomeTotal(item)}, but the manifest lists ${animal.count}`,
        );
      }
    });
    const unlisted = animals.findIndex((a) => !seen.has(a.id));
    if (unlisted >= 0)
      throw invalidField(["items"], `give an outcome for every animal line (line ${unlisted + 1} is missing)`);
    const extraTaxa = input.extras.length
      ? await tx.find(TaxonSchema, { id: { $in: input.extras.map((e) => e.taxonId) } })
      : [];
    const taxonById = new Map(extraTaxa.map((x) => [x.id, x]));
    input.extras.forEach((e, i) => {
      if (!taxonById.has(e.taxonId))
        throw invalidField(["extras", i, "taxonId"], "this species is not in the catalogue");
    });

    const signedAt = new Date();
    const checkIn = tx.create(CheckInSchema, {
      transfer: t,
      signedBy: tx.getReference(UserSchema, actor.id),
      signedName: input.signedName,
      signedAt,
      notes: input.notes ?? null,
    });
    const sender = await tx.findOneOrFail(OrganizationSchema, { id: t.senderOrganization.id });
    const receiverOrg = await tx.findOneOrFail(OrganizationSchema, { id: t.receiverOrganization.id });
    const arrivedOn = signedAt.toISOString().slice(0, 10);
    for (const item of input.items) {
      const animal = byId.get(item.animalId)!;
      tx.create(CheckInItemSchema, {
        checkIn,
        animal,
        arrivedWell: item.arrivedWell,
        arrivedProblem: item.arrivedProblem,
        deadOnArrival: item.deadOnArrival,
        missing: item.missing,
        problem: item.problem ?? null,
        weightG: item.weightG ?? null,
        notes: item.notes ?? null,
      });
    }
    // Every animal enters the register, losses too, so it accounts for every animal on the
    // manifest (CITES Rp/3 1.72, 1.82); lines started from the sender's register continue it.
    const departed = await tx.getConnection().execute<{ on: string }[]>(
      `SELECT to_char(at AT TIME ZONE 'UTC', 'YYYY-MM-DD') AS "on" FROM custody_entry
        WHERE transfer_id = ? AND kind = 'status_change' AND payload->>'to' = 'in_transit' ORDER BY seq LIMIT 1`,
      [t.id],
    );
    await recordArrivals(tx, {
      actor,
      transfer: t,
      sender,
      receiver: receiverOrg,
      arrivedOn,
      departedOn: departed[0]?.on ?? null,
      lines: input.items.map((item) => ({
        animal: byId.get(item.animalId)!,
        counts: {
          well: item.arrivedWell,
          problem: item.arrivedProblem,
          dead_on_arrival: item.deadOnArrival,
          missing: item.missing,
        },
        notes: {
          well: registerNotes("well", item, input.notes ?? null),
          problem: registerNotes("problem", item, input.notes ?? null),
          dead_on_arrival: registerNotes("dead_on_arrival", item, input.notes ?? null),
          missing: registerNotes("missing", item, input.notes ?? null),
        },
        weightG: item.weightG ?? null,
      })),
    });
    for (const e of input.extras)
      tx.create(CheckInExtraSchema, {
        checkIn,
        taxon: ref(taxonById.get(e.taxonId)!),
        count: e.count,
        sex: e.sex,
        notes: e.notes ?? null,
      });

    const rows = computeDiscrepancies(
      animals.map((a) => ({
        id: a.id,
        taxonId: a.taxon.id,
        scientificName: a.taxon.getEntity().scientificName,
        sex: a.sex,
        count: a.count,
      })),
      input.items,
      input.extras.map((e) => ({
        taxonId: e.taxonId,
        scientificName: taxonById.get(e.taxonId)!.scientificName,
        sex: e.sex,
        count: e.count,
      })),
    );
    const summary = describe(rows);
    // Each line's own words on the record too: what was wrong, the notes, the weight.
    const lines = input.items
      .filter((item) => item.problem || item.notes || item.weightG != null || item.deadOnArrival || item.missing)
      .map((item) => ({
        scientificName: byId.get(item.animalId)!.taxon.getEntity().scientificName,
        deadOnArrival: item.deadOnArrival,
        missing: item.missing,
        problem: item.problem ?? null,
        notes: item.notes ?? null,
        weightG: item.weightG ?? null,
      }));
    await appendCustody(tx, t.id, actor, "check_in", {
      signedName: input.signedName,
      summary,
      discrepancies: rows,
      lines,
      notes: input.notes ?? null,
      boxTempF: input.boxTempF ?? null,
    });
    await checkBoxReading(tx, links, t, actor, { tempF: input.boxTempF, place: null, source: "check_in" });
    await appendCustody(tx, t.id, actor, "status_change", {
      from: "delivered",
      to: "checked_in",
      reason: "check-in signed",
    });
    t.status = "checked_in";
    t.version += 1;
    await notifyParty(tx, links, t, "sender", "checked_in", actor, { summary });
    await tx.flush();
    return t;
  });
}
