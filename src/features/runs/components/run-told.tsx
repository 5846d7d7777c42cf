import type { RunNotifiedDto } from "@shared/schemas/run";
import { Notice } from "@/components/ui/feedback";

const hours = (h: number) => `${Math.abs(h).toFixed(1)} h ${h > 0 ? "later" : "earlier"}`;

/** Who was told after a change moved their arrival by more than 2 hours. */
export function RunTold({ notified }: { notified: readonly RunNotifiedDto[] }) {
  if (notified.length === 0)
    return (
      <Notice tone="ok" role="status" title="The run was changed">
        No drop-off moved by more than 2 hours, so nobody was e-mailed.
      </Notice>
    );
  return (
    <Notice tone="info" role="status" title="The run was changed; these people were told">
      <ul className="list-disc pl-5">
        {notified.map((n) => (
          <li key={n.transferId}>
            {n.transferNumber}: arrives {hours(n.arrivalMovedH)}. E-mailed{" "}
            {n.told.map((person) => `${person.name} (${person.party})`).join(" and ") || "nobody (no address on file)"}.
          </li>
        ))}
      </ul>
    </Notice>
  );
}
