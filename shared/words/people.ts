import type { OrganizationKind, UserRole } from "../constants";

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
