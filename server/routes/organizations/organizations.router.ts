import { Router, type Request } from "express";
import {
  joinOrganizationSchema,
  memberInviteSchema,
  memberPatchSchema,
  organizationInputSchema,
  organizationPatchSchema,
} from "@shared/schemas/auth";
import type { AppContext } from "../../context";
import { OrganizationSchema } from "../../db/entities/organization.entity";
import { PasswordTokenSchema } from "../../db/entities/password-token.entity";
import { UserSchema } from "../../db/entities/user.entity";
import { conflict, forbidden, notFound } from "../../http/errors";
import { roleMisfit } from "@shared/roles";
import { currentUser, requirePolicy, requireUser } from "../../http/guards";
import { parse, pathId } from "../../http/validate";
import { canManageOrganizations, organizationAccess } from "../../policies/organization.policy";
import { presentOrganization } from "../../presenters/organization.presenter";
import { presentUserForAdmin } from "../../presenters/user.presenter";
import { acceptMembership, changeMember, inviteMember } from "../../services/members";
import { actorFromUser, presentActor } from "../../auth/actor";
import { invitationsRouter } from "./invitations.router";

/**
 * The organisation the caller manages (its manager, or the site admin): 404 for anyone outside
 * it, so another organisation's people are not even confirmed to exist; 403 for its own people
 * who are not managers.
 */
async function loadManagedOrganization(req: Request, param = "id") {
  const id = pathId(req, param, "organisation");
  const actor = currentUser(req);
  const access = organizationAccess(actor, id);
  const organization = access ? await req.em.findOne(OrganizationSchema, { id }) : null;
  if (!organization || !access) throw notFound("That organisation");
  if (access !== "manage") throw forbidden("Only the organisation's managers can do this.");
  return organization;
}

export function organizationsRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requireUser);
  router.use("/invitations", invitationsRouter(ctx));

  router.get("/", requirePolicy(canManageOrganizations), async (req, res) => {
    const orgs = await req.em.find(OrganizationSchema, {}, { orderBy: { name: "asc" } });
    res.json({ organizations: orgs.map(presentOrganization) });
  });

  router.post("/", requirePolicy(canManageOrganizations), async (req, res) => {
    const input = parse(organizationInputSchema, req.body);
    const org = req.em.create(OrganizationSchema, {
      name: input.name,
      kind: input.kind,
      ...input.address,
      phone: input.phone,
      email: input.email,
      pending: false,
      listed: false,
    });
    await req.em.flush();
    res.status(201).json({ organization: presentOrganization(org) });
  });

  // Accepting an invitation to join with an account one already has (issue 14, §5).
  router.post("/join", async (req, res) => {
    const { token } = parse(joinOrganizationSchema, req.body);
    const { user, organization } = await acceptMembership({ em: req.em, actor: currentUser(req), token });
    await req.em.populate(user, ["organization"]);
    res.json({ user: presentActor(actorFromUser(user)), organization: presentOrganization(organization) });
  });

  router.get("/:id", async (req, res) => {
    const id = pathId(req, "id", "organisation");
    const access = organizationAccess(currentUser(req), id);
    const organization = access ? await req.em.findOne(OrganizationSchema, { id }) : null;
    if (!organization) throw notFound("That organisation");
    res.json({ organization: presentOrganization(organization) });
  });

  // The manager edits their own organisation's details and its directory listing; only the
  // site admin changes what kind of organisation it is (its people's roles depend on it).
  router.patch("/:id", async (req, res) => {
    const org = await loadManagedOrganization(req);
    const input = parse(organizationPatchSchema, req.body);
    if (input.kind !== undefined && input.kind !== org.kind && currentUser(req).role !== "admin")
      throw forbidden("Only a Hatchway administrator can change what kind of organisation this is.");
    if (input.kind !== undefined && input.kind !== org.kind) {
      const kind = input.kind;
      const people = await req.em.find(UserSchema, { organization: org.id }, { orderBy: { displayName: "asc" } });
      const misfits = people.filter((p) => roleMisfit(p.role, kind));
      if (misfits.length)
        throw conflict(
          `${misfits.map((p) => p.displayName).join(", ")} ${misfits.length === 1 ? "has a role" : "have roles"} this kind of organisation does not have (${roleMisfit(misfits[0]!.role, kind)}): change ${misfits.length === 1 ? "it" : "them"} first.`,
          { field: "kind" },
        );
    }
    const { address, ...rest } = input;
    req.em.assign(org, { ...rest, ...(address ?? {}) });
    await req.em.flush();
    res.json({ organization: presentOrganization(org) });
  });

  router.get("/:id/members", async (req, res) => {
    const org = await loadManagedOrganization(req);
    const people = await req.em.find(
      UserSchema,
      { organization: org.id },
      { populate: ["organization"], orderBy: { displayName: "asc" } },
    );
    const pending = new Set(
      (
        await req.em.find(PasswordTokenSchema, {
          user: { $in: people.map((p) => p.id) },
          usedAt: null,
          expiresAt: { $gt: new Date() },
        })
      ).map((t) => t.user!.id),
    );
    res.json({ members: people.map((p) => presentUserForAdmin(p, !p.passwordHash && pending.has(p.id))) });
  });

  router.post("/:id/members", async (req, res) => {
    const org = await loadManagedOrganization(req);
    const input = parse(memberInviteSchema, req.body);
    const { member } = await inviteMember({
      em: req.em,
      actor: currentUser(req),
      organization: org,
      input,
      links: ctx.links,
    });
    ctx.kickOutbox();
    if (member) await req.em.populate(member, ["organization"]);
    res.status(201).json({
      member: member ? presentUserForAdmin(member, true) : null,
      invitation: { email: input.email, role: input.role, awaitingAcceptance: member === null },
    });
  });

  router.patch("/:id/members/:userId", async (req, res) => {
    const org = await loadManagedOrganization(req);
    const userId = pathId(req, "userId", "person");
    const input = parse(memberPatchSchema, req.body);
    const member = await changeMember({
      em: req.em,
      pool: ctx.pool,
      actor: currentUser(req),
      organization: org,
      userId,
      input,
    });
    await req.em.populate(member, ["organization"]);
    res.json({ member: presentUserForAdmin(member, false) });
  });

  return router;
}
