import { describe, expect, it } from "vitest";
import { ORGANIZATION_KINDS, USER_ROLES } from "./constants";
import { roleMisfit, rolesInOrganization } from "./roles";

// The roles of issue 14, §2 (our own rule, not a published one): keeper organisations have
// managers and members, courier services managers and couriers, and the site admin stands apart.
describe("roles within an organisation", () => {
  it("gives a courier service couriers and a keeper organisation members", () => {
    expect(rolesInOrganization("courier_service")).toEqual(["manager", "courier"]);
    for (const kind of ORGANIZATION_KINDS.filter((k) => k !== "courier_service"))
      expect(rolesInOrganization(kind)).toEqual(["manager", "member"]);
  });

  it("refuses a member in a courier service and a courier in a keeper organisation", () => {
    expect(roleMisfit("member", "courier_service")).toMatch(/managers or couriers/);
    expect(roleMisfit("courier", "breeder")).toMatch(/managers or members/);
    expect(roleMisfit("courier", "courier_service")).toBeNull();
    expect(roleMisfit("manager", "courier_service")).toBeNull();
  });

  it("needs an organisation for managers and members, not for the admin or a courier on their own", () => {
    expect(roleMisfit("manager", null)).toMatch(/needs an organisation/);
    expect(roleMisfit("member", null)).toMatch(/needs an organisation/);
    expect(roleMisfit("courier", null)).toBeNull();
    for (const kind of [null, ...ORGANIZATION_KINDS]) expect(roleMisfit("admin", kind)).toBeNull();
  });

  it("says something for every role that does not fit, and nothing for every one that does", () => {
    for (const kind of ORGANIZATION_KINDS)
      for (const role of USER_ROLES)
        expect(roleMisfit(role, kind) === null).toBe(role === "admin" || rolesInOrganization(kind).includes(role));
  });
});
