import type { Color, PDFDocument, PDFFont, PDFPage } from "pdf-lib";
import { rgb } from "pdf-lib";
import { safeText, textWidthPt, wrapText, type PdfFonts } from "./fonts";

function hex(value: string): Color {
  const n = Number.parseInt(value.slice(1), 16);
  return rgb(((n >> 16) & 255) / 255, ((n >> 8) & 255) / 255, (n & 255) / 255);
}

/** The field-notebook palette, printed on white paper. */
export const COLORS = {
  ink: hex("#1e2420"),
  muted: hex("#56615a"),
  green: hex("#2f5d3a"),
  greenTint: hex("#eaf1ec"),
  amber: hex("#a86a12"),
  amberTint: hex("#fcf3e3"),
  brick: hex("#a3392b"),
  brickTint: hex("#f8e9e6"),
  rule: hex("#c5cfc8"),
  white: rgb(1, 1, 1),
} as const;

export const LETTER_PT: [number, number] = [612, 792];

export interface Margins {
  top: number;
  bottom: number;
  left: number;
  right: number;
}

export interface TextStyle {
  bold?: boolean;
  sizePt?: number;
  color?: Color;
}

/**
 * A top-to-bottom cursor over a growing list of pages. Everything drawn through it goes through
 * the glyph check in `fonts.ts`, and nothing is drawn past the bottom margin.
 */
export class PageFlow {
  readonly pages: PDFPage[] = [];
  page!: PDFPage;
  y = 0;

  constructor(
    readonly doc: PDFDocument,
    readonly fonts: PdfFonts,
    readonly margins: Margins,
    private readonly onNewPage: (flow: PageFlow) => void = () => {},
    readonly pageSizePt: [number, number] = LETTER_PT,
  ) {
    this.newPage();
  }

  get left(): number {
    return this.margins.left;
  }

  get width(): number {
    return this.pageSizePt[0] - this.margins.left - this.margins.right;
  }

  get top(): number {
    return this.pageSizePt[1] - this.margins.top;
  }

  /** Points left above the bottom margin. */
  get room(): number {
    return this.y - this.margins.bottom;
  }

  font(bold = false): PDFFont {
    return bold ? this.fonts.bold : this.fonts.regular;
  }

  newPage(): void {
    this.page = this.doc.addPage(this.pageSizePt);
    this.pages.push(this.page);
    this.y = this.top;
    this.onNewPage(this);
  }

  /** Starts a new page unless `heightPt` still fits on this one. */
  ensure(heightPt: number): void {
    if (heightPt > this.room) this.newPage();
  }

  gap(heightPt: number): void {
    this.y -= heightPt;
  }

  /** One line at an absolute position (our own labels and short values); no wrapping. */
  drawLine(text: string, x: number, baselineY: number, style: TextStyle = {}): void {
    const font = this.font(style.bold);
    this.page.drawText(safeText(font, text), {
      x,
      y: baselineY,
      size: style.sizePt ?? 9,
      font,
      color: style.color ?? COLORS.ink,
    });
  }

  /** Wrapped paragraph at the cursor, breaking onto new pages between lines. */
  paragraph(text: string, style: TextStyle = {}, indentPt = 0): void {
    const font = this.font(style.bold);
    const sizePt = style.sizePt ?? 9;
    const lineH = sizePt * 1.35;
    for (const line of wrapText(font, text, sizePt, this.width - indentPt)) {
      this.ensure(lineH);
      this.page.drawText(line, {
        x: this.left + indentPt,
        y: this.y - sizePt,
        size: sizePt,
        font,
        color: style.color ?? COLORS.ink,
      });
      this.y -= lineH;
    }
  }

  /** A bullet point with a hanging indent. */
  bullet(text: string, style: TextStyle = {}): void {
    const indentPt = 12;
    const font = this.font(style.bold);
    const sizePt = style.sizePt ?? 9;
    const lineH = sizePt * 1.35;
    wrapText(font, text, sizePt, this.width - indentPt).forEach((line, i) => {
      this.ensure(lineH);
      if (i === 0) this.drawLine("•", this.left + 2, this.y - sizePt, { sizePt, color: COLORS.green });
      this.page.drawText(line, {
        x: this.left + indentPt,
        y: this.y - sizePt,
        size: sizePt,
        font,
        color: style.color ?? COLORS.ink,
      });
      this.y -= lineH;
    });
    this.y -= 2;
  }

  /** A green section heading with a rule, kept together with `keepWithPt` of what follows. */
  heading(text: string, keepWithPt = 40): void {
    const sizePt = 12;
    this.ensure(sizePt + 12 + keepWithPt);
    this.gap(6);
    this.drawLine(text, this.left, this.y - sizePt, { bold: true, sizePt, color: COLORS.green });
    this.y -= sizePt + 4;
    this.page.drawLine({
      start: { x: this.left, y: this.y },
      end: { x: this.left + this.width, y: this.y },
      thickness: 0.8,
      color: COLORS.green,
    });
    this.y -= 6;
  }
}

/** A table cell: plain text, or text with a second, muted paragraph under it. */
export type Cell = string | { text: string; bold?: boolean; color?: Color; sub?: string };

export interface Column {
  header: string;
  widthPt: number;
  align?: "left" | "right";
}

export interface TableRow {
  cells: Cell[];
  /** One cell across all columns (notes under an animal). */
  span?: boolean;
  fill?: Color;
  minHeightPt?: number;
  bold?: boolean;
  /** Keeps this row on the same page as the next one; no rule between when the next one spans. */
  keepWithNext?: boolean;
  /** For span rows: where the cell starts, in points from the table's left edge. */
  indentPt?: number;
}

export interface TableSpec {
  columns: Column[];
  rows: TableRow[];
  sizePt?: number;
  /** Drawn above the repeated header on every page after the first. */
  continuedTitle?: string;
  /** Vertical rules between columns, for tables filled in by hand. */
  grid?: boolean;
}

interface LaidLine {
  text: string;
  font: PDFFont;
  color: Color;
}

const PAD_X = 3;
const PAD_Y = 3;

/**
 * Draws a table at the cursor. Rows that do not fit move to a new page under a repeated header;
 * a row taller than a whole page (a very long note) is split between lines.
 */
export function drawTable(flow: PageFlow, spec: TableSpec): void {
  const sizePt = spec.sizePt ?? 8.5;
  const lineH = sizePt * 1.3;
  const header = spec.columns.map((c) => wrapText(flow.fonts.bold, c.header, sizePt, c.widthPt - 2 * PAD_X));
  const headerH = Math.max(...header.map((l) => l.length)) * lineH + 2 * PAD_Y;
  const continuedH = spec.continuedTitle ? sizePt * 1.6 : 0;

  const drawHeader = (continued: boolean): void => {
    if (continued && spec.continuedTitle) {
      flow.drawLine(`${spec.continuedTitle} (continued)`, flow.left, flow.y - sizePt, {
        sizePt,
        color: COLORS.muted,
      });
      flow.y -= continuedH;
    }
    flow.page.drawRectangle({
      x: flow.left,
      y: flow.y - headerH,
      width: flow.width,
      height: headerH,
      color: COLORS.greenTint,
    });
    let x = flow.left;
    spec.columns.forEach((col, i) => {
      drawCellLines(
        flow,
        (header[i] ?? []).map((text) => ({ text, font: flow.fonts.bold, color: COLORS.green })),
        x,
        col,
        sizePt,
        lineH,
      );
      x += col.widthPt;
    });
    flow.y -= headerH;
    rule(flow, COLORS.green, 0.8);
  };

  const firstRowH = spec.rows[0] ? Math.min(rowHeight(layRow(flow, spec, spec.rows[0], sizePt), lineH), 3 * lineH) : 0;
  flow.ensure(headerH + firstRowH);
  drawHeader(false);

  const laid = spec.rows.map((row) => layRow(flow, spec, row, sizePt));
  const heightOf = (i: number): number => {
    const row = spec.rows[i];
    const lines = laid[i];
    return row && lines ? Math.max(rowHeight(lines, lineH), row.minHeightPt ?? 0) : 0;
  };
  spec.rows.forEach((row, i) => {
    let lines = laid[i] ?? [];
    const minH = row.minHeightPt ?? 0;
    const fullH = heightOf(i);
    const keptH = fullH + (row.keepWithNext ? Math.min(heightOf(i + 1), 3 * lineH + 2 * PAD_Y) : 0);
    const freshRoom = flow.top - flow.margins.bottom - headerH - continuedH;
    const nearlyFull = flow.room < 4 * lineH + 2 * PAD_Y;
    // A row kept with the one before it starts beside it and splits, rather than leave it alone.
    const follows = spec.rows[i - 1]?.keepWithNext ?? false;
    if (keptH > flow.room && (nearlyFull || (!follows && keptH <= freshRoom))) {
      flow.newPage();
      drawHeader(true);
    }
    // Split only what cannot fit even on a fresh page.
    while (rowHeight(lines, lineH) > flow.room) {
      const fitLines = Math.max(1, Math.floor((flow.room - 2 * PAD_Y) / lineH));
      drawRow(
        flow,
        spec,
        row,
        lines.map((l) => l.slice(0, fitLines)),
        fitLines * lineH + 2 * PAD_Y,
        sizePt,
        lineH,
        true,
      );
      lines = lines.map((l) => l.slice(fitLines));
      flow.newPage();
      drawHeader(true);
    }
    const ruleBelow = !(row.keepWithNext && spec.rows[i + 1]?.span);
    drawRow(flow, spec, row, lines, Math.max(rowHeight(lines, lineH), minH), sizePt, lineH, ruleBelow);
  });
}

function rowHeight(lines: LaidLine[][], lineH: number): number {
  return Math.max(1, ...lines.map((l) => l.length)) * lineH + 2 * PAD_Y;
}

function layRow(flow: PageFlow, spec: TableSpec, row: TableRow, sizePt: number): LaidLine[][] {
  const widths = row.span ? [flow.width - (row.indentPt ?? 0)] : spec.columns.map((c) => c.widthPt);
  return widths.map((widthPt, i) => layCell(flow, row.cells[i] ?? "", row.bold ?? false, sizePt, widthPt - 2 * PAD_X));
}

function layCell(flow: PageFlow, cell: Cell, rowBold: boolean, sizePt: number, widthPt: number): LaidLine[] {
  const spec = typeof cell === "string" ? { text: cell } : cell;
  const font = flow.font(spec.bold ?? rowBold);
  const color = spec.color ?? COLORS.ink;
  const main = wrapText(font, spec.text, sizePt, widthPt).map((text) => ({ text, font, color }));
  if (!spec.sub) return main;
  const sub = wrapText(flow.fonts.regular, spec.sub, sizePt, widthPt);
  return [...main, ...sub.map((text) => ({ text, font: flow.fonts.regular, color: COLORS.muted }))];
}

function drawRow(
  flow: PageFlow,
  spec: TableSpec,
  row: TableRow,
  lines: LaidLine[][],
  heightPt: number,
  sizePt: number,
  lineH: number,
  ruleBelow: boolean,
): void {
  if (row.fill) {
    flow.page.drawRectangle({
      x: flow.left,
      y: flow.y - heightPt,
      width: flow.width,
      height: heightPt,
      color: row.fill,
    });
  }
  const indentPt = row.span ? (row.indentPt ?? 0) : 0;
  const columns = row.span ? [{ header: "", widthPt: flow.width - indentPt }] : spec.columns;
  let x = flow.left + indentPt;
  columns.forEach((col, i) => {
    drawCellLines(flow, lines[i] ?? [], x, col, sizePt, lineH);
    x += col.widthPt;
    if (spec.grid && i < columns.length - 1) {
      flow.page.drawLine({
        start: { x, y: flow.y },
        end: { x, y: flow.y - heightPt },
        thickness: 0.5,
        color: COLORS.rule,
      });
    }
  });
  flow.y -= heightPt;
  if (ruleBelow) rule(flow, COLORS.rule, 0.5);
}

function drawCellLines(flow: PageFlow, lines: LaidLine[], x: number, col: Column, sizePt: number, lineH: number): void {
  lines.forEach((line, i) => {
    const textW = textWidthPt(line.font, line.text, sizePt);
    const lineX = col.align === "right" ? x + col.widthPt - PAD_X - textW : x + PAD_X;
    flow.page.drawText(line.text, {
      x: lineX,
      y: flow.y - PAD_Y - sizePt - i * lineH,
      size: sizePt,
      font: line.font,
      color: line.color,
    });
  });
}

function rule(flow: PageFlow, color: Color, thickness: number): void {
  flow.page.drawLine({
    start: { x: flow.left, y: flow.y },
    end: { x: flow.left + flow.width, y: flow.y },
    thickness,
    color,
  });
}

/** A bordered, tinted box of our own short bullet points (cautions), kept on one page. */
export function drawNoteBox(
  flow: PageFlow,
  title: string,
  items: string[],
  colors: { border: Color; fill: Color; title: Color },
): void {
  const sizePt = 8.5;
  const lineH = sizePt * 1.35;
  const bullet = "•  ";
  const innerW = flow.width - 20;
  const bulletW = textWidthPt(flow.fonts.regular, bullet, sizePt);
  const wrapped = items.map((item) => wrapText(flow.fonts.regular, item, sizePt, innerW - bulletW));
  const heightPt = 10 + sizePt * 1.6 + wrapped.reduce((n, l) => n + l.length, 0) * lineH + 6;
  flow.ensure(heightPt);
  const topY = flow.y;
  flow.page.drawRectangle({
    x: flow.left,
    y: topY - heightPt,
    width: flow.width,
    height: heightPt,
    color: colors.fill,
    borderColor: colors.border,
    borderWidth: 1,
  });
  flow.drawLine(title, flow.left + 10, topY - 8 - sizePt, { bold: true, sizePt, color: colors.title });
  let y = topY - 10 - sizePt * 1.6;
  for (const lines of wrapped) {
    flow.drawLine(bullet, flow.left + 10, y - sizePt, { sizePt, color: colors.title });
    for (const line of lines) {
      flow.page.drawText(line, {
        x: flow.left + 10 + bulletW,
        y: y - sizePt,
        size: sizePt,
        font: flow.fonts.regular,
        color: COLORS.ink,
      });
      y -= lineH;
    }
  }
  flow.y = topY - heightPt;
}
