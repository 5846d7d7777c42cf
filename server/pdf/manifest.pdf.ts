import {
  MANIFEST_CHECK_WORDS,
  ANIMAL_ORIGIN_WORDS,
  DOCUMENT_KIND_WORDS,
  PACK_WORDS,
  PURPOSE_WORDS,
  SEX_WORDS,
  TRANSPORT_MODE_WORDS,
  WALL_MATERIAL_WORDS,
} from "@shared/words";
import { PDFDocument } from "pdf-lib";
import { embedFonts, fitText, safeText, textWidthPt, wrapText } from "./fonts";
import { formatDateRange, formatInstant } from "@shared/dates";
import { formatDimensionsBoth, formatLengthBoth, formatTempRangeBoth, formatWeightBoth } from "@shared/units";
import { COLORS, PageFlow, drawNoteBox, drawTable, type Cell, type TableRow } from "./layout";
import type { ManifestAnimal, ManifestBox, ManifestInput, ManifestVerdict, PartyBlock } from "./manifest-input";
import { drawQrCode } from "./qr";
import { animalsInBox, speciesTotals } from "./species-totals";

const MARGINS = { top: 40, bottom: 52, left: 40, right: 40 };
const QR_SIZE_PT = 96;

/** Cautions printed on every manifest (product brief, "Cautions the product shows"). */
export const MANIFEST_CAUTIONS = [
  "This manifest is a packing and custody record, not legal advice. Confirm the rules for every species with the wildlife agencies of the origin and destination states, and the animals' fitness to travel with a licensed veterinarian.",
  "Temperature advice is a planning aid, not a guarantee: check the forecast at both ends and along the way before the boxes leave.",
  "Heat packs and cold packs never touch an animal's container: fix them to the wall or lid of the insulated box with packing material between.",
];

const HANDLING_STEPS = [
  "Keep every box upright, arrow up, out of direct sun and away from heaters, vents and engines. Never leave a box in a parked vehicle.",
  "Do not open the boxes or the containers inside them. Boxes holding venomous animals say VENOMOUS; only the receiver opens those containers.",
  "If a box is damaged, delayed, too hot or too cold, call a 24-hour number below at once, then record it in Hatchway or in the custody table.",
  "On arrival the receiver opens every container, checks each animal against this manifest and records what arrived well, with a problem, dead or missing.",
];

const CUSTODY_ROWS = 8;

/**
 * The packing manifest that travels with the animals: US Letter pages in PDF points, every
 * animal by box, species totals, permits, temperature and handling text, an empty custody
 * table and a QR code for the handoff page. All user text is drawn as plain glyphs.
 */
export async function renderManifestPdf(input: ManifestInput): Promise<Uint8Array> {
  const doc = await PDFDocument.create();
  setMetadata(doc, input);
  const fonts = await embedFonts(doc);
  const flow = new PageFlow(doc, fonts, MARGINS, (f) => runningHeader(f, input));

  drawTitleBlock(flow, input);
  drawVerdicts(flow, input.verdicts);
  flow.gap(4);
  drawParties(flow, input.sender, input.receiver);
  drawCouriers(flow, input);
  flow.gap(8);
  drawNoteBox(flow, "Please read", MANIFEST_CAUTIONS, {
    border: COLORS.amber,
    fill: COLORS.amberTint,
    title: COLORS.amber,
  });
  drawBoxes(flow, input.boxes);
  drawTotals(flow, input.boxes);
  drawDocuments(flow, input);
  drawTemperature(flow, input);
  drawHandling(flow, input);
  drawCustody(flow);
  drawFooters(flow, input);
  return doc.save();
}

function setMetadata(doc: PDFDocument, input: ManifestInput): void {
  doc.setTitle(`Packing manifest ${input.transferNumber}`);
  doc.setSubject("Live animal packing manifest");
  doc.setCreator("Hatchway");
  doc.setProducer("Hatchway");
  doc.setCreationDate(new Date(input.generatedAt));
  doc.setModificationDate(new Date(input.generatedAt));
}

function runningHeader(flow: PageFlow, input: ManifestInput): void {
  if (flow.pages.length === 1) return;
  flow.drawLine(`Packing manifest · Transfer ${input.transferNumber}`, flow.left, flow.y - 8, {
    sizePt: 8,
    color: COLORS.muted,
  });
  flow.y -= 16;
}

function drawTitleBlock(flow: PageFlow, input: ManifestInput): void {
  const { page } = flow;
  const qrX = flow.left + flow.width - QR_SIZE_PT;
  const topY = flow.y;
  drawQrCode(page, input.handoffUrl, { x: qrX, y: topY - QR_SIZE_PT, sizePt: QR_SIZE_PT });
  const caption = "Scan at every handoff";
  const captionX = qrX + (QR_SIZE_PT - textWidthPt(flow.fonts.regular, caption, 7)) / 2;
  flow.drawLine(caption, captionX, topY - QR_SIZE_PT - 6, { sizePt: 7, color: COLORS.muted });

  const textW = flow.width - QR_SIZE_PT - 16;
  flow.drawLine("HATCHWAY  ·  PACKING MANIFEST", flow.left, topY - 10, { bold: true, sizePt: 9, color: COLORS.green });
  const numberText = fitText(flow.fonts.bold, `Transfer ${input.transferNumber}`, 20, textW);
  page.drawText(numberText, { x: flow.left, y: topY - 34, size: 20, font: flow.fonts.bold, color: COLORS.ink });
  flow.drawLine(`${TRANSPORT_MODE_WORDS[input.mode]}  ·  ${PURPOSE_WORDS[input.purpose]}`, flow.left, topY - 50, {
    sizePt: 10,
  });

  const animals = input.boxes.reduce((n, b) => n + animalsInBox(b), 0);
  const facts: [string, string][] = [
    ["Planned departure", formatInstant(input.plannedDeparture.at, input.plannedDeparture.tz)],
    ["Expected arrival", formatInstant(input.expectedArrival.at, input.expectedArrival.tz)],
    ["Boxes", String(input.boxes.length)],
    ["Animals", `${animals} (${speciesTotals(input.boxes).length} species)`],
  ];
  const colW = textW / 2;
  facts.forEach(([label, value], i) => {
    const x = flow.left + (i % 2) * colW;
    const y = topY - 66 - Math.floor(i / 2) * 24;
    flow.drawLine(label.toUpperCase(), x, y, { sizePt: 6.5, color: COLORS.muted });
    page.drawText(fitText(flow.fonts.bold, value, 9.5, colW - 8), {
      x,
      y: y - 11,
      size: 9.5,
      font: flow.fonts.bold,
      color: COLORS.ink,
    });
  });
  const urlLine = fitText(flow.fonts.regular, `Handoff page: ${input.handoffUrl}`, 7, flow.width);
  page.drawText(urlLine, {
    x: flow.left,
    y: topY - QR_SIZE_PT - 18,
    size: 7,
    font: flow.fonts.regular,
    color: COLORS.muted,
  });
  flow.y = topY - QR_SIZE_PT - 28;
}

/** The colours of a verdict on paper: green, amber, brick red, as on the transfer page. */
export const VERDICT_COLOURS = {
  ok: { ink: COLORS.green, fill: COLORS.greenTint },
  caution: { ink: COLORS.amber, fill: COLORS.amberTint },
  block: { ink: COLORS.brick, fill: COLORS.brickTint },
} as const;

/**
 * The transfer's current verdicts side by side, under the title: what was checked, what it says in
 * the page's words and colours ("DO NOT SHIP", "UNVERIFIED"), why, and when (in the origin's zone).
 */
function drawVerdicts(flow: PageFlow, verdicts: readonly ManifestVerdict[]): void {
  if (verdicts.length === 0) {
    flow.paragraph("No check of the rules or the temperature could be made for this manifest.", {
      bold: true,
      color: COLORS.brick,
    });
    return;
  }
  const gapPt = 12;
  const colW = (flow.width - gapPt * (verdicts.length - 1)) / verdicts.length;
  const innerW = colW - 16;
  const laid = verdicts.map((v) => ({
    v,
    headline: wrapText(flow.fonts.bold, v.headline, 12, innerW),
    detail: wrapText(flow.fonts.regular, v.detail, 7.5, innerW),
    when: wrapText(flow.fonts.regular, `Checked ${formatInstant(v.checkedAt, v.tz)}`, 7, innerW),
  }));
  const heightPt = Math.max(
    ...laid.map((l) => 22 + l.headline.length * 14 + l.detail.length * 9.5 + l.when.length * 9 + 8),
  );
  flow.ensure(heightPt + 8);
  const topY = flow.y;
  laid.forEach(({ v, headline, detail, when }, i) => {
    const x = flow.left + i * (colW + gapPt);
    const colours = VERDICT_COLOURS[v.tone];
    flow.page.drawRectangle({
      x,
      y: topY - heightPt,
      width: colW,
      height: heightPt,
      color: colours.fill,
      borderColor: colours.ink,
      borderWidth: 1.5,
    });
    flow.drawLine(MANIFEST_CHECK_WORDS[v.check].toUpperCase(), x + 8, topY - 13, {
      bold: true,
      sizePt: 7,
      color: colours.ink,
    });
    let y = topY - 18;
    for (const line of headline) {
      y -= 14;
      flow.page.drawText(line, { x: x + 8, y: y + 2, size: 12, font: flow.fonts.bold, color: colours.ink });
    }
    y -= 2;
    for (const line of detail) {
      y -= 9.5;
      flow.page.drawText(line, { x: x + 8, y, size: 7.5, font: flow.fonts.regular, color: COLORS.ink });
    }
    for (const line of when) {
      y -= 9;
      flow.page.drawText(line, { x: x + 8, y, size: 7, font: flow.fonts.regular, color: COLORS.muted });
    }
  });
  flow.y = topY - heightPt - 4;
}

function partyLines(party: PartyBlock): { text: string; bold: boolean }[] {
  return [
    { text: party.organisation, bold: true },
    { text: party.contactName, bold: false },
    { text: party.street, bold: false },
    { text: `${party.city}, ${party.state} ${party.zip}`, bold: false },
    { text: `24-hour phone: ${party.phone24h}`, bold: true },
    { text: party.email, bold: false },
  ];
}

/** Shipper and consignee side by side: the name-and-address block of 50 CFR 14.81. */
function drawParties(flow: PageFlow, sender: PartyBlock, receiver: PartyBlock): void {
  const sizePt = 9;
  const lineH = sizePt * 1.35;
  const gapPt = 12;
  const colW = (flow.width - gapPt) / 2;
  const blocks = [
    { title: "SHIPPER (SENDER)", party: sender },
    { title: "CONSIGNEE (RECEIVER)", party: receiver },
  ].map(({ title, party }) => ({
    title,
    lines: partyLines(party).flatMap(({ text, bold }) =>
      wrapText(flow.font(bold), text, sizePt, colW - 16).map((line) => ({ line, bold })),
    ),
  }));
  const heightPt = 26 + Math.max(...blocks.map((b) => b.lines.length)) * lineH + 6;
  flow.ensure(heightPt);
  const topY = flow.y;
  blocks.forEach((block, i) => {
    const x = flow.left + i * (colW + gapPt);
    flow.page.drawRectangle({
      x,
      y: topY - heightPt,
      width: colW,
      height: heightPt,
      borderColor: COLORS.green,
      borderWidth: 0.8,
    });
    flow.page.drawRectangle({ x, y: topY - 18, width: colW, height: 18, color: COLORS.greenTint });
    flow.drawLine(block.title, x + 8, topY - 12.5, { bold: true, sizePt: 8, color: COLORS.green });
    block.lines.forEach(({ line, bold }, n) => {
      flow.page.drawText(line, {
        x: x + 8,
        y: topY - 26 - sizePt - n * lineH + 2,
        size: sizePt,
        font: flow.font(bold),
        color: COLORS.ink,
      });
    });
  });
  flow.y = topY - heightPt;
}

function drawCouriers(flow: PageFlow, input: ManifestInput): void {
  flow.heading(input.couriers.length > 1 ? "Couriers" : "Courier", 50);
  if (input.couriers.length === 0) {
    flow.paragraph(
      input.mode === "hand_delivery"
        ? "Hand delivery: no courier is named. Whoever carries the boxes signs the custody table."
        : "No courier named yet. Whoever takes the boxes signs the custody table.",
      { color: COLORS.muted },
    );
    return;
  }
  drawTable(flow, {
    columns: [
      { header: "Name", widthPt: 190 },
      { header: "Organisation", widthPt: 212 },
      { header: "Phone", widthPt: 130 },
    ],
    rows: input.couriers.map((c) => ({ cells: [{ text: c.name, bold: true }, c.organisation ?? "—", c.phone] })),
  });
}

const ANIMAL_COLUMNS = [
  { header: "#", widthPt: 22, align: "right" as const },
  { header: "Species (scientific / common)", widthPt: 138 },
  { header: "Count", widthPt: 32, align: "right" as const },
  { header: "Sex", widthPt: 50 },
  { header: "Identifier", widthPt: 64 },
  { header: "Origin", widthPt: 78 },
  { header: "Size", widthPt: 90 },
  { header: "Venomous", widthPt: 58 },
];
const NOTES_INDENT_PT = 22;

function boxDetails(box: ManifestBox): string {
  const parts = [formatDimensionsBoth(box.lengthMm, box.widthMm, box.heightMm)];
  if (box.insulation) {
    parts.push(
      `${WALL_MATERIAL_WORDS[box.insulation.material]}, ${formatLengthBoth(box.insulation.wallThicknessMm)} walls`,
    );
  }
  parts.push(PACK_WORDS[box.pack]);
  parts.push(box.sealNumber ? `Seal no. ${box.sealNumber}` : "No seal number");
  const n = animalsInBox(box);
  parts.push(`${n} ${n === 1 ? "animal" : "animals"}`);
  return parts.join("  ·  ");
}

function animalRows(animal: ManifestAnimal, lineNo: number): TableRow[] {
  const size = [
    animal.lengthMm === null ? null : formatLengthBoth(animal.lengthMm),
    animal.weightG === null ? null : formatWeightBoth(animal.weightG),
  ]
    .filter((s): s is string => s !== null)
    .join("\n");
  const venomous: Cell = animal.venomous ? { text: "VENOMOUS", bold: true, color: COLORS.brick } : "No";
  const hasNotes = Boolean(animal.notes?.trim());
  const rows: TableRow[] = [
    {
      keepWithNext: hasNotes,
      cells: [
        String(lineNo),
        { text: animal.scientificName, bold: true, sub: animal.commonName },
        String(animal.count),
        SEX_WORDS[animal.sex],
        animal.identifier ?? "—",
        ANIMAL_ORIGIN_WORDS[animal.origin],
        size || "—",
        venomous,
      ],
    },
  ];
  if (hasNotes) {
    rows.push({
      cells: [{ text: `Notes: ${animal.notes ?? ""}`, color: COLORS.muted }],
      span: true,
      indentPt: NOTES_INDENT_PT,
    });
  }
  return rows;
}

function drawBoxes(flow: PageFlow, boxes: ManifestBox[]): void {
  flow.heading("Contents by box", 120);
  let lineNo = 0;
  for (const box of boxes) {
    // The label is one line of the user's text; its own line breaks would split the title.
    const title = safeText(flow.fonts.bold, `Box ${box.index} of ${boxes.length}: ${box.label}`);
    // Title, details, table header and the first row stay together on one page.
    flow.ensure(110);
    flow.gap(4);
    flow.paragraph(title, { bold: true, sizePt: 10.5, color: COLORS.green });
    flow.paragraph(boxDetails(box), { sizePt: 8, color: COLORS.muted });
    flow.gap(2);
    if (box.animals.length === 0) {
      flow.paragraph("This box holds no animals.", { sizePt: 8.5 });
      continue;
    }
    drawTable(flow, {
      columns: ANIMAL_COLUMNS,
      rows: box.animals.flatMap((animal) => animalRows(animal, ++lineNo)),
      continuedTitle: `Box ${box.index} of ${boxes.length}`,
    });
    flow.gap(6);
  }
}

/** "Box A — tortoises (box 1)": the sender's label, with the number printed on the box label. */
const boxByLabel = (box: { index: number; label: string }) => `${box.label} (box ${box.index})`;

/**
 * The list 50 CFR 14.81 wants with the shipment: each species with its number of animals, the
 * boxes that hold it by their labels, and whether it is venomous; then the grand total.
 */
function drawTotals(flow: PageFlow, boxes: ManifestBox[]): void {
  const totals = speciesTotals(boxes);
  flow.heading("Totals by species (50 CFR 14.81)", 70);
  const rows: TableRow[] = totals.map((t, i) => ({
    // the last species stays on the page of the grand total
    keepWithNext: i === totals.length - 1,
    cells: [
      { text: t.scientificName, bold: true, sub: t.commonName },
      { text: String(t.count), bold: true },
      t.boxes.map(boxByLabel).join("\n"),
      t.venomous ? { text: "VENOMOUS", bold: true, color: COLORS.brick } : "No",
    ],
  }));
  const all = totals.reduce((n, t) => n + t.count, 0);
  rows.push({
    cells: [
      `All species (${totals.length})`,
      String(all),
      `${boxes.length} ${boxes.length === 1 ? "box" : "boxes"}`,
      "",
    ],
    bold: true,
    fill: COLORS.greenTint,
  });
  drawTable(flow, {
    columns: [
      { header: "Species (scientific / common)", widthPt: 196 },
      { header: "Number of animals", widthPt: 70, align: "right" },
      { header: "Boxes (by label)", widthPt: 198 },
      { header: "Venomous", widthPt: 68 },
    ],
    rows,
    continuedTitle: "Totals by species",
  });
}

function validity(from: string, to: string | null): string {
  return formatDateRange(from, to);
}

function drawDocuments(flow: PageFlow, input: ManifestInput): void {
  flow.heading("Permits and certificates", 70);
  if (input.documents.length === 0) {
    flow.paragraph("No permits or certificates are listed for this transfer.", { color: COLORS.muted });
    return;
  }
  drawTable(flow, {
    columns: [
      { header: "Kind", widthPt: 104 },
      { header: "Number", widthPt: 112 },
      { header: "Issuer / jurisdiction", widthPt: 120 },
      { header: "Holder", widthPt: 100 },
      { header: "Valid", widthPt: 96 },
    ],
    rows: input.documents.map((d) => ({
      cells: [
        DOCUMENT_KIND_WORDS[d.kind],
        { text: d.number, bold: true },
        d.issuer,
        d.holder,
        validity(d.validFrom, d.validTo),
      ],
    })),
    continuedTitle: "Permits and certificates",
  });
}

function drawTemperature(flow: PageFlow, input: ManifestInput): void {
  flow.heading("Temperature and packing", 40);
  const t = input.temperature;
  if (t?.safeRangeF) {
    flow.paragraph(`Safe transit range: ${formatTempRangeBoth(t.safeRangeF.minF, t.safeRangeF.maxF)}`, {
      bold: true,
      sizePt: 10,
    });
  } else if (t?.boxRangesF && Object.keys(t.boxRangesF).length) {
    flow.paragraph("Safe transit range: differs by box; each box label and the notes below give it.", {
      bold: true,
      sizePt: 10,
    });
  }
  if (t?.advice) labelled(flow, "Advice", t.advice);
  if (t?.packingNotes) labelled(flow, "Packing notes", t.packingNotes);
  if (!t?.safeRangeF && !t?.advice && !t?.packingNotes) {
    flow.paragraph("No temperature advice was recorded for this transfer.", { color: COLORS.muted });
  }
  flow.gap(4);
  flow.paragraph(
    "Temperature advice is a planning aid, not a guarantee. Heat packs never touch an animal's container.",
    {
      sizePt: 8,
      color: COLORS.amber,
    },
  );
}

function labelled(flow: PageFlow, label: string, text: string): void {
  flow.gap(2);
  flow.paragraph(label, { bold: true, sizePt: 8.5, color: COLORS.green });
  flow.paragraph(text, { sizePt: 9 });
}

function drawHandling(flow: PageFlow, input: ManifestInput): void {
  flow.heading("Handling and emergencies", 60);
  for (const step of HANDLING_STEPS) flow.bullet(step);
  if (input.handlingNotes?.trim()) labelled(flow, "Sender's handling notes", input.handlingNotes);
  flow.gap(6);
  drawTable(flow, {
    columns: [
      { header: "Emergency contact", widthPt: 220 },
      { header: "Role", widthPt: 172 },
      { header: "Phone (24 hours)", widthPt: 140 },
    ],
    rows: contactsOnce(input).map((c) => ({
      cells: [
        { text: c.name, bold: true, ...(c.organisation ? { sub: c.organisation } : {}) },
        c.roles.join("; "),
        { text: c.phone, bold: true },
      ],
    })),
    continuedTitle: "Emergency contacts",
  });
}

type ContactRow = { name: string; organisation: string | null; roles: string[]; phone: string };

const contactKey = (name: string, phone: string) =>
  `${name.normalize("NFC").trim().replace(/\s+/g, " ").toLowerCase()}|${phone.replace(/\D/g, "")}`;

/**
 * Sender, receiver, then the other emergency contacts, each person once: a contact with the same
 * name and number as one listed before adds its role to that row instead of repeating it.
 */
export function contactsOnce(input: Pick<ManifestInput, "sender" | "receiver" | "emergencyContacts">): ContactRow[] {
  const rows = new Map<string, ContactRow>();
  const add = (name: string, organisation: string | null, role: string, phone: string) => {
    const key = contactKey(name, phone);
    const row = rows.get(key);
    if (!row) rows.set(key, { name, organisation, roles: [role], phone });
    else if (!row.roles.some((r) => role.startsWith(r) || r.startsWith(role))) row.roles.push(role);
  };
  add(input.sender.contactName, input.sender.organisation, "Sender", input.sender.phone24h);
  add(input.receiver.contactName, input.receiver.organisation, "Receiver", input.receiver.phone24h);
  for (const c of input.emergencyContacts) add(c.name, null, c.role, c.phone);
  return [...rows.values()];
}

function drawCustody(flow: PageFlow): void {
  // Heading, text and all eight rows on one page: a sign-by-hand table is not split.
  flow.heading("Chain of custody", 40 + 30 + 20 + CUSTODY_ROWS * 34);
  flow.paragraph(
    "Record every handoff in Hatchway by scanning the QR code. Without a device, fill in a row here: the person releasing and the person receiving both print and sign, and the receiver of one leg releases the next.",
    { sizePt: 8.5 },
  );
  flow.gap(4);
  drawTable(flow, {
    columns: [
      { header: "#", widthPt: 18, align: "right" },
      { header: "Released by (print, sign)", widthPt: 118 },
      { header: "Received by (print, sign)", widthPt: 118 },
      { header: "Date and time", widthPt: 78 },
      { header: "Place", widthPt: 84 },
      { header: "Boxes, seals intact", widthPt: 62 },
      { header: "Box temp °F", widthPt: 54 },
    ],
    rows: Array.from({ length: CUSTODY_ROWS }, (_, i) => ({ cells: [String(i + 1)], minHeightPt: 34 })),
    continuedTitle: "Chain of custody",
    grid: true,
  });
}

function drawFooters(flow: PageFlow, input: ManifestInput): void {
  const produced = `Produced ${formatInstant(input.generatedAt, input.generatedTz)} by Hatchway`;
  const total = flow.pages.length;
  flow.pages.forEach((page, i) => {
    page.drawLine({
      start: { x: flow.left, y: 38 },
      end: { x: flow.left + flow.width, y: 38 },
      thickness: 0.5,
      color: COLORS.rule,
    });
    const pageText = `Page ${i + 1} of ${total}`;
    const pageW = textWidthPt(flow.fonts.bold, pageText, 8);
    page.drawText(
      fitText(flow.fonts.regular, `${produced}  ·  Transfer ${input.transferNumber}`, 7.5, flow.width - pageW - 20),
      {
        x: flow.left,
        y: 26,
        size: 7.5,
        font: flow.fonts.regular,
        color: COLORS.muted,
      },
    );
    page.drawText(pageText, {
      x: flow.left + flow.width - pageW,
      y: 26,
      size: 8,
      font: flow.fonts.bold,
      color: COLORS.ink,
    });
  });
}
