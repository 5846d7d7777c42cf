import { Router } from "express";
import { organizationInputSchema, organizationPatchSchema } from "@shared/schemas/auth";
import { OrganizationSchema } from "../../db/entities/organization.entity";
import { notFound } from "../../http/errors";
import { requirePolicy } from "../../http/guards";
import { parse, pathId } from "../../http/validate";
import { canManageOrganizations } from "../../policies/organization.policy";
import { presentOrganization } from "../../presenters/organization.presenter";

export function organizationsRouter(): Router {
  const router = Router();
  router.use(requirePolicy(canManageOrganizations));

  router.get("/", async (req, res) => {
    const orgs = await req.em.find(OrganizationSchema, {}, { orderBy: { name: "asc" } });
    res.json({ organizations: orgs.map(presentOrganization) });
  });

  router.post("/", async (req, res) => {
    const input = parse(organizationInputSchema, req.body);
    const org = req.em.create(OrganizationSchema, {
      name: input.name,
      kind: input.kind,
      ...input.address,
      phone: input.phone,
      email: input.email,
    });
    await req.em.flush();
    res.status(201).json({ organization: presentOrganization(org) });
  });

  router.patch("/:id", async (req, res) => {
    const id = pathId(req, "id", "organisation");
    const input = parse(organizationPatchSchema, req.body);
    const org = await req.em.findOne(OrganizationSchema, { id });
    if (!org) throw notFound("That organisation");
    const { address, ...rest } = input;
    req.em.assign(org, { ...rest, ...(address ?? {}) });
    await req.em.flush();
    res.json({ organization: presentOrganization(org) });
  });

  return router;
}
