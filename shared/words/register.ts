import type { AcquisitionWay, RegisterEntryKind, RegisterEventKind, RegisterStatus, ReportColumn } from "../constants";

/** An entry is one animal or a group of them. */
export const REGISTER_ENTRY_KIND_WORDS: Readonly<Record<RegisterEntryKind, string>> = {
  individual: "One animal",
  group: "A group",
};

/** What happened, as the register's timeline and the yearly report say it. */
export const REGISTER_EVENT_KIND_WORDS: Readonly<Record<RegisterEventKind, string>> = {
  acquired: "Acquired",
  hatched: "Hatched or born",
  measured: "Measured",
  died: "Died",
  euthanised: "Euthanised",
  sold: "Sold",
  given: "Given away",
  transferred_out: "Transferred out",
  loaned_out: "Loaned out",
  loan_returned: "Back from loan",
  escaped: "Escaped",
  released: "Released",
  missing_on_arrival: "Missing at arrival (never received)",
  split_off: "Split into a new entry",
  split_from: "Split from another entry",
  note: "Note",
  voided: "Recorded in error (withdrawn)",
};

/** How an animal came to the keeper. */
export const ACQUISITION_WAY_WORDS: Readonly<Record<AcquisitionWay, string>> = {
  transfer: "By transfer",
  purchase: "Bought",
  gift: "Given to us",
  loan_in: "On loan to us",
  rescue: "Rescued",
  other: "Other",
};

/** Where an entry stands now. */
export const REGISTER_STATUS_WORDS: Readonly<Record<RegisterStatus, string>> = {
  in_care: "In our care",
  died: "Died",
  transferred_out: "Sold, given or transferred out",
  on_loan: "Out on loan",
  escaped_or_released: "Escaped or released",
  never_arrived: "Never arrived",
  split: "Split into other entries",
};

/** The yearly report's column headings. */
export const REPORT_COLUMN_WORDS: Readonly<Record<ReportColumn, string>> = {
  acquired: "Acquired",
  hatched: "Hatched or born",
  died: "Died",
  transferredOut: "Sold, given or transferred out",
  escapedOrReleased: "Escaped or released",
};

/** "12 days left of quarantine" / "quarantine ends today". */
export function quarantineWords(daysLeft: number): string {
  if (daysLeft <= 0) return "Quarantine ends today";
  return daysLeft === 1 ? "1 day left of quarantine" : `${daysLeft} days left of quarantine`;
}
