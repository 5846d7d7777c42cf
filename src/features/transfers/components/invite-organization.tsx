import { useState } from "react";
import { ORGANIZATION_KINDS, US_STATES, type OrganizationKind, type UsState } from "@shared/constants";
import { ORGANIZATION_KIND_WORDS } from "@shared/words";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/feedback";
import { ApiError } from "@/lib/api-client";
import { useInviteOrganization } from "../api/invite-organization";

/** Whom the sender invites: the receiver (a keeper organisation) or the courier service. */
export type InvitedParty = "receiver" | "courier_service";

const WORDS: Record<InvitedParty, { open: string; legend: string }> = {
  receiver: { open: "Not listed? Invite the receiver by e-mail", legend: "Invite the receiver" },
  courier_service: { open: "Not listed? Invite a courier service by e-mail", legend: "Invite a courier service" },
};

/**
 * An organisation not in the directory: invite it by e-mail. It exists at once (pending) and is
 * chosen for the transfer; the invitee finds the transfer when they sign up (issue 14, §3).
 */
export function InviteOrganization({
  party,
  onInvited,
  defaultState = "OR",
}: {
  party: InvitedParty;
  onInvited: (organizationId: string) => void;
  defaultState?: UsState;
}) {
  const [open, setOpen] = useState(false);
  if (!open)
    return (
      <Button type="button" variant="secondary" onClick={() => setOpen(true)}>
        {WORDS[party].open}
      </Button>
    );
  return (
    <InviteOrganizationForm
      party={party}
      defaultState={defaultState}
      onInvited={onInvited}
      onClose={() => setOpen(false)}
    />
  );
}

function InviteOrganizationForm({
  party,
  defaultState,
  onInvited,
  onClose,
}: {
  party: InvitedParty;
  defaultState: UsState;
  onInvited: (organizationId: string) => void;
  onClose: () => void;
}) {
  const [organizationName, setName] = useState("");
  const [kind, setKind] = useState<OrganizationKind>(party === "receiver" ? "nature_centre" : "courier_service");
  const [email, setEmail] = useState("");
  const [state, setState] = useState<UsState>(defaultState);
  const invite = useInviteOrganization();
  const send = () =>
    invite.mutate(
      { organizationName, kind, email, state },
      { onSuccess: (organization) => (onInvited(organization.id), onClose()) },
    );
  return (
    <fieldset className="grid gap-3 rounded-card border border-rule p-4 sm:grid-cols-2">
      <legend className="px-1 font-semibold">{WORDS[party].legend}</legend>
      <TextField label="Organisation name" value={organizationName} onChange={(e) => setName(e.target.value)} />
      {party === "receiver" ? (
        <SelectField
          label="Kind of organisation"
          value={kind}
          options={ORGANIZATION_KINDS.filter((k) => k !== "courier_service").map((k) => ({
            value: k,
            label: ORGANIZATION_KIND_WORDS[k],
          }))}
          onChange={(e) => setKind(e.target.value as OrganizationKind)}
        />
      ) : null}
      <TextField label="Their e-mail" type="email" value={email} onChange={(e) => setEmail(e.target.value)} />
      <SelectField
        label="Their state"
        value={state}
        options={US_STATES.map((s) => ({ value: s, label: s }))}
        onChange={(e) => setState(e.target.value as UsState)}
      />
      {invite.error ? (
        <Notice tone="block" role="alert">
          {invite.error instanceof ApiError ? invite.error.message : "The invitation could not be sent. Try again."}
        </Notice>
      ) : null}
      <div className="flex gap-2 sm:col-span-2">
        <Button type="button" busy={invite.isPending} onClick={send}>
          Send the invitation
        </Button>
        <Button type="button" variant="secondary" onClick={onClose}>
          Cancel
        </Button>
      </div>
    </fieldset>
  );
}
