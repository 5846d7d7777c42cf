import type { OrganizationDto } from "@shared/schemas/auth";
import type { Organization } from "../db/entities/organization.entity";

export function presentOrganization(org: Organization): OrganizationDto {
  return {
    id: org.id,
    name: org.name,
    kind: org.kind,
    address: {
      street: org.street,
      city: org.city,
      state: org.state as OrganizationDto["address"]["state"],
      zip: org.zip,
    },
    phone: org.phone,
    email: org.email,
    pending: org.pending,
    listed: org.listed,
  };
}
