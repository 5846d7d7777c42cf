import { isKeeper } from "../../auth/actor";
import { KEEPER_ROLES } from "@shared/constants";
import { Router } from "express";
import type { DirectoryCourierDto, DirectoryOrganizationDto } from "@shared/schemas/transfer";
import type { UsState } from "@shared/constants";
import { OrganizationSchema } from "../../db/entities/organization.entity";
import { UserSchema } from "../../db/entities/user.entity";
import { forbidden } from "../../http/errors";
import { currentUser, requireUser } from "../../http/guards";

/** Who a sender can send to and whom they can ask to carry: keeper organisations and couriers. */
export function directoryRouter(): Router {
  const router = Router();
  router.use(requireUser, (req, _res, next) => {
    const actor = currentUser(req);
    if (!isKeeper(actor) && actor.role !== "admin")
      return next(forbidden("The directory is for keeper organisations."));
    next();
  });

  router.get("/organizations", async (req, res) => {
    const orgs = await req.em.find(
      OrganizationSchema,
      { kind: { $ne: "courier_service" } },
      { orderBy: { name: "asc" } },
    );
    const members = await req.em.find(
      UserSchema,
      { role: { $in: KEEPER_ROLES }, disabled: false, organization: { $in: orgs.map((o) => o.id) } },
      { orderBy: { displayName: "asc" } },
    );
    const organizations: DirectoryOrganizationDto[] = orgs.map((o) => ({
      id: o.id,
      name: o.name,
      kind: o.kind,
      street: o.street,
      city: o.city,
      state: o.state as UsState,
      zip: o.zip,
      contacts: members
        .filter((m) => m.organization?.id === o.id)
        .map((m) => ({ id: m.id, displayName: m.displayName, email: m.email })),
    }));
    res.json({ organizations });
  });

  router.get("/couriers", async (req, res) => {
    const couriers = await req.em.find(
      UserSchema,
      { role: "courier", disabled: false },
      { populate: ["organization"], orderBy: { displayName: "asc" } },
    );
    const list: DirectoryCourierDto[] = couriers.map((c) => ({
      id: c.id,
      displayName: c.displayName,
      organizationName: c.organization?.getEntity()?.name ?? null,
    }));
    res.json({ couriers: list });
  });
  return router;
}
