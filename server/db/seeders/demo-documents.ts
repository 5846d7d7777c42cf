import type { EntityManager } from "@mikro-orm/postgresql";
import { addDays } from "@shared/temperature/zoned-time";
import { todayUtc } from "@shared/compliance/expiry";
import type { DocumentRecord } from "@shared/compliance/schemas";
import { PermitDocumentSchema } from "../entities/compliance.entity";
import type { Organization } from "../entities/organization.entity";
import { UserSchema } from "../entities/user.entity";

const DEMO_NOTE = "Invented for the Hatchway demo: not a real permit or certificate, and no agency issued it.";

type DemoRecord = Omit<
  DocumentRecord,
  "holderName" | "veterinarianName" | "veterinarianAccredited" | "inspectionDate" | "statements" | "animalsCovered"
> &
  Partial<
    Pick<
      DocumentRecord,
      "veterinarianName" | "veterinarianAccredited" | "inspectionDate" | "statements" | "animalsCovered"
    >
  >;

/**
 * A few invented permits and certificates for the demo organisations, dated around today so the
 * screens show every expiry badge (valid, expiring soon, expired). No scans are uploaded. Each
 * organisation needs a member first: the documents are recorded as created by one.
 */
export async function seedDemoDocuments(
  em: EntityManager,
  orgs: { breeder: Organization; centre: Organization; rescue: Organization },
): Promise<number> {
  const today = todayUtc();
  const day = (offset: number) => addDays(today, offset);
  const plan: [Organization, DemoRecord][] = [
    [
      orgs.breeder,
      {
        kind: "cvi",
        jurisdiction: "TN",
        number: "DEMO-CVI-TN-26-0147",
        speciesCovered: ["Stigmochelys pardalis", "Centrochelys sulcata"],
        validFrom: day(-5),
        validTo: day(25),
        issuedOn: day(-5),
        veterinarianName: "Dr. Hollis Wren (demo)",
        veterinarianAccredited: true,
        inspectionDate: day(-5),
        statements: ["Examined and found free of ticks", "Examined and found free of signs of infectious disease"],
        animalsCovered: [{ scientificName: "Stigmochelys pardalis", count: 2, identifier: null }],
      },
    ],
    [
      orgs.breeder,
      {
        kind: "captive_bred_registration",
        jurisdiction: "US",
        number: "DEMO-CBW-000318",
        speciesCovered: ["Astrochelys radiata"],
        validFrom: day(-200),
        validTo: day(530),
        issuedOn: day(-200),
      },
    ],
    [
      orgs.breeder,
      {
        kind: "possession_permit",
        jurisdiction: "TN",
        number: "DEMO-TN-WL-0091",
        speciesCovered: ["Crotalus horridus"],
        validFrom: day(-375),
        validTo: day(-10),
        issuedOn: day(-375),
      },
    ],
    [
      orgs.centre,
      {
        kind: "possession_permit",
        jurisdiction: "OR",
        number: "DEMO-OR-POS-5520",
        speciesCovered: ["Terrapene carolina", "Ambystoma maculatum", "Chrysemys picta"],
        validFrom: day(-90),
        validTo: day(275),
        issuedOn: day(-90),
      },
    ],
    [
      orgs.centre,
      {
        kind: "state_import_permit",
        jurisdiction: "OR",
        number: "DEMO-OR-IMP-1108",
        speciesCovered: ["Pantherophis guttatus", "Eublepharis macularius"],
        validFrom: day(-30),
        validTo: day(20),
        issuedOn: day(-30),
      },
    ],
    [
      orgs.rescue,
      {
        kind: "state_import_permit",
        jurisdiction: "OH",
        number: "DEMO-OH-IMP-3304",
        speciesCovered: ["Trachemys scripta", "Terrapene"],
        validFrom: day(-60),
        validTo: day(305),
        issuedOn: day(-60),
      },
    ],
  ];
  for (const [org, record] of plan) {
    const member = await em.findOne(
      UserSchema,
      { organization: org.id, role: { $in: ["manager", "member"] } },
      { orderBy: { createdAt: "asc" } },
    );
    if (!member) throw new Error(`demo documents: ${org.name} has no member to record them`);
    em.create(PermitDocumentSchema, {
      organization: org.id,
      kind: record.kind,
      jurisdiction: record.jurisdiction,
      number: record.number,
      holderName: org.name,
      speciesCovered: record.speciesCovered,
      validFrom: record.validFrom,
      validTo: record.validTo,
      issuedOn: record.issuedOn,
      veterinarian: record.veterinarianName ?? null,
      veterinarianAccredited: record.veterinarianAccredited ?? null,
      inspectionDate: record.inspectionDate ?? null,
      statements: record.statements ?? [],
      animalsCovered: record.animalsCovered ?? [],
      notes: DEMO_NOTE,
      createdBy: member.id,
      reminderSentAt: null,
    });
  }
  await em.flush();
  return plan.length;
}
