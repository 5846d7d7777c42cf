import type { UsState } from "@shared/constants";
import type { ManifestInput } from "../pdf/manifest-input";
import type { TransferView } from "../services/transfers/read-view";
import type { ManifestExtras } from "../services/transfers/manifest-extras";
import type { AppLinks } from "../mail/links";

/** The manifest and labels' input from a transfer's view: every box with its animals, in packing order. */
export function presentManifestInput(
  v: TransferView,
  extras: Required<ManifestExtras>,
  links: AppLinks,
  now: Date,
): ManifestInput {
  const t = v.t;
  const originTz = t.origin_time_zone ?? "America/New_York";
  const destinationTz = t.destination_time_zone ?? originTz;
  const party = (org: TransferView["sender"], contact: TransferView["senderContact"]) => ({
    organisation: org.name,
    contactName: contact?.display_name ?? org.name,
    street: org.street,
    city: org.city,
    state: org.state as UsState,
    zip: org.zip,
    phone24h: org.phone,
    email: contact?.email ?? org.email,
  });
  const sender = party(v.sender, v.senderContact);
  const receiver = party(v.receiver, v.receiverContact);
  // Shipper and consignee are the addresses the animals leave from and go to (50 CFR 14.81).
  Object.assign(sender, {
    street: t.origin_street,
    city: t.origin_city,
    state: t.origin_state as UsState,
    zip: t.origin_zip,
  });
  Object.assign(receiver, {
    street: t.destination_street,
    city: t.destination_city,
    state: t.destination_state as UsState,
    zip: t.destination_zip,
  });

  return {
    transferNumber: t.number,
    mode: t.mode,
    purpose: t.purpose,
    plannedDeparture: { at: new Date(t.planned_departure_at).toISOString(), tz: originTz },
    expectedArrival: { at: new Date(t.expected_arrival_at).toISOString(), tz: destinationTz },
    sender,
    receiver,
    couriers: v.legs.map((l) => ({ name: l.courier_name, organisation: l.org_name, phone: l.org_phone ?? "" })),
    boxes: v.containers.map((c, i) => ({
      id: c.id,
      label: c.label,
      index: i + 1,
      lengthMm: c.length_mm,
      widthMm: c.width_mm,
      heightMm: c.height_mm,
      insulation: { material: c.wall_material, wallThicknessMm: c.wall_thickness_mm },
      pack: c.pack,
      sealNumber: c.seal_number,
      animals: v.animals
        .filter((a) => a.container_id === c.id)
        .map((a) => ({
          scientificName: a.taxon.scientific_name,
          commonName: a.taxon.common_names[0] ?? "",
          count: a.count,
          sex: a.sex,
          identifier: a.identifier,
          origin: a.origin,
          lengthMm: a.length_mm,
          weightG: a.weight_g,
          venomous: a.taxon.venomous,
          notes: a.notes,
        })),
    })),
    documents: extras.documents,
    temperature: extras.temperature,
    verdicts: extras.verdicts,
    handlingNotes: t.handling_notes,
    // The sender and the receiver head the contacts from their own blocks; these are the others.
    emergencyContacts: [
      ...v.legs
        .filter((l) => l.org_phone)
        .map((l) => ({
          name: l.courier_name,
          role: `Courier, leg ${l.sequence}${l.org_name ? ` — ${l.org_name}` : ""}`,
          phone: l.org_phone!,
        })),
    ],
    handoffUrl: links.to(`/legs/${t.id}`),
    generatedAt: now.toISOString(),
    generatedTz: originTz,
  };
}
