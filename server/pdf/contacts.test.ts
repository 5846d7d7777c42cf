import { describe, expect, it } from "vitest";
import { contactsOnce } from "./manifest.pdf";
import { buildManifestInput } from "./manifest-input.fixture";

describe("contactsOnce", () => {
  it("lists each party once: the sender and the receiver first, a repeated person adds a role", () => {
    // source: issue 12 §3 (product requirement): each party is listed once in the contacts
    const base = buildManifestInput();
    const input = buildManifestInput({
      emergencyContacts: [
        // The same person and number as the sender, written a little differently.
        {
          name: ` ${base.sender.contactName.toUpperCase()} `,
          role: "Courier, leg 1",
          phone: base.sender.phone24h.replace(/\D/g, ""),
        },
        { name: base.receiver.contactName, role: "Receiver — again", phone: base.receiver.phone24h },
        { name: "Dr. Demo Vet", role: "Sender's veterinarian", phone: "(555) 010-0199" },
      ],
    });
    const rows = contactsOnce(input);
    expect(rows.map((r) => [r.name, r.roles])).toEqual([
      [base.sender.contactName, ["Sender", "Courier, leg 1"]],
      [base.receiver.contactName, ["Receiver"]],
      ["Dr. Demo Vet", ["Sender's veterinarian"]],
    ]);
  });
});
