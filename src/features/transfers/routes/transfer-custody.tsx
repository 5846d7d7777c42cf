import { describeCustodyEntry } from "@shared/words";
import { Link, useParams } from "react-router";
import type { CustodyEntryDto, PhotoDto } from "@shared/schemas/transfer";
import { PhotoStrip } from "@/components/ui/photo-strip";
import { Loading, Notice } from "@/components/ui/feedback";
import { PageHeader } from "@/components/ui/page";
import { paths } from "@/config/paths";
import { formatInstant } from "@shared/dates";
import { useTransfer } from "@/lib/transfer-queries";
import { useUnitSystem } from "@/lib/units-preference";
import { useCustody } from "../api/custody";

function Entry({ entry: e, broken, photo }: { entry: CustodyEntryDto; broken: boolean; photo: PhotoDto | null }) {
  const [system] = useUnitSystem();
  const { title, lines } = describeCustodyEntry(e, system);
  return (
    <li className={`rounded-md border p-3 ${broken ? "border-brick-line bg-brick-bg" : "border-rule bg-paper-card"}`}>
      <p className="font-semibold">
        {e.seq}. {title}{" "}
        <span className="font-normal text-ink-soft">
          · {formatInstant(e.at)} · {e.actor.displayName}
        </span>
      </p>
      {lines.length ? (
        <ul className="mt-1 grid gap-0.5 text-sm">
          {lines.map((line, i) => (
            <li key={i}>{line}</li>
          ))}
        </ul>
      ) : null}
      {photo ? <PhotoStrip photos={[photo]} label={`Photo of entry ${e.seq}`} /> : null}
      <p className="mt-1 wrap-anywhere font-mono text-xs text-ink-soft">
        <span className="font-sans">Hash</span> {e.hash} <span className="font-sans">follows</span> {e.prevHash}
      </p>
    </li>
  );
}

/** Every custody event in order, with the hash chain that shows nothing was changed or removed. */
export function TransferCustodyRoute() {
  const { transferId = "" } = useParams();
  const transfer = useTransfer(transferId);
  const custody = useCustody(transferId, true);
  const number = transfer.data?.number ?? "";
  const photos = new Map((transfer.data?.photos ?? []).map((p) => [p.id, p]));
  return (
    <>
      <PageHeader
        title={`Custody log${number ? ` for ${number}` : ""}`}
        eyebrow="Append-only record"
        actions={
          <>
            <a
              href={`/api/transfers/${encodeURIComponent(transferId)}/custody/export`}
              download
              className="inline-flex min-h-11 items-center px-2 font-medium text-fern underline"
            >
              Download the log to keep
            </a>
            <Link
              to={paths.transfers.detail.href(transferId)}
              className="inline-flex min-h-11 items-center px-2 font-medium text-fern underline"
            >
              Back to the transfer
            </Link>
          </>
        }
      >
        Each entry carries the hash of the one before it, and the log&apos;s end is recorded apart from the entries, so
        a changed or missing entry shows — at the end too. The downloaded log can be checked later without Hatchway.
      </PageHeader>
      {custody.isPending ? (
        <Loading label="Loading the custody log…" />
      ) : custody.error ? (
        <Notice tone="block" role="alert">
          {(custody.error as Error).message}
        </Notice>
      ) : (
        <div className="grid gap-4">
          {custody.data.intact ? (
            <Notice tone="ok" title="The log is intact">
              All {custody.data.entries.length} entries chain together; none was changed or removed.
            </Notice>
          ) : (
            <Notice tone="block" role="alert" title={`The log is broken at entry ${custody.data.brokenAt ?? "?"}`}>
              {custody.data.breaks.length > 1 ? (
                <ul className="mb-1 grid gap-0.5">
                  {custody.data.breaks.map((b) => (
                    <li key={`${b.problem}-${b.seq}`}>{b.message}</li>
                  ))}
                </ul>
              ) : (
                `${custody.data.reason ?? "An entry does not match the one before it."} `
              )}
              Tell your administrator.
            </Notice>
          )}
          <ol className="grid gap-2">
            {custody.data.entries.map((e) => (
              <Entry
                key={e.seq}
                entry={e}
                broken={custody.data.breaks.some((b) => e.seq >= b.seq && e.seq <= b.toSeq)}
                photo={e.kind === "photo_added" ? (photos.get(String(e.payload.photoId)) ?? null) : null}
              />
            ))}
          </ol>
        </div>
      )}
    </>
  );
}
