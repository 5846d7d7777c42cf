import { Router } from "express";
import { ref } from "@mikro-orm/core";
import { userInviteSchema, userPatchSchema } from "@shared/schemas/auth";
import { roleMisfit } from "@shared/roles";
import type { AppContext } from "../../context";
import { UserSchema } from "../../db/entities/user.entity";
import { OrganizationSchema } from "../../db/entities/organization.entity";
import { PasswordTokenSchema } from "../../db/entities/password-token.entity";
import { badRequest, invalidField, notFound } from "../../http/errors";
import { currentUser, requirePolicy } from "../../http/guards";
import { parse, pathId } from "../../http/validate";
import { canManageUsers } from "../../policies/user.policy";
import { presentUserForAdmin } from "../../presenters/user.presenter";
import { inviteUser } from "../../services/invite-user";

export function usersRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requirePolicy(canManageUsers));

  router.get("/", async (req, res) => {
    const users = await req.em.find(UserSchema, {}, { populate: ["organization"], orderBy: { displayName: "asc" } });
    res.json({ users: users.map((u) => presentUserForAdmin(u, !u.passwordHash)) });
  });

  router.post("/", async (req, res) => {
    const input = parse(userInviteSchema, req.body);
    const user = await inviteUser({ em: req.em, actor: currentUser(req), input, links: ctx.links });
    ctx.kickOutbox();
    await req.em.populate(user, ["organization"]);
    res.status(201).json({ user: presentUserForAdmin(user, true) });
  });

  router.patch("/:id", async (req, res) => {
    const id = pathId(req, "id", "user");
    const input = parse(userPatchSchema, req.body);
    const user = await req.em.findOne(UserSchema, { id }, { populate: ["organization"] });
    if (!user) throw notFound("That user");
    const actor = currentUser(req);
    if (user.id === actor.id && (input.disabled === true || (input.role && input.role !== "admin"))) {
      throw badRequest("You cannot disable yourself or remove your own admin role.", {
        field: input.disabled ? "disabled" : "role",
      });
    }
    if (input.organizationId !== undefined) {
      const org = input.organizationId ? await req.em.findOne(OrganizationSchema, { id: input.organizationId }) : null;
      if (input.organizationId && !org) throw invalidField(["organizationId"], "choose an organisation from the list");
      user.organization = org ? ref(org) : null;
    }
    if (input.displayName !== undefined) user.displayName = input.displayName;
    if (input.role !== undefined) user.role = input.role;
    if (input.disabled !== undefined) user.disabled = input.disabled;
    const misfit = roleMisfit(user.role, user.organization?.getEntity().kind ?? null);
    if (misfit) throw invalidField([input.organizationId !== undefined ? "organizationId" : "role"], misfit);
    await req.em.flush();
    const pending = await req.em.count(PasswordTokenSchema, { user, usedAt: null });
    res.json({ user: presentUserForAdmin(user, !user.passwordHash && pending > 0) });
  });

  return router;
}
