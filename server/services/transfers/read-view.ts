import type pg from "pg";
import type {
  AlertKind,
  AnimalOrigin,
  IdentifierKind,
  LengthKind,
  OrganizationKind,
  PackKind,
  PhotoMoment,
  PhotoSubject,
  ProfileGroup,
  Purpose,
  Sex,
  TransferStatus,
  TransportMode,
  WallMaterial,
} from "@shared/constants";

/** A transfer and everything its page shows, read in one round trip (plain rows, no ORM). */
export type TransferView = {
  t: {
    id: string;
    number: string;
    status: TransferStatus;
    version: number;
    mode: TransportMode;
    purpose: Purpose;
    sale: boolean;
    sale_price_usd: number | null;
    sender_organization_id: string;
    receiver_organization_id: string;
    first_sent_at: string | null;
    courier_service_id: string | null;
    origin_street: string;
    origin_city: string;
    origin_state: string;
    origin_zip: string;
    origin_lat: number | null;
    origin_lon: number | null;
    origin_time_zone: string | null;
    destination_street: string;
    destination_city: string;
    destination_state: string;
    destination_zip: string;
    destination_lat: number | null;
    destination_lon: number | null;
    destination_time_zone: string | null;
    planned_departure_at: string;
    expected_arrival_at: string;
    handling_notes: string | null;
    sender_private_notes: string | null;
    receiver_private_notes: string | null;
    confirmed_at: string | null;
    cancelled_reason: string | null;
    reconfirmation_reason: string | null;
    created_at: string;
    updated_at: string;
  };
  sender: OrgRow;
  receiver: OrgRow;
  senderContact: PersonRow | null;
  receiverContact: PersonRow | null;
  containers: {
    id: string;
    key: string;
    position: number;
    label: string;
    length_mm: number;
    width_mm: number;
    height_mm: number;
    wall_material: WallMaterial;
    wall_thickness_mm: number;
    pack: PackKind;
    seal_number: string | null;
  }[];
  animals: {
    id: string;
    position: number;
    container_id: string | null;
    count: number;
    sex: Sex;
    identifier: string | null;
    identifier_kind: IdentifierKind | null;
    origin: AnimalOrigin;
    length_mm: number | null;
    length_kind: LengthKind | null;
    weight_g: number | null;
    hatch_date: string | null;
    notes: string | null;
    taxon: TaxonRowView;
  }[];
  legs: {
    id: string;
    sequence: number;
    from_label: string | null;
    to_label: string | null;
    courier_id: string;
    courier_name: string;
    org_name: string | null;
    org_phone: string | null;
  }[];
  handoffs: { actor_id: string | null; actor_name: string; at: string; payload: Record<string, unknown> }[];
  alerts: {
    id: string;
    kind: AlertKind;
    at: string;
    message: string;
    acknowledged_at: string | null;
    acknowledged_by_id: string | null;
    acknowledged_by_name: string | null;
    acknowledgement_note: string | null;
  }[];
  checkIn: {
    signed_at: string;
    signed_name: string;
    notes: string | null;
    signed_by_id: string;
    signed_by_name: string;
    items: {
      animal_id: string;
      arrived_well: number;
      arrived_problem: number;
      dead_on_arrival: number;
      missing: number;
      problem: string | null;
      weight_g: number | null;
      notes: string | null;
    }[];
    extras: { count: number; sex: Sex; notes: string | null; taxon: TaxonRowView }[];
  } | null;
  /** The custody entry of demo or bench data cleared without the gates (gatesForLoadedData), if any. */
  checksSkipped: { at: string; payload: Record<string, unknown> } | null;
  /** The courier service the sender asked to carry the transfer (issue 14, §3). */
  courierService: { id: string; name: string; city: string; state: string; phone: string; pending: boolean } | null;
  /** The courier's run that carries it (issue 16), if any. */
  runId: string | null;
  /** Photos at the handoffs and the check-in, oldest first. */
  photos: {
    id: string;
    moment: PhotoMoment;
    handoff_index: number | null;
    subject: PhotoSubject;
    container_id: string | null;
    animal_id: string | null;
    caption: string | null;
    content_type: string;
    size_bytes: number;
    sha256: string;
    uploaded_by_id: string;
    uploaded_by_name: string;
    created_at: string;
  }[];
  /** The receiver's acknowledgement of a delivery the courier recorded (custody entry), if any. */
  deliveryAcknowledged: {
    at: string;
    actor_id: string | null;
    actor_name: string;
    payload: Record<string, unknown>;
  } | null;
};
type OrgRow = {
  id: string;
  name: string;
  kind: OrganizationKind;
  street: string;
  city: string;
  state: string;
  zip: string;
  phone: string;
  email: string;
};
type PersonRow = { id: string; display_name: string; email: string };
export type TaxonRowView = {
  id: string;
  rank: string;
  scientific_name: string;
  common_names: string[];
  venomous: boolean;
  profile_group: ProfileGroup | null;
};

const TAXON_JSON = (alias: string) =>
  `json_build_object('id', ${alias}.id, 'rank', ${alias}.rank, 'scientific_name', ${alias}.scientific_name, 'common_names', ${alias}.common_names, 'venomous', ${alias}.venomous, 'profile_group', ${alias}.profile_group)`;

/** Columns by name (json_build_object is several times cheaper than to_jsonb(row) and says what the page reads). */
const jsonOf = (alias: string, columns: readonly string[]) =>
  `json_build_object(${columns.map((c) => `'${c}', ${alias}.${c}`).join(", ")})`;
const T_JSON = jsonOf("t", [
  "id",
  "number",
  "status",
  "version",
  "mode",
  "purpose",
  "sale",
  "sale_price_usd",
  "sender_organization_id",
  "receiver_organization_id",
  "first_sent_at",
  "courier_service_id",
  "origin_street",
  "origin_city",
  "origin_state",
  "origin_zip",
  "origin_lat",
  "origin_lon",
  "origin_time_zone",
  "destination_street",
  "destination_city",
  "destination_state",
  "destination_zip",
  "destination_lat",
  "destination_lon",
  "destination_time_zone",
  "planned_departure_at",
  "expected_arrival_at",
  "handling_notes",
  "sender_private_notes",
  "receiver_private_notes",
  "confirmed_at",
  "cancelled_reason",
  "reconfirmation_reason",
  "created_at",
  "updated_at",
]);
const CONTAINER_JSON = jsonOf("c", [
  "id",
  "key",
  "position",
  "label",
  "length_mm",
  "width_mm",
  "height_mm",
  "wall_material",
  "wall_thickness_mm",
  "pack",
  "seal_number",
]);

export const TRANSFER_VIEW_SQL = `
SELECT json_build_object(
  't', ${T_JSON},
  'sender', json_build_object('id', so.id, 'name', so.name, 'kind', so.kind, 'street', so.street, 'city', so.city, 'state', so.state, 'zip', so.zip, 'phone', so.phone, 'email', so.email),
  'receiver', json_build_object('id', ro.id, 'name', ro.name, 'kind', ro.kind, 'street', ro.street, 'city', ro.city, 'state', ro.state, 'zip', ro.zip, 'phone', ro.phone, 'email', ro.email),
  'senderContact', (SELECT json_build_object('id', u.id, 'display_name', u.display_name, 'email', u.email) FROM app_user u WHERE u.id = t.sender_contact_id),
  'receiverContact', (SELECT json_build_object('id', u.id, 'display_name', u.display_name, 'email', u.email) FROM app_user u WHERE u.id = t.receiver_contact_id),
  'containers', coalesce((SELECT json_agg(${CONTAINER_JSON} ORDER BY c.position) FROM container c WHERE c.transfer_id = t.id), '[]'),
  'animals', coalesce((SELECT json_agg(json_build_object('id', a.id, 'position', a.position, 'container_id', a.container_id, 'count', a.count, 'sex', a.sex,
                           'identifier', a.identifier, 'identifier_kind', a.identifier_kind, 'origin', a.origin, 'length_mm', a.length_mm, 'length_kind', a.length_kind,
                           'weight_g', a.weight_g, 'hatch_date', a.hatch_date, 'notes', a.notes, 'taxon', ${TAXON_JSON("x")}) ORDER BY a.position)
                         FROM animal a JOIN taxon x ON x.id = a.taxon_id WHERE a.transfer_id = t.id), '[]'),
  'legs', coalesce((SELECT json_agg(json_build_object('id', l.id, 'sequence', l.sequence, 'from_label', l.from_label, 'to_label', l.to_label, 'courier_id', u.id,
                           'courier_name', u.display_name, 'org_name', o.name, 'org_phone', o.phone) ORDER BY l.sequence)
                      FROM leg l JOIN app_user u ON u.id = l.courier_id LEFT JOIN organization o ON o.id = u.organization_id WHERE l.transfer_id = t.id), '[]'),
  'handoffs', coalesce((SELECT json_agg(json_build_object('actor_id', e.actor_id, 'actor_name', e.actor_name, 'at', e.at, 'payload', e.payload) ORDER BY e.seq)
                          FROM custody_entry e WHERE e.transfer_id = t.id AND e.kind = 'handoff'), '[]'),
  'alerts', coalesce((SELECT json_agg(json_build_object('id', al.id, 'kind', al.kind, 'at', al.at, 'message', al.message,
                           'acknowledged_at', al.acknowledged_at, 'acknowledged_by_id', al.acknowledged_by_id,
                           'acknowledged_by_name', al.acknowledged_by_name, 'acknowledgement_note', al.acknowledgement_note) ORDER BY al.at, al.custody_seq)
                        FROM transfer_alert al WHERE al.transfer_id = t.id), '[]'),
  'checkIn', (SELECT json_build_object('signed_at', ci.signed_at, 'signed_name', ci.signed_name, 'notes', ci.notes, 'signed_by_id', su.id, 'signed_by_name', su.display_name,
                'items', coalesce((SELECT json_agg(to_jsonb(i.*) - 'check_in_id' - 'id') FROM check_in_item i WHERE i.check_in_id = ci.id), '[]'),
                'extras', coalesce((SELECT json_agg(json_build_object('count', e.count, 'sex', e.sex, 'notes', e.notes, 'taxon', ${TAXON_JSON("x")}))
                                      FROM check_in_extra e JOIN taxon x ON x.id = e.taxon_id WHERE e.check_in_id = ci.id), '[]'))
                FROM check_in ci JOIN app_user su ON su.id = ci.signed_by_id WHERE ci.transfer_id = t.id),
  'courierService', (SELECT json_build_object('id', cs.id, 'name', cs.name, 'city', cs.city, 'state', cs.state, 'phone', cs.phone, 'pending', cs.pending)
                      FROM organization cs WHERE cs.id = t.courier_service_id),
  'checksSkipped', (SELECT json_build_object('at', e.at, 'payload', e.payload) FROM custody_entry e
                     WHERE e.transfer_id = t.id AND e.kind = 'checks_skipped' ORDER BY e.seq LIMIT 1),
  'photos', coalesce((SELECT json_agg(json_build_object('id', ph.id, 'moment', ph.moment, 'handoff_index', ph.handoff_index, 'subject', ph.subject,
                           'container_id', ph.container_id, 'animal_id', ph.animal_id, 'caption', ph.caption, 'content_type', ph.content_type,
                           'size_bytes', ph.size_bytes, 'sha256', ph.sha256, 'uploaded_by_id', ph.uploaded_by_id, 'uploaded_by_name', ph.uploaded_by_name,
                           'created_at', ph.created_at) ORDER BY ph.created_at, ph.custody_seq)
                        FROM transfer_photo ph WHERE ph.transfer_id = t.id), '[]'),
  'runId', (SELECT rs.run_id FROM run_stop rs WHERE rs.transfer_id = t.id AND rs.kind = 'pickup'),
  'deliveryAcknowledged', (SELECT json_build_object('at', e.at, 'actor_id', e.actor_id, 'actor_name', e.actor_name, 'payload', e.payload) FROM custody_entry e
                     WHERE e.transfer_id = t.id AND e.kind = 'delivery_acknowledged' ORDER BY e.seq DESC LIMIT 1)
) AS view
FROM transfer t
JOIN organization so ON so.id = t.sender_organization_id
JOIN organization ro ON ro.id = t.receiver_organization_id
WHERE t.id = $1`;

export async function readTransferView(pool: pg.Pool, id: string): Promise<TransferView | null> {
  // A named statement: PostgreSQL plans this large query once per connection, not per request.
  const { rows } = await pool.query<{ view: TransferView }>({
    name: "transfer-view-v6",
    text: TRANSFER_VIEW_SQL,
    values: [id],
  });
  return rows[0]?.view ?? null;
}
