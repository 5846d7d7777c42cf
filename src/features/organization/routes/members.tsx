import { useState, type FormEvent } from "react";
import type { OrganizationKind, UserRole } from "@shared/constants";
import type { MemberDto } from "@shared/schemas/auth";
import { USER_ROLE_WORDS } from "@shared/words";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { Badge, Loading, Notice } from "@/components/ui/feedback";
import { Card, PageHeader } from "@/components/ui/page";
import { ApiError } from "@/lib/api-client";
import { useViewer } from "@/lib/viewer";
import { useChangeMember, useInviteMember, useMembers, useOrganization, useUpdateOrganization } from "../api/members";

const messageOf = (error: unknown) => (error instanceof ApiError ? error.message : "That did not work. Try again.");
const rolesFor = (kind: OrganizationKind): ("manager" | "member" | "courier")[] =>
  kind === "courier_service" ? ["manager", "courier"] : ["manager", "member"];

/** The manager's page: the organisation's people, inviting, roles, disabling, the directory listing (issue 14, §2). */
export function MembersRoute() {
  const viewer = useViewer();
  const organizationId = viewer.user.organization?.id ?? "";
  const organization = useOrganization(organizationId);
  const members = useMembers(organizationId);
  if (!organization.data || !members.data) return <Loading label="Opening your organisation…" />;
  const roles = rolesFor(organization.data.kind);
  return (
    <div className="grid gap-6">
      <PageHeader title={`People of ${organization.data.name}`} documentTitle="Your organisation" />
      <ListingCard id={organizationId} listed={organization.data.listed} />
      <InviteCard id={organizationId} roles={roles} />
      <Card title="People">
        <ul className="divide-y divide-rule">
          {members.data.map((m) => (
            <MemberRow key={m.id} id={organizationId} member={m} roles={roles} self={m.id === viewer.user.id} />
          ))}
        </ul>
      </Card>
    </div>
  );
}

function ListingCard({ id, listed }: { id: string; listed: boolean }) {
  const update = useUpdateOrganization(id);
  return (
    <Card title="Directory">
      <label className="flex min-h-11 items-center gap-3">
        <input
          type="checkbox"
          className="h-5 w-5 shrink-0"
          checked={listed}
          disabled={update.isPending}
          onChange={(e) => update.mutate({ listed: e.target.checked })}
        />
        List us in the directory, so senders can choose us (only our name, kind, city and state are shown)
      </label>
      {update.error ? <Notice tone="block">{messageOf(update.error)}</Notice> : null}
    </Card>
  );
}

function InviteCard({ id, roles }: { id: string; roles: ("manager" | "member" | "courier")[] }) {
  const [email, setEmail] = useState("");
  const [displayName, setDisplayName] = useState("");
  const [role, setRole] = useState(roles[1]!);
  const invite = useInviteMember(id);
  const submit = (e: FormEvent) => {
    e.preventDefault();
    invite.mutate({ email, displayName, role }, { onSuccess: () => (setEmail(""), setDisplayName("")) });
  };
  return (
    <Card title="Invite someone">
      <form className="grid gap-3 sm:grid-cols-4 sm:items-end" onSubmit={submit} noValidate>
        <TextField label="Name" value={displayName} onChange={(e) => setDisplayName(e.target.value)} />
        <TextField label="E-mail" type="email" value={email} onChange={(e) => setEmail(e.target.value)} />
        <SelectField
          label="Role"
          value={role}
          options={roles.map((r) => ({ value: r, label: USER_ROLE_WORDS[r] }))}
          onChange={(e) => setRole(e.target.value as typeof role)}
        />
        <Button type="submit" busy={invite.isPending}>
          Send the invitation
        </Button>
      </form>
      {invite.error ? <Notice tone="block">{messageOf(invite.error)}</Notice> : null}
      {invite.isSuccess ? (
        <Notice tone="ok">
          {invite.data.invitation.awaitingAcceptance
            ? "That address already has an account: it was sent a link to accept."
            : "Invitation sent."}
        </Notice>
      ) : null}
    </Card>
  );
}

function MemberRow({
  id,
  member,
  roles,
  self,
}: {
  id: string;
  member: MemberDto;
  roles: ("manager" | "member" | "courier")[];
  self: boolean;
}) {
  const change = useChangeMember(id);
  return (
    <li className="flex flex-wrap items-center gap-3 py-3">
      <div className="mr-auto">
        <p className="font-semibold">{member.displayName}</p>
        <p className="text-sm text-ink-soft">{member.email}</p>
      </div>
      {member.invitationPending ? <Badge tone="info">Invitation sent</Badge> : null}
      {member.disabled ? <Badge tone="neutral">Disabled</Badge> : null}
      <SelectField
        label={`Role of ${member.displayName}`}
        value={member.role}
        disabled={change.isPending || member.disabled}
        options={roles.map((r) => ({ value: r, label: USER_ROLE_WORDS[r as UserRole] }))}
        onChange={(e) =>
          change.mutate({ userId: member.id, change: { role: e.target.value as (typeof roles)[number] } })
        }
      />
      {self ? null : (
        <Button
          variant="secondary"
          busy={change.isPending}
          onClick={() => change.mutate({ userId: member.id, change: { disabled: !member.disabled } })}
        >
          {member.disabled ? "Enable" : "Disable"}
        </Button>
      )}
      {change.error ? <Notice tone="block">{messageOf(change.error)}</Notice> : null}
    </li>
  );
}
