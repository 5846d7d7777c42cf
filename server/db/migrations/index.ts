// Every committed migration, in order. Listing them here (instead of scanning the folder)
// lets the same code run under tsx, vitest and a bundler. Add a new migration below.
import { Migration20261201220520 } from "./Migration20261201220520";
import { Migration20261201222513_transfer_record } from "./Migration20261201222513_transfer_record";
import { Migration20261201300000_compliance } from "./Migration20261201300000_compliance";
import { Migration20261201310000_temperature } from "./Migration20261201310000_temperature";
import { Migration20261202100000_transfer_alerts } from "./Migration20261202100000_transfer_alerts";
import { Migration20261202130000_least_privilege } from "./Migration20261202130000_least_privilege";
import { Migration20261202130100_custody_head } from "./Migration20261202130100_custody_head";
import { Migration20261202150000_draft_privacy } from "./Migration20261202150000_draft_privacy";
import { Migration20261202150100_organization_roles } from "./Migration20261202150100_organization_roles";
import { Migration20261202150200_joining } from "./Migration20261202150200_joining";
import { Migration20261202150300_account_mail } from "./Migration20261202150300_account_mail";
import { Migration20261202150400_organization_invitations } from "./Migration20261202150400_organization_invitations";
import { Migration20261202150500_courier_service } from "./Migration20261202150500_courier_service";

export const MIGRATIONS = [
  { name: "Migration20261201220520", class: Migration20261201220520 },
  { name: "Migration20261201222513_transfer_record", class: Migration20261201222513_transfer_record },
  { name: "Migration20261201300000_compliance", class: Migration20261201300000_compliance },
  { name: "Migration20261201310000_temperature", class: Migration20261201310000_temperature },
  { name: "Migration20261202100000_transfer_alerts", class: Migration20261202100000_transfer_alerts },
  { name: "Migration20261202130000_least_privilege", class: Migration20261202130000_least_privilege },
  { name: "Migration20261202130100_custody_head", class: Migration20261202130100_custody_head },
  { name: "Migration20261202150000_draft_privacy", class: Migration20261202150000_draft_privacy },
  { name: "Migration20261202150100_organization_roles", class: Migration20261202150100_organization_roles },
  { name: "Migration20261202150200_joining", class: Migration20261202150200_joining },
  { name: "Migration20261202150300_account_mail", class: Migration20261202150300_account_mail },
  {
    name: "Migration20261202150400_organization_invitations",
    class: Migration20261202150400_organization_invitations,
  },
  { name: "Migration20261202150500_courier_service", class: Migration20261202150500_courier_service },
];
