/**
 * The run sheet (issue 16): what the driver carries on a courier's run. Stops in order with their
 * times, addresses and phones; at each the boxes to load or unload by label and seal with their
 * contents by scientific name and count and whether venomous (50 CFR 14.81); the paperwork each
 * state on the way asks for, as Hatchway's rule library knows it (and "not reviewed" where nobody
 * reviewed a state's rules); the planned rests as guidance; an empty log for the van's temperature.
 */
import { PDFDocument } from "pdf-lib";
import { formatInstant } from "@shared/dates";
import { RUN_STOP_KIND_WORDS } from "@shared/words";
import { embedFonts, fitText, textWidthPt } from "./fonts";
import { COLORS, PageFlow, drawNoteBox, drawTable, type TableRow } from "./layout";

export type RunSheetBox = {
  label: string;
  sealNumber: string | null;
  contents: { scientificName: string; count: number; venomous: boolean | null }[];
};

export type RunSheetStop = {
  kind: "pickup" | "dropoff";
  arriveAt: string;
  leaveAt: string;
  timeZone: string;
  transferNumber: string;
  address: string;
  organizationName: string;
  contactName: string | null;
  phone: string;
  boxes: RunSheetBox[];
};

export type RunSheetState = {
  /** "Tennessee". */
  name: string;
  code: string;
  /** What the rule library says for the boxes, one line each ("HW-…: CVI needed (cite)"). */
  requirements: string[];
  /** Null when the rules were reviewed; otherwise why not, and whom to ask. */
  notReviewed: string | null;
};

export type RunSheetInput = {
  courierName: string;
  departAt: string;
  timeZone: string;
  vehicle: string;
  drivers: string[];
  drivingH: number;
  roadKm: number;
  finishAt: string;
  guidance: string;
  stops: RunSheetStop[];
  rests: { title: string; startAt: string; endAt: string; afterStop: number; timeZone: string }[];
  states: RunSheetState[];
  generatedAt: string;
};

const MARGINS = { top: 40, bottom: 52, left: 36, right: 36 };
const LOG_ROWS = 16;

export const RUN_SHEET_CAUTIONS = [
  "Rules summaries are not legal advice: confirm each state's requirements with its wildlife agency, and the animals' fitness to travel with a licensed veterinarian.",
  "Never leave boxes in a parked van without its climate control running; keep boxes upright, out of the sun and away from vents. Do not open boxes or the containers in them.",
  "Boxes marked VENOMOUS are opened only by the receiver. Different species do not share a container (CITES Rp/3 1.41).",
];

const venomousWords = (v: boolean | null) => (v === null ? "venomous: unknown" : v ? "VENOMOUS" : "not venomous");

export async function renderRunSheetPdf(input: RunSheetInput): Promise<Uint8Array> {
  const doc = await PDFDocument.create();
  doc.setTitle(`Run sheet ${input.courierName} ${input.departAt.slice(0, 10)}`);
  doc.setCreator("Hatchway");
  doc.setProducer("Hatchway");
  doc.setCreationDate(new Date(input.generatedAt));
  doc.setModificationDate(new Date(input.generatedAt));
  const fonts = await embedFonts(doc);
  const flow = new PageFlow(doc, fonts, MARGINS, (f) => {
    if (f.pages.length === 1) return;
    f.drawLine(
      `Run sheet · ${input.courierName} · leaves ${formatInstant(input.departAt, input.timeZone)}`,
      f.left,
      f.y - 8,
      {
        sizePt: 8,
        color: COLORS.muted,
      },
    );
    f.y -= 16;
  });

  drawTitle(flow, input);
  drawNoteBox(flow, "Please read", RUN_SHEET_CAUTIONS, {
    border: COLORS.amber,
    fill: COLORS.amberTint,
    title: COLORS.amber,
  });
  drawStops(flow, input);
  drawRests(flow, input);
  drawStates(flow, input);
  drawTemperatureLog(flow);
  drawFooters(flow, input);
  return doc.save();
}

function drawTitle(flow: PageFlow, input: RunSheetInput): void {
  flow.drawLine("HATCHWAY  ·  RUN SHEET", flow.left, flow.y - 10, { bold: true, sizePt: 9, color: COLORS.green });
  flow.page.drawText(fitText(flow.fonts.bold, input.courierName, 18, flow.width), {
    x: flow.left,
    y: flow.y - 32,
    size: 18,
    font: flow.fonts.bold,
    color: COLORS.ink,
  });
  flow.y -= 44;
  const boxes = input.stops.filter((s) => s.kind === "pickup").reduce((n, s) => n + s.boxes.length, 0);
  const facts: [string, string][] = [
    ["Leaves", formatInstant(input.departAt, input.timeZone)],
    ["Last stop done", formatInstant(input.finishAt, input.timeZone)],
    ["Van", input.vehicle],
    ["Drivers", input.drivers.length ? input.drivers.join(", ") : "not named"],
    ["Stops", `${input.stops.length} (${boxes} boxes)`],
    [
      "Driving",
      `${input.drivingH.toFixed(1)} h, ${Math.round(input.roadKm / 1.609344)} mi (${Math.round(input.roadKm)} km)`,
    ],
  ];
  const colW = flow.width / 3;
  facts.forEach(([label, value], i) => {
    const x = flow.left + (i % 3) * colW;
    const y = flow.y - Math.floor(i / 3) * 24;
    flow.drawLine(label.toUpperCase(), x, y - 6, { sizePt: 6.5, color: COLORS.muted });
    flow.page.drawText(fitText(flow.fonts.bold, value, 9, colW - 8), {
      x,
      y: y - 17,
      size: 9,
      font: flow.fonts.bold,
      color: COLORS.ink,
    });
  });
  flow.y -= 52;
}

function drawStops(flow: PageFlow, input: RunSheetInput): void {
  flow.heading("Stops in order");
  const rows: TableRow[] = [];
  input.stops.forEach((stop, i) => {
    const window = `${formatInstant(stop.arriveAt, stop.timeZone)} – ${formatInstant(stop.leaveAt, stop.timeZone).replace(/^.*, (\d\d:\d\d)/, "$1")}`;
    const who = [stop.organizationName, stop.contactName].filter(Boolean).join(", ");
    rows.push({
      cells: [
        { text: String(i + 1), bold: true },
        { text: RUN_STOP_KIND_WORDS[stop.kind], bold: true, color: stop.kind === "pickup" ? COLORS.green : COLORS.ink },
        { text: window },
        { text: stop.address, sub: `${who} · ${stop.phone}` },
        { text: stop.transferNumber, sub: `${stop.boxes.length} box${stop.boxes.length === 1 ? "" : "es"}` },
      ],
      keepWithNext: stop.boxes.length > 0,
      fill: COLORS.greenTint,
    });
    stop.boxes.forEach((box, b) => {
      const contents = box.contents
        .map((c) => `${c.scientificName} × ${c.count} (${venomousWords(c.venomous)})`)
        .join("; ");
      rows.push({
        cells: [
          `${stop.kind === "pickup" ? "Load" : "Unload"} ${box.label}, seal ${box.sealNumber ?? "none recorded"}: ${contents || "no animals listed"}`,
        ],
        span: true,
        indentPt: 24,
        keepWithNext: b < stop.boxes.length - 1,
      });
    });
  });
  drawTable(flow, {
    columns: [
      { header: "#", widthPt: 20, align: "right" },
      { header: "Do", widthPt: 50 },
      { header: "Planned (arrive – leave)", widthPt: 140 },
      { header: "Address, who, phone", widthPt: 250 },
      { header: "Transfer", widthPt: flow.width - 460 },
    ],
    rows,
    continuedTitle: "Stops in order (continued)",
  });
}

function drawRests(flow: PageFlow, input: RunSheetInput): void {
  flow.heading("Planned rests (guidance)");
  flow.paragraph(input.guidance, { sizePt: 8, color: COLORS.muted });
  flow.gap(4);
  if (input.rests.length === 0) {
    flow.paragraph("The plan needs no rest on this run.", { sizePt: 8.5 });
    return;
  }
  drawTable(flow, {
    columns: [
      { header: "After stop", widthPt: 60, align: "right" },
      { header: "Rest", widthPt: 250 },
      { header: "From", widthPt: 115 },
      { header: "Until", widthPt: flow.width - 425 },
    ],
    rows: input.rests.map((rest) => ({
      cells: [
        String(rest.afterStop + 1),
        rest.title,
        formatInstant(rest.startAt, rest.timeZone),
        formatInstant(rest.endAt, rest.timeZone),
      ],
    })),
  });
}

function drawStates(flow: PageFlow, input: RunSheetInput): void {
  flow.heading("Paperwork by state on the way");
  flow.paragraph(
    "What Hatchway's rule library asks for the boxes on board, state by state along the run. Where a state's rules were not reviewed, nothing here means nothing is needed: ask the state before you cross.",
    { sizePt: 8, color: COLORS.muted },
  );
  flow.gap(4);
  for (const state of input.states) {
    flow.ensure(40);
    flow.paragraph(`${state.name} (${state.code})`, { bold: true, sizePt: 9.5 });
    if (state.notReviewed) flow.bullet(`NOT REVIEWED: ${state.notReviewed}`, { color: COLORS.brick, sizePt: 8.5 });
    if (state.requirements.length === 0 && !state.notReviewed)
      flow.bullet("The reviewed rules ask nothing of these boxes here.", { sizePt: 8.5 });
    for (const line of state.requirements) flow.bullet(line, { sizePt: 8.5 });
  }
}

function drawTemperatureLog(flow: PageFlow): void {
  flow.heading("Van temperature log", 40 + 30 + LOG_ROWS * 22);
  flow.paragraph(
    "Read the van's thermometer at each stop and every few hours on the road; note anything outside the set range and what you did.",
    { sizePt: 8.5 },
  );
  flow.gap(4);
  drawTable(flow, {
    columns: [
      { header: "Date and time", widthPt: 110 },
      { header: "Where", widthPt: 150 },
      { header: "Van °F", widthPt: 60 },
      { header: "Box °F (if read)", widthPt: 80 },
      { header: "Note, initials", widthPt: flow.width - 400 },
    ],
    rows: Array.from({ length: LOG_ROWS }, () => ({ cells: [""], minHeightPt: 22 })),
    continuedTitle: "Van temperature log",
    grid: true,
  });
}

function drawFooters(flow: PageFlow, input: RunSheetInput): void {
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
      fitText(
        flow.fonts.regular,
        `Produced ${formatInstant(input.generatedAt, input.timeZone)} by Hatchway · rests are planning guidance`,
        7.5,
        flow.width - pageW - 20,
      ),
      { x: flow.left, y: 26, size: 7.5, font: flow.fonts.regular, color: COLORS.muted },
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
