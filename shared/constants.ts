/**
 * Vocabulary shared by the client, the server and the pure domain code.
 * A limit or a list lives here once; schemas and screens import it.
 */

/** USPS two-letter codes: the 50 states, DC and the inhabited territories. */
export const US_STATES = [
  "AL",
  "AK",
  "AZ",
  "AR",
  "CA",
  "CO",
  "CT",
  "DE",
  "FL",
  "GA",
  "HI",
  "ID",
  "IL",
  "IN",
  "IA",
  "KS",
  "KY",
  "LA",
  "ME",
  "MD",
  "MA",
  "MI",
  "MN",
  "MS",
  "MO",
  "MT",
  "NE",
  "NV",
  "NH",
  "NJ",
  "NM",
  "NY",
  "NC",
  "ND",
  "OH",
  "OK",
  "OR",
  "PA",
  "RI",
  "SC",
  "SD",
  "TN",
  "TX",
  "UT",
  "VT",
  "VA",
  "WA",
  "WV",
  "WI",
  "WY",
  "DC",
  "PR",
  "GU",
  "VI",
  "AS",
  "MP",
] as const;
export type UsState = (typeof US_STATES)[number];

/**
 * Jurisdictions outside the continental US (the 48 contiguous states). Moving an
 * injurious species between the continental US and one of these is a federal
 * "shipment" under 18 U.S.C. 42 (USARK v. Zinke, 852 F.3d 1131).
 * Alaska is not contiguous but the statute's list names Hawaii, DC, Puerto Rico and
 * territories; Alaska is treated as continental for that rule.
 */
export const NON_CONTINENTAL = ["HI", "DC", "PR", "GU", "VI", "AS", "MP"] as const;

export const ORGANIZATION_KINDS = [
  "breeder",
  "nature_centre",
  "rescue",
  "zoo",
  "private_keeper",
  "courier_service",
] as const;
export type OrganizationKind = (typeof ORGANIZATION_KINDS)[number];

/**
 * `admin` runs the site; within an organisation a `manager` runs its people and details, a
 * `member` keeps animals (keeper organisations) and a `courier` carries (courier services).
 */
export const USER_ROLES = ["admin", "manager", "member", "courier"] as const;
export type UserRole = (typeof USER_ROLES)[number];

/**
 * What a one-time link sent by e-mail does: choose a first password (an invitation), confirm the
 * address a new organisation signed up with, set a new password after "Forgot your password?",
 * accept joining an organisation (an existing account invited by a manager), or sign up an
 * organisation a sender invited to a transfer (`invite_organization`, no account yet).
 */
export const ACCOUNT_TOKEN_PURPOSES = [
  "set_password",
  "confirm_email",
  "reset_password",
  "join_organization",
  "invite_organization",
] as const;
export type AccountTokenPurpose = (typeof ACCOUNT_TOKEN_PURPOSES)[number];

/**
 * The e-mails a person may choose not to receive. Alerts on a transfer and changes of the
 * temperature advice carry safety information and are always sent: they are not in this list.
 */
export const MAIL_CHOICES = ["transfer_steps", "document_expiry", "leg_assignments"] as const;
export type MailChoice = (typeof MAIL_CHOICES)[number];

/** The roles of the people of a keeper organisation, who send and receive transfers. */
export const KEEPER_ROLES = ["manager", "member"] as const satisfies readonly UserRole[];

export const TRANSPORT_MODES = ["overnight_air", "ground_courier", "hand_delivery"] as const;
export type TransportMode = (typeof TRANSPORT_MODES)[number];

export const PURPOSES = [
  "education_exhibition",
  "breeding",
  "private_keeping",
  "rescue_rehoming",
  "scientific",
  "commercial_sale",
] as const;
export type Purpose = (typeof PURPOSES)[number];

export const SEXES = ["male", "female", "unknown"] as const;
export type Sex = (typeof SEXES)[number];

export const ANIMAL_ORIGINS = [
  "captive_bred",
  "captive_hatched",
  "wild_caught",
  "long_term_captive",
  "rescued",
] as const;
export type AnimalOrigin = (typeof ANIMAL_ORIGINS)[number];

export const TAXON_RANKS = ["class", "order", "family", "genus", "species", "subspecies"] as const;
export type TaxonRank = (typeof TAXON_RANKS)[number];

/**
 * Temperature-profile groups a species belongs to. The safe transit ranges and pack
 * bands of each group are guidelines (REPTILES magazine shipping guide, common
 * practice), editable by admins.
 */
export const PROFILE_GROUPS = [
  "temperate_aquatic_turtle",
  "tropical_tortoise",
  "temperate_tortoise",
  "desert_reptile",
  "temperate_snake",
  "tropical_snake",
  "tropical_lizard",
  "temperate_lizard",
  "salamander",
  "frog_toad",
  "tropical_frog",
  "crocodilian",
] as const;
export type ProfileGroup = (typeof PROFILE_GROUPS)[number];

export const WALL_MATERIALS = ["eps", "corrugated"] as const;
export type WallMaterial = (typeof WALL_MATERIALS)[number];

export const PACK_KINDS = ["none", "heat_40h", "heat_72h", "cold"] as const;
export type PackKind = (typeof PACK_KINDS)[number];

export const DOCUMENT_KINDS = [
  "state_import_permit",
  "possession_permit",
  "export_permit",
  "federal_permit",
  "captive_bred_registration",
  "cvi",
] as const;
export type DocumentKind = (typeof DOCUMENT_KINDS)[number];

/** Limits that the forms and the server share. */
export const LIMITS = {
  nameMax: 200,
  textMax: 4000,
  emailMax: 254,
  passwordMin: 8,
  passwordMax: 128,
  animalCountMax: 10_000,
  lengthMmMax: 3000,
  weightGMax: 200_000,
  boxDimensionMmMax: 2000,
  wallThicknessMmMax: 200,
  animalsPerTransferMax: 1000,
  containersPerTransferMax: 200,
  uploadBytesMax: 10 * 1024 * 1024,
  /** A photo from a phone camera (a 12-megapixel JPEG is 2–5 MB). */
  photoBytesMax: 10 * 1024 * 1024,
  /** Photos one transfer keeps in all (pickup, handoffs, check-in). */
  photosPerTransferMax: 200,
} as const;

/** Where a transfer is in its life, in order. */
export const TRANSFER_STATUSES = [
  "draft",
  "awaiting_receiver",
  "ready",
  "in_transit",
  "delivered",
  "checked_in",
  "closed",
  "cancelled",
] as const;
export type TransferStatus = (typeof TRANSFER_STATUSES)[number];

/** How a length was measured: carapace (turtles, tortoises), snout–vent or total length. */
export const LENGTH_KINDS = ["carapace", "snout_vent", "total"] as const;
export type LengthKind = (typeof LENGTH_KINDS)[number];

export const IDENTIFIER_KINDS = ["microchip", "shell_notch", "photo_id", "band", "other"] as const;
export type IdentifierKind = (typeof IDENTIFIER_KINDS)[number];

/** What the receiver found when opening each container. */
export const CHECK_IN_OUTCOMES = ["arrived_well", "arrived_problem", "dead_on_arrival", "missing"] as const;
export type CheckInOutcome = (typeof CHECK_IN_OUTCOMES)[number];

/** Who the caller is on a transfer's page. */
export const VIEWER_ROLES = ["sender", "receiver", "courier", "admin"] as const;
export type ViewerRole = (typeof VIEWER_ROLES)[number];

/** The list's "mine" filter: transfers I send, receive or carry. */
export const TRANSFER_LIST_ROLES = ["sending", "receiving", "carrying"] as const;
export type TransferListRole = (typeof TRANSFER_LIST_ROLES)[number];

/** What the transfer list can be sorted by. */
export const TRANSFER_SORT_KEYS = ["departure", "number", "status", "updated"] as const;
export type TransferSortKey = (typeof TRANSFER_SORT_KEYS)[number];

/** Custody moments: 0 is the pickup from the sender, the last is the delivery to the receiver. */
export const HANDOFF_KINDS = ["pickup", "handoff", "delivery"] as const;
export type HandoffKind = (typeof HANDOFF_KINDS)[number];

/** A handoff kept on a phone without signal (D40): waiting to be sent, or refused by the server. */
export const OFFLINE_HANDOFF_STATES = ["waiting", "refused"] as const;
export type OfflineHandoffState = (typeof OFFLINE_HANDOFF_STATES)[number];

/** Kinds of entry in a transfer's append-only custody log. */
export const CUSTODY_KINDS = [
  "created",
  "status_change",
  "handoff",
  "check_in",
  "couriers_assigned",
  "override",
  "correction",
  /** Demo or bench data cleared to ship without the gates (gatesForLoadedData in server/composition.ts). */
  "checks_skipped",
  /** Something on the record that a party must see: a seal that does not match, an implausible handoff … */
  "alert_raised",
  /** A party saw an alert and said so, with a note; the alert itself stays. */
  "alert_acknowledged",
  /** The receiver said "I have the boxes" for a delivery the courier recorded (own account or one-time code). */
  "delivery_acknowledged",
  /** A photo taken at a handoff or at the check-in, stored with its SHA-256. */
  "photo_added",
] as const;
export type CustodyKind = (typeof CUSTODY_KINDS)[number];

/**
 * What an alert on a transfer is about. Alerts are raised by the server when the record shows
 * something that needs a person's eyes (never by a request that says "raise"), kept for good,
 * e-mailed to both parties, and acknowledged with a note — acknowledging never removes one.
 */
export const ALERT_KINDS = [
  /** A seal number read at a handoff differs from the one on the manifest. */
  "seal_mismatch",
  /** A seal was found broken or missing. */
  "seal_broken",
  /** The boxes counted at a handoff differ from the boxes on the manifest. */
  "count_mismatch",
  /** A pickup recorded long before the planned departure. */
  "early_pickup",
  /** A handoff whose distance from the previous one cannot have been covered in the time between. */
  "implausible_speed",
  /** Custody handed to someone other than the leg's assigned courier or the receiver. */
  "unexpected_party",
  /** A box temperature read at a handoff or check-in outside the animals' safe range. */
  "temperature_out_of_range",
] as const;
export type AlertKind = (typeof ALERT_KINDS)[number];

/**
 * How a custody chain can be found broken (shared/custody/hash-chain.ts): an entry missing from
 * the middle, out of order, changed, or not pointing at the one before; entries missing from
 * the end or added past the chain's head; the head itself missing or not matching.
 */
export const CHAIN_PROBLEMS = [
  "missing",
  "out_of_order",
  "changed",
  "unlinked",
  "missing_tail",
  "beyond_head",
  "head_missing",
  "head_mismatch",
] as const;
export type ChainProblem = (typeof CHAIN_PROBLEMS)[number];

/**
 * How an animal entered the register at check-in: accepted (well, or with a problem), or a loss
 * recorded at arrival (dead on arrival, missing), so the register shows every animal sent.
 */
export const REGISTER_CONDITIONS = ["well", "problem", "dead_on_arrival", "missing"] as const;
export type RegisterCondition = (typeof REGISTER_CONDITIONS)[number];

/** A register entry is one animal with its own identifiers, or a group counted together (a clutch). */
export const REGISTER_ENTRY_KINDS = ["individual", "group"] as const;
export type RegisterEntryKind = (typeof REGISTER_ENTRY_KINDS)[number];

/**
 * What can happen to animals in the register (issue 15 §1). Events are append-only: a correction
 * is a new event that names the one it replaces (`voided` replaces it with nothing).
 */
export const REGISTER_EVENT_KINDS = [
  "acquired",
  "hatched",
  "measured",
  "died",
  "euthanised",
  "sold",
  "given",
  "transferred_out",
  "loaned_out",
  "loan_returned",
  "escaped",
  "released",
  "missing_on_arrival",
  "split_off",
  "split_from",
  "note",
  "voided",
] as const;
export type RegisterEventKind = (typeof REGISTER_EVENT_KINDS)[number];

/** How an acquired animal came to the keeper. */
export const ACQUISITION_WAYS = ["transfer", "purchase", "gift", "loan_in", "rescue", "other"] as const;
export type AcquisitionWay = (typeof ACQUISITION_WAYS)[number];

/** Where an entry stands now, from its count and its last event that took animals out. */
export const REGISTER_STATUSES = [
  "in_care",
  "died",
  "transferred_out",
  "on_loan",
  "escaped_or_released",
  "never_arrived",
  "split",
] as const;
export type RegisterStatus = (typeof REGISTER_STATUSES)[number];

/** The columns of a permit's yearly report, in the order a report reads them. */
export const REPORT_COLUMNS = ["acquired", "hatched", "died", "transferredOut", "escapedOrReleased"] as const;
export type ReportColumn = (typeof REPORT_COLUMNS)[number];

/** Problems with the packing the sender resolves before sending for confirmation. */
export const PACKING_FINDING_CODES = [
  "mixed_species",
  "unpacked_animal",
  "empty_box",
  "no_animals",
  "no_boxes",
] as const;
export type PackingFindingCode = (typeof PACKING_FINDING_CODES)[number];

/** Where an e-mail in the outbox stands. */
export const OUTBOX_STATUSES = ["pending", "sent", "dead"] as const;
export type OutboxStatus = (typeof OUTBOX_STATUSES)[number];

/** The column of the temperature guideline a profile follows. */
export const ANIMAL_CLASSES = ["reptile", "amphibian"] as const;
export type AnimalClass = (typeof ANIMAL_CLASSES)[number];

/** When a stored temperature check was made. */
export const CHECK_MARKS = ["24h", "4h", "manual", "gate"] as const;
export type CheckMark = (typeof CHECK_MARKS)[number];

/** Why a forecast could not be had: the weather service's faults, or a trip beyond its horizon. */
export const FORECAST_UNAVAILABLE_REASONS = [
  "timeout",
  "network",
  "redirect",
  "upstream_error",
  "invalid_response",
  "beyond_horizon",
] as const;
export type ForecastUnavailableReason = (typeof FORECAST_UNAVAILABLE_REASONS)[number];

/** What the demo's local weather stand-in can be told to answer. */
export const WEATHER_SCENARIOS = [
  "normal",
  "heat_wave",
  "cold_snap",
  "outage",
  "reset",
  "garbage",
  "slow",
  "redirect",
] as const;
export type WeatherScenario = (typeof WEATHER_SCENARIOS)[number];

/** The plausibility checks of a handoff that need a reason from the person recording it when they fail. */
export const HANDOFF_REASON_KEYS = ["earlyPickup", "implausibleSpeed", "unexpectedParty"] as const;
export type HandoffReasonKey = (typeof HANDOFF_REASON_KEYS)[number];

/** When a photo was taken: at a handoff (the pickup is handoff 0) or at the arrival check-in. */
export const PHOTO_MOMENTS = ["handoff", "check_in"] as const;
export type PhotoMoment = (typeof PHOTO_MOMENTS)[number];

/** What a photo shows. */
export const PHOTO_SUBJECTS = ["box_outside", "seal", "animal", "other"] as const;
export type PhotoSubject = (typeof PHOTO_SUBJECTS)[number];

/**
 * Where the delivery to the receiver stands. A delivery recorded by the courier alone waits for
 * the receiver's acknowledgement; the transfer stays "on the road" until it comes (DEVELOPERS.md D18).
 */
export const DELIVERY_STATES = ["awaiting_receiver", "acknowledged"] as const;
export type DeliveryState = (typeof DELIVERY_STATES)[number];

/** How the receiver acknowledged a delivery. */
export const DELIVERY_ACKNOWLEDGEMENT_WAYS = ["recorded_by_receiver", "receiver_account", "one_time_code"] as const;
export type DeliveryAcknowledgementWay = (typeof DELIVERY_ACKNOWLEDGEMENT_WAYS)[number];

/**
 * What surrounds the box in an hour of the trip: the outside air (loading, a doorstep), a
 * vehicle held in its set range, an unconditioned vehicle on the move, a closed vehicle parked in
 * sun or shade, a carrier's building (sort hub, station, the aircraft hold), or a home or facility.
 */
export const EXPOSURES = [
  "outdoors",
  "vehicle_climate_controlled",
  "vehicle_unconditioned",
  "parked_sun",
  "parked_shade",
  "carrier_building",
  "indoors",
] as const;
export type Exposure = (typeof EXPOSURES)[number];

/** How a vehicle's air is held: in a set range, or not at all. */
export const VEHICLE_CONDITIONINGS = ["climate_controlled", "unconditioned"] as const;
export type VehicleConditioning = (typeof VEHICLE_CONDITIONINGS)[number];

/** Where the vehicle waits during a planned stop: in the sun, in shade, or indoors (the box is taken in). */
export const PARKED_KINDS = ["sun", "shade", "indoors"] as const;
export type ParkedKind = (typeof PARKED_KINDS)[number];

/** Where a box temperature was read: at a handoff of the custody chain, or at the check-in. */
export const READING_SOURCES = ["pickup", "handoff", "delivery", "check_in"] as const;
export type ReadingSource = (typeof READING_SOURCES)[number];
