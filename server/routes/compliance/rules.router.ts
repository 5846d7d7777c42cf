import { Router } from "express";
import { z } from "zod";
import { ruleListQuerySchema, ruleVersionInputSchema, type RuleSummaryDto } from "@shared/schemas/compliance";
import { currentUser, requirePolicy } from "../../http/guards";
import { parse, pathParam } from "../../http/validate";
import { canManageRules } from "../../policies/compliance.policy";
import { presentRuleVersion } from "../../presenters/compliance-rule.presenter";
import { appendRuleVersion, createRule, listCurrentRules, ruleHistory } from "../../services/compliance/rules";

const ruleKeySchema = z.string().regex(/^[a-z0-9][a-z0-9.-]{0,99}$/, { message: "Name a rule by its id" });

/** The rule library, for admins: current versions, the history of each rule, new versions. */
export function rulesRouter(): Router {
  const router = Router();
  router.use(requirePolicy(canManageRules, "Only an administrator keeps the rule library."));

  router.get("/", async (req, res) => {
    const query = parse(ruleListQuerySchema, req.query);
    const rules: RuleSummaryDto[] = (await listCurrentRules(req.em, query)).map(({ current, versionCount }) => ({
      ruleKey: current.ruleKey,
      current: presentRuleVersion(current),
      versionCount,
    }));
    res.json({ rules });
  });

  router.post("/", async (req, res) => {
    const input = parse(ruleVersionInputSchema, req.body);
    const row = await createRule({ em: req.em, actor: currentUser(req), input });
    res.status(201).json({ version: presentRuleVersion(row) });
  });

  router.get("/:ruleKey", async (req, res) => {
    const ruleKey = pathParam(req, "ruleKey", "rule name", ruleKeySchema);
    res.json({ ruleKey, versions: (await ruleHistory(req.em, ruleKey)).map(presentRuleVersion) });
  });

  router.post("/:ruleKey/versions", async (req, res) => {
    const ruleKey = pathParam(req, "ruleKey", "rule name", ruleKeySchema);
    const input = parse(ruleVersionInputSchema, req.body);
    const row = await appendRuleVersion({ em: req.em, actor: currentUser(req), ruleKey, input });
    res.status(201).json({ version: presentRuleVersion(row) });
  });

  return router;
}
