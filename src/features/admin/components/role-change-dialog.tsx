import type { UserRole } from "@shared/constants";
import type { AdminUserDto } from "@shared/schemas/auth";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { USER_ROLE_WORDS } from "@shared/words";

/** What each role may do, said before an administrator hands it to someone. */
const ROLE_POWERS: Record<UserRole, string> = {
  admin:
    "Administrators read every transfer, manage people and organisations, and edit the rule library and the temperature profiles.",
  manager:
    "Managers run their own organisation: they invite its people, change their roles, disable them and edit the organisation's details; in a keeper organisation they also do everything a member does.",
  member:
    "Members of a keeper organisation draft, send, confirm and check in their organisation's transfers, and keep its register.",
  courier: "Couriers see only the legs they are assigned to, and record pickups and handoffs.",
};

export type RoleChange = { user: AdminUserDto; role: UserRole };

/** Asks before a person's role changes, saying what they will and will no longer be able to do. */
export function RoleChangeDialog({
  change,
  busy,
  onConfirm,
  onCancel,
}: {
  change: RoleChange | null;
  busy: boolean;
  onConfirm: (change: RoleChange) => void;
  onCancel: () => void;
}) {
  const name = change?.user.displayName ?? "";
  return (
    <ConfirmDialog
      open={change !== null}
      title={change ? `Change ${name}’s role to ${USER_ROLE_WORDS[change.role]}?` : ""}
      confirmLabel="Change the role"
      cancelLabel={change ? `Keep ${name} as they are` : undefined}
      busy={busy}
      onConfirm={() => change && onConfirm(change)}
      onCancel={onCancel}
    >
      {change ? (
        <>
          <p>
            Their role now: {USER_ROLE_WORDS[change.user.role]}. {ROLE_POWERS[change.role]}
          </p>
          <p>
            The change applies from their next page; they stay signed in.
            {change.role === "member" && !change.user.organization
              ? " A member needs an organisation: give them one first, or the change is refused."
              : ""}
          </p>
        </>
      ) : null}
    </ConfirmDialog>
  );
}
