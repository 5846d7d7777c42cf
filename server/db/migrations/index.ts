// Every committed migration, in order. Listing them here (instead of scanning the folder)
// lets the same code run under tsx, vitest and a bundler. Add a new migration below.
import { Migration20261201220520 } from "./Migration20261201220520";
import { Migration20261201222513_transfer_record } from "./Migration20261201222513_transfer_record";

export const MIGRATIONS = [
  { name: "Migration20261201220520", class: Migration20261201220520 },
  { name: "Migration20261201222513_transfer_record", class: Migration20261201222513_transfer_record },
];
