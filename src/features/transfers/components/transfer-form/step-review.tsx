import { ANIMAL_ORIGIN_WORDS, PACK_WORDS, PURPOSE_WORDS, SEX_WORDS, TRANSPORT_MODE_WORDS } from "@shared/words";
import { useFormContext, useWatch } from "react-hook-form";
import type { DirectoryOrganizationDto, TaxonBriefDto, TransferInput } from "@shared/schemas/transfer";
import { packingFindings } from "@shared/transfer/packing";
import { Notice } from "@/components/ui/feedback";
import { TaxonName } from "@/components/ui/taxon-name";
import { formatInstant } from "@shared/dates";
import { formatDimensions } from "@shared/units";
import { useUnitSystem } from "@/lib/units-preference";

const when = (iso: string) => (iso && !Number.isNaN(Date.parse(iso)) ? formatInstant(iso) : "not set");

/** Step 4: everything on one page, with the packing problems the server will also find. */
export function ReviewStep({
  organizations,
  taxa,
}: {
  organizations: DirectoryOrganizationDto[];
  taxa: Record<string, TaxonBriefDto>;
}) {
  const { control } = useFormContext<TransferInput>();
  const v = useWatch({ control }) as TransferInput;
  const [system] = useUnitSystem();
  const receiver = organizations.find((o) => o.id === v.receiverOrganizationId);
  const findings = packingFindings(
    v.containers.map((c) => ({ id: c.key, label: c.label })),
    v.animals.map((a, i) => ({
      id: String(i),
      containerId: a.containerKey,
      taxonId: a.taxonId,
      scientificName: taxa[a.taxonId]?.scientificName ?? "an unnamed species",
    })),
  );
  const unpacked = v.animals.filter((a) => a.containerKey === null);

  const line = (a: TransferInput["animals"][number], i: number) => (
    <li key={i}>
      {a.count} ×{" "}
      {taxa[a.taxonId] ? (
        <TaxonName taxon={taxa[a.taxonId]!} />
      ) : (
        <span className="text-brick">species not chosen</span>
      )}
      , {SEX_WORDS[a.sex].toLowerCase()}
      {a.origin ? `, ${ANIMAL_ORIGIN_WORDS[a.origin].toLowerCase()}` : ""}
      {a.identifier ? ` (${a.identifier})` : ""}
    </li>
  );

  return (
    <div className="grid grid-cols-1 gap-5">
      <dl className="grid gap-x-6 gap-y-2 sm:grid-cols-[max-content_1fr]">
        <dt className="font-semibold">Receiver</dt>
        <dd>{receiver?.name ?? "not chosen"}</dd>
        <dt className="font-semibold">From</dt>
        <dd>
          {[v.origin.street, v.origin.city, v.origin.state, v.origin.zip].filter(Boolean).join(", ") || "not set"}
        </dd>
        <dt className="font-semibold">To</dt>
        <dd>
          {[v.destination.street, v.destination.city, v.destination.state, v.destination.zip]
            .filter(Boolean)
            .join(", ") || "not set"}
        </dd>
        <dt className="font-semibold">Travel</dt>
        <dd>
          {v.mode ? TRANSPORT_MODE_WORDS[v.mode] : "mode not chosen"}; leaves {when(v.plannedDepartureAt)}, arrives{" "}
          {when(v.expectedArrivalAt)}
        </dd>
        <dt className="font-semibold">Purpose</dt>
        <dd>
          {v.purpose ? PURPOSE_WORDS[v.purpose] : "not chosen"}
          {v.sale ? `; a sale${v.salePriceUsd != null ? ` for $${v.salePriceUsd.toLocaleString("en-US")}` : ""}` : ""}
        </dd>
      </dl>

      <div className="grid gap-3">
        <h3 className="text-lg font-semibold">Boxes and what is in them</h3>
        {v.containers.map((c) => (
          <div key={c.key} className="rounded-card border border-rule bg-paper-card p-3">
            <p className="font-semibold">
              {c.label || "Unnamed box"}{" "}
              <span className="font-normal text-ink-soft">
                {Number.isFinite(c.lengthMm) && Number.isFinite(c.widthMm) && Number.isFinite(c.heightMm)
                  ? formatDimensions(c.lengthMm, c.widthMm, c.heightMm, system)
                  : "size not set"}{" "}
                · {PACK_WORDS[c.pack]}
              </span>
            </p>
            <ul className="mt-1 list-disc pl-5">
              {v.animals.map((a, i) => (a.containerKey === c.key ? line(a, i) : null))}
            </ul>
          </div>
        ))}
        {unpacked.length > 0 ? (
          <div className="rounded-card border border-dashed border-rule p-3">
            <p className="font-semibold">Not in a box yet</p>
            <ul className="mt-1 list-disc pl-5">
              {v.animals.map((a, i) => (a.containerKey === null ? line(a, i) : null))}
            </ul>
          </div>
        ) : null}
      </div>

      {findings.length > 0 ? (
        <Notice tone="caution" title="Packing to sort out before the receiver is asked">
          <ul className="list-disc pl-5">
            {findings.map((f, i) => (
              <li key={i}>{f.message}</li>
            ))}
          </ul>
          <p className="mt-1">You can still save the draft and fix these later.</p>
        </Notice>
      ) : (
        <Notice tone="ok">Every animal is in a box, and no box mixes species.</Notice>
      )}
    </div>
  );
}
