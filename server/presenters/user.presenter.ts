import type { AdminUserDto, UserDto } from "@shared/schemas/auth";
import type { User } from "../db/entities/user.entity";

/** The user as everyone may see them: never the password hash. Organisation must be loaded. */
export function presentUser(user: User): UserDto {
  const org = user.organization?.unwrap?.() ?? null;
  return {
    id: user.id,
    email: user.email,
    displayName: user.displayName,
    role: user.role,
    organization: org ? { id: org.id, name: org.name, kind: org.kind } : null,
  };
}

export function presentUserForAdmin(user: User, invitationPending: boolean): AdminUserDto {
  return { ...presentUser(user), disabled: user.disabled, invitationPending, createdAt: user.createdAt.toISOString() };
}
