import { Router, type Request } from "express";
import { runInputSchema, runPatchSchema, type RunPatchAnswerDto } from "@shared/schemas/run";
import { forbidden } from "../../http/errors";
import { currentUser, requireUser } from "../../http/guards";
import { parse, pathId } from "../../http/validate";
import { mayPlanRuns } from "../../policies/run.policy";
import { presentRun } from "../../presenters/run.presenter";
import { listRuns, readRunView } from "../../services/runs/read-run";
import { createRun, loadRunForActor, updateRun } from "../../services/runs/runs";
import { recheckRunTransfers } from "../../services/runs/recheck-run";
import { renderRunSheetPdf } from "../../pdf/run-sheet.pdf";
import { runSheetInput } from "../../services/runs/run-sheet";
import { SANDBOX_CSP } from "../../http/security";

const idParam = (req: Request) => pathId(req, "id", "run");

/** The run as this caller sees it, read fresh after any change; strangers get a 404. */
async function presentForActor(req: Request, runId: string) {
  const em = req.em.fork();
  const { run, role } = await loadRunForActor(em, currentUser(req), runId);
  return presentRun(await readRunView(em, run), role);
}

/** Issue 16: a courier service's runs. */
export function runsRouter(): Router {
  const router = Router();
  router.use(requireUser);

  router.get("/", async (req, res) => {
    const actor = currentUser(req);
    const ownService = actor.organization?.kind === "courier_service" && !actor.disabled ? actor.organization.id : null;
    res.json({ runs: await listRuns(req.em.fork(), ownService) });
  });

  router.post("/", async (req, res) => {
    const actor = currentUser(req);
    if (!mayPlanRuns(actor)) throw forbidden("Only the manager of a courier service plans its runs.");
    const input = parse(runInputSchema, req.body);
    const { runId, changedTransferIds } = await createRun({ em: req.em.fork(), actor, input });
    await recheckRunTransfers(req.ctx, changedTransferIds);
    req.ctx.kickOutbox();
    res.status(201).json(await presentForActor(req, runId));
  });

  router.get("/:id", async (req, res) => {
    res.json(await presentForActor(req, idParam(req)));
  });

  router.patch("/:id", async (req, res) => {
    const id = idParam(req);
    const actor = currentUser(req);
    const { role } = await loadRunForActor(req.em.fork(), actor, id);
    if (role !== "manager") throw forbidden("Only the manager of the courier service changes its runs.");
    const input = parse(runPatchSchema, req.body);
    const { notified, changedTransferIds } = await updateRun({
      em: req.em.fork(),
      actor,
      runId: id,
      input,
      links: req.ctx.links,
    });
    const temperature = await recheckRunTransfers(req.ctx, changedTransferIds);
    req.ctx.kickOutbox();
    const answer: RunPatchAnswerDto = {
      ...(await presentForActor(req, id)),
      notified,
      temperature,
    };
    res.json(answer);
  });

  router.get("/:id/sheet.pdf", async (req, res) => {
    const id = idParam(req);
    const em = req.em.fork();
    const { run } = await loadRunForActor(em, currentUser(req), id);
    const bytes = await renderRunSheetPdf(await runSheetInput(em, run, new Date()));
    res.setHeader("Content-Type", "application/pdf");
    res.setHeader(
      "Content-Disposition",
      `${req.query.download === "1" ? "attachment" : "inline"}; filename="run-${run.departAt.toISOString().slice(0, 10)}.pdf"`,
    );
    res.setHeader("X-Content-Type-Options", "nosniff");
    res.setHeader("Content-Security-Policy", SANDBOX_CSP);
    res.send(Buffer.from(bytes));
  });

  return router;
}
