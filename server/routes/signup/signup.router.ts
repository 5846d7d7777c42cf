import { Router } from "express";
import { confirmSignupSchema, signupSchema, type CheckYourEmailDto } from "@shared/schemas/account";
import { emailKey } from "@shared/schemas/common";
import type { AppContext } from "../../context";
import { parse } from "../../http/validate";
import { actorFromUser, presentActor } from "../../auth/actor";
import { createAccountThrottle } from "../../auth/throttle";
import { signInSession } from "../../auth/session";
import { abilitiesOf } from "../../policies/user.policy";
import { confirmSignup, readInvitation, signUp } from "../../services/signup";
import { notFound } from "../../http/errors";

/**
 * Organisations join by themselves (issue 14, §1): POST /api/signup always answers 202
 * "check your e-mail"; POST /api/signup/confirm opens the account and signs its person in.
 */
export function signupRouter(ctx: AppContext): Router {
  const router = Router();
  const throttle = createAccountThrottle(ctx.pool, ctx.env);
  const checkYourEmail: CheckYourEmailDto = { status: "check_your_email" };

  router.post("/", async (req, res) => {
    const input = parse(signupSchema, req.body);
    await throttle.consume("signup", req.ip ?? "unknown", emailKey(input.user.email));
    await signUp({ em: req.em, input, links: ctx.links });
    ctx.kickOutbox();
    res.status(202).json(checkYourEmail);
  });

  // The sign-up page opened from an invitation e-mail shows who invited and fills in name and state.
  router.get("/invitation", async (req, res) => {
    const { token } = parse(confirmSignupSchema, { token: req.query.token });
    const invitation = await readInvitation(req.em, token);
    if (!invitation) throw notFound("That invitation");
    res.json({ invitation });
  });

  router.post("/confirm", async (req, res) => {
    const { token } = parse(confirmSignupSchema, req.body);
    await throttle.consume("confirm", req.ip ?? "unknown", null);
    const user = await confirmSignup({ em: req.em, token });
    const actor = actorFromUser(user);
    await signInSession(req, actor);
    res.json({ user: presentActor(actor), abilities: abilitiesOf(actor) });
  });

  return router;
}
