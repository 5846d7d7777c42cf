import type { AccountTokenPurpose, OrganizationKind, UserRole } from "../constants";

export const ORGANIZATION_KIND_WORDS: Readonly<Record<OrganizationKind, string>> = {
  breeder: "Breeder",
  nature_centre: "Nature centre or educator",
  rescue: "Rescue",
  zoo: "Zoo or aquarium",
  private_keeper: "Private keeper",
  courier_service: "Courier service",
};

export const USER_ROLE_WORDS: Readonly<Record<UserRole, string>> = {
  admin: "Administrator",
  manager: "Manager",
  member: "Keeper organisation member",
  courier: "Courier",
};

/** What a one-time link from an e-mail was for, said when it no longer works. */
export const ACCOUNT_TOKEN_PURPOSE_WORDS: Readonly<Record<AccountTokenPurpose, string>> = {
  set_password: "Choosing your first password",
  confirm_email: "Confirming your e-mail address",
  reset_password: "Choosing a new password",
  join_organization: "Joining an organisation",
  invite_organization: "Signing up an invited organisation",
};
