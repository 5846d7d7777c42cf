import { Router } from "express";
import { organizationInvitationSchema } from "@shared/schemas/account";
import type { AppContext } from "../../context";
import { isKeeper } from "../../auth/actor";
import { forbidden } from "../../http/errors";
import { currentUser } from "../../http/guards";
import { parse } from "../../http/validate";
import { inviteOrganization } from "../../services/invite-organization";

/** Inviting the other party of a transfer by e-mail (issue 14, §3): POST /api/organizations/invitations. */
export function invitationsRouter(ctx: AppContext): Router {
  const router = Router();
  router.post("/", async (req, res) => {
    const actor = currentUser(req);
    if (!isKeeper(actor))
      throw forbidden("Only a keeper organisation's people can invite the other party of a transfer.");
    const input = parse(organizationInvitationSchema, req.body);
    const organization = await inviteOrganization({ em: req.em, actor, input, links: ctx.links });
    ctx.kickOutbox();
    res.status(201).json({ organization: { id: organization.id, name: organization.name, pending: true } });
  });
  return router;
}
