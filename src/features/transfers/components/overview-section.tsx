import { PURPOSE_WORDS, TRANSPORT_MODE_WORDS } from "@shared/words";
import type { OrgBriefDto, PersonDto, PlaceDto, TransferDto } from "@shared/schemas/transfer";
import { formatInstant } from "@shared/dates";
import { Section } from "./section";

function Party({
  role,
  organization,
  contact,
}: {
  role: string;
  organization: OrgBriefDto;
  contact: PersonDto | null;
}) {
  return (
    <div className="rounded-md border border-rule p-3">
      <p className="text-xs font-semibold uppercase tracking-wide text-ink-faint">{role}</p>
      <p className="font-semibold">{organization.name}</p>
      {contact ? <p>{contact.displayName}</p> : null}
      <p className="text-sm">
        <a className="text-fern underline" href={`tel:${organization.phone}`}>
          {organization.phone}
        </a>
        {" · "}
        <a className="text-fern underline" href={`mailto:${contact?.email ?? organization.email}`}>
          {contact?.email ?? organization.email}
        </a>
      </p>
    </div>
  );
}

const placeText = (p: PlaceDto) => `${p.street}, ${p.city}, ${p.state} ${p.zip}`;

/** Who sends and receives, from where to where, how, when and why. */
export function OverviewSection({ transfer: t }: { transfer: TransferDto }) {
  return (
    <Section id="overview" title="Who and where">
      <div className="grid gap-3 sm:grid-cols-2">
        <Party role="Sender" organization={t.sender.organization} contact={t.sender.contact} />
        <Party role="Receiver" organization={t.receiver.organization} contact={t.receiver.contact} />
      </div>
      <dl className="mt-4 grid gap-x-6 gap-y-2 sm:grid-cols-[max-content_1fr]">
        <dt className="font-semibold">Leaves from</dt>
        <dd>{placeText(t.origin)}</dd>
        <dt className="font-semibold">Goes to</dt>
        <dd>{placeText(t.destination)}</dd>
        <dt className="font-semibold">How</dt>
        <dd>{TRANSPORT_MODE_WORDS[t.mode]}</dd>
        <dt className="font-semibold">Departure</dt>
        <dd>{formatInstant(t.plannedDepartureAt, t.origin.timeZone)}</dd>
        <dt className="font-semibold">Arrival</dt>
        <dd>{formatInstant(t.expectedArrivalAt, t.destination.timeZone)}</dd>
        <dt className="font-semibold">Purpose</dt>
        <dd>
          {PURPOSE_WORDS[t.purpose]}
          {t.sale
            ? `; a sale${t.salePriceUsd != null ? ` for $${t.salePriceUsd.toLocaleString("en-US")}` : ""}`
            : "; not a sale"}
        </dd>
        {t.handlingNotes ? (
          <>
            <dt className="font-semibold">Handling notes</dt>
            <dd className="whitespace-pre-wrap">{t.handlingNotes}</dd>
          </>
        ) : null}
        {t.privateNotes ? (
          <>
            <dt className="font-semibold">Private notes</dt>
            <dd className="whitespace-pre-wrap">
              {t.privateNotes} <span className="text-sm text-ink-soft">(only your organisation sees these)</span>
            </dd>
          </>
        ) : null}
      </dl>
    </Section>
  );
}
