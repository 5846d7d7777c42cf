import type { HandoffDto, TransferDto } from "@shared/schemas/transfer";
import { HANDOFF_REASON_KEYS } from "@shared/constants";
import { boxName, DELIVERY_STATE_WORDS, DELIVERY_WAY_WORDS, REASON_TITLES } from "@shared/words";
import { formatInstant } from "@shared/dates";
import { formatTemp } from "@shared/units";
import { Badge } from "@/components/ui/feedback";
import { PhotoStrip } from "@/components/ui/photo-strip";
import { useUnitSystem } from "@/lib/units-preference";

/** Each seal as read: a mismatch or a broken seal one by one; "match the record" only when every one does. */
function SealLines({ handoff: h, transfer: t }: { handoff: HandoffDto; transfer: TransferDto }) {
  const label = new Map(t.containers.map((c) => [c.id, c.label]));
  const problems = h.seals.filter((s) => !s.intact || !s.matches);
  const good = h.seals.length - problems.length;
  return (
    <ul className="grid gap-0.5 text-sm">
      {problems.map((s) => {
        const box = boxName(label.get(s.containerId) ?? "a box");
        return (
          <li key={s.containerId} className="font-semibold text-brick">
            {!s.intact
              ? `${box}: ${s.expected ? `seal ${s.expected} broken or missing` : "opened or damaged"}`
              : `${box}: expected seal ${s.expected ?? "none"}, read ${s.sealNumber ?? "no number"}`}
          </li>
        );
      })}
      {good > 0 ? (
        <li className="text-ink-soft">
          {good === h.seals.length
            ? `Seals read on ${good} ${good === 1 ? "box" : "boxes"}: each matches the record and is unbroken`
            : `${good} more ${good === 1 ? "seal matches" : "seals match"} the record and ${good === 1 ? "is" : "are"} unbroken`}
        </li>
      ) : null}
      {h.sealsUnchecked.length ? (
        <li className="text-amber">
          Seals not checked on {h.sealsUnchecked.map((id) => boxName(label.get(id) ?? "a box")).join(", ")}
        </li>
      ) : null}
    </ul>
  );
}

/** One recorded handoff as the custody trail shows it: who, when, what was counted and read, why, and its photos. */
export function HandoffRecord({ handoff: h, transfer: t }: { handoff: HandoffDto; transfer: TransferDto }) {
  const [system] = useUnitSystem();
  const short = h.boxesCounted !== h.boxesExpected;
  const place =
    h.place.text ??
    (h.place.lat != null && h.place.lon != null ? `${h.place.lat.toFixed(4)}, ${h.place.lon.toFixed(4)}` : null);
  const photos = t.photos.filter((p) => p.moment === "handoff" && p.handoffIndex === h.handoffIndex);
  const boxLabel = new Map(t.containers.map((c) => [c.id, c.label]));
  const isDelivery = h.kind === "delivery" && t.delivery;
  return (
    <>
      <p className="text-sm">
        {formatInstant(h.at)} · {h.releasedByName} <span aria-hidden>→</span>
        <span className="sr-only">handed to</span> {h.receivedByName}
      </p>
      <p className="text-sm text-ink-soft">
        {h.boxesCounted} of {h.boxesExpected} boxes counted ·{" "}
        {h.boxTempF === null ? "box temperature not taken" : `box at ${formatTemp(h.boxTempF, system)}`}
        {place ? ` · ${place}` : ""} · recorded by {h.recordedBy.displayName}
      </p>
      {short ? (
        <p className="mt-1">
          <Badge tone="caution">Box count differs</Badge>
        </p>
      ) : null}
      <SealLines handoff={h} transfer={t} />
      {HANDOFF_REASON_KEYS.filter((key) => h.reasons[key]).map((key) => (
        <p key={key} className="text-sm">
          <span className="font-semibold">{REASON_TITLES[key]}:</span> {h.reasons[key]}
        </p>
      ))}
      {h.notChecked.map((line) => (
        <p key={line} className="text-sm text-amber">
          {line}
        </p>
      ))}
      {isDelivery ? (
        <p
          className={`text-sm font-semibold ${t.delivery!.state === "acknowledged" ? "text-fern-dark" : "text-amber"}`}
        >
          {DELIVERY_STATE_WORDS[t.delivery!.state]}
          {t.delivery!.state === "acknowledged" && t.delivery!.acknowledgedBy
            ? ` (${t.delivery!.acknowledgedBy.displayName}${t.delivery!.way ? `, ${DELIVERY_WAY_WORDS[t.delivery!.way]}` : ""})`
            : ""}
        </p>
      ) : null}
      {h.notes ? <p className="whitespace-pre-wrap text-sm">{h.notes}</p> : null}
      <PhotoStrip
        photos={photos}
        label={`Photos of handoff ${h.handoffIndex + 1}`}
        shows={(p) => (p.containerId ? (boxLabel.get(p.containerId) ?? null) : null)}
      />
    </>
  );
}
