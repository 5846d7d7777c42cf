/**
 * Builders for test and demo records. Each creates its own parents when none are given,
 * so a test states only what it cares about. The demo seeder is built from these too.
 */
import type { EntityManager } from "@mikro-orm/postgresql";
import { ref } from "@mikro-orm/core";
import type { OrganizationKind, UserRole } from "@shared/constants";
import { emailKey } from "@shared/schemas/common";
import { OrganizationSchema, type Organization } from "../server/db/entities/organization.entity";
import { UserSchema, type User } from "../server/db/entities/user.entity";
import { hashPassword } from "../server/auth/passwords";
import type { TransferStatus } from "@shared/constants";
import type { TransferInputParsed } from "@shared/schemas/transfer";
import { TaxonSchema } from "../server/db/entities/taxon.entity";
import { AnimalSchema, ContainerSchema, type Transfer } from "../server/db/entities/transfer.entity";
import { actorFromUser, type Actor } from "../server/auth/actor";
import { createTransfer } from "../server/services/transfers/write-transfer";
import { transitionTransfer } from "../server/services/transfers/transition";
import { assignLegs } from "../server/services/transfers/legs";
import { recordHandoff } from "../server/services/transfers/handoff";
import { checkInTransfer } from "../server/services/transfers/check-in";
import type { AppContext } from "../server/context";
import { createReadyGates } from "../server/composition";
import { createLinks } from "../server/mail/links";
import { TEST_PUBLIC_URL } from "./support/constants";

let counter = 0;
const next = () => `${Date.now().toString(36)}${(++counter).toString(36)}`;

export const DEMO_PASSWORD = "hatchway-demo";

type OrgOverrides = Partial<
  Pick<Organization, "name" | "kind" | "street" | "city" | "state" | "zip" | "phone" | "email" | "listed" | "pending">
>;

export async function buildOrganization(em: EntityManager, overrides: OrgOverrides = {}): Promise<Organization> {
  const n = next();
  const org = em.create(OrganizationSchema, {
    name: `Test Keepers ${n}`,
    kind: "breeder" as OrganizationKind,
    street: "1 Test Lane",
    city: "Knoxville",
    state: "TN",
    zip: "37917",
    phone: "+1 865 555 0100",
    email: `org-${n}@example.test`,
    ...overrides,
  });
  await em.flush();
  return org;
}

type UserOverrides = {
  email?: string;
  displayName?: string;
  role?: UserRole;
  organization?: Organization | null;
  password?: string | null;
  disabled?: boolean;
};

/** A user with a password (default "hatchway-demo"); members get an organisation of their own. */
export async function buildUser(em: EntityManager, overrides: UserOverrides = {}): Promise<User> {
  const n = next();
  const role = overrides.role ?? "member";
  const organization =
    overrides.organization !== undefined
      ? overrides.organization
      : role === "member" || role === "manager"
        ? await buildOrganization(em)
        : role === "courier"
          ? await buildOrganization(em, { kind: "courier_service" })
          : null;
  const email = overrides.email ?? `user-${n}@example.test`;
  const password = overrides.password === undefined ? DEMO_PASSWORD : overrides.password;
  const user = em.create(UserSchema, {
    email,
    emailKey: emailKey(email),
    displayName: overrides.displayName ?? `Test User ${n}`,
    role,
    organization: organization ? ref(organization) : null,
    passwordHash: password === null ? null : await hashPassword(password),
    disabled: overrides.disabled ?? false,
  });
  await em.flush();
  return user;
}

// ---------------------------------------------------------------- transfers

export async function actorOf(em: EntityManager, user: User): Promise<Actor> {
  await em.populate(user, ["organization"]);
  return actorFromUser(user);
}

/** A taxon from the seeded catalogue by scientific name (the template database has them all). */
export async function taxonId(em: EntityManager, scientificName: string): Promise<string> {
  return (await em.findOneOrFail(TaxonSchema, { scientificName })).id;
}

type AnimalSpec = {
  taxon: string;
  count?: number;
  sex?: "male" | "female" | "unknown";
  box?: string;
  lengthMm?: number;
  identifier?: string;
};

/** A valid transfer input: one box per distinct `box` key, departing in `daysAhead` days. */
export async function transferInput(
  em: EntityManager,
  receiverOrganizationId: string,
  options: { animals?: AnimalSpec[]; daysAhead?: number; boxes?: string[]; mode?: TransferInputParsed["mode"] } = {},
): Promise<TransferInputParsed> {
  const animals = options.animals ?? [{ taxon: "Pantherophis guttatus", count: 2, sex: "female", box: "A" }];
  const boxes = options.boxes ?? [...new Set(animals.map((a) => a.box ?? "A"))];
  const depart = new Date(Date.now() + (options.daysAhead ?? 3) * 86_400_000);
  return {
    receiverOrganizationId,
    receiverContactId: null,
    origin: { street: "418 Quarry Hollow Road", city: "Knoxville", state: "TN", zip: "37917" },
    destination: { street: "92 Boardwalk Lane", city: "Eugene", state: "OR", zip: "97401" },
    mode: options.mode ?? "overnight_air",
    plannedDepartureAt: depart.toISOString(),
    expectedArrivalAt: new Date(depart.getTime() + 20 * 3600_000).toISOString(),
    purpose: "education_exhibition",
    sale: false,
    salePriceUsd: null,
    handlingNotes: "Keep upright and out of the sun.",
    privateNotes: null,
    containers: boxes.map((key, i) => ({
      key,
      label: `Box ${key}`,
      lengthMm: 400,
      widthMm: 300,
      heightMm: 250,
      wallMaterial: "eps" as const,
      wallThicknessMm: 25,
      pack: "none" as const,
      sealNumber: `SEAL-${i + 1}`,
    })),
    animals: await Promise.all(
      animals.map(async (a) => ({
        taxonId: await taxonId(em, a.taxon),
        count: a.count ?? 1,
        sex: a.sex ?? "unknown",
        identifier: a.identifier ?? null,
        identifierKind: null,
        origin: "captive_bred" as const,
        lengthMm: a.lengthMm ?? null,
        lengthKind: null,
        weightG: null,
        hatchDate: null,
        notes: null,
        containerKey: a.box ?? "A",
      })),
    ),
  };
}

/**
 * The reason test fixtures give when they confirm past the temperature gate and past an unverified
 * compliance verdict (a state on the route with no reviewed rules).
 */
export const FIXTURE_OVERRIDE =
  "Test fixture: the temperature check and the unreviewed states are not under test here.";

/**
 * Records a review of the library's rules for each jurisdiction named ("all": every one), as an
 * administrator would on the coverage screen; null withdraws the reviews. Tests of a "clear"
 * verdict need every jurisdiction on the route reviewed (and free of demo rules).
 */
export async function markReviewed(
  em: EntityManager,
  jurisdictions: readonly string[] | "all",
  reviewedOn: string | null = "2026-12-01",
): Promise<void> {
  const reviewer = reviewedOn === null ? null : "Test reviewer";
  if (jurisdictions === "all") {
    await em.execute("UPDATE jurisdiction_coverage SET reviewed_on = ?, reviewed_by = ?", [reviewedOn, reviewer]);
    return;
  }
  await em.execute("UPDATE jurisdiction_coverage SET reviewed_on = ?, reviewed_by = ? WHERE jurisdiction IN (?)", [
    reviewedOn,
    reviewer,
    [...jurisdictions],
  ]);
}

export type TransferCast = { transfer: Transfer; sender: User; receiver: User; couriers: User[] };

/** What a fixture's steps use from an app: its gates and where its e-mails link to. */
export type FixtureWiring = Pick<AppContext, "links" | "readyGates">;

/**
 * The wiring of a fixture built without naming an app: the product's gates in their order, with
 * no weather service (so the temperature gate says "forecast unavailable" and the fixture
 * overrides it with FIXTURE_OVERRIDE), and links to the test apps' public URL.
 */
export const FIXTURE_WIRING: FixtureWiring = Object.freeze({
  links: createLinks(TEST_PUBLIC_URL),
  readyGates: createReadyGates(null),
});

/**
 * A transfer between two fresh organisations, moved through the real services up to
 * `status`. Couriers are assigned once it is cleared (one leg unless `legs` says more).
 */
export async function buildTransfer(
  em: EntityManager,
  options: {
    status?: TransferStatus;
    legs?: number;
    sender?: User;
    receiver?: User;
    couriers?: User[];
    animals?: AnimalSpec[];
    mode?: TransferInputParsed["mode"];
    /** The app whose gates and links the steps use; FIXTURE_WIRING when not named. */
    app?: FixtureWiring;
    /**
     * Days until the planned departure. By default 3, or 12 hours for a transfer cleared to travel,
     * so a pickup recorded "now" is not an early pickup (more than 24 h before it needs a reason).
     */
    daysAhead?: number;
  } = {},
): Promise<TransferCast> {
  const { links, readyGates: gates } = options.app ?? FIXTURE_WIRING;
  const sender = options.sender ?? (await buildUser(em, { role: "member" }));
  const receiver =
    options.receiver ??
    (await buildUser(em, {
      role: "member",
      organization: await buildOrganization(em, { kind: "nature_centre", state: "OR", city: "Eugene", zip: "97401" }),
    }));
  const couriers =
    options.couriers ??
    (await Promise.all(Array.from({ length: options.legs ?? 1 }, () => buildUser(em, { role: "courier" }))));
  await em.populate(receiver, ["organization"]);
  const s = await actorOf(em, sender);
  const r = await actorOf(em, receiver);
  const target = options.status ?? "draft";
  const cleared = ["ready", "in_transit", "delivered", "checked_in", "closed"].includes(target);
  const input = await transferInput(em, receiver.organization!.id, {
    animals: options.animals,
    mode: options.mode,
    daysAhead: options.daysAhead ?? (cleared ? 0.5 : 3),
  });
  let transfer = await createTransfer({ em: em.fork(), actor: s, input });
  const order: TransferStatus[] = [
    "draft",
    "awaiting_receiver",
    "ready",
    "in_transit",
    "delivered",
    "checked_in",
    "closed",
  ];
  const reach = (st: TransferStatus) => order.indexOf(target) >= order.indexOf(st);
  if (target === "cancelled") {
    transfer = await transitionTransfer({
      em: em.fork(),
      actor: s,
      transferId: transfer.id,
      input: { to: "cancelled", reason: "Test cancellation" },
      gates,
      links,
    });
  }
  if (reach("awaiting_receiver"))
    transfer = await transitionTransfer({
      em: em.fork(),
      actor: s,
      transferId: transfer.id,
      input: { to: "awaiting_receiver" },
      gates,
      links,
    });
  if (reach("ready")) {
    // Tests run without a weather service: the temperature gate answers "forecast unavailable"
    // and the receiver overrides it with a reason, as a party may (the override is logged).
    transfer = await transitionTransfer({
      em: em.fork(),
      actor: r,
      transferId: transfer.id,
      input: { to: "ready", override: true, reason: FIXTURE_OVERRIDE },
      gates,
      links,
    });
    transfer = await assignLegs({
      em: em.fork(),
      actor: s,
      transferId: transfer.id,
      input: { legs: couriers.map((c) => ({ courierId: c.id })) },
      links,
    });
  }
  const containers = await em.fork().find(ContainerSchema, { transfer: transfer.id });
  // Every handoff at the origin's position, between the people assigned: the fixture's handoffs
  // come seconds apart, and anything else would be an implausible speed or an unexpected party.
  const names = [sender.displayName, ...couriers.map((c) => c.displayName), receiver.displayName];
  const handoff = (index: number) => ({
    handoffIndex: index,
    boxesCounted: containers.length,
    seals: containers.map((c) => ({ containerId: c.id, sealNumber: c.sealNumber ?? null, intact: true })),
    boxTempF: 72,
    place: { text: "Test depot", lat: transfer.originLat ?? null, lon: transfer.originLon ?? null, accuracyM: 10 },
    releasedByName: names[index]!,
    receivedByName: names[index + 1]!,
    acknowledged: true as const,
  });
  if (reach("in_transit"))
    transfer = await recordHandoff({
      em: em.fork(),
      actor: await actorOf(em, couriers[0]!),
      transferId: transfer.id,
      input: handoff(0) as never,
      links,
    });
  if (reach("delivered")) {
    for (let i = 1; i < couriers.length; i++)
      transfer = await recordHandoff({
        em: em.fork(),
        actor: await actorOf(em, couriers[i]!),
        transferId: transfer.id,
        input: handoff(i) as never,
        links,
      });
    transfer = await recordHandoff({
      em: em.fork(),
      actor: r,
      transferId: transfer.id,
      input: handoff(couriers.length) as never,
      links,
    });
  }
  if (reach("checked_in")) {
    const animals = await em.fork().find(AnimalSchema, { transfer: transfer.id });
    transfer = await checkInTransfer({
      em: em.fork(),
      actor: r,
      transferId: transfer.id,
      input: {
        items: animals.map((a) => ({
          animalId: a.id,
          arrivedWell: a.count,
          arrivedProblem: 0,
          deadOnArrival: 0,
          missing: 0,
        })),
        extras: [],
        signedName: "Receiver",
        acknowledged: true,
      } as never,
      links,
    });
  }
  if (reach("closed"))
    transfer = await transitionTransfer({
      em: em.fork(),
      actor: r,
      transferId: transfer.id,
      input: { to: "closed" },
      gates,
      links,
    });
  return { transfer, sender, receiver, couriers };
}
