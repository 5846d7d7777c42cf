import type { RegisterEntryDto, RegisterEventDto } from "@shared/schemas/register";
import type { RegisterEntryKind, RegisterEventKind, RegisterStatus, Sex, AcquisitionWay } from "@shared/constants";

/** One row of the register read (`ENTRY_COLUMNS`), as PostgreSQL gives it. */
export type RegisterEntryRow = {
  id: string;
  kind: RegisterEntryKind;
  taxon_id: string;
  scientific_name: string;
  common_names: string[] | null;
  venomous: boolean;
  sex: Sex;
  count: number;
  count_in_care: number;
  status: RegisterStatus;
  identifier: string | null;
  identifier_kind: string | null;
  origin: string | null;
  hatch_date: string | null;
  date_acquired: string;
  acquired_how: AcquisitionWay | null;
  source_organization_name: string | null;
  source_permit_number: string | null;
  transfer_number: string | null;
  transfer_id: string | null;
  condition: RegisterEntryDto["condition"];
  notes: string | null;
  weight_g: number | null;
  length_mm: number | null;
  permit_ids: string[] | null;
  quarantine_started_on: string | null;
  quarantine_until: string | null;
  previous_entry_id: string | null;
  parent_entry_id: string | null;
};

const DAY_MS = 86_400_000;

/** Days from `today` to `until` (both YYYY-MM-DD). */
const daysBetween = (today: string, until: string) => Math.round((Date.parse(until) - Date.parse(today)) / DAY_MS);

/** An entry for the register's pages and the animal page; quarantine is shown only while it lasts and animals are in care. */
export function presentRegisterEntry(row: RegisterEntryRow, today: string): RegisterEntryDto {
  const inQuarantine =
    row.quarantine_until !== null &&
    row.quarantine_started_on !== null &&
    row.quarantine_until >= today &&
    row.count_in_care > 0;
  return {
    id: row.id,
    kind: row.kind,
    taxon: {
      id: row.taxon_id,
      scientificName: row.scientific_name,
      commonName: row.common_names?.[0] ?? null,
      venomous: row.venomous,
    },
    sex: row.sex,
    count: row.count,
    countInCare: row.count_in_care,
    status: row.status,
    identifier: row.identifier,
    identifierKind: row.identifier_kind,
    origin: row.origin,
    hatchDate: row.hatch_date,
    dateAcquired: row.date_acquired,
    acquiredHow: row.acquired_how,
    sourceOrganization: row.source_organization_name,
    sourcePermitNumber: row.source_permit_number,
    transferNumber: row.transfer_number,
    transferId: row.transfer_id,
    condition: row.condition,
    notes: row.notes,
    weightG: row.weight_g,
    lengthMm: row.length_mm,
    permitIds: row.permit_ids ?? [],
    quarantine: inQuarantine
      ? {
          startedOn: row.quarantine_started_on!,
          until: row.quarantine_until!,
          daysLeft: daysBetween(today, row.quarantine_until!),
        }
      : null,
    previousEntryId: row.previous_entry_id,
    parentEntryId: row.parent_entry_id,
  };
}

export type RegisterEventRow = {
  id: string;
  entry_id: string;
  kind: RegisterEventKind;
  on: string;
  count: number;
  note: string | null;
  cause: string | null;
  acquired_how: AcquisitionWay | null;
  counterparty_name: string | null;
  counterparty_address: string | null;
  counterparty_permit_number: string | null;
  corrects_event_id: string | null;
  transfer_id: string | null;
  other_entry_id: string | null;
  weight_g: number | null;
  length_mm: number | null;
  recorded_by_name: string;
  created_at: string | Date;
};

/** Events in the order they were recorded, each naming the later event that replaced it. */
export function presentRegisterEvents(rows: RegisterEventRow[]): RegisterEventDto[] {
  const replacedBy = new Map(
    rows.filter((row) => row.corrects_event_id).map((row) => [row.corrects_event_id!, row.id]),
  );
  return rows.map((row) => ({
    id: row.id,
    entryId: row.entry_id,
    kind: row.kind,
    on: row.on,
    count: row.count,
    note: row.note,
    cause: row.cause,
    acquiredHow: row.acquired_how,
    counterparty:
      row.counterparty_name || row.counterparty_address || row.counterparty_permit_number
        ? {
            name: row.counterparty_name,
            address: row.counterparty_address,
            permitNumber: row.counterparty_permit_number,
          }
        : null,
    correctsEventId: row.corrects_event_id,
    replacedById: replacedBy.get(row.id) ?? null,
    transferId: row.transfer_id,
    otherEntryId: row.other_entry_id,
    weightG: row.weight_g,
    lengthMm: row.length_mm,
    recordedBy: row.recorded_by_name,
    recordedAt: new Date(row.created_at).toISOString(),
  }));
}
