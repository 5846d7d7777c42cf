import { HANDOFF_KIND_WORDS } from "@shared/words";
import { Link } from "react-router";
import type { TransferDto } from "@shared/schemas/transfer";
import { handoffKind } from "@shared/transfer/lifecycle";
import { Badge } from "@/components/ui/feedback";
import { paths } from "@/config/paths";
import { useCustody } from "../api/custody";
import { HandoffRecord } from "./handoff-record";
import { Section } from "./section";

/** The handoffs planned and recorded, and the state of the tamper-evident log behind them. */
export function CustodySection({ transfer: t }: { transfer: TransferDto }) {
  const custody = useCustody(t.id, t.abilities.readCustody);
  const slots = Math.max(t.handoffsPlanned, t.handoffs.length);
  const byIndex = new Map(t.handoffs.map((h) => [h.handoffIndex, h]));
  return (
    <Section
      id="custody"
      title="Custody trail"
      actions={
        t.abilities.readCustody ? (
          <span className="flex flex-wrap items-center gap-2">
            {custody.data ? (
              <Badge tone={custody.data.intact ? "ok" : "block"}>
                {custody.data.intact ? "Log intact" : `Log broken at entry ${custody.data.brokenAt ?? "?"}`}
              </Badge>
            ) : null}
            <Link
              to={paths.transfers.custody.href(t.id)}
              className="inline-flex min-h-11 items-center px-2 font-medium text-fern underline"
            >
              Full custody log
            </Link>
          </span>
        ) : null
      }
    >
      {slots === 0 ? (
        <p className="text-ink-soft">The handoffs are planned once couriers are assigned.</p>
      ) : (
        <ol className="relative grid gap-3 border-l-2 border-rule pl-5">
          {Array.from({ length: slots }, (_, i) => {
            const h = byIndex.get(i);
            const kind = h?.kind ?? handoffKind(i, t.legs.length);
            return (
              <li key={i} className="relative">
                <span
                  aria-hidden
                  className={`absolute -left-[1.72rem] top-1 h-3 w-3 rounded-full border-2 ${h ? "border-fern bg-fern" : "border-rule bg-paper-card"}`}
                />
                <p className="font-semibold">
                  {i + 1}. {HANDOFF_KIND_WORDS[kind]}{" "}
                  {h ? null : <span className="font-normal text-ink-soft">— not yet recorded</span>}
                </p>
                {h ? <HandoffRecord handoff={h} transfer={t} /> : null}
                {!h && t.abilities.handOff === i ? (
                  <Link
                    to={paths.courier.handoff.href(t.id)}
                    className="mt-1 inline-flex min-h-11 items-center rounded-md border border-fern-dark bg-fern px-4 font-medium text-paper-card"
                  >
                    Record this handoff
                  </Link>
                ) : null}
              </li>
            );
          })}
        </ol>
      )}
    </Section>
  );
}
