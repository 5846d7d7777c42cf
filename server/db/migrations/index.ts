// Every committed migration, in order. Listing them here (instead of scanning the folder)
// lets the same code run under tsx, vitest and a bundler. Add a new migration below.
import { Migration20261201220520 } from "./Migration20261201220520";
import { Migration20261201222513_transfer_record } from "./Migration20261201222513_transfer_record";
import { Migration20261201300000_compliance } from "./Migration20261201300000_compliance";
import { Migration20261201310000_temperature } from "./Migration20261201310000_temperature";
import { Migration20261202100000_transfer_alerts } from "./Migration20261202100000_transfer_alerts";
import { Migration20261203100000_exposure } from "./Migration20261203100000_exposure";

export const MIGRATIONS = [
  { name: "Migration20261201220520", class: Migration20261201220520 },
  { name: "Migration20261201222513_transfer_record", class: Migration20261201222513_transfer_record },
  { name: "Migration20261201300000_compliance", class: Migration20261201300000_compliance },
  { name: "Migration20261201310000_temperature", class: Migration20261201310000_temperature },
  { name: "Migration20261202100000_transfer_alerts", class: Migration20261202100000_transfer_alerts },
  { name: "Migration20261203100000_exposure", class: Migration20261203100000_exposure },
];
