import "server-only";
import PDFDocument from "pdfkit";
import { quoteCautions } from "./cautions";
import { type QuoteDocument, hubCautions } from "./document";
import { fitmentChangeRows } from "./fitment";
import { formatBp, formatUsd } from "./money";
import { formatQuantity } from "./quantity";

/** The standard PDF fonts cover WinAnsi only: typographic signs become their plain forms. */
const plain = (s: string) =>
  s
    .replace(/[−–—]/g, "-")
    .replace(/→/g, "->")
    .replace(/≈/g, "~")
    .replace(/[“”]/g, '"')
    .replace(/[‘’]/g, "'")
    .replace(/…/g, "...")
    .replace(/[^\x20-\x7E\xA0-\xFF\n]/g, "?");
const date = (d: Date | string) => new Date(d).toLocaleDateString("en-US", { year: "numeric", month: "short", day: "numeric" });

/**
 * The quote as a PDF (US Letter), built with pdfkit's standard Helvetica: no font files fetched.
 * It prints a QuoteDocument only, so a sent quote prints from what was sent.
 */
export function quotePdf(d: QuoteDocument): Promise<Buffer> {
  const { shop, customer, lines, totals: t } = d;
  const fit = d.fitment;
  const doc = new PDFDocument({ size: "LETTER", margin: 50, info: { Title: `Quote Q-${d.number}`, Author: shop.name } });
  const chunks: Buffer[] = [];
  doc.on("data", (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
  });
  const W = doc.page.width - 100;
  const text = (s: string, opts?: PDFKit.Mixins.TextOptions) => doc.text(plain(s), opts);
  const heading = (s: string) => {
    doc.moveDown(0.8).font("Helvetica-Bold").fontSize(12);
    text(s);
    doc.font("Helvetica").fontSize(10).moveDown(0.2);
  };

  doc.font("Helvetica-Bold").fontSize(18);
  text(shop.name);
  doc.font("Helvetica").fontSize(10);
  if (shop.address) text(shop.address);
  if (shop.phone) text(`Phone ${shop.phone}`);
  doc.moveDown(0.8).font("Helvetica-Bold").fontSize(14);
  text(`Quote Q-${d.number}`);
  doc.font("Helvetica").fontSize(10);
  text(`Date ${date(d.sentAt ?? d.createdAt)}${d.validUntil ? ` - valid until ${date(d.validUntil)}` : ""}${d.preparedBy ? ` - prepared by ${d.preparedBy}` : ""}`);

  heading("Customer");
  text(customer.name);
  text([customer.phone, customer.email].filter(Boolean).join(" - "));
  heading("Vehicle");
  text(`${d.vehicle.description} - bolt pattern ${d.vehicle.boltPattern}${d.vehicle.hubBoreMm !== null ? ` - hub bore ${d.vehicle.hubBoreMm} mm` : ""}`);
  text(`Now: ${fit.current.tire} on ${fit.current.wheel}`);
  text(`Planned: ${fit.planned.tire} on ${fit.planned.wheel}${fit.planned.beadlock ? " (beadlock)" : ""}`);

  heading("Lines");
  const cols = [0, 105, 335, 375, 440];
  const row = (cells: string[], bold = false) => {
    const y = doc.y;
    doc.font(bold ? "Helvetica-Bold" : "Helvetica");
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
    row([l.sku, `${l.description}${l.discountCents ? ` (less ${formatUsd(l.discountCents)})` : ""}${l.taxable ? "" : " *"}`, formatQuantity(l.quantity, l.unit), formatUsd(l.unitPriceCents), formatUsd(l.lineTotalCents)]);
  }
  doc.moveDown(0.5);
  const total = (label: string, value: string, bold = false) => {
    doc.font(bold ? "Helvetica-Bold" : "Helvetica");
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
  doc.font("Helvetica").fontSize(8).moveDown(0.3);
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
  doc.end();
  return done;
}
