import { pipeline } from "node:stream/promises";
import { Router, type Request } from "express";
import {
  alertAcknowledgeSchema,
  checkInInputSchema,
  createTransferSchema,
  deliveryAcknowledgeSchema,
  handoffInputSchema,
  legsInputSchema,
  messageInputSchema,
  photoUploadQuerySchema,
  transferListQuerySchema,
  transferPatchSchema,
  transitionSchema,
  type DeliveryCodeDto,
  type MessageDto,
  type TransferChangeDto,
} from "@shared/schemas/transfer";
import type { Actor } from "../../auth/actor";
import { MessageSchema, TransferChangeSchema, type Transfer } from "../../db/entities/transfer.entity";
import { UserSchema } from "../../db/entities/user.entity";
import { forbidden, notFound } from "../../http/errors";
import { currentUser, requireUser } from "../../http/guards";
import { idempotent } from "../../http/idempotency";
import { parse, pathId } from "../../http/validate";
import { SANDBOX_CSP } from "../../http/security";
import { mayCheckIn, transferAbilities, viewerRoleFor } from "../../policies/transfer.policy";
import { factsOfView, presentTransfer } from "../../presenters/transfer.presenter";
import { readTransferView } from "../../services/transfers/read-view";
import { exportCustodyLog, readCustodyLog } from "../../services/transfers/custody";
import { loadTransferForActor } from "../../services/transfers/load";
import { listTransfers } from "../../services/transfers/list";
import { createTransfer, updateTransfer } from "../../services/transfers/write-transfer";
import { transitionTransfer } from "../../services/transfers/transition";
import { assignLegs } from "../../services/transfers/legs";
import { chooseCourierService } from "../../services/transfers/courier-service";
import { courierServiceChoiceSchema } from "@shared/schemas/account";
import { recordHandoff } from "../../services/transfers/handoff";
import { acknowledgeAlert } from "../../services/transfers/alerts";
import { checkInTransfer } from "../../services/transfers/check-in";
import { acknowledgeDelivery, issueDeliveryCode } from "../../services/transfers/delivery";
import { addPhoto, loadPhotoForActor } from "../../services/transfers/photos";
import { photoBody } from "./photo-upload";
import { manifestExtras } from "../../services/transfers/manifest-extras";
import { presentManifestInput } from "../../presenters/manifest.presenter";
import { renderManifestPdf } from "../../pdf/manifest.pdf";
import { renderLabelsPdf } from "../../pdf/labels.pdf";

/**
 * The transfer as this caller sees it now, read fresh (one query) after any change.
 * Strangers get the same 404 as for a transfer that does not exist.
 */
export async function presentForActor(req: Request, transferId: string) {
  const actor = currentUser(req);
  const view = await readTransferView(req.ctx.pool, transferId);
  const facts = view ? factsOfView(view) : null;
  const role = facts ? viewerRoleFor(actor, facts) : null;
  if (!view || !facts || !role) throw notFound("That transfer");
  return presentTransfer(view, role, transferAbilities(actor, role, facts));
}

const idParam = (req: Request) => pathId(req, "id", "transfer");

export function transfersRouter(): Router {
  const router = Router();
  router.use(requireUser);

  router.get("/", async (req, res) => {
    const query = parse(transferListQuerySchema, req.query);
    res.json(await listTransfers(req.ctx.pool, currentUser(req), query));
  });

  router.post("/", async (req, res) => {
    const input = parse(createTransferSchema(new Date()), req.body);
    const transfer = await createTransfer({ em: req.em, actor: currentUser(req), input });
    res.status(201).json({ transfer: await presentForActor(req, transfer.id) });
  });

  router.get("/:id", async (req, res) => {
    res.json({ transfer: await presentForActor(req, idParam(req)) });
  });

  router.patch("/:id", async (req, res) => {
    const id = idParam(req);
    const actor = currentUser(req);
    const { role, facts } = await loadTransferForActor(req.em, id, actor);
    if (!transferAbilities(actor, role, facts).edit)
      throw forbidden("Only the sender can edit this transfer, and only before the animals leave.");
    const input = parse(transferPatchSchema, req.body);
    await updateTransfer({ em: req.em.fork(), actor, transferId: id, input, links: req.ctx.links });
    req.ctx.kickOutbox();
    res.json({ transfer: await presentForActor(req, id) });
  });

  router.post("/:id/transition", async (req, res) => {
    const id = idParam(req);
    const input = parse(transitionSchema, req.body);
    await transitionTransfer({
      em: req.em,
      actor: currentUser(req),
      transferId: id,
      input: {
        to: input.to,
        reason: input.reason ?? null,
        override: input.override,
        overrideGates: input.overrideGates,
      },
      gates: req.ctx.readyGates,
      links: req.ctx.links,
    });
    req.ctx.kickOutbox();
    res.json({ transfer: await presentForActor(req, id) });
  });

  router.put("/:id/legs", async (req, res) => {
    const id = idParam(req);
    const input = parse(legsInputSchema, req.body);
    await assignLegs({ em: req.em, actor: currentUser(req), transferId: id, input, links: req.ctx.links });
    req.ctx.kickOutbox();
    res.json({ transfer: await presentForActor(req, id) });
  });

  // The courier service asked to carry it (issue 14, §3); its manager then assigns the legs.
  router.put("/:id/courier-service", async (req, res) => {
    const id = idParam(req);
    const { organizationId } = parse(courierServiceChoiceSchema, req.body);
    await chooseCourierService({ em: req.em, actor: currentUser(req), transferId: id, organizationId });
    res.json({ transfer: await presentForActor(req, id) });
  });

  router.post("/:id/handoffs", async (req, res) => {
    const id = idParam(req);
    // Existence and access first: a stranger learns nothing from the idempotency answers, and
    // a role that never records handoffs is refused before its body or the state is looked at.
    const { role } = await loadTransferForActor(req.em.fork(), id, currentUser(req));
    if (role === "admin") throw forbidden("Administrators can read transfers but not record handoffs.");
    const input = parse(handoffInputSchema, req.body);
    await idempotent(req, res, `handoff:${id}`, async () => {
      await recordHandoff({
        em: req.em.fork(),
        actor: currentUser(req),
        transferId: id,
        input,
        links: req.ctx.links,
      });
      req.ctx.kickOutbox();
      return { status: 201, body: { transfer: await presentForActor(req, id) } };
    });
  });

  router.post("/:id/check-in", async (req, res) => {
    const id = idParam(req);
    const { role } = await loadTransferForActor(req.em.fork(), id, currentUser(req));
    if (!mayCheckIn(role)) throw forbidden("Only a member of the receiving organisation can check the animals in.");
    const input = parse(checkInInputSchema, req.body);
    await idempotent(req, res, `check-in:${id}`, async () => {
      await checkInTransfer({
        em: req.em.fork(),
        actor: currentUser(req),
        transferId: id,
        input,
        links: req.ctx.links,
      });
      req.ctx.kickOutbox();
      return { status: 201, body: { transfer: await presentForActor(req, id) } };
    });
  });

  // The receiver's "I have the boxes": from their own account, or with their code on the courier's phone.
  router.post("/:id/delivery/acknowledge", async (req, res) => {
    const id = idParam(req);
    const { code } = parse(deliveryAcknowledgeSchema, req.body ?? {});
    await acknowledgeDelivery({ em: req.em, actor: currentUser(req), transferId: id, code, links: req.ctx.links });
    req.ctx.kickOutbox();
    res.json({ transfer: await presentForActor(req, id) });
  });

  // A one-time code the receiver reads out to the courier; shown once, stored only as a hash.
  router.post("/:id/delivery-code", async (req, res) => {
    const { code, expiresAt } = await issueDeliveryCode({
      em: req.em,
      actor: currentUser(req),
      transferId: idParam(req),
    });
    const body: DeliveryCodeDto = { code, expiresAt: expiresAt.toISOString() };
    res.status(201).json(body);
  });

  router.post("/:id/photos", photoBody, async (req, res) => {
    const id = idParam(req);
    const query = parse(photoUploadQuerySchema, req.query);
    const photo = await addPhoto({
      em: req.em,
      storage: req.ctx.adapters.storage,
      actor: currentUser(req),
      transferId: id,
      query,
      body: Buffer.isBuffer(req.body) ? req.body : Buffer.alloc(0),
    });
    res.status(201).json({ photo: { id: photo.id, sha256: photo.sha256 }, transfer: await presentForActor(req, id) });
  });

  // Shown inline as an image, never as a page of ours: the stored type (read from the bytes), nosniff, a sandbox.
  router.get("/:id/photos/:photoId", async (req, res) => {
    const photo = await loadPhotoForActor(req.em, currentUser(req), idParam(req), pathId(req, "photoId", "photo"));
    const object = await req.ctx.adapters.storage.getObjectStream(photo.storageKey);
    res.set({
      "Content-Type": photo.contentType,
      "Content-Length": String(object.contentLength ?? photo.sizeBytes),
      "Content-Disposition": `inline; filename="photo-${photo.id}.${photo.contentType === "image/png" ? "png" : "jpg"}"`,
      "X-Content-Type-Options": "nosniff",
      "Content-Security-Policy": "sandbox; default-src 'none'",
      "Cache-Control": "no-store",
      "Repr-Digest": `sha-256=:${Buffer.from(photo.sha256, "hex").toString("base64")}:`,
    });
    try {
      await pipeline(object.stream, res);
    } catch (err) {
      // The viewer went away mid-download: nothing to answer any more.
      if ((err as NodeJS.ErrnoException).code !== "ERR_STREAM_PREMATURE_CLOSE") throw err;
    }
  });

  // The paper that travels with the animals: parties and the assigned courier (admins read).
  for (const [file, render, what] of [
    ["manifest.pdf", renderManifestPdf, "manifest"],
    ["labels.pdf", renderLabelsPdf, "box-labels"],
  ] as const) {
    router.get(`/:id/${file}`, async (req, res) => {
      const id = idParam(req);
      const actor = currentUser(req);
      const view = await readTransferView(req.ctx.pool, id);
      if (!view || !viewerRoleFor(actor, factsOfView(view))) throw notFound("That transfer");
      const bytes = await render(
        presentManifestInput(view, await manifestExtras(req.ctx, id), req.ctx.links, new Date()),
      );
      const name = `${view.t.number}-${what}.pdf`;
      res.setHeader("Content-Type", "application/pdf");
      res.setHeader(
        "Content-Disposition",
        `${req.query.download === "1" ? "attachment" : "inline"}; filename="${name}"`,
      );
      res.setHeader("X-Content-Type-Options", "nosniff");
      res.setHeader("Content-Security-Policy", SANDBOX_CSP);
      res.send(Buffer.from(bytes));
    });
  }

  router.get("/:id/custody", async (req, res) => {
    const id = idParam(req);
    await loadTransferForActor(req.em, id, currentUser(req));
    res.json(await readCustodyLog(req.em, id));
  });

  // The log to keep, for anyone who may read it: checkable later without Hatchway (D19).
  router.get("/:id/custody/export", async (req, res) => {
    const id = idParam(req);
    const { transfer } = await loadTransferForActor(req.em, id, currentUser(req));
    const exported = await exportCustodyLog(req.em, transfer);
    res.attachment(`${transfer.number}-custody.json`);
    res.setHeader("X-Content-Type-Options", "nosniff");
    res.type("application/json").send(`${JSON.stringify(exported, null, 2)}\n`);
  });

  router.get("/:id/changes", async (req, res) => {
    const id = idParam(req);
    const { role } = await loadTransferForActor(req.em, id, currentUser(req));
    if (role === "courier") throw forbidden("The edit history is for the sender and the receiver.");
    const rows = await req.em.find(
      TransferChangeSchema,
      { transfer: id },
      { orderBy: { createdAt: "desc" }, populate: ["actor"] },
    );
    const changes: TransferChangeDto[] = rows.map((c) => ({
      at: c.createdAt.toISOString(),
      actor: { id: c.actor.id, displayName: c.actor.getEntity().displayName },
      field: c.field,
      oldValue: c.oldValue ?? null,
      newValue: c.newValue ?? null,
    }));
    res.json({ changes });
  });

  router.get("/:id/messages", async (req, res) => {
    const id = idParam(req);
    const { role } = await loadTransferForActor(req.em, id, currentUser(req));
    if (role === "courier") throw forbidden("The discussion is between the sender and the receiver.");
    const rows = await req.em.find(
      MessageSchema,
      { transfer: id },
      { orderBy: { createdAt: "asc" }, populate: ["author", "author.organization"] },
    );
    res.json({ messages: rows.map(presentMessage) });
  });

  router.post("/:id/messages", async (req, res) => {
    const id = idParam(req);
    const actor = currentUser(req);
    const { transfer, role, facts } = await loadTransferForActor(req.em, id, actor);
    if (!transferAbilities(actor, role, facts).discuss)
      throw forbidden("Only the sender and the receiver can write here.");
    const { body } = parse(messageInputSchema, req.body);
    const message = req.em.create(MessageSchema, {
      transfer: transfer as Transfer,
      author: req.em.getReference(UserSchema, actor.id),
      body,
    });
    await req.em.flush();
    await req.em.populate(message, ["author", "author.organization"]);
    res.status(201).json({ message: presentMessage(message) });
  });

  router.post("/:id/alerts/:alertId/acknowledge", async (req, res) => {
    const id = idParam(req);
    const alertId = pathId(req, "alertId", "alert");
    const { note } = parse(alertAcknowledgeSchema, req.body);
    await acknowledgeAlert({ em: req.em, actor: currentUser(req), transferId: id, alertId, note });
    const transfer = await presentForActor(req, id);
    res.json({ alert: transfer.alerts.find((a) => a.id === alertId), transfer });
  });

  return router;
}

function presentMessage(m: {
  id: string;
  body: string;
  createdAt: Date;
  author: {
    getEntity(): { id: string; displayName: string; organization?: { getEntity?(): { name: string } } | null };
  };
}): MessageDto {
  const author = m.author.getEntity();
  return {
    id: m.id,
    author: {
      id: author.id,
      displayName: author.displayName,
      organizationName: author.organization?.getEntity?.()?.name ?? null,
    },
    body: m.body,
    at: m.createdAt.toISOString(),
  };
}

export type { Actor };
