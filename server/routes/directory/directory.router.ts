import { isKeeper } from "../../auth/actor";
import { KEEPER_ROLES } from "@shared/constants";
import { Router } from "express";
import type {
  DirectoryCourierDto,
  DirectoryCourierServiceDto,
  DirectoryOrganizationDto,
} from "@shared/schemas/transfer";
import type { UsState } from "@shared/constants";
import { OrganizationSchema } from "../../db/entities/organization.entity";
import { UserSchema } from "../../db/entities/user.entity";
import { forbidden } from "../../http/errors";
import { currentUser, requireUser } from "../../http/guards";

type CourierServiceRow = { id: string; name: string; city: string; state: string; pending: boolean; listed: boolean };
type CourierRow = { id: string; display_name: string; organization_name: string | null };

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

  // Courier services a sender can ask to carry a transfer (issue 14, §3): the listed ones by name,
  // city and state; those the caller's organisation invited, and those already carrying one of its
  // transfers, with their state of joining.
  router.get("/courier-services", async (req, res) => {
    const own = currentUser(req).organization?.id ?? null;
    const admin = currentUser(req).role === "admin";
    const rows: CourierServiceRow[] = await req.em.getConnection().execute(
      `SELECT o.id, o.name, o.city, o.state, o.pending, o.listed
         FROM organization o
        WHERE o.kind = 'courier_service'
          AND (?::boolean
               OR (o.listed AND NOT o.pending)
               OR o.invited_by_id = ?
               OR o.id IN (SELECT t.courier_service_id FROM transfer t
                            WHERE t.sender_organization_id = ? OR t.receiver_organization_id = ?))
        ORDER BY o.name, o.id`,
      [admin, own, own, own],
    );
    const services: DirectoryCourierServiceDto[] = rows.map((r) => ({
      id: r.id,
      name: r.name,
      city: r.city,
      state: r.state as UsState,
      pending: r.pending,
      listed: r.listed,
    }));
    res.json({ courierServices: services });
  });

  // Couriers a sender may put on a leg, or a service's manager on its legs: a keeper sees the
  // couriers of the services it could choose (listed, invited by it, or already carrying its
  // transfers) and those already on its legs, never every courier on Hatchway.
  router.get("/couriers", async (req, res) => {
    const actor = currentUser(req);
    const own = actor.organization?.id ?? null;
    const serviceManager = actor.role === "manager" && actor.organization?.kind === "courier_service";
    const scope = actor.role === "admin" ? "all" : serviceManager ? "service" : "keeper";
    const couriers: CourierRow[] = await req.em.getConnection().execute(
      `SELECT u.id, u.display_name, o.name AS organization_name
         FROM app_user u LEFT JOIN organization o ON o.id = u.organization_id
        WHERE u.role = 'courier' AND NOT u.disabled
          AND (? = 'all'
               OR (? = 'service' AND u.organization_id = ?)
               OR (? = 'keeper' AND (
                     (o.listed AND NOT o.pending)
                     OR o.invited_by_id = ?
                     OR o.id IN (SELECT t.courier_service_id FROM transfer t
                                  WHERE t.sender_organization_id = ? OR t.receiver_organization_id = ?)
                     OR u.id IN (SELECT l.courier_id FROM leg l JOIN transfer t ON t.id = l.transfer_id
                                  WHERE t.sender_organization_id = ? OR t.receiver_organization_id = ?))))
        ORDER BY u.display_name, u.id`,
      [scope, scope, own, scope, own, own, own, own, own],
    );
    const list: DirectoryCourierDto[] = couriers.map((c) => ({
      id: c.id,
      displayName: c.display_name,
      organizationName: c.organization_name,
    }));
    res.json({ couriers: list });
  });
  return router;
}
