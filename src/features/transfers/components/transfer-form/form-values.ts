import type { AnimalInput, ContainerInput, TaxonBriefDto, TransferDto, TransferInput } from "@shared/schemas/transfer";
import type { Address } from "@shared/schemas/common";
import { newIdempotencyKey } from "@/lib/idempotency";

/** The form's own key for a box, so animals can name it before the server gives it an id. */
export function newBoxKey(): string {
  return `box-${newIdempotencyKey()}`;
}

// NaN is the form's "not filled in yet" for a number: the schema refuses it with its message.
const EMPTY = Number.NaN;

/** A new box: same size, walls and pack as the one before it, if any (boxes usually match). */
export function nextBox(previous: ContainerInput | undefined, position: number): ContainerInput {
  return {
    key: newBoxKey(),
    label: `Box ${position}`,
    lengthMm: previous?.lengthMm ?? EMPTY,
    widthMm: previous?.widthMm ?? EMPTY,
    heightMm: previous?.heightMm ?? EMPTY,
    wallMaterial: previous?.wallMaterial ?? "eps",
    wallThicknessMm: previous?.wallThicknessMm ?? EMPTY,
    pack: previous?.pack ?? "none",
    sealNumber: "",
  };
}

/** A copy of a box under a new key and label; its seal is its own, so that starts empty. */
export function duplicateBox(box: ContainerInput, position: number): ContainerInput {
  return { ...box, id: undefined, key: newBoxKey(), label: `Box ${position}`, sealNumber: "" };
}

/** A new animal line: same box and origin as the line before it, species still to choose. */
export function nextAnimal(previous: AnimalInput | undefined, fallbackBoxKey: string | null): AnimalInput {
  return {
    taxonId: "",
    count: 1,
    sex: "unknown",
    identifier: "",
    identifierKind: null,
    origin: previous?.origin ?? ("" as AnimalInput["origin"]),
    lengthMm: null,
    lengthKind: null,
    weightG: null,
    hatchDate: null,
    notes: "",
    containerKey: previous ? previous.containerKey : fallbackBoxKey,
  };
}

/** A copy of a line for the next animal of the same kind; an identifier belongs to one animal. */
export function duplicateAnimal(line: AnimalInput): AnimalInput {
  return { ...line, id: undefined, identifier: "", identifierKind: line.identifierKind ?? null };
}

/** An empty transfer, leaving from the sender's address when the directory knows it. */
export function blankTransfer(senderAddress: Address | null): TransferInput {
  const firstBox = nextBox(undefined, 1);
  const emptyAddress = { street: "", city: "", state: "" as Address["state"], zip: "" };
  return {
    receiverOrganizationId: "",
    receiverContactId: null,
    origin: senderAddress ?? emptyAddress,
    destination: emptyAddress,
    mode: "" as TransferInput["mode"],
    plannedDepartureAt: "",
    expectedArrivalAt: "",
    purpose: "" as TransferInput["purpose"],
    sale: false,
    salePriceUsd: null,
    handlingNotes: "",
    privateNotes: "",
    containers: [firstBox],
    animals: [nextAnimal(undefined, firstBox.key)],
  };
}

const addressOf = (p: { street: string; city: string; state: Address["state"]; zip: string }): Address => ({
  street: p.street,
  city: p.city,
  state: p.state,
  zip: p.zip,
});

/** A saved transfer as the form's values, in the saved order of boxes and lines. */
export function transferToInput(t: TransferDto): TransferInput {
  const keyById = new Map(t.containers.map((c) => [c.id, c.key]));
  return {
    receiverOrganizationId: t.receiver.organization.id,
    receiverContactId: t.receiver.contact?.id ?? null,
    origin: addressOf(t.origin),
    destination: addressOf(t.destination),
    mode: t.mode,
    plannedDepartureAt: t.plannedDepartureAt,
    expectedArrivalAt: t.expectedArrivalAt,
    purpose: t.purpose,
    sale: t.sale,
    salePriceUsd: t.salePriceUsd,
    handlingNotes: t.handlingNotes ?? "",
    privateNotes: t.privateNotes ?? "",
    containers: [...t.containers]
      .sort((a, b) => a.position - b.position)
      .map((c) => ({
        id: c.id,
        key: c.key,
        label: c.label,
        lengthMm: c.lengthMm,
        widthMm: c.widthMm,
        heightMm: c.heightMm,
        wallMaterial: c.wallMaterial,
        wallThicknessMm: c.wallThicknessMm,
        pack: c.pack,
        sealNumber: c.sealNumber ?? "",
      })),
    animals: [...t.animals]
      .sort((a, b) => a.position - b.position)
      .map((a) => ({
        id: a.id,
        taxonId: a.taxon.id,
        count: a.count,
        sex: a.sex,
        identifier: a.identifier ?? "",
        identifierKind: a.identifierKind,
        origin: a.origin,
        lengthMm: a.lengthMm,
        lengthKind: a.lengthKind,
        weightG: a.weightG,
        hatchDate: a.hatchDate,
        notes: a.notes ?? "",
        containerKey: a.containerKey ?? (a.containerId ? (keyById.get(a.containerId) ?? null) : null),
      })),
  };
}

/** The species already on a saved transfer, so the form can show their names. */
export function taxaOf(t: TransferDto): Record<string, TaxonBriefDto> {
  return Object.fromEntries(t.animals.map((a) => [a.taxon.id, a.taxon]));
}
