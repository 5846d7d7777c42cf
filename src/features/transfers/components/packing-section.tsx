import type { TransferDto } from "@shared/schemas/transfer";
import { Notice } from "@/components/ui/feedback";
import { Section } from "./section";

/** What the server found wrong with the packing; sending for confirmation waits for these. */
export function PackingSection({ transfer: t }: { transfer: TransferDto }) {
  const boxLabel = new Map(t.containers.map((c) => [c.id, c.label]));
  return (
    <Section id="packing" title="Packing to sort out">
      {t.packingFindings.length === 0 ? (
        <Notice tone="ok">Every animal is in a box, and no box mixes species.</Notice>
      ) : (
        <ul className="grid gap-2">
          {t.packingFindings.map((f, i) => (
            <li key={`${f.code}-${i}`}>
              <Notice tone="caution" title={f.containerId ? boxLabel.get(f.containerId) : undefined}>
                {f.message}
              </Notice>
            </li>
          ))}
        </ul>
      )}
    </Section>
  );
}
