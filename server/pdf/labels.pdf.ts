import { PDFDocument, type Color, type PDFPage } from "pdf-lib";
import { embedFonts, fitSize, fitText, safeText, textWidthPt, wrapText, type PdfFonts } from "./fonts";
import { tempRangeParts } from "@shared/units";
import { formatInstant } from "@shared/dates";
import { LABEL_CHECK_WORDS } from "@shared/words";
import { COLORS } from "./layout";
import type { ManifestBox, ManifestInput, PartyBlock } from "./manifest-input";
import { drawQrCode } from "./qr";
import { speciesTotals } from "./species-totals";

/** 4 × 6 in at 72 pt per inch, portrait. */
export const LABEL_SIZE_PT: [number, number] = [288, 432];
const M = 12;
const INNER_W = LABEL_SIZE_PT[0] - 2 * M;
const QR_SIZE_PT = 80;
const ARROW_W = 30;

interface Ctx {
  page: PDFPage;
  fonts: PdfFonts;
}

/**
 * One 4 × 6 in label page per box, in box order: LIVE ANIMALS, THIS SIDE UP with vector arrows,
 * VENOMOUS or NON-VENOMOUS, box n of N, shipper and consignee name and address and the box's
 * contents by scientific name and number (50 CFR 14.81), the safe range in °F and °C, and a QR
 * code for the handoff page.
 */
export async function renderLabelsPdf(input: ManifestInput): Promise<Uint8Array> {
  const doc = await PDFDocument.create();
  doc.setTitle(`Box labels ${input.transferNumber}`);
  doc.setCreator("Hatchway");
  doc.setProducer("Hatchway");
  doc.setCreationDate(new Date(input.generatedAt));
  doc.setModificationDate(new Date(input.generatedAt));
  const fonts = await embedFonts(doc);
  for (const box of input.boxes) {
    drawLabel({ page: doc.addPage(LABEL_SIZE_PT), fonts }, input, box);
  }
  return doc.save();
}

function drawLabel(ctx: Ctx, input: ManifestInput, box: ManifestBox): void {
  let y = LABEL_SIZE_PT[1] - M;
  y = drawOrientation(ctx, y);
  y = drawVenomBand(
    ctx,
    y - 6,
    box.animals.some((a) => a.venomous),
  );
  y = drawBoxLine(ctx, y - 6, input, box);
  y = drawChecks(ctx, y - 2, input);
  y = drawParty(ctx, y - 3, "FROM (SHIPPER)", input.sender, 7);
  y = drawParty(ctx, y - 4, "TO (CONSIGNEE)", input.receiver, 10);
  const bottomTop = M + QR_SIZE_PT + 8;
  drawContents(ctx, y - 4, bottomTop + 4, box);
  drawBottom(ctx, input, box, bottomTop);
}

function line(
  ctx: Ctx,
  text: string,
  x: number,
  y: number,
  sizePt: number,
  bold = false,
  color: Color = COLORS.ink,
): void {
  const font = bold ? ctx.fonts.bold : ctx.fonts.regular;
  ctx.page.drawText(safeText(font, text), { x, y, size: sizePt, font, color });
}

function centred(
  ctx: Ctx,
  text: string,
  centreX: number,
  y: number,
  sizePt: number,
  bold: boolean,
  color: Color = COLORS.ink,
): void {
  const font = bold ? ctx.fonts.bold : ctx.fonts.regular;
  const safe = fitText(font, text, sizePt, INNER_W);
  line(ctx, safe, centreX - textWidthPt(font, safe, sizePt) / 2, y, sizePt, bold, color);
}

/** Two upward arrows over a base bar, the usual "this way up" sign, drawn as vectors. */
function drawUpArrows(page: PDFPage, x: number, topY: number, heightPt: number): void {
  const w = ARROW_W / 2 - 2;
  const head = w * 0.9;
  const shaft = w * 0.36;
  const arrow = (ox: number): string =>
    `M${ox + w / 2} 0L${ox + w} ${head}H${ox + w / 2 + shaft / 2}V${heightPt - 6}H${ox + w / 2 - shaft / 2}V${head}H${ox}Z`;
  const bar = `M0 ${heightPt - 3}H${ARROW_W}V${heightPt}H0Z`;
  page.drawSvgPath(`${arrow(0)}${arrow(ARROW_W - w)}${bar}`, { x, y: topY, color: COLORS.ink });
}

function drawOrientation(ctx: Ctx, topY: number): number {
  const centreX = LABEL_SIZE_PT[0] / 2;
  const textW = INNER_W - 2 * (ARROW_W + 8);
  const size = fitSize(ctx.fonts.bold, "LIVE ANIMALS", 27, 16, textW);
  centred(ctx, "LIVE ANIMALS", centreX, topY - size * 0.78, size, true);
  centred(ctx, "THIS SIDE UP", centreX, topY - size * 0.78 - 22, 15, true, COLORS.green);
  const heightPt = size * 0.78 + 22;
  drawUpArrows(ctx.page, M, topY, heightPt);
  drawUpArrows(ctx.page, LABEL_SIZE_PT[0] - M - ARROW_W, topY, heightPt);
  return topY - heightPt - 4;
}

function drawVenomBand(ctx: Ctx, topY: number, venomous: boolean): number {
  const h = 28;
  const centreX = LABEL_SIZE_PT[0] / 2;
  if (venomous) {
    ctx.page.drawRectangle({ x: M, y: topY - h, width: INNER_W, height: h, color: COLORS.brick });
    centred(ctx, "VENOMOUS", centreX, topY - h + 7.5, 20, true, COLORS.white);
  } else {
    ctx.page.drawRectangle({ x: M, y: topY - h, width: INNER_W, height: h, borderColor: COLORS.ink, borderWidth: 1.2 });
    centred(ctx, "NON-VENOMOUS", centreX, topY - h + 8.5, 15, true);
  }
  return topY - h;
}

function drawBoxLine(ctx: Ctx, topY: number, input: ManifestInput, box: ManifestBox): number {
  const boxText = `BOX ${box.index} of ${input.boxes.length}`;
  line(ctx, boxText, M, topY - 18, 20, true);
  const boxW = textWidthPt(ctx.fonts.bold, boxText, 20);
  const rightW = INNER_W - boxW - 10;
  const transfer = fitText(ctx.fonts.regular, `Transfer ${input.transferNumber}`, 7.5, rightW);
  const label = fitText(ctx.fonts.regular, box.label, 7.5, rightW);
  const rightX = M + INNER_W;
  line(ctx, transfer, rightX - textWidthPt(ctx.fonts.regular, transfer, 7.5), topY - 8, 7.5, false, COLORS.muted);
  line(ctx, label, rightX - textWidthPt(ctx.fonts.regular, label, 7.5), topY - 18, 7.5, false, COLORS.muted);
  ctx.page.drawLine({
    start: { x: M, y: topY - 25 },
    end: { x: M + INNER_W, y: topY - 25 },
    thickness: 0.6,
    color: COLORS.rule,
  });
  return topY - 25;
}

const TONE_INK = { ok: COLORS.green, caution: COLORS.amber, block: COLORS.brick } as const;
const TONE_FILL = { ok: COLORS.greenTint, caution: COLORS.amberTint, block: COLORS.brickTint } as const;

/**
 * The transfer's verdicts as checked when the labels were printed, on one line in the page's
 * words and colours ("Rules: UNVERIFIED · Temperature: DO NOT SHIP"), on a band tinted by the
 * worst of them, with the time of the check.
 */
function drawChecks(ctx: Ctx, topY: number, input: ManifestInput): number {
  const verdicts = input.verdicts;
  const h = 19;
  const worst = verdicts.some((v) => v.tone === "block")
    ? "block"
    : verdicts.some((v) => v.tone === "caution") || verdicts.length === 0
      ? "caution"
      : "ok";
  ctx.page.drawRectangle({
    x: M,
    y: topY - h,
    width: INNER_W,
    height: h,
    color: TONE_FILL[worst],
    borderColor: TONE_INK[worst],
    borderWidth: 1.2,
  });
  if (verdicts.length === 0) {
    line(ctx, "CHECKS NOT MADE: see the transfer page", M + 5, topY - 10, 8, true, COLORS.brick);
    return topY - h;
  }
  let x = M + 5;
  const room = M + INNER_W - 5;
  verdicts.forEach((v, i) => {
    const label = `${i > 0 ? "  ·  " : ""}${LABEL_CHECK_WORDS[v.check]}: `;
    const labelW = textWidthPt(ctx.fonts.regular, label, 7);
    line(ctx, label, x, topY - 10, 7, false, COLORS.ink);
    x += labelW;
    const word = fitText(ctx.fonts.bold, v.short, 8, Math.max(10, room - x));
    line(ctx, word, x, topY - 10, 8, true, TONE_INK[v.tone]);
    x += textWidthPt(ctx.fonts.bold, word, 8);
  });
  const latest = verdicts.reduce((a, b) => (a.checkedAt > b.checkedAt ? a : b));
  const when = `Checked ${formatInstant(latest.checkedAt, latest.tz)}; details on the manifest`;
  line(ctx, fitText(ctx.fonts.regular, when, 6, INNER_W - 10), M + 5, topY - h + 3.5, 6, false, COLORS.muted);
  return topY - h;
}

function drawParty(ctx: Ctx, topY: number, title: string, party: PartyBlock, sizePt: number): number {
  const lineH = sizePt * 1.22;
  let y = topY - 7;
  line(ctx, title, M, y, 6.5, true, COLORS.green);
  y -= 3;
  const rows: [string, boolean][] = [
    [party.organisation, true],
    [party.contactName, false],
    [party.street, false],
    [`${party.city}, ${party.state} ${party.zip}`, false],
    [`24-hour phone: ${party.phone24h}`, false],
  ];
  for (const [text, bold] of rows) {
    const font = bold ? ctx.fonts.bold : ctx.fonts.regular;
    // Addresses are legal marking: wrap onto a second line rather than cut; past that, an
    // ellipsis shows the rest is on the manifest.
    const wrapped = wrapText(font, text, sizePt, INNER_W);
    const parts =
      wrapped.length <= 2 ? wrapped : [wrapped[0] ?? "", fitText(font, wrapped.slice(1).join(" "), sizePt, INNER_W)];
    for (const part of parts) {
      y -= lineH;
      line(ctx, part, M, y + sizePt * 0.22, sizePt, bold);
    }
  }
  return y - 2;
}

/** Single column at 8.5 pt when it fits, else two columns at 7 pt, else the rest is counted. */
function drawContents(ctx: Ctx, topY: number, bottomY: number, box: ManifestBox): void {
  const totals = speciesTotals([box]);
  const room = topY - 10 - bottomY;
  const single = totals.length * 8.5 * 1.2 <= room;
  const sizePt = single ? 8.5 : 7;
  const lineH = sizePt * 1.2;
  const columns = single ? 1 : 2;
  const rows = Math.max(1, Math.floor(room / lineH));
  const capacity = rows * columns;
  const shown = totals.length <= capacity ? totals : totals.slice(0, capacity - 1);
  const title = single ? "CONTENTS (SCIENTIFIC NAME, NUMBER)" : "CONTENTS (SCIENTIFIC NAME, NUMBER; VENOMOUS IN RED)";
  line(ctx, title, M, topY - 7, 6.5, true, COLORS.green);
  const gapPt = 12;
  const colW = (INNER_W - (columns - 1) * gapPt) / columns;
  shown.forEach((t, i) => {
    const x = M + Math.floor(i / rows) * (colW + gapPt);
    const y = topY - 10 - ((i % rows) + 1) * lineH;
    const count = String(t.count);
    const countW = textWidthPt(ctx.fonts.bold, count, sizePt);
    const venom = single && t.venomous ? "VENOMOUS" : "";
    const venomW = venom ? textWidthPt(ctx.fonts.bold, venom, sizePt) + 6 : 0;
    const nameFont = t.venomous ? ctx.fonts.bold : ctx.fonts.regular;
    const name = fitText(nameFont, t.scientificName, sizePt, colW - countW - venomW - 8);
    line(ctx, name, x, y, sizePt, t.venomous, t.venomous ? COLORS.brick : COLORS.ink);
    if (venom) line(ctx, venom, x + colW - countW - venomW, y, sizePt, true, COLORS.brick);
    line(ctx, count, x + colW - countW, y, sizePt, true);
  });
  if (shown.length < totals.length) {
    const rest = totals.slice(shown.length);
    const x = M + (columns - 1) * (colW + gapPt);
    const y = topY - 10 - rows * lineH;
    line(
      ctx,
      fitText(
        ctx.fonts.bold,
        `+ ${rest.length} more species (${rest.reduce((n, t) => n + t.count, 0)}): see manifest`,
        sizePt,
        colW,
      ),
      x,
      y,
      sizePt,
      true,
    );
  }
}

function drawBottom(ctx: Ctx, input: ManifestInput, box: ManifestBox, topY: number): void {
  ctx.page.drawLine({ start: { x: M, y: topY }, end: { x: M + INNER_W, y: topY }, thickness: 0.6, color: COLORS.rule });
  const qrX = M + INNER_W - QR_SIZE_PT + 4;
  drawQrCode(ctx.page, input.handoffUrl, { x: qrX, y: M + 4, sizePt: QR_SIZE_PT });
  const caption = "Scan at handoff";
  line(
    ctx,
    caption,
    qrX + (QR_SIZE_PT - textWidthPt(ctx.fonts.regular, caption, 6.5)) / 2,
    M,
    6.5,
    false,
    COLORS.muted,
  );

  const range = input.temperature?.boxRangesF?.[box.id] ?? input.temperature?.safeRangeF;
  line(ctx, "KEEP BETWEEN", M, topY - 14, 6.5, true, COLORS.green);
  if (range) {
    const { f, c } = tempRangeParts(range.minF, range.maxF);
    line(ctx, f, M, topY - 34, 18, true);
    line(ctx, `(${c})`, M, topY - 47, 10);
  } else {
    line(ctx, "See manifest", M, topY - 32, 12, true);
  }
  const advice = ["Keep out of direct sun.", "Never leave in a parked vehicle.", "Do not open."];
  advice.forEach((text, i) => line(ctx, text, M, topY - 62 - i * 9, 7.5));
}
