import { Router, type Request } from "express";
import { stringify } from "csv-stringify/sync";
import { registerQuerySchema, type RegisterEntryDto } from "@shared/schemas/transfer";
import { REGISTER_CONDITION_WORDS, SEX_WORDS } from "@shared/words";
import { RegisterEntrySchema } from "../../db/entities/check-in.entity";
import { forbidden } from "../../http/errors";
import { currentUser, requireUser } from "../../http/guards";
import { parse } from "../../http/validate";
import { presentTaxon } from "../../presenters/taxon.presenter";

/**
 * A spreadsheet cell that begins with = + - @ (or a tab or carriage return) is read as a
 * formula by spreadsheet programs: prefix it with an apostrophe (OWASP CSV Injection).
 */
export function neutraliseCell(value: string): string {
  return /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
}

async function entriesFor(req: Request): Promise<RegisterEntryDto[]> {
  const actor = currentUser(req);
  if (actor.role !== "member" || !actor.organization)
    throw forbidden("The collection register belongs to a keeper organisation.");
  const q = parse(registerQuerySchema, req.query);
  const where: Record<string, unknown> = { organization: actor.organization.id };
  if (q.taxonId) where.taxon = q.taxonId;
  if (q.sex) where.sex = q.sex;
  if (q.from || q.to) where.dateAcquired = { ...(q.from ? { $gte: q.from } : {}), ...(q.to ? { $lte: q.to } : {}) };
  if (q.q) {
    const like = `%${q.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    where.$or = [
      { transferNumber: { $ilike: like } },
      { sourceOrganizationName: { $ilike: like } },
      { identifier: { $ilike: like } },
      { taxon: { scientificName: { $ilike: like } } },
    ];
  }
  const rows = await req.em.find(RegisterEntrySchema, where, {
    populate: ["taxon"],
    orderBy: { dateAcquired: "desc", createdAt: "desc" },
    limit: 5000,
  });
  return rows.map((r) => ({
    id: r.id,
    taxon: presentTaxon(r.taxon.getEntity()),
    sex: r.sex,
    count: r.count,
    identifier: r.identifier ?? null,
    dateAcquired: String(r.dateAcquired),
    sourceOrganization: r.sourceOrganizationName,
    transferNumber: r.transferNumber,
    transferId: r.transfer.id,
    condition: r.condition,
    notes: r.notes ?? null,
    weightG: r.weightG ?? null,
  }));
}

export function registerRouter(): Router {
  const router = Router();
  router.use(requireUser);
  router.get("/", async (req, res) => {
    res.json({ entries: await entriesFor(req) });
  });
  return router;
}

export function registerCsvRoute(): Router {
  const router = Router();
  router.get("/register.csv", requireUser, async (req, res) => {
    const entries = await entriesFor(req);
    const header = [
      "Date acquired",
      "Scientific name",
      "Common name",
      "Sex",
      "Count",
      "Identifier",
      "Source organisation",
      "Transfer",
      "Condition on arrival",
      "Weight at check-in (g)",
      "Notes",
    ];
    const rows = entries.map((e) =>
      [
        e.dateAcquired,
        e.taxon.scientificName,
        e.taxon.commonName ?? "",
        SEX_WORDS[e.sex],
        String(e.count),
        e.identifier ?? "",
        e.sourceOrganization,
        e.transferNumber,
        REGISTER_CONDITION_WORDS[e.condition],
        e.weightG === null ? "" : String(e.weightG),
        e.notes ?? "",
      ].map(neutraliseCell),
    );
    res.setHeader("Content-Type", "text/csv; charset=utf-8");
    res.setHeader(
      "Content-Disposition",
      `attachment; filename="collection-register-${new Date().toISOString().slice(0, 10)}.csv"`,
    );
    res.setHeader("X-Content-Type-Options", "nosniff");
    res.send(stringify([header, ...rows]));
  });
  return router;
}
