import type { Color, PDFPage } from "pdf-lib";
import { rgb } from "pdf-lib";
import QRCode from "qrcode";

/** Light modules a scanner needs around the symbol (ISO/IEC 18004 asks for 4). */
export const QR_QUIET_ZONE_MODULES = 4;

export interface QrPlacement {
  /** Lower-left corner of the symbol including its quiet zone, in PDF points. */
  x: number;
  y: number;
  /** Side of the square including the quiet zone, in PDF points. */
  sizePt: number;
  color?: Color;
}

/**
 * Draws `text` as a QR code of vector squares (one path, dark runs merged per row) so it stays
 * sharp at any print resolution and costs a few hundred bytes. Error correction M survives the
 * creases and scuffs a box label gets. Returns the module size in points.
 */
export function drawQrCode(page: PDFPage, text: string, placement: QrPlacement): number {
  const { modules } = QRCode.create(text, { errorCorrectionLevel: "M" });
  const n = modules.size;
  const modulePt = placement.sizePt / (n + 2 * QR_QUIET_ZONE_MODULES);
  let path = "";
  for (let row = 0; row < n; row++) {
    let col = 0;
    while (col < n) {
      if (!modules.get(row, col)) {
        col++;
        continue;
      }
      const start = col;
      while (col < n && modules.get(row, col)) col++;
      // Overlap runs by a hair so anti-aliasing draws no seams between rows.
      path += `M${start} ${row}h${col - start}v1.02h${start - col}z`;
    }
  }
  const quietPt = QR_QUIET_ZONE_MODULES * modulePt;
  // drawSvgPath puts the SVG origin at (x, y) with y growing downwards.
  page.drawSvgPath(path, {
    x: placement.x + quietPt,
    y: placement.y + placement.sizePt - quietPt,
    scale: modulePt,
    color: placement.color ?? rgb(0, 0, 0),
  });
  return modulePt;
}
