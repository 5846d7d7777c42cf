import { PDFDocument } from "pdf-lib";
import { formatDate, formatDateRange } from "@shared/dates";
import type { RegisterReportDto } from "@shared/schemas/register";
import { DOCUMENT_KIND_WORDS, REGISTER_EVENT_KIND_WORDS, REPORT_COLUMN_WORDS } from "@shared/words";
import type { DocumentKind, RegisterEventKind } from "@shared/constants";
import { embedFonts } from "./fonts";
import { COLORS, drawTable, PageFlow } from "./layout";

const counterpartyText = (event: RegisterReportDto["species"][number]["events"][number]) =>
  event.counterparty
    ? [
        event.counterparty.name,
        event.counterparty.address,
        event.counterparty.permitNumber && `permit ${event.counterparty.permitNumber}`,
      ]
        .filter(Boolean)
        .join(", ")
    : "";

/**
 * The yearly report as a letter-size PDF in Hatchway's own layout and fonts: the permit, the
 * period, a totals table per species (start, each column, end), then each species' events.
 */
export async function renderRegisterReportPdf(report: RegisterReportDto, generatedAt: Date): Promise<Uint8Array> {
  const doc = await PDFDocument.create();
  doc.setTitle(`Yearly report ${report.permit.number}`);
  doc.setCreator("Hatchway");
  doc.setProducer("Hatchway");
  doc.setCreationDate(generatedAt);
  doc.setModificationDate(generatedAt);
  const fonts = await embedFonts(doc);
  const flow = new PageFlow(doc, fonts, { top: 48, bottom: 48, left: 48, right: 48 });
  const kind = DOCUMENT_KIND_WORDS[report.permit.kind as DocumentKind] ?? "Permit";
  flow.paragraph("Yearly report of animals held", { bold: true, sizePt: 16 });
  flow.paragraph(
    `${kind} no. ${report.permit.number} (${report.permit.jurisdiction}), held by ${report.permit.holderName}`,
    { sizePt: 10 },
  );
  flow.paragraph(
    `Period: ${formatDateRange(report.from, report.to)}${report.dueOn ? ` · due ${formatDate(report.dueOn)}` : ""}`,
    { sizePt: 10 },
  );
  flow.paragraph(
    "Prepared by Hatchway from the keeper's register. Check it against your own records; the issuing agency's rules decide what the report must hold.",
    { sizePt: 8, color: COLORS.muted },
  );
  flow.gap(8);
  const width = flow.width;
  const numberWidth = 52;
  drawTable(flow, {
    columns: [
      { header: "Species", widthPt: width - numberWidth * 7 },
      { header: "At the start", widthPt: numberWidth, align: "right" },
      ...(["acquired", "hatched", "died", "transferredOut", "escapedOrReleased"] as const).map((column) => ({
        header: REPORT_COLUMN_WORDS[column],
        widthPt: numberWidth,
        align: "right" as const,
      })),
      { header: "At the end", widthPt: numberWidth, align: "right" },
    ],
    rows: report.species.length
      ? report.species.map((species) => ({
          cells: [
            { text: species.scientificName },
            String(species.start),
            String(species.acquired),
            String(species.hatched),
            String(species.died),
            String(species.transferredOut),
            String(species.escapedOrReleased),
            { text: String(species.end), bold: true },
          ],
        }))
      : [{ cells: ["No animals of this permit in the register for the period."], span: true }],
  });
  for (const species of report.species) {
    if (species.events.length === 0) continue;
    flow.gap(10);
    flow.heading(species.scientificName);
    drawTable(flow, {
      continuedTitle: `${species.scientificName} (continued)`,
      columns: [
        { header: "Date", widthPt: 70 },
        { header: "What happened", widthPt: 100 },
        { header: "Number", widthPt: 40, align: "right" },
        { header: "Identifier", widthPt: 80 },
        { header: "From or to (name, address, permit)", widthPt: width - 290 },
      ],
      rows: species.events.map((event) => ({
        cells: [
          formatDate(event.on),
          REGISTER_EVENT_KIND_WORDS[event.kind as RegisterEventKind],
          String(event.count),
          event.identifier ?? "",
          { text: counterpartyText(event), sub: event.transferNumber ? `Transfer ${event.transferNumber}` : undefined },
        ],
      })),
    });
  }
  return doc.save();
}
