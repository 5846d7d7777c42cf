import { Router } from "express";
import { MAIL_CHOICES, type MailChoice } from "@shared/constants";
import { accountPatchSchema, passwordChangeSchema, type AccountDto } from "@shared/schemas/account";
import type { AppContext } from "../../context";
import { UserSchema, type User } from "../../db/entities/user.entity";
import { HttpError } from "../../http/errors";
import { currentUser, requireUser } from "../../http/guards";
import { parse } from "../../http/validate";
import { hashPassword, verifyPassword } from "../../auth/passwords";
import { endOtherSessions } from "../../auth/session";
import { createLoginThrottle } from "../../auth/throttle";

function presentAccount(user: User): AccountDto {
  const org = user.organization?.unwrap?.() ?? null;
  const optedOut = new Set(user.mailOptOuts);
  return {
    id: user.id,
    email: user.email,
    displayName: user.displayName,
    role: user.role,
    organization: org ? { id: org.id, name: org.name, kind: org.kind } : null,
    mail: Object.fromEntries(MAIL_CHOICES.map((c) => [c, !optedOut.has(c)])) as Record<MailChoice, boolean>,
  };
}

/** One's own account (issue 14, §2): name, password (the current one asked first), which e-mails to receive. */
export function accountRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requireUser);
  // A wrong current password counts as a failed sign-in: the same throttle stops guessing here.
  const throttle = createLoginThrottle(ctx.pool, ctx.env);

  router.get("/", async (req, res) => {
    const user = await req.em.findOneOrFail(UserSchema, { id: currentUser(req).id }, { populate: ["organization"] });
    res.json({ account: presentAccount(user) });
  });

  router.patch("/", async (req, res) => {
    const input = parse(accountPatchSchema, req.body);
    const user = await req.em.findOneOrFail(UserSchema, { id: currentUser(req).id }, { populate: ["organization"] });
    if (input.displayName !== undefined) user.displayName = input.displayName;
    if (input.mail) {
      const optedOut = new Set(user.mailOptOuts);
      for (const [choice, wanted] of Object.entries(input.mail))
        if (wanted) optedOut.delete(choice);
        else optedOut.add(choice);
      user.mailOptOuts = MAIL_CHOICES.filter((c) => optedOut.has(c));
    }
    await req.em.flush();
    res.json({ account: presentAccount(user) });
  });

  router.post("/password", async (req, res) => {
    const input = parse(passwordChangeSchema, req.body);
    const actor = currentUser(req);
    const ip = req.ip ?? "unknown";
    await throttle.assertAllowed(actor.email.toLowerCase(), ip);
    const user = await req.em.findOneOrFail(UserSchema, { id: actor.id });
    if (!(await verifyPassword(user.passwordHash, input.currentPassword))) {
      await throttle.recordFailure(actor.email.toLowerCase(), ip);
      throw new HttpError(400, "wrong_password", "Your current password is not right. Type it again.", {
        field: "currentPassword",
      });
    }
    user.passwordHash = await hashPassword(input.newPassword);
    await req.em.flush();
    // Whoever knew the old password is signed out everywhere else; this session stays.
    await endOtherSessions(ctx.pool, user.id, req.sessionID);
    res.status(204).end();
  });

  return router;
}
