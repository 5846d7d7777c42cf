import { USER_ROLE_WORDS } from "@shared/words";
import { useState } from "react";
import { USER_ROLES, type OrganizationKind, type UserRole } from "@shared/constants";
import { roleMisfit } from "@shared/roles";
import { Button } from "@/components/ui/button";
import { Badge, EmptyState, Loading, Notice } from "@/components/ui/feedback";
import { Card, PageHeader } from "@/components/ui/page";
import { Table, Td, Th } from "@/components/ui/table";
import { useToast } from "@/components/ui/toast";
import { ApiError } from "@/lib/api-client";
import { useUpdateUser, useUsers } from "../api/users";
import { InviteUserForm } from "../components/invite-user-form";
import { RoleChangeDialog, type RoleChange } from "../components/role-change-dialog";

export function UsersRoute() {
  const users = useUsers();
  const update = useUpdateUser();
  const [inviting, setInviting] = useState(false);
  const [roleChange, setRoleChange] = useState<RoleChange | null>(null);
  const notify = useToast();

  const changeRole = ({ user, role }: RoleChange) =>
    update.mutate(
      { id: user.id, patch: { role } },
      {
        onSuccess: () => notify(`${user.displayName}’s role is now ${USER_ROLE_WORDS[role]}`),
        onSettled: () => setRoleChange(null),
      },
    );

  return (
    <>
      <PageHeader
        title="People"
        eyebrow="Administration"
        actions={!inviting ? <Button onClick={() => setInviting(true)}>Invite someone</Button> : null}
      >
        Everyone who can sign in to Hatchway, their role and their organisation.
      </PageHeader>
      {inviting ? (
        <Card title="Invite someone" className="mb-6">
          <p className="mb-4 text-sm text-ink-soft">
            They get an e-mail with a one-time link to choose a password (valid 72 hours).
          </p>
          <InviteUserForm onDone={() => setInviting(false)} />
        </Card>
      ) : null}
      {update.error ? (
        <div className="mb-4">
          <Notice tone="block" role="alert">
            {update.error instanceof ApiError ? update.error.message : "The change was not saved."}
          </Notice>
        </div>
      ) : null}
      {users.isPending ? (
        <Loading label="Loading people…" />
      ) : users.error ? (
        <Notice tone="block" role="alert">
          {(users.error as Error).message}
        </Notice>
      ) : users.data.length === 0 ? (
        <EmptyState title="Nobody here yet">Invite the first person with the button above.</EmptyState>
      ) : (
        <Table
          caption="People who can sign in"
          head={
            <tr>
              <Th>Name</Th>
              <Th>E-mail</Th>
              <Th>Organisation</Th>
              <Th>Role</Th>
              <Th>State</Th>
              <Th>
                <span className="sr-only">Actions</span>
              </Th>
            </tr>
          }
        >
          {users.data.map((u) => (
            <tr key={u.id}>
              <Td className="font-medium">{u.displayName}</Td>
              <Td>{u.email}</Td>
              <Td>{u.organization?.name ?? <span className="text-ink-faint">—</span>}</Td>
              <Td>
                <label className="sr-only" htmlFor={`role-${u.id}`}>
                  Role of {u.displayName}
                </label>
                <select
                  id={`role-${u.id}`}
                  className="min-h-10 rounded-md border border-rule bg-paper-card px-2"
                  value={u.role}
                  onChange={(e) => {
                    update.reset();
                    setRoleChange({ user: u, role: e.target.value as UserRole });
                  }}
                >
                  {USER_ROLES.filter(
                    (r) =>
                      r === u.role || !roleMisfit(r, (u.organization?.kind as OrganizationKind | undefined) ?? null),
                  ).map((r) => (
                    <option key={r} value={r}>
                      {USER_ROLE_WORDS[r]}
                    </option>
                  ))}
                </select>
              </Td>
              <Td>
                {u.disabled ? (
                  <Badge tone="block">Disabled</Badge>
                ) : u.invitationPending ? (
                  <Badge tone="caution">Invited</Badge>
                ) : (
                  <Badge tone="ok">Active</Badge>
                )}
              </Td>
              <Td className="text-right">
                <Button
                  variant="secondary"
                  onClick={() => update.mutate({ id: u.id, patch: { disabled: !u.disabled } })}
                >
                  {u.disabled ? "Enable" : "Disable"}
                </Button>
              </Td>
            </tr>
          ))}
        </Table>
      )}
      <RoleChangeDialog
        change={roleChange}
        busy={update.isPending}
        onConfirm={changeRole}
        onCancel={() => setRoleChange(null)}
      />
    </>
  );
}
