import { Router, type Request } from "express";
import type { TransferStatus } from "@shared/constants";
import { attachDocumentSchema, overrideInputSchema } from "@shared/schemas/compliance";
import { currentUser, requireUser } from "../../http/guards";
import { parse, pathId } from "../../http/validate";
import { canOverrideCompliance } from "../../policies/compliance.policy";
import { canAttachDocuments, canReadTransferDocuments } from "../../policies/document.policy";
import { presentTransferCompliance } from "../../presenters/transfer-compliance.presenter";
import { attachDocument, detachDocument, documentsForTransfer } from "../../services/compliance/documents";
import { evaluateTransfer } from "../../services/compliance/evaluation";
import { currentOverride } from "../../services/compliance/gate";
import { overrideCompliance } from "../../services/compliance/override";
import { loadTransferForActor } from "../../services/transfers/load";

const idParam = (req: Request, name: "id" | "documentId" = "id") =>
  pathId(req, name, name === "id" ? "transfer" : "document");

/** The transfer's verdict as the caller sees it now, with the documents on file. */
async function complianceFor(req: Request, transferId: string) {
  const em = req.em.fork();
  const actor = currentUser(req);
  const { transfer, role } = await loadTransferForActor(em, transferId, actor);
  const { result, facts } = await evaluateTransfer(em, transfer);
  // An override answers a blocked or documents-needed verdict; otherwise there is nothing to show.
  const overridable = result.verdict === "blocked" || result.verdict === "needs_documents";
  const override = overridable ? await currentOverride(em, transfer) : null;
  const abilities = {
    override: canOverrideCompliance(actor, role) && transfer.status === "awaiting_receiver" && overridable && !override,
    attachDocuments: canAttachDocuments(role, transfer.status as TransferStatus),
    readDocuments: canReadTransferDocuments(role),
  };
  return presentTransferCompliance(result, facts.shipDate, override, abilities);
}

/** `/api/transfers/:id/compliance…` and `/api/transfers/:id/documents…`. */
export function transferComplianceRouter(): Router {
  const router = Router();
  router.use(requireUser);

  router.get("/:id/compliance", async (req, res) => {
    res.json(await complianceFor(req, idParam(req)));
  });

  router.post("/:id/compliance/override", async (req, res) => {
    const id = idParam(req);
    const input = parse(overrideInputSchema, req.body);
    await overrideCompliance({ em: req.em, actor: currentUser(req), transferId: id, input });
    res.status(201).json(await complianceFor(req, id));
  });

  router.post("/:id/documents", async (req, res) => {
    const id = idParam(req);
    const { documentId } = parse(attachDocumentSchema, req.body);
    await attachDocument({ em: req.em, actor: currentUser(req), transferId: id, documentId });
    res.status(201).json({ documents: await documentsForTransfer(req.em.fork(), currentUser(req), id) });
  });

  router.delete("/:id/documents/:documentId", async (req, res) => {
    await detachDocument({
      em: req.em,
      actor: currentUser(req),
      transferId: idParam(req),
      documentId: idParam(req, "documentId"),
    });
    res.status(204).end();
  });

  return router;
}
