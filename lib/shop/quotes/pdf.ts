import "server-only";
import { join } from "node:path";
import PDFDocument from "pdfkit";
import SVGtoPDF from "svg-to-pdfkit";
import { quoteCautions } from "./cautions";
import { type QuoteDocument, hubCautions } from "./document";
import { type QuoteDrawing, quoteDrawing } from "./drawing";
import { fitmentChangeRows } from "./fitment";
import { formatBp, formatUsd } from "./money";
import { formatQuantity } from "./quantity";
import { formatDayOf } from "@/lib/shop/bookings/zoned";

/**
 * Inter (SIL OFL 1.1, from the @expo-google-fonts/inter package), embedded as a subset: it covers
 * Latin with Latin Extended A/B and Additional, Greek and Cyrillic, so "Łódź" prints as itself.
 * (pdfkit's standard Helvetica covers WinAnsi only and printed "?ód?".) Read from node_modules
 * at run time, as the server has it; pdfkit is a server external package, never bundled.
 */
const FONT_DIR = join(process.cwd(), "node_modules/@expo-google-fonts/inter");
const REGULAR = join(FONT_DIR, "400Regular/Inter_400Regular.ttf");
const BOLD = join(FONT_DIR, "700Bold/Inter_700Bold.ttf");
const ITALIC = join(FONT_DIR, "400Regular_Italic/Inter_400Regular_Italic.ttf");
const BOLD_ITALIC = join(FONT_DIR, "700Bold_Italic/Inter_700Bold_Italic.ttf");

/** Scripts the embedded font draws; anything else (e.g. CJK) prints as "?" rather than an empty box. */
const plain = (s: string) =>
  s
    .replace(/≈/g, "~")
    .replace(/[^\n\x20-\x7E\xA0-\u024F\u0370-\u03FF\u0400-\u04FF\u1E00-\u1EFF\u2010-\u2027\u2030-\u205E\u20AC\u2190-\u2193\u2212]/gu, "?");
/**
 * A colour the PDF's SVG reader does not parse itself: CSS's space-separated `rgb(r g b / a)`,
 * which the drawing uses for its translucent fills.
 */
function cssColour(parsed: SVGtoPDF.Color | undefined, raw?: string): SVGtoPDF.Color | undefined {
  if (parsed) return parsed;
  const m = /^rgba?\(\s*(\d+)\s+(\d+)\s+(\d+)\s*(?:\/\s*([\d.]+)\s*)?\)$/i.exec(raw?.trim() ?? "");
  return m ? [[Number(m[1]), Number(m[2]), Number(m[3])], m[4] === undefined ? 1 : Number(m[4])] : undefined;
}

/**
 * The cross-section on a page of its own (it is tall: the whole tire, ground to top), as large
 * as the page allows, with the key to its line styles. Drawn with the embedded Inter.
 */
function drawingPage(doc: PDFKit.PDFDocument, drawing: QuoteDrawing, text: (s: string, o?: PDFKit.Mixins.TextOptions) => void) {
  doc.addPage();
  doc.font("Body-Bold").fontSize(12);
  text("Side by side at the hub");
  doc.font("Body").fontSize(9);
  text(
    "To scale, seen from the front, inboard to the left. Current: solid lines, upright figures; planned (the quoted wheel and tire): dashed lines, italic figures. " +
      "Flange, bead seat, pad and sidewall shapes are schematic; every position and dimension is computed from the two setups' figures.",
    { width: doc.page.width - 100 },
  );
  doc.moveDown(0.5);
  const top = doc.y;
  const height = doc.page.height - 50 - top;
  const width = Math.min(doc.page.width - 100, height * drawing.aspect);
  const x = (doc.page.width - width) / 2;
  SVGtoPDF(doc as unknown as Parameters<typeof SVGtoPDF>[0], drawing.svg, x, top, {
    width,
    height: width / drawing.aspect,
    fontCallback: (_family, bold, italic) => (bold ? (italic ? "Body-BoldItalic" : "Body-Bold") : italic ? "Body-Italic" : "Body"),
    colorCallback: cssColour as unknown as SVGtoPDF.Options["colorCallback"],
    // The quote still goes out; the warning says what of the drawing the reader could not draw.
    warningCallback: (w) => console.warn(`quote drawing: ${w}`),
  });
}

/**
 * The quote as a PDF (US Letter), set in the embedded Inter (no font fetched from anywhere).
 * It prints a QuoteDocument only, so a sent quote prints from what was sent, its days on the shop's
 * clock (`timeZone`); the last page is the cross-section of the current and quoted setups
 * (drawing.tsx), when the summary's setups read.
 */
export function quotePdf(d: QuoteDocument, timeZone: string): Promise<Buffer> {
  const { shop, customer, lines, totals: t } = d;
  // Days on the shop's clock (`timeZone`, the shop's IANA zone), not the server's UTC.
  const date = (at: string) => formatDayOf(at, timeZone);
  const fit = d.fitment;
  const doc = new PDFDocument({ size: "LETTER", margin: 50, info: { Title: `Quote Q-${d.number}`, Author: shop.name }, font: REGULAR });
  doc.registerFont("Body", REGULAR);
  doc.registerFont("Body-Bold", BOLD);
  doc.registerFont("Body-Italic", ITALIC);
  doc.registerFont("Body-BoldItalic", BOLD_ITALIC);
  const chunks: Buffer[] = [];
  doc.on("data", (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
  });
  const W = doc.page.width - 100;
  const text = (s: string, opts?: PDFKit.Mixins.TextOptions) => doc.text(plain(s), opts);
  const heading = (s: string) => {
    doc.moveDown(0.8).font("Body-Bold").fontSize(12);
    text(s);
    doc.font("Body").fontSize(10).moveDown(0.2);
  };

  doc.font("Body-Bold").fontSize(18);
  text(shop.name);
  doc.font("Body").fontSize(10);
  if (shop.address) text(shop.address);
  if (shop.phone) text(`Phone ${shop.phone}`);
  doc.moveDown(0.8).font("Body-Bold").fontSize(14);
  text(`Quote Q-${d.number}`);
  doc.font("Body").fontSize(10);
  text(
    `Date ${date(d.sentAt ?? d.createdAt)}${d.validUntil ? ` - valid until ${date(d.validUntil)}` : ""}${d.preparedBy ? ` - prepared by ${d.preparedBy}` : ""}`,
  );

  heading("Customer");
  text(customer.name);
  text([customer.phone, customer.email].filter(Boolean).join(" - "));
  heading("Vehicle");
  text(
    `${d.vehicle.description} - bolt pattern ${d.vehicle.boltPattern}${d.vehicle.hubBoreMm !== null ? ` - hub bore ${d.vehicle.hubBoreMm} mm` : ""}`,
  );
  text(`Now: ${fit.current.tire} on ${fit.current.wheel}`);
  text(`Planned: ${fit.planned.tire} on ${fit.planned.wheel}${fit.planned.beadlock ? " (beadlock)" : ""}`);

  heading("Lines");
  const cols = [0, 105, 335, 375, 440];
  const row = (cells: string[], bold = false) => {
    const y = doc.y;
    doc.font(bold ? "Body-Bold" : "Body");
    const widths = [103, 225, 38, 63, W - 440];
    let h = 0;
    cells.forEach((c, i) => {
      const align = i >= 2 ? "right" : "left";
      doc.text(plain(c), 50 + cols[i]!, y, { width: widths[i], align });
      h = Math.max(h, doc.y - y);
    });
    doc.x = 50;
    doc.y = y + h + 3;
    if (doc.y > doc.page.height - 90) doc.addPage();
  };
  row(["SKU", "Description", "Qty", "Unit", "Amount"], true);
  for (const l of lines) {
    row([
      l.sku,
      `${l.description}${l.discountCents ? ` (less ${formatUsd(l.discountCents)})` : ""}${l.taxable ? "" : " *"}`,
      formatQuantity(l.quantity, l.unit),
      formatUsd(l.unitPriceCents),
      formatUsd(l.lineTotalCents),
    ]);
  }
  doc.moveDown(0.5);
  const total = (label: string, value: string, bold = false) => {
    doc.font(bold ? "Body-Bold" : "Body");
    const y = doc.y;
    doc.text(plain(label), 50 + 250, y, { width: 180, align: "right" });
    doc.text(plain(value), 50 + 440, y, { width: W - 440, align: "right" });
    doc.x = 50;
  };
  total("Subtotal", formatUsd(t.subtotalCents));
  if (t.discountCents) total("Discount", `-${formatUsd(t.discountCents)}`);
  total(`Tax ${formatBp(t.taxRateBp)}% on ${formatUsd(t.taxableCents)}`, formatUsd(t.taxCents));
  total("Total", formatUsd(t.totalCents), true);
  total(`Deposit (${t.depositPct}%)`, formatUsd(t.depositCents));
  total("Balance due after the deposit", formatUsd(t.balanceCents));
  doc.font("Body").fontSize(8).moveDown(0.3);
  text("* not taxed", { width: W, align: "right" });
  doc.fontSize(10);
  if (d.notes) {
    heading("Notes");
    text(d.notes, { width: W });
  }

  heading("Fitment summary");
  const facts = fitmentChangeRows(fit);
  for (const [k, v] of facts) text(`${k}: ${v}`);
  if (fit.warnings.length) {
    heading("Clearance warnings");
    for (const w of fit.warnings) text(`- ${w}`, { width: W });
  }
  const hub = hubCautions(d);
  if (hub.length) {
    heading("Wheel on the hub");
    for (const h of hub) text(`- ${h}`, { width: W });
  }
  heading("Modifications required");
  if (fit.modifications.length) for (const m of fit.modifications) text(`- ${m}`, { width: W });
  else text("None expected from the numbers.");
  heading("Cautions");
  doc.fontSize(9);
  for (const c of quoteCautions(fit)) text(`- ${c}`, { width: W });
  const drawing = quoteDrawing(fit);
  if (drawing) drawingPage(doc, drawing, text);
  doc.end();
  return done;
}
