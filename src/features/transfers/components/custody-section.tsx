import { HANDOFF_KIND_WORDS } from "@shared/words";
import { Link } from "react-router";
import type { HandoffDto, TransferDto } from "@shared/schemas/transfer";
import { handoffKind } from "@shared/transfer/lifecycle";
import { Badge } from "@/components/ui/feedback";
import { paths } from "@/config/paths";
import { formatInstant } from "@shared/dates";
import { formatTemp } from "@shared/units";
import { useUnitSystem } from "@/lib/units-preference";
import { useCustody } from "../api/custody";
import { Section } from "./section";

function Recorded({ handoff: h }: { handoff: HandoffDto }) {
  const [system] = useUnitSystem();
  const broken = h.seals.filter((s) => !s.intact).length;
  const short = h.boxesCounted !== h.boxesExpected;
  const place =
    h.place.text ??
    (h.place.lat != null && h.place.lon != null ? `${h.place.lat.toFixed(4)}, ${h.place.lon.toFixed(4)}` : null);
  return (
    <>
      <p className="text-sm">
        {formatInstant(h.at)} · {h.releasedByName} <span aria-hidden>→</span>
        <span className="sr-only">handed to</span> {h.receivedByName}
      </p>
      <p className="text-sm text-ink-soft">
        {h.boxesCounted} of {h.boxesExpected} boxes · seals {broken === 0 ? "all intact" : `${broken} not intact`} · box
        at {formatTemp(h.boxTempF, system)}
        {place ? ` · ${place}` : ""} · recorded by {h.recordedBy.displayName}
      </p>
      {short || broken > 0 ? (
        <p className="mt-1">
          <Badge tone="caution">{short ? "Box count differs" : "Seal problem"}</Badge>
        </p>
      ) : null}
      {h.notes ? <p className="whitespace-pre-wrap text-sm">{h.notes}</p> : null}
    </>
  );
}

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
                {h ? <Recorded handoff={h} /> : null}
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
