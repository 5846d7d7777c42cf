import { useState } from "react";
import { Link, useParams } from "react-router";
import {
  ANIMAL_ORIGIN_WORDS,
  quarantineWords,
  REGISTER_ENTRY_KIND_WORDS,
  REGISTER_STATUS_WORDS,
  SEX_WORDS,
} from "@shared/words";
import type { AnimalOrigin } from "@shared/constants";
import { formatDate } from "@shared/dates";
import { Loading, Notice } from "@/components/ui/feedback";
import { Card, PageHeader } from "@/components/ui/page";
import { paths } from "@/config/paths";
import { useRegisterEntry } from "../api/register-entry";
import { EventForm } from "../components/event-form";
import { SplitForm } from "../components/split-form";
import { Timeline } from "../components/timeline";

/** One animal or group: what is known of it, its whole history (and its life with earlier keepers), and the event form. */
export function RegisterEntryRoute() {
  const { entryId = "" } = useParams();
  const view = useRegisterEntry(entryId);
  const [correcting, setCorrecting] = useState<string | null>(null);
  if (view.isPending) return <Loading label="Loading the animal's record…" />;
  if (view.error)
    return (
      <Notice tone="block" role="alert">
        {view.error.message}
      </Notice>
    );
  const { entry, events, earlier } = view.data;
  const facts: [string, string][] = [
    ["Kind", REGISTER_ENTRY_KIND_WORDS[entry.kind]],
    ["Status", REGISTER_STATUS_WORDS[entry.status]],
    ["In care", `${entry.countInCare} of ${entry.count}`],
    ["Sex", SEX_WORDS[entry.sex]],
    ["Identifier", entry.identifier ?? "None recorded"],
    ["Origin", entry.origin ? (ANIMAL_ORIGIN_WORDS[entry.origin as AnimalOrigin] ?? entry.origin) : "Not known"],
    ["Hatched or born", entry.hatchDate ? formatDate(entry.hatchDate) : "Not known"],
    ["Acquired", formatDate(entry.dateAcquired)],
    [
      "Source",
      [entry.sourceOrganization, entry.sourcePermitNumber && `permit ${entry.sourcePermitNumber}`]
        .filter(Boolean)
        .join(", ") || "Not recorded",
    ],
  ];
  return (
    <>
      <PageHeader
        title={entry.taxon.scientificName}
        eyebrow={entry.identifier ?? REGISTER_ENTRY_KIND_WORDS[entry.kind]}
      >
        <Link to={paths.register} className="text-fern underline">
          Back to the register
        </Link>
      </PageHeader>
      {entry.quarantine ? (
        <Notice tone="caution" title={quarantineWords(entry.quarantine.daysLeft)}>
          In quarantine since {formatDate(entry.quarantine.startedOn)}, until {formatDate(entry.quarantine.until)}.
          Adding animals to this group starts the clock again. Ask your veterinarian how long quarantine should last for
          this species.
        </Notice>
      ) : null}
      <div className="mt-4 grid gap-4 lg:grid-cols-2">
        <Card title="What is known">
          <dl className="grid grid-cols-2 gap-2 text-sm">
            {facts.map(([term, value]) => (
              <div key={term} className="contents">
                <dt className="font-semibold">{term}</dt>
                <dd>{value}</dd>
              </div>
            ))}
          </dl>
          {entry.parentEntryId ? (
            <p className="mt-2 text-sm">
              Split off{" "}
              <Link className="text-fern underline" to={paths.registerEntry.href(entry.parentEntryId)}>
                the group it came from
              </Link>
              .
            </p>
          ) : null}
          {entry.transferId ? (
            <p className="mt-2 text-sm">
              Arrived with transfer{" "}
              <Link className="text-fern underline" to={paths.transfers.detail.href(entry.transferId)}>
                {entry.transferNumber}
              </Link>{" "}
              (its custody log shows the move).
            </p>
          ) : null}
        </Card>
        <Card title={correcting ? "Correct an event" : "Record what happened"}>
          <EventForm key={correcting ?? "new"} entry={entry} corrects={correcting} onDone={() => setCorrecting(null)} />
        </Card>
        {entry.kind === "group" && entry.countInCare > 0 ? (
          <Card title="Split some off the group" className="lg:col-span-2">
            <SplitForm key={entry.id} entry={entry} />
          </Card>
        ) : null}
      </div>
      <section className="mt-6">
        <h2 className="mb-2 text-lg font-semibold">History</h2>
        <Timeline events={events} onCorrect={setCorrecting} />
      </section>
      {earlier.map((before) => (
        <section key={before.entry.id} className="mt-6">
          <h2 className="mb-2 text-lg font-semibold">
            With an earlier keeper ({before.entry.sourceOrganization ?? "before"})
          </h2>
          <Timeline events={before.events} />
        </section>
      ))}
    </>
  );
}
