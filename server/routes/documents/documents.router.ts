import { pipeline } from "node:stream/promises";
import { Router, type Request } from "express";
import { documentInputSchema, documentListQuerySchema } from "@shared/schemas/compliance";
import type { AppContext } from "../../context";
import { DocumentScanSchema, PermitDocumentSchema } from "../../db/entities/compliance.entity";
import { forbidden, notFound } from "../../http/errors";
import { currentUser, requireUser } from "../../http/guards";
import { parse, pathId } from "../../http/validate";
import { canHoldDocuments, documentAbilities } from "../../policies/document.policy";
import { presentDocument, presentScan } from "../../presenters/document.presenter";
import {
  createDocument,
  documentsForTransfer,
  loadDocumentForActor,
  scansOf,
  updateDocument,
  uploadScan,
} from "../../services/compliance/documents";
import { scanBody } from "./scan-upload";
import { SANDBOX_CSP } from "../../http/security";
import { withCatalogueNames, type SuggestNames } from "../../services/compliance/species-names";
import { searchTaxa } from "../taxa/taxa.router";

const idParam = (req: Request, name: "id" | "scanId" = "id") => pathId(req, name, name === "id" ? "document" : "scan");

/** Permits and certificates: the organisation's own, and those a transfer uses for its parties. */
export function documentsRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requireUser);
  // Species lists take the catalogue's names; an unknown name is refused with close matches.
  const suggest: SuggestNames = (name) =>
    searchTaxa(ctx, name, 5).then((hits) =>
      hits.map((h) => ({ scientificName: h.scientificName, commonName: h.commonName })),
    );

  router.get("/", async (req, res) => {
    const { transferId } = parse(documentListQuerySchema, req.query);
    const actor = currentUser(req);
    if (transferId) {
      res.json({ documents: await documentsForTransfer(req.em, actor, transferId) });
      return;
    }
    if (!canHoldDocuments(actor)) throw forbidden("Permits and certificates belong to a keeper organisation.");
    const docs = await req.em.find(
      PermitDocumentSchema,
      { organization: actor.organization!.id },
      { populate: ["organization"], orderBy: { validTo: "asc nulls last", createdAt: "desc" } },
    );
    const scans = await scansOf(req.em, docs);
    res.json({ documents: docs.map((doc) => presentDocument(doc, "holder", scans.get(doc.id) ?? [])) });
  });

  router.post("/", async (req, res) => {
    const input = await withCatalogueNames(req.em, suggest, parse(documentInputSchema, req.body));
    const doc = await createDocument({ em: req.em, actor: currentUser(req), input });
    await req.em.populate(doc, ["organization"]);
    res.status(201).json({ document: presentDocument(doc, "holder", []) });
  });

  router.get("/:id", async (req, res) => {
    const { doc, viewer } = await loadDocumentForActor(req.em, currentUser(req), idParam(req));
    const scans = viewer === "courier" ? [] : ((await scansOf(req.em, [doc])).get(doc.id) ?? []);
    res.json({ document: presentDocument(doc, viewer, scans) });
  });

  router.patch("/:id", async (req, res) => {
    const doc = await updateDocument({
      em: req.em,
      actor: currentUser(req),
      documentId: idParam(req),
      patch:
        req.body && typeof req.body === "object" && !Array.isArray(req.body)
          ? await withCatalogueNames(req.em, suggest, req.body as Record<string, unknown>)
          : req.body,
    });
    await req.em.populate(doc, ["organization"]);
    res.json({ document: presentDocument(doc, "holder", (await scansOf(req.em, [doc])).get(doc.id) ?? []) });
  });

  router.post("/:id/scans", scanBody, async (req, res) => {
    const body = Buffer.isBuffer(req.body) ? req.body : Buffer.alloc(0);
    const scan = await uploadScan({
      em: req.em,
      storage: ctx.adapters.storage,
      actor: currentUser(req),
      documentId: idParam(req),
      body,
      fileName: req.header("X-File-Name"),
    });
    res.status(201).json({ scan: presentScan(scan) });
  });

  // Streamed as an attachment in a sandbox: a scan is never rendered as a page of ours.
  router.get("/:id/scans/:scanId", async (req, res) => {
    const { doc, viewer } = await loadDocumentForActor(req.em, currentUser(req), idParam(req));
    if (!documentAbilities(viewer).readScans)
      throw forbidden("Couriers see the document list for the manifest, not the scans.");
    const scan = await req.em.findOne(DocumentScanSchema, { id: idParam(req, "scanId"), document: doc.id });
    if (!scan) throw notFound("That scan");
    const object = await ctx.adapters.storage.getObjectStream(scan.storageKey);
    res.attachment(scan.originalName);
    res.set({
      "Content-Type": scan.contentType,
      "Content-Length": String(object.contentLength ?? scan.sizeBytes),
      "X-Content-Type-Options": "nosniff",
      "Content-Security-Policy": SANDBOX_CSP,
      "Cache-Control": "no-store",
      "Repr-Digest": `sha-256=:${Buffer.from(scan.sha256, "hex").toString("base64")}:`,
    });
    try {
      await pipeline(object.stream, res);
    } catch (err) {
      // The reader went away mid-download: nothing to answer any more.
      if ((err as NodeJS.ErrnoException).code !== "ERR_STREAM_PREMATURE_CLOSE") throw err;
    }
  });

  return router;
}
