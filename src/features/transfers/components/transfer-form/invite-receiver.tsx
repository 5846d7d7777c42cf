import { useState } from "react";
import { ORGANIZATION_KINDS, US_STATES, type OrganizationKind, type UsState } from "@shared/constants";
import { ORGANIZATION_KIND_WORDS } from "@shared/words";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/feedback";
import { ApiError } from "@/lib/api-client";
import { useInviteOrganization } from "../../api/invite-organization";

/**
 * A receiver not in the directory: invite it by e-mail. The organisation exists at once (pending)
 * and is chosen as the receiver; the invitee finds the transfer when they sign up.
 */
export function InviteReceiver({ onInvited }: { onInvited: (organizationId: string) => void }) {
  const [open, setOpen] = useState(false);
  if (!open)
    return (
      <Button type="button" variant="secondary" onClick={() => setOpen(true)}>
        Not listed? Invite the receiver by e-mail
      </Button>
    );
  return <InviteReceiverForm onInvited={onInvited} onClose={() => setOpen(false)} />;
}

function InviteReceiverForm({
  onInvited,
  onClose,
}: {
  onInvited: (organizationId: string) => void;
  onClose: () => void;
}) {
  const setOpen = (value: false) => value || onClose();
  const [organizationName, setName] = useState("");
  const [kind, setKind] = useState<OrganizationKind>("nature_centre");
  const [email, setEmail] = useState("");
  const [state, setState] = useState<UsState>("OR");
  const invite = useInviteOrganization();
  const send = () =>
    invite.mutate(
      { organizationName, kind, email, state },
      { onSuccess: (organization) => (onInvited(organization.id), setOpen(false)) },
    );
  return (
    <fieldset className="grid gap-3 rounded-card border border-rule p-4 sm:grid-cols-2">
      <legend className="px-1 font-semibold">Invite the receiver</legend>
      <TextField label="Organisation name" value={organizationName} onChange={(e) => setName(e.target.value)} />
      <SelectField
        label="Kind of organisation"
        value={kind}
        options={ORGANIZATION_KINDS.filter((k) => k !== "courier_service").map((k) => ({
          value: k,
          label: ORGANIZATION_KIND_WORDS[k],
        }))}
        onChange={(e) => setKind(e.target.value as OrganizationKind)}
      />
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
        <Button type="button" variant="secondary" onClick={() => setOpen(false)}>
          Cancel
        </Button>
      </div>
    </fieldset>
  );
}
