import type { Request, RequestHandler } from "express";
import type { Actor } from "../auth/actor";
import { HttpError } from "./errors";

/** The signed-in user, or a 401. */
export function currentUser(req: Request): Actor {
  if (!req.user) throw new HttpError(401, "unauthenticated", "Please sign in.");
  return req.user;
}

export const requireUser: RequestHandler = (req, _res, next) => {
  if (!req.user) return next(new HttpError(401, "unauthenticated", "Please sign in."));
  next();
};

/** Guards a router with a policy function; a denial is 403. */
export function requirePolicy(policy: (actor: Actor) => boolean, message?: string): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) return next(new HttpError(401, "unauthenticated", "Please sign in."));
    if (!policy(req.user))
      return next(new HttpError(403, "forbidden", message ?? "Only an administrator can do this."));
    next();
  };
}
