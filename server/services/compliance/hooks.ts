import { registerTask } from "../scheduler";
import { registerReadyGate } from "../transfers/transition";
import { expiryReminderTask } from "./expiry-reminders";
import { complianceGate } from "./gate";
import { registerManifestExtras } from "../transfers/manifest-extras";
import { manifestDocuments } from "./manifest-documents";

let registered = false;

/** Puts the compliance gate in front of "ready to ship" and schedules the expiry reminders, once per process. */
export function registerComplianceHooks(): void {
  if (registered) return;
  registered = true;
  registerReadyGate(complianceGate);
  registerTask(expiryReminderTask);
  registerManifestExtras(manifestDocuments);
}
