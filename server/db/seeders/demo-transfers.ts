/**
 * The demo transfers: an invented scenario walked through the real services, so every
 * record, custody entry and e-mail in the demo is what the product itself would write.
 * Organisations, people, seal numbers and notes are invented; the species are real taxa.
 */
import type { EntityManager } from "@mikro-orm/postgresql";
import type { TransferInputParsed } from "@shared/schemas/transfer";
import { actorFromUser, type Actor } from "../../auth/actor";
import type { User } from "../entities/user.entity";
import { TaxonSchema } from "../entities/taxon.entity";
import { AnimalSchema, ContainerSchema } from "../entities/transfer.entity";
import { createTransfer } from "../../services/transfers/write-transfer";
import { transitionTransfer } from "../../services/transfers/transition";
import { assignLegs } from "../../services/transfers/legs";
import { recordHandoff } from "../../services/transfers/handoff";
import { checkInTransfer } from "../../services/transfers/check-in";
import type { ReadyGate } from "../../services/transfers/transition";
import type { AppLinks } from "../../mail/links";
import { gatesForLoadedData } from "../../composition";

type Cast = { sender: User; receiver: User; couriers: User[] };
type Box = {
  key: string;
  label: string;
  pack?: TransferInputParsed["containers"][number]["pack"];
  seal: string;
  size?: [number, number, number];
};
type Line = {
  taxon: string;
  count: number;
  sex: "male" | "female" | "unknown";
  box: string;
  identifier?: string;
  lengthMm?: number;
  weightG?: number;
  notes?: string;
  origin?: TransferInputParsed["animals"][number]["origin"];
};
type Address = TransferInputParsed["origin"];

type Plan = {
  cast: Cast;
  from: Address;
  to: Address;
  mode: TransferInputParsed["mode"];
  departInDays: number;
  purpose: TransferInputParsed["purpose"];
  boxes: Box[];
  animals: Line[];
  handling: string;
  until: "draft" | "awaiting_receiver" | "ready" | "in_transit" | "delivered" | "checked_in" | "closed" | "cancelled";
  handoffs?: number;
  outcomes?: Record<string, { well: number; problem?: number; dead?: number; missing?: number; note?: string }>;
};

async function actor(em: EntityManager, user: User): Promise<Actor> {
  await em.populate(user, ["organization"]);
  return actorFromUser(user);
}

/** What the demo's steps use in place of an app: where e-mails link to, and the gates it skips (and says so). */
type Wiring = { links: AppLinks; gates: readonly ReadyGate[] };

async function runPlan(em: EntityManager, { links, gates }: Wiring, plan: Plan) {
  const s = await actor(em, plan.cast.sender);
  const r = await actor(em, plan.cast.receiver);
  const taxa = new Map(
    (await em.find(TaxonSchema, { scientificName: { $in: plan.animals.map((a) => a.taxon) } })).map((t) => [
      t.scientificName,
      t.id,
    ]),
  );
  // Departures a few minutes ahead for the records that then move on "now"; days ahead otherwise.
  const depart = new Date(Date.now() + (plan.departInDays > 0 ? plan.departInDays * 86_400_000 : 5 * 60_000));
  // Days ahead: 14:00 UTC, mid-morning at the demo's eastern origins (09:00 EST, 10:00 EDT).
  if (plan.departInDays > 0) depart.setUTCHours(14, 0, 0, 0);
  else depart.setUTCMinutes(0, 0, 0);
  if (depart.getTime() < Date.now()) depart.setTime(depart.getTime() + 3600_000);
  const input: TransferInputParsed = {
    receiverOrganizationId: plan.cast.receiver.organization!.id,
    receiverContactId: plan.cast.receiver.id,
    origin: plan.from,
    destination: plan.to,
    mode: plan.mode,
    plannedDepartureAt: depart.toISOString(),
    // Overnight air: next day. Coast to coast by road: about four days for one driver within the
    // federal hours-of-service limits (the temperature model's road plan says about 91 h).
    expectedArrivalAt: new Date(depart.getTime() + (plan.mode === "overnight_air" ? 22 : 96) * 3600_000).toISOString(),
    purpose: plan.purpose,
    sale: false,
    salePriceUsd: null,
    handlingNotes: plan.handling,
    privateNotes: null,
    containers: plan.boxes.map((b) => ({
      key: b.key,
      label: b.label,
      lengthMm: b.size?.[0] ?? 380,
      widthMm: b.size?.[1] ?? 280,
      heightMm: b.size?.[2] ?? 230,
      wallMaterial: "eps" as const,
      wallThicknessMm: 25,
      pack: b.pack ?? "none",
      sealNumber: b.seal,
    })),
    animals: plan.animals.map((a) => {
      const taxonId = taxa.get(a.taxon);
      if (!taxonId) throw new Error(`demo seed: ${a.taxon} is not in the species catalogue`);
      return {
        taxonId,
        count: a.count,
        sex: a.sex,
        identifier: a.identifier ?? null,
        identifierKind: a.identifier ? ("microchip" as const) : null,
        origin: a.origin ?? "captive_bred",
        lengthMm: a.lengthMm ?? null,
        lengthKind: a.lengthMm ? ("snout_vent" as const) : null,
        weightG: a.weightG ?? null,
        hatchDate: null,
        notes: a.notes ?? null,
        containerKey: a.box,
      };
    }),
  };
  const t = await createTransfer({ em: em.fork(), actor: s, input });
  const order = ["draft", "awaiting_receiver", "ready", "in_transit", "delivered", "checked_in", "closed"];
  const reach = (st: string) => order.indexOf(plan.until) >= order.indexOf(st);
  if (plan.until === "cancelled") {
    await transitionTransfer({
      em: em.fork(),
      actor: s,
      transferId: t.id,
      input: { to: "awaiting_receiver" },
      gates,
      links,
    });
    await transitionTransfer({
      em: em.fork(),
      actor: s,
      transferId: t.id,
      input: { to: "cancelled", reason: "The receiving pond is being rebuilt; we will send in spring instead." },
      gates,
      links,
    });
    return t;
  }
  if (reach("awaiting_receiver"))
    await transitionTransfer({
      em: em.fork(),
      actor: s,
      transferId: t.id,
      input: { to: "awaiting_receiver" },
      gates,
      links,
    });
  if (reach("ready")) {
    // Past the gates, and the custody log says so (gatesForLoadedData): the demo is not a record of checks.
    await transitionTransfer({ em: em.fork(), actor: r, transferId: t.id, input: { to: "ready" }, gates, links });
    await assignLegs({
      em: em.fork(),
      actor: s,
      transferId: t.id,
      input: {
        legs: plan.cast.couriers.map((c, i) => ({
          courierId: c.id,
          fromLabel: i === 0 ? `${plan.from.city}, ${plan.from.state}` : "Relay point",
          toLabel: i === plan.cast.couriers.length - 1 ? `${plan.to.city}, ${plan.to.state}` : "Relay point",
        })),
      },
      links,
    });
  }
  const containers = await em.fork().find(ContainerSchema, { transfer: t.id }, { orderBy: { position: "asc" } });
  const names = [
    plan.cast.sender.displayName,
    ...plan.cast.couriers.map((c) => c.displayName),
    plan.cast.receiver.displayName,
  ];
  const places = [
    "Loading bay, sender's facility",
    "Nightjar depot, Louisville KY",
    "Rest area, I-70 near Hays KS",
    "Receiving room, nature centre",
  ];
  const total =
    plan.until === "in_transit" ? (plan.handoffs ?? 1) : reach("delivered") ? plan.cast.couriers.length + 1 : 0;
  for (let i = 0; i < total; i++) {
    const recorder = i < plan.cast.couriers.length ? plan.cast.couriers[i]! : plan.cast.receiver;
    await recordHandoff({
      em: em.fork(),
      actor: await actor(em, recorder),
      transferId: t.id,
      input: {
        handoffIndex: i,
        boxesCounted: containers.length,
        seals: containers.map((c) => ({ containerId: c.id, sealNumber: c.sealNumber ?? null, intact: true })),
        boxTempF: [73, 70, 68, 71][i] ?? 70,
        place: {
          text: places[i === total - 1 && reach("delivered") ? 3 : i] ?? "En route",
          lat: null,
          lon: null,
          accuracyM: null,
        },
        releasedByName: names[i]!,
        receivedByName: names[i + 1]!,
        notes: null,
        acknowledged: true,
      },
      links,
      // Recorded in one go when the demo loads: the times and places say nothing, and the log says so.
      checks: { loadedAs: "demo" },
    });
  }
  if (reach("checked_in")) {
    const animals = await em
      .fork()
      .find(AnimalSchema, { transfer: t.id }, { orderBy: { position: "asc" }, populate: ["taxon"] });
    await checkInTransfer({
      em: em.fork(),
      actor: r,
      transferId: t.id,
      input: {
        items: animals.map((a) => {
          const o = plan.outcomes?.[a.taxon.getEntity().scientificName] ?? { well: a.count };
          return {
            animalId: a.id,
            arrivedWell: o.well,
            arrivedProblem: o.problem ?? 0,
            deadOnArrival: o.dead ?? 0,
            missing: o.missing ?? 0,
            problem: o.note ?? null,
            weightG: null,
            notes: o.note ?? null,
          };
        }),
        extras: [],
        notes: "All containers opened in the quarantine room; photos in the discussion.",
        signedName: plan.cast.receiver.displayName,
        acknowledged: true,
      },
      links,
    });
  }
  if (reach("closed"))
    await transitionTransfer({ em: em.fork(), actor: r, transferId: t.id, input: { to: "closed" }, gates, links });
  return t;
}

const KNOXVILLE: Address = { street: "418 Quarry Hollow Road", city: "Knoxville", state: "TN", zip: "37917" };
const EUGENE: Address = { street: "92 Boardwalk Lane", city: "Eugene", state: "OR", zip: "97401" };
const COLUMBUS: Address = { street: "7 Pinfold Court", city: "Columbus", state: "OH", zip: "43215" };

export async function seedDemoTransfers(
  em: EntityManager,
  people: { sender: User; receiver: User; other: User; courier: User; relay: User },
  links: AppLinks,
) {
  const wiring: Wiring = { links, gates: gatesForLoadedData("demo") };
  const main: Cast = { sender: people.sender, receiver: people.receiver, couriers: [people.courier] };
  const relayed: Cast = { ...main, couriers: [people.courier, people.relay] };
  const fromRescue: Cast = { sender: people.other, receiver: people.receiver, couriers: [people.courier] };

  await runPlan(em, wiring, {
    cast: main,
    from: KNOXVILLE,
    to: EUGENE,
    mode: "overnight_air",
    departInDays: 9,
    purpose: "education_exhibition",
    until: "draft",
    boxes: [
      { key: "A", label: "Box A — corn snakes", seal: "CR-5521", pack: "heat_40h" },
      { key: "B", label: "Box B — leopard geckos", seal: "CR-5522", pack: "heat_40h" },
    ],
    animals: [
      {
        taxon: "Pantherophis guttatus",
        count: 3,
        sex: "unknown",
        box: "A",
        weightG: 9,
        notes: "2026 hatchlings, each in its own deli cup",
      },
      { taxon: "Eublepharis macularius", count: 2, sex: "female", box: "B", weightG: 48 },
    ],
    handling: "Hatchlings in individual deli cups with damp paper towel. Keep the box level and out of direct sun.",
  });
  await runPlan(em, wiring, {
    cast: main,
    from: KNOXVILLE,
    to: EUGENE,
    mode: "overnight_air",
    departInDays: 6,
    purpose: "education_exhibition",
    until: "awaiting_receiver",
    boxes: [
      { key: "A", label: "Box A — box turtle", seal: "CR-5530", size: [450, 350, 250] },
      { key: "B", label: "Box B — salamanders", seal: "CR-5531" },
    ],
    animals: [
      {
        taxon: "Terrapene carolina",
        count: 1,
        sex: "male",
        box: "A",
        identifier: "985112004417733",
        lengthMm: 128,
        weightG: 410,
        notes: "Education animal; handles well",
      },
      {
        taxon: "Ambystoma maculatum",
        count: 2,
        sex: "unknown",
        box: "B",
        lengthMm: 95,
        notes: "Moist sphagnum, no standing water",
      },
    ],
    handling: "Turtle in a ventilated tub with damp moss. Salamanders must stay cool: under 70 °F.",
  });
  await runPlan(em, wiring, {
    cast: main,
    from: KNOXVILLE,
    to: EUGENE,
    mode: "ground_courier",
    departInDays: 4,
    purpose: "breeding",
    until: "ready",
    boxes: [{ key: "A", label: "Box A — bearded dragons", seal: "CR-5540", pack: "heat_72h" }],
    animals: [{ taxon: "Pogona vitticeps", count: 4, sex: "unknown", box: "A", lengthMm: 140, weightG: 85 }],
    handling: "Juveniles in separate ventilated cups. Heat pack taped to the lid, never touching a cup.",
  });
  await runPlan(em, wiring, {
    cast: relayed,
    from: KNOXVILLE,
    to: EUGENE,
    mode: "ground_courier",
    departInDays: 0,
    purpose: "education_exhibition",
    until: "in_transit",
    handoffs: 2,
    boxes: [
      { key: "A", label: "Box A — painted turtles", seal: "CR-5550", size: [450, 350, 250] },
      { key: "B", label: "Box B — dart frogs", seal: "CR-5551" },
    ],
    animals: [
      { taxon: "Chrysemys picta", count: 2, sex: "female", box: "A", lengthMm: 132, weightG: 380 },
      {
        taxon: "Dendrobates tinctorius",
        count: 3,
        sex: "unknown",
        box: "B",
        lengthMm: 42,
        notes: "Deli cups with moist leaf litter",
      },
    ],
    handling: "Frogs need 68–78 °F. Do not leave the van parked in the sun; keep boxes off the floor over the exhaust.",
  });
  await runPlan(em, wiring, {
    cast: main,
    from: KNOXVILLE,
    to: EUGENE,
    mode: "overnight_air",
    departInDays: 0,
    purpose: "education_exhibition",
    until: "checked_in",
    boxes: [
      { key: "A", label: "Box A — tree frogs", seal: "CR-5560" },
      { key: "B", label: "Box B — axolotls", seal: "CR-5561", pack: "cold" },
    ],
    animals: [
      { taxon: "Agalychnis callidryas", count: 5, sex: "unknown", box: "A", lengthMm: 48 },
      {
        taxon: "Ambystoma mexicanum",
        count: 4,
        sex: "unknown",
        box: "B",
        lengthMm: 150,
        notes: "Double-bagged with oxygen, bags in a cooler insert",
      },
    ],
    handling: "Axolotls must stay below 68 °F. Tree frogs in ventilated deli cups.",
    outcomes: {
      "Agalychnis callidryas": { well: 4, dead: 1, note: "One frog dead on arrival; cup was dry." },
      "Ambystoma mexicanum": { well: 3, missing: 1, note: "Only three bags in the insert." },
    },
  });
  await runPlan(em, wiring, {
    cast: fromRescue,
    from: COLUMBUS,
    to: EUGENE,
    mode: "overnight_air",
    departInDays: 0,
    purpose: "rescue_rehoming",
    until: "closed",
    boxes: [{ key: "A", label: "Box A — rescued box turtle", seal: "SS-0107", size: [450, 350, 250] }],
    animals: [
      {
        taxon: "Terrapene carolina carolina",
        count: 1,
        sex: "female",
        box: "A",
        origin: "rescued",
        lengthMm: 121,
        weightG: 365,
        notes: "Healed shell fracture, cleared by the rescue's vet",
      },
    ],
    handling: "Shell repair is stable; pad the tub with towels.",
  });
  await runPlan(em, wiring, {
    cast: fromRescue,
    from: COLUMBUS,
    to: EUGENE,
    mode: "ground_courier",
    departInDays: 12,
    purpose: "rescue_rehoming",
    until: "cancelled",
    boxes: [{ key: "A", label: "Box A — sliders", seal: "SS-0110", size: [500, 400, 300] }],
    animals: [
      { taxon: "Trachemys scripta elegans", count: 2, sex: "unknown", box: "A", origin: "rescued", lengthMm: 160 },
    ],
    handling: "Damp towels, no water in the tub.",
  });
}
