import type { QuarantineOverride } from "@shared/register/quarantine";
import express, { Router, type Request } from "express";
import { isUtf8 } from "node:buffer";
import { stringify } from "csv-stringify/sync";
import { todayUtc } from "@shared/compliance/expiry";
import { nextDueReport } from "@shared/register/reporting";
import {
  permitReportingSchema,
  quarantineSettingsSchema,
  registerEntryInputSchema,
  registerEventInputSchema,
  registerQuerySchema,
  registerReportQuerySchema,
  registerSplitInputSchema,
  stateNoticeDoneSchema,
  transferLinesQuerySchema,
  type RegisterEntryDto,
  type RegisterReportDto,
} from "@shared/schemas/register";
import { REGISTER_CONDITION_WORDS, REGISTER_EVENT_KIND_WORDS, REPORT_COLUMN_WORDS, SEX_WORDS } from "@shared/words";
import type { RegisterEventKind } from "@shared/constants";
import type { AppContext } from "../../context";
import { PermitDocumentSchema } from "../../db/entities/compliance.entity";
import { OrganizationSchema } from "../../db/entities/organization.entity";
import { TaxonSchema } from "../../db/entities/taxon.entity";
import { presentTaxon } from "../../presenters/taxon.presenter";
import { HttpError, invalidField, notFound } from "../../http/errors";
import type { EntityManager } from "@mikro-orm/postgresql";
import { currentUser, requireUser } from "../../http/guards";
import { parse, pathId } from "../../http/validate";
import { presentRegisterEntry, presentRegisterEvents } from "../../presenters/register.presenter";
import { renderRegisterReportPdf } from "../../pdf/register-report.pdf";
import {
  createEntry,
  recordEvent,
  registerOwner,
  splitEntry,
  type SuggestSpecies,
} from "../../services/register/ledger";
import { importRegisterCsv } from "../../services/register/import";
import { readRegisterEntry, readRegisterEvents, readRegisterPage } from "../../services/register/read";
import { permitReport } from "../../services/register/report";
import { markStateNoticeDone, readStateNotices } from "../../services/register/notices";
import { searchTaxa } from "../taxa/taxa.router";

/**
 * A spreadsheet cell that begins with = + - @ (or a tab or carriage return) is read as a
 * formula by spreadsheet programs: prefix it with an apostrophe (OWASP CSV Injection).
 */
const presentQuarantine = (o: { quarantineDays: number; quarantineOverrides: QuarantineOverride[] }) => ({
  quarantineDays: o.quarantineDays,
  overrides: o.quarantineOverrides ?? [],
});

/**
 * Each quarantine setting names a genus or a species of the catalogue, spelled as the catalogue
 * spells it; anything else is a 400 on its row. One name once.
 */
async function catalogueNames(em: EntityManager, rows: QuarantineOverride[]): Promise<QuarantineOverride[]> {
  const found: QuarantineOverride[] = [];
  for (const [i, row] of rows.entries()) {
    const name = row.name.trim().replace(/\s+/g, " ");
    const [match] = await em.getConnection().execute<{ name: string }[]>(
      `SELECT CASE WHEN lower(scientific_name) = lower(?) THEN scientific_name
                     ELSE split_part(scientific_name, ' ', 1) END AS name
           FROM taxon
          WHERE lower(scientific_name) = lower(?) OR lower(split_part(scientific_name, ' ', 1)) = lower(?)
          ORDER BY lower(scientific_name) = lower(?) DESC
          LIMIT 1`,
      [name, name, name, name],
    );
    if (!match || (name.includes(" ") && match.name.toLowerCase() !== name.toLowerCase()))
      throw invalidField(["overrides", i, "name"], "name a genus or a species from the catalogue");
    if (found.some((f) => f.name === match.name))
      throw invalidField(["overrides", i, "name"], "give each genus or species once");
    found.push({ name: match.name, days: row.days });
  }
  return found;
}

export function neutraliseCell(value: string): string {
  return /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
}

/** A CSV download: every cell neutralised, sent as an attachment that is never sniffed. */
function sendCsv(res: express.Response, filename: string, rows: string[][]) {
  res.setHeader("Content-Type", "text/csv; charset=utf-8");
  res.setHeader("Content-Disposition", `attachment; filename="${filename}"`);
  res.setHeader("X-Content-Type-Options", "nosniff");
  res.send(stringify(rows.map((row) => row.map(neutraliseCell))));
}

/** The one API route that takes CSV instead of JSON: `POST /api/register/import`. */
export function isRegisterImport(req: Request): boolean {
  return req.method === "POST" && /^\/register\/import\/?$/.test(req.path);
}
export const REGISTER_IMPORT_TYPES = ["text/csv"];
const csvBody = express.raw({ type: REGISTER_IMPORT_TYPES, limit: "2mb" });

async function pageFor(req: Request, overrides: { limit?: number } = {}) {
  const organizationId = registerOwner(currentUser(req));
  const query = { ...parse(registerQuerySchema, req.query), ...overrides };
  const today = todayUtc();
  const page = await readRegisterPage(req.ctx.pool, organizationId, query, today);
  return { entries: page.rows.map((row) => presentRegisterEntry(row, today)), nextCursor: page.nextCursor };
}

const entryId = (req: Request) => pathId(req, "id", "register entry");

async function entryView(req: Request, id: string) {
  const actor = currentUser(req);
  const organizationId = registerOwner(actor);
  const today = todayUtc();
  const row = await readRegisterEntry(req.ctx.pool, organizationId, id);
  if (!row) throw notFound("That register entry");
  const events = presentRegisterEvents(await readRegisterEvents(req.ctx.pool, id));
  // The animal's life before it came here: the sender's entries it continues, as far back as they go.
  const earlier: { entry: RegisterEntryDto; events: ReturnType<typeof presentRegisterEvents> }[] = [];
  let previousId = row.previous_entry_id;
  while (previousId && earlier.length < 20) {
    const previous = await readRegisterEntry(req.ctx.pool, null, previousId);
    if (!previous) break;
    earlier.push({
      entry: presentRegisterEntry(previous, today),
      events: presentRegisterEvents(await readRegisterEvents(req.ctx.pool, previous.id)),
    });
    previousId = previous.previous_entry_id;
  }
  return { entry: presentRegisterEntry(row, today), events, earlier };
}

function reportCsv(report: RegisterReportDto): string[][] {
  const columns = ["acquired", "hatched", "died", "transferredOut", "escapedOrReleased"] as const;
  const rows: string[][] = [
    ["Permit", report.permit.number, "Jurisdiction", report.permit.jurisdiction, "From", report.from, "To", report.to],
    [],
    ["Scientific name", "At the start", ...columns.map((c) => REPORT_COLUMN_WORDS[c]), "At the end"],
    ...report.species.map((s) => [
      s.scientificName,
      String(s.start),
      ...columns.map((c) => String(s[c])),
      String(s.end),
    ]),
    [],
    [
      "Scientific name",
      "Date",
      "What happened",
      "Number",
      "Identifier",
      "Name",
      "Address",
      "Permit number",
      "Transfer",
    ],
  ];
  for (const s of report.species)
    for (const e of s.events)
      rows.push([
        s.scientificName,
        e.on,
        REGISTER_EVENT_KIND_WORDS[e.kind as RegisterEventKind],
        String(e.count),
        e.identifier ?? "",
        e.counterparty?.name ?? "",
        e.counterparty?.address ?? "",
        e.counterparty?.permitNumber ?? "",
        e.transferNumber ?? "",
      ]);
  return rows;
}

/** The keeper's register: entries, their events, the import, the yearly report, permits' reporting plans. */
export function registerRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requireUser);
  const suggest: SuggestSpecies = (name) =>
    searchTaxa(ctx, name, 5).then((hits) =>
      hits.map((h) => ({ scientificName: h.scientificName, commonName: h.commonName })),
    );

  router.get("/", async (req, res) => {
    res.json(await pageFor(req));
  });

  router.post("/entries", async (req, res) => {
    const actor = currentUser(req);
    registerOwner(actor);
    const input = parse(registerEntryInputSchema, req.body);
    const entry = await req.em.transactional(async (tx) => {
      const created = await createEntry({ em: tx, actor, input, suggest });
      await tx.flush();
      return created;
    });
    res.status(201).json(await entryView(req, entry.id));
  });

  router.get("/entries/:id", async (req, res) => {
    res.json(await entryView(req, entryId(req)));
  });

  router.post("/entries/:id/events", async (req, res) => {
    const actor = currentUser(req);
    const id = entryId(req);
    registerOwner(actor);
    const input = parse(registerEventInputSchema, req.body);
    const { event } = await recordEvent({ em: req.em, actor, entryId: id, input });
    const view = await entryView(req, id);
    res.status(201).json({ event: view.events.find((candidate) => candidate.id === event.id), entry: view.entry });
  });

  router.post("/entries/:id/split", async (req, res) => {
    const actor = currentUser(req);
    const id = entryId(req);
    registerOwner(actor);
    const input = parse(registerSplitInputSchema, req.body);
    const child = await splitEntry({ em: req.em, actor, entryId: id, input });
    res.status(201).json(await entryView(req, child.id));
  });

  router.post("/import", csvBody, async (req, res) => {
    const actor = currentUser(req);
    registerOwner(actor);
    if (!req.is("text/csv") || !Buffer.isBuffer(req.body))
      throw new HttpError(415, "unsupported_media_type", "Send the register as a CSV file (text/csv).");
    const bytes: Buffer = req.body;
    if (!isUtf8(bytes))
      throw new HttpError(
        400,
        "invalid_encoding",
        "The file is not UTF-8 text: save it from the spreadsheet as “CSV UTF-8”.",
        {
          field: "body",
        },
      );
    const result = await importRegisterCsv({ em: req.em, actor, csv: bytes.toString("utf8"), suggest });
    if ("rows" in result)
      res.status(400).json({
        error: {
          code: "invalid_rows",
          message: `${result.rows.length} row${result.rows.length === 1 ? "" : "s"} cannot be imported; nothing was imported. Correct ${result.rows.length === 1 ? "it" : "them"} and send the file again.`,
        },
        rows: result.rows,
      });
    else res.json(result);
  });

  const report = async (req: Request) => {
    const organizationId = registerOwner(currentUser(req));
    const query = parse(registerReportQuerySchema, req.query);
    return { query, report: await permitReport(req.ctx.pool, organizationId, query.permitId, query) };
  };
  router.get("/report", async (req, res) => {
    const { query, report: body } = await report(req);
    if (query.format === "json") return res.json(body);
    if (query.format === "csv")
      return sendCsv(res, `yearly-report-${body.permit.number}-${body.from}-${body.to}.csv`, reportCsv(body));
    const pdf = await renderRegisterReportPdf(body, new Date());
    res.setHeader("Content-Type", "application/pdf");
    res.setHeader("Content-Disposition", `attachment; filename="yearly-report-${body.from}-${body.to}.pdf"`);
    res.send(Buffer.from(pdf));
  });

  // A new transfer started from the register (issue 15 §2): one prefilled animal line per chosen entry.
  router.get("/transfer-lines", async (req, res) => {
    const organizationId = registerOwner(currentUser(req));
    const { ids } = parse(transferLinesQuerySchema, req.query);
    const today = todayUtc();
    const animals = [];
    for (const [index, id] of ids.entries()) {
      const row = await readRegisterEntry(req.ctx.pool, organizationId, id);
      if (!row) throw notFound("That register entry");
      if (row.count_in_care === 0)
        throw new HttpError(
          400,
          "invalid",
          `Entry ${index + 1} (${row.scientific_name}) has no animals in your care.`,
          { field: "ids" },
        );
      const entry = presentRegisterEntry(row, today);
      animals.push({
        registerEntryId: entry.id,
        taxonId: entry.taxon.id,
        scientificName: entry.taxon.scientificName,
        count: entry.countInCare,
        sex: entry.sex,
        identifier: entry.identifier,
        identifierKind: entry.identifierKind,
        origin: entry.origin ?? "captive_bred",
        originKnown: entry.origin !== null,
        hatchDate: entry.hatchDate,
        weightG: entry.weightG,
        lengthMm: entry.lengthMm,
        quarantine: entry.quarantine,
      });
    }
    const taxa = await req.em.find(TaxonSchema, { id: { $in: [...new Set(animals.map((a) => a.taxonId))] } });
    res.json({ animals, taxa: taxa.map(presentTaxon) });
  });

  // Permits with their reporting year and the report due next.
  router.get("/permits", async (req, res) => {
    const organizationId = registerOwner(currentUser(req));
    const permits = await req.em.find(
      PermitDocumentSchema,
      { organization: organizationId },
      { orderBy: { number: "asc" } },
    );
    const today = todayUtc();
    res.json({
      permits: permits.map((permit) => {
        const planned =
          permit.reportStartMonth != null && permit.reportDueMonth != null && permit.reportDueDay != null
            ? { startMonth: permit.reportStartMonth, dueMonth: permit.reportDueMonth, dueDay: permit.reportDueDay }
            : null;
        return {
          id: permit.id,
          kind: permit.kind,
          jurisdiction: permit.jurisdiction,
          number: permit.number,
          reportStartMonth: permit.reportStartMonth ?? null,
          reportDueMonth: permit.reportDueMonth ?? null,
          reportDueDay: permit.reportDueDay ?? null,
          nextReport: planned ? nextDueReport(planned, today) : null,
        };
      }),
    });
  });

  router.put("/permits/:id/reporting", async (req, res) => {
    const organizationId = registerOwner(currentUser(req));
    const id = pathId(req, "id", "permit");
    const input = parse(permitReportingSchema, req.body);
    const permit = await req.em.findOne(PermitDocumentSchema, { id, organization: organizationId });
    if (!permit) throw notFound("That permit");
    const all = [input.reportStartMonth, input.reportDueMonth, input.reportDueDay];
    if (all.some((v) => v === null) && all.some((v) => v !== null))
      throw new HttpError(
        400,
        "invalid",
        "Give the first month of the reporting year, the due month and the due day, or none of them.",
        {
          field: "reportStartMonth",
        },
      );
    permit.reportStartMonth = input.reportStartMonth;
    permit.reportDueMonth = input.reportDueMonth;
    permit.reportDueDay = input.reportDueDay;
    await req.em.flush();
    res.json({ id: permit.id, ...input });
  });

  router.get("/settings", async (req, res) => {
    const organizationId = registerOwner(currentUser(req));
    const organization = await req.em.findOneOrFail(OrganizationSchema, { id: organizationId });
    res.json(presentQuarantine(organization));
  });

  router.put("/settings", async (req, res) => {
    const organizationId = registerOwner(currentUser(req));
    const input = parse(quarantineSettingsSchema, req.body);
    const overrides = input.overrides ? await catalogueNames(req.em, input.overrides) : undefined;
    const organization = await req.em.findOneOrFail(OrganizationSchema, { id: organizationId });
    organization.quarantineDays = input.quarantineDays;
    if (overrides) organization.quarantineOverrides = overrides;
    await req.em.flush();
    res.json(presentQuarantine(organization));
  });

  // State notices due after a move, for the caller's side of it, once the animals have arrived.
  router.get("/transfers/:transferId/notices", async (req, res) => {
    const transferId = pathId(req, "transferId", "transfer");
    res.json(await readStateNotices({ em: req.em, pool: req.ctx.pool, actor: currentUser(req), transferId }));
  });

  router.post("/transfers/:transferId/notices/:key/done", async (req, res) => {
    const transferId = pathId(req, "transferId", "transfer");
    const input = parse(stateNoticeDoneSchema, req.body ?? {});
    const notice = await markStateNoticeDone({
      em: req.em,
      pool: req.ctx.pool,
      actor: currentUser(req),
      transferId,
      key: String(req.params.key),
      input,
    });
    res.status(201).json({ notice });
  });

  return router;
}

/** The register as CSV, with the filters of the page (up to 5,000 rows). */
export function registerCsvRoute(): Router {
  const router = Router();
  router.get("/register.csv", requireUser, async (req, res) => {
    const { entries } = await pageFor(req, { limit: 5000 });
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
    const rows = entries.map((e) => [
      e.dateAcquired,
      e.taxon.scientificName,
      e.taxon.commonName ?? "",
      SEX_WORDS[e.sex],
      String(e.count),
      e.identifier ?? "",
      e.sourceOrganization ?? "",
      e.transferNumber ?? "",
      e.condition ? REGISTER_CONDITION_WORDS[e.condition] : "",
      e.weightG === null ? "" : String(e.weightG),
      e.notes ?? "",
    ]);
    sendCsv(res, `collection-register-${todayUtc()}.csv`, [header, ...rows]);
  });
  return router;
}
