import { Router } from "express";
import { excerpt } from "@shared/validation/text";
import { evaluateRequestSchema } from "@shared/compliance/schemas";
import type { AppContext } from "../../context";
import { invalidField } from "../../http/errors";
import { requireUser } from "../../http/guards";
import { parse } from "../../http/validate";
import { evaluateWhatIf } from "../../services/compliance/evaluation";
import { documentsRouter } from "../documents/documents.router";
import { searchTaxa } from "../taxa/taxa.router";
import { coverageRouter } from "./coverage.router";
import { rulesRouter } from "./rules.router";
import { transferComplianceRouter } from "./transfer-compliance.router";

const SUGGESTIONS_MAX = 5;

/**
 * Everything compliance under /api: the what-if and the rule library (/compliance), permits and
 * certificates with their scans (/documents), and a transfer's verdict, override and documents
 * (/transfers/:id/…). The gate and the expiry task are the composition root's (server/composition.ts).
 */
export function complianceRouter(ctx: AppContext): Router {
  const router = Router();
  router.use("/compliance", whatIfRouter(ctx));
  router.use("/documents", documentsRouter(ctx));
  router.use("/transfers", transferComplianceRouter());
  return router;
}

function whatIfRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requireUser);

  // "Can this travel?": any signed-in user; nothing is stored.
  router.post("/evaluate", async (req, res) => {
    const input = parse(evaluateRequestSchema, req.body);
    const outcome = await evaluateWhatIf(req.em, input);
    if (!outcome.ok) {
      const name = outcome.scientificName.trim();
      const hits = name.length >= 2 ? await searchTaxa(ctx, name.slice(0, 100), SUGGESTIONS_MAX) : [];
      const suggestions = hits.map((hit) => ({ scientificName: hit.scientificName, commonName: hit.commonName }));
      const hint = suggestions.length ? ` Did you mean ${suggestions.map((s) => s.scientificName).join(", ")}?` : "";
      throw invalidField(
        ["animals", outcome.index, "scientificName"],
        `“${excerpt(name)}” is not in the species list.${hint}`,
        { suggestions },
        "unknown_species",
      );
    }
    res.json(outcome.result);
  });

  router.use("/rules", rulesRouter());
  router.use("/coverage", coverageRouter());
  return router;
}
