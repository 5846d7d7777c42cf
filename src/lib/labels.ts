import type { OrganizationKind, UserRole } from "@shared/constants";

/** Words on screen for stored values, in our own voice. */
export const organizationKindLabel: Record<OrganizationKind, string> = {
  breeder: "Breeder",
  nature_centre: "Nature centre or educator",
  rescue: "Rescue",
  zoo: "Zoo or aquarium",
  private_keeper: "Private keeper",
  courier_service: "Courier service",
};

export const roleLabel: Record<UserRole, string> = {
  admin: "Administrator",
  member: "Keeper organisation member",
  courier: "Courier",
};
