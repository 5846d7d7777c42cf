import type { TransferDto } from "@shared/schemas/transfer";
import { formatInstant } from "@shared/dates";
import { Notice } from "@/components/ui/feedback";
import { useStateNotices } from "../api/state-notices";
import { Section } from "./section";

/** Dated to-dos from state rules after arrival (Texas 31 TAC 65.327, Maryland COMAR 15.11.01.09), with their citations. */
export function StateNoticesSection({ transfer: t }: { transfer: TransferDto }) {
  const arrived = t.status === "checked_in" || t.status === "closed";
  const notices = useStateNotices(t.id, arrived && (t.viewerRole === "sender" || t.viewerRole === "receiver"));
  if (!arrived || !notices.data?.notices.length) return null;
  return (
    <Section id="state-notices" title="Notices the states ask for">
      <ul className="grid gap-2">
        {notices.data.notices.map((notice) => (
          <li key={notice.key}>
            <Notice tone="caution" title={`${notice.duty} by ${formatInstant(notice.dueAt)}`}>
              Within {notice.withinHours} hours ({notice.citation})
              {notice.appliesTo ? `; applies to ${notice.appliesTo}` : ""}. Confirm with the state wildlife agency what
              it needs and how to send it.
            </Notice>
          </li>
        ))}
      </ul>
    </Section>
  );
}
