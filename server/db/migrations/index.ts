// Every committed migration, in order. Listing them here (instead of scanning the folder)
// lets the same code run under tsx, vitest and a bundler. Add a new migration below.
import { Migration20261201220520 } from "./Migration20261201220520";
import { Migration20261201222513_transfer_record } from "./Migration20261201222513_transfer_record";
import { Migration20261201300000_compliance } from "./Migration20261201300000_compliance";
import { Migration20261201310000_temperature } from "./Migration20261201310000_temperature";
import { Migration20261202100000_transfer_alerts } from "./Migration20261202100000_transfer_alerts";
import { Migration20261202130000_least_privilege } from "./Migration20261202130000_least_privilege";
import { Migration20261202130100_custody_head } from "./Migration20261202130100_custody_head";
import { Migration20261202130200_jurisdiction_coverage } from "./Migration20261202130200_jurisdiction_coverage";
import { Migration20261202140000_custody_evidence } from "./Migration20261202140000_custody_evidence";
import { Migration20261203100000_exposure } from "./Migration20261203100000_exposure";
import { Migration20261204100000_register_ledger } from "./Migration20261204100000_register_ledger";
import { Migration20261205100000_draft_privacy } from "./Migration20261205100000_draft_privacy";
import { Migration20261205101000_organization_roles } from "./Migration20261205101000_organization_roles";
import { Migration20261205102000_joining } from "./Migration20261205102000_joining";
import { Migration20261205103000_account_mail } from "./Migration20261205103000_account_mail";
import { Migration20261205104000_organization_invitations } from "./Migration20261205104000_organization_invitations";
import { Migration20261205105000_courier_service } from "./Migration20261205105000_courier_service";
import { Migration20261206100000_runs } from "./Migration20261206100000_runs";
import { Migration20261207100000_register_report_indexes } from "./Migration20261207100000_register_report_indexes";
import { Migration20261207101000_state_notice_done } from "./Migration20261207101000_state_notice_done";
import { Migration20261208100000_quarantine_by_taxon } from "./Migration20261208100000_quarantine_by_taxon";

export const MIGRATIONS = [
  { name: "Migration20261201220520", class: Migration20261201220520 },
  { name: "Migration20261201222513_transfer_record", class: Migration20261201222513_transfer_record },
  { name: "Migration20261201300000_compliance", class: Migration20261201300000_compliance },
  { name: "Migration20261201310000_temperature", class: Migration20261201310000_temperature },
  { name: "Migration20261202100000_transfer_alerts", class: Migration20261202100000_transfer_alerts },
  { name: "Migration20261202130000_least_privilege", class: Migration20261202130000_least_privilege },
  { name: "Migration20261202130100_custody_head", class: Migration20261202130100_custody_head },
  { name: "Migration20261202130200_jurisdiction_coverage", class: Migration20261202130200_jurisdiction_coverage },
  { name: "Migration20261202140000_custody_evidence", class: Migration20261202140000_custody_evidence },
  { name: "Migration20261203100000_exposure", class: Migration20261203100000_exposure },
  { name: "Migration20261204100000_register_ledger", class: Migration20261204100000_register_ledger },
  { name: "Migration20261205100000_draft_privacy", class: Migration20261205100000_draft_privacy },
  { name: "Migration20261205101000_organization_roles", class: Migration20261205101000_organization_roles },
  { name: "Migration20261205102000_joining", class: Migration20261205102000_joining },
  { name: "Migration20261205103000_account_mail", class: Migration20261205103000_account_mail },
  {
    name: "Migration20261205104000_organization_invitations",
    class: Migration20261205104000_organization_invitations,
  },
  { name: "Migration20261205105000_courier_service", class: Migration20261205105000_courier_service },
  { name: "Migration20261206100000_runs", class: Migration20261206100000_runs },
  {
    name: "Migration20261207100000_register_report_indexes",
    class: Migration20261207100000_register_report_indexes,
  },
  { name: "Migration20261207101000_state_notice_done", class: Migration20261207101000_state_notice_done },
  { name: "Migration20261208100000_quarantine_by_taxon", class: Migration20261208100000_quarantine_by_taxon },
];
