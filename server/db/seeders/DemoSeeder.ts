import type { EntityManager } from "@mikro-orm/postgresql";
import { Seeder } from "@mikro-orm/seeder";
import { buildOrganization, buildUser } from "../../../tests/factories";
import { seedDemoTransfers } from "./demo-transfers";
import { seedDemoDocuments } from "./demo-documents";
import type { AppLinks } from "../../mail/links";
import { seedDemoRun } from "./demo-run";

/**
 * The demo scenario. Every organisation, person, address, phone number and permit number
 * here is invented for the demo; the species are real taxa. `links` is where the demo's e-mails
 * point (the PUBLIC_URL of the app that will serve it). Its transfers pass "ready to ship" through
 * gatesForLoadedData (server/composition.ts), which records in each custody log that the compliance
 * and temperature checks were not run.
 */
export class DemoSeeder extends Seeder {
  constructor(private readonly links: AppLinks) {
    super();
  }

  async run(em: EntityManager): Promise<void> {
    // MikroORM's CLI builds seeders without arguments; the demo needs to know its public URL.
    if (!this.links) throw new Error("The demo seeder needs the public URL: run it through prepareDatabase.");
    const breeder = await buildOrganization(em, {
      name: "Cinder Ridge Reptile Breeders",
      kind: "breeder",
      street: "418 Quarry Hollow Road",
      city: "Knoxville",
      state: "TN",
      zip: "37917",
      phone: "+1 865 555 0142",
      email: "office@cinderridge.example",
    });
    const centre = await buildOrganization(em, {
      name: "Willow Marsh Nature Centre",
      kind: "nature_centre",
      street: "92 Boardwalk Lane",
      city: "Eugene",
      state: "OR",
      zip: "97401",
      phone: "+1 541 555 0177",
      email: "animals@willowmarsh.example",
      // A receiver that chose to be listed in the directory (name, kind, city and state shown).
      listed: true,
    });
    const rescue = await buildOrganization(em, {
      name: "Second Shell Turtle Rescue",
      kind: "rescue",
      street: "7 Pinfold Court",
      city: "Columbus",
      state: "OH",
      zip: "43215",
      phone: "+1 614 555 0119",
      email: "intake@secondshell.example",
      // Not listed: only organisations that already share a transfer with it see it.
      listed: false,
    });
    const couriers = await buildOrganization(em, {
      name: "Nightjar Ground Couriers",
      kind: "courier_service",
      street: "55 Depot Row",
      city: "Louisville",
      state: "KY",
      zip: "40202",
      phone: "+1 502 555 0190",
      email: "dispatch@nightjar.example",
      listed: true,
    });

    await buildUser(em, {
      email: "admin@demo.hatchway.test",
      displayName: "Hatchway Admin",
      role: "admin",
      organization: null,
    });
    const sender = await buildUser(em, {
      email: "sender@demo.hatchway.test",
      displayName: "Ruth Calder",
      role: "manager",
      organization: breeder,
    });
    const receiver = await buildUser(em, {
      email: "receiver@demo.hatchway.test",
      displayName: "Milo Faraday",
      role: "manager",
      organization: centre,
    });
    const courier = await buildUser(em, {
      email: "courier@demo.hatchway.test",
      displayName: "Juno Park",
      role: "courier",
      organization: couriers,
    });
    const other = await buildUser(em, {
      email: "other@demo.hatchway.test",
      displayName: "Ivy Brandt",
      role: "manager",
      organization: rescue,
    });
    // A second driver for the relay leg of the demo's two-courier transfer.
    const relay = await buildUser(em, {
      email: "relay@demo.hatchway.test",
      displayName: "Theo Brannock",
      role: "courier",
      organization: couriers,
    });
    // The courier service's manager assigns Juno and Theo to the legs of the transfers it carries.
    const dispatcher = await buildUser(em, {
      email: "dispatch@demo.hatchway.test",
      displayName: "Wren Okafor",
      role: "manager",
      organization: couriers,
    });
    await seedDemoDocuments(em, { breeder, centre, rescue });
    await seedDemoTransfers(em, { sender, receiver, other, courier, relay }, this.links);
    await seedDemoRun(em, { breeder, couriers, sender, dispatcher, courier });
  }
}
