/**
 * The quote editor's form: lines as typed (text), turned into the request body with every
 * problem named as the screen names the field ("Line 3 — quantity: …"). Pure, shared by the
 * editor and its tests. Also decides whether the form differs from what is saved.
 */
import type { CatalogItem } from "@/lib/shop/catalog/api";
import type { QuoteLineKind, QuoteLineUnit } from "@/lib/platform/db/types";
import type { QuoteLine } from "./api";
import { fieldLabel } from "./fieldLabels";
import { formatCents, parseMoneyToCents } from "./money";
import { QuantityError, parseQuantity } from "./quantity";

export interface EditLine {
  key: string;
  kind: QuoteLineKind;
  unit: QuoteLineUnit;
  catalogItemId: string | null;
  sku: string;
  description: string;
  quantity: string;
  unitPrice: string;
  discount: string;
  taxable: boolean;
}

export interface EditForm {
  lines: EditLine[];
  discount: string;
  notes: string;
}

type SavedLine = Pick<
  QuoteLine,
  "id" | "kind" | "unit" | "catalogItemId" | "sku" | "description" | "quantity" | "unitPriceCents" | "discountCents" | "taxable"
>;

const dollars = (cents: number) => formatCents(cents).replace(/,/g, "");

export const toEditLine = (l: SavedLine): EditLine => ({
  key: l.id,
  kind: l.kind,
  unit: l.unit,
  catalogItemId: l.catalogItemId,
  sku: l.sku,
  description: l.description,
  quantity: String(Number(l.quantity)),
  unitPrice: dollars(l.unitPriceCents),
  discount: dollars(l.discountCents),
  taxable: l.taxable,
});

export function formOf(saved: { lines: readonly SavedLine[]; quote: { discountCents: number; notes: string } }): EditForm {
  return { lines: saved.lines.map(toEditLine), discount: dollars(saved.quote.discountCents), notes: saved.quote.notes };
}

const comparable = (f: EditForm) => JSON.stringify({ ...f, lines: f.lines.map(({ key: _k, ...rest }) => rest) });

/** True when the form holds edits that are not saved. */
export function isDirty(form: EditForm, saved: EditForm): boolean {
  return comparable(form) !== comparable(saved);
}

/** True when this line is exactly as saved (so its saved amount still applies). */
export function lineUnchanged(line: EditLine, saved: readonly SavedLine[]): boolean {
  const s = saved.find((x) => x.id === line.key);
  return !!s && JSON.stringify(toEditLine(s)) === JSON.stringify(line);
}

export interface LineBody {
  kind: QuoteLineKind;
  unit: QuoteLineUnit;
  catalogItemId: string | null;
  sku: string;
  description: string;
  quantity: number;
  unitPriceCents: number;
  discountCents: number;
  taxable: boolean;
}
export interface QuoteBody {
  lines: LineBody[];
  discountCents: number;
  notes: string;
}

/**
 * The PUT body, or the problems that keep it from being sent.
 * @example bodyOf({ lines: [{ ...line, quantity: "1 1/2", unit: "hour" }], discount: "0", notes: "" }).body!.lines[0].quantity; // 1.5
 */
export function bodyOf(form: EditForm): { body: QuoteBody; problems: [] } | { body: null; problems: string[] } {
  const problems: string[] = [];
  const say = (path: string, message: string) => problems.push(`${fieldLabel(path)}: ${message}`);
  const lines = form.lines.map((l, i): LineBody => {
    let quantity = 0;
    try {
      quantity = parseQuantity(l.quantity, l.unit);
    } catch (e) {
      say(`lines.${i}.quantity`, e instanceof QuantityError ? e.message : "Enter a quantity.");
    }
    const unitPriceCents = parseMoneyToCents(l.unitPrice);
    const discountCents = parseMoneyToCents(l.discount.trim() || "0");
    if (!l.description.trim()) say(`lines.${i}.description`, "Describe the line.");
    if (unitPriceCents === null || unitPriceCents < 0) say(`lines.${i}.unitPriceCents`, "Enter the unit price in dollars, like 129.50.");
    if (discountCents === null || discountCents < 0) say(`lines.${i}.discountCents`, "Enter the discount in dollars (0 or more).");
    return {
      kind: l.kind,
      unit: l.unit,
      catalogItemId: l.catalogItemId,
      sku: l.sku,
      description: l.description,
      quantity,
      unitPriceCents: unitPriceCents ?? 0,
      discountCents: discountCents ?? 0,
      taxable: l.taxable,
    };
  });
  if (lines.length === 0) say("lines", "A quote needs at least one line.");
  const discountCents = parseMoneyToCents(form.discount.trim() || "0");
  if (discountCents === null || discountCents < 0) say("discountCents", "Enter the quote discount in dollars (0 or more).");
  if (problems.length) return { body: null, problems };
  return { body: { lines, discountCents: discountCents!, notes: form.notes }, problems: [] };
}

let seq = 0;
const newKey = () => `new-${Date.now()}-${++seq}`;

/** A catalog item as a new line: its own price; items per wheel take the quote's wheel count. */
export function lineFromCatalog(
  item: Pick<CatalogItem, "id" | "kind" | "sku" | "description" | "priceCents" | "serviceUnit">,
  wheelQty: number,
): EditLine {
  const hourly = item.kind === "service" && item.serviceUnit === "per_hour";
  const perWheel = item.kind !== "service" || item.serviceUnit === "per_wheel";
  return {
    key: newKey(),
    kind: item.kind,
    unit: hourly ? "hour" : "each",
    catalogItemId: item.id,
    sku: item.sku,
    description: item.description,
    quantity: String(perWheel ? wheelQty : 1),
    unitPrice: dollars(item.priceCents),
    discount: "0",
    // Parts are taxed, labour and services are not (as on a new quote).
    taxable: item.kind !== "service",
  };
}

/** An hour of labour at the shop's rate. */
export function labourLine(rateCents: number): EditLine {
  return {
    key: newKey(),
    kind: "custom",
    unit: "hour",
    catalogItemId: null,
    sku: "",
    description: "Labour",
    quantity: "1",
    unitPrice: dollars(rateCents),
    discount: "0",
    taxable: false,
  };
}

/** A custom parts line with no price yet: saving asks for one. */
export function partsLine(description: string, quantity: number): EditLine {
  return {
    key: newKey(),
    kind: "custom",
    unit: "each",
    catalogItemId: null,
    sku: "",
    description,
    quantity: String(quantity),
    unitPrice: "",
    discount: "0",
    taxable: true,
  };
}
