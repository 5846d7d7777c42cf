import { Router } from "express";
import { JURISDICTIONS } from "@shared/compliance/jurisdiction";
import { z } from "@shared/validation/zod";
import { coverageReviewInputSchema } from "@shared/schemas/compliance";
import { currentUser, requirePolicy } from "../../http/guards";
import { parse } from "../../http/validate";
import { canManageRules } from "../../policies/compliance.policy";
import { listCoverage, recordCoverageReview } from "../../services/compliance/coverage";

const jurisdictionParam = z.enum(JURISDICTIONS);

/**
 * `/api/compliance/coverage`: what the rule library knows of each jurisdiction (any signed-in
 * user may read it: it names the agencies to ask); admins record reviews.
 */
export function coverageRouter(): Router {
  const router = Router();

  router.get("/", async (req, res) => {
    res.json({ coverage: await listCoverage(req.em) });
  });

  router.patch(
    "/:jurisdiction",
    requirePolicy(canManageRules, "Only an administrator records reviews of the rule library."),
    async (req, res) => {
      const jurisdiction = parse(jurisdictionParam, req.params.jurisdiction);
      const input = parse(coverageReviewInputSchema, req.body);
      res.json({ coverage: await recordCoverageReview({ em: req.em, actor: currentUser(req), jurisdiction, input }) });
    },
  );

  return router;
}
