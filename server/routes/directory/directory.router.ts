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
    // A courier service's manager reads its own couriers, to assign them to legs (issue 14, §3).
    const serviceManager = actor.role === "manager" && actor.organization?.kind === "courier_service";
    if (serviceManager && req.path === "/couriers") return next();
    if (!isKeeper(actor) && actor.role !== "admin")
      return next(forbidden("The directory is for keeper organisations."));
    next();
  });

  // Keeper organisations a sender can pick (issue 14, §3): those listed in the directory, shown
  // by name, kind, city and state only; and, with their address and people, the caller's own,
  // those it invited, and those it already shares a transfer with.
  router.get("/organizations", async (req, res) => {
    const own = currentUser(req).organization?.id ?? null;
    const known = new Set<string>(own ? [own] : []);
    if (own) {
      const rows: { id: string }[] = await req.em.getConnection().execute(
        `SELECT receiver_organization_id AS id FROM transfer WHERE sender_organization_id = ?
          UNION SELECT sender_organization_id FROM transfer WHERE receiver_organization_id = ?
          UNION SELECT id FROM organization WHERE invited_by_id = ?`,
        [own, own, own],
      );
      for (const row of rows) known.add(row.id);
    }
    const admin = currentUser(req).role === "admin";
    const orgs = await req.em.find(
      OrganizationSchema,
      {
        kind: { $ne: "courier_service" },
        ...(admin ? {} : { $or: [{ listed: true, pending: false }, { id: { $in: [...known] } }] }),
      },
      { orderBy: { name: "asc" } },
    );
    const detailed = orgs.filter((o) => admin || known.has(o.id));
    const members = await req.em.find(
      UserSchema,
      { role: { $in: KEEPER_ROLES }, disabled: false, organization: { $in: detailed.map((o) => o.id) } },
      { orderBy: { displayName: "asc" } },
    );
    const organizations: DirectoryOrganizationDto[] = orgs.map((o) => {
      const full = admin || known.has(o.id);
      return {
        id: o.id,
        name: o.name,
        kind: o.kind,
        city: o.city,
        state: o.state as UsState,
        street: full ? o.street : "",
        zip: full ? o.zip : "",
        pending: o.pending,
        listed: o.listed,
        contacts: full
          ? members
              .filter((m) => m.organization?.id === o.id)
              .map((m) => ({ id: m.id, displayName: m.displayName, email: m.email }))
          : [],
      };
    });
    res.json({ organizations });
  });

  router.get("/couriers", async (req, res) => {
    const couriers = await req.em.find(
      UserSchema,
      {
        role: "courier",
        disabled: false,
        ...(currentUser(req).role === "manager" && currentUser(req).organization?.kind === "courier_service"
          ? { organization: currentUser(req).organization!.id }
          : {}),
      },
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
