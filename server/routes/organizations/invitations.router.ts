import { Router } from "express";
import type { AppContext } from "../../context";

/** Inviting the other party of a transfer by e-mail (issue 14, §3). */
export function invitationsRouter(_ctx: AppContext): Router {
  const router = Router();
  return router;
}
