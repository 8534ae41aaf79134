/**
 * A quote as a document: everything the PDF, the customer's page and the e-mail show, in one
 * plain object. It is built from the live rows while the quote is a draft, and stored as sent
 * (table quote_documents) when it is sent, so what the customer received never changes after
 * (a renamed shop, a repriced catalog). Pure.
 */
import type { QuoteLineKind, QuoteLineUnit } from "@/lib/platform/db/types";
import { iso } from "@/lib/platform/http/isoDates";
import type { FitmentSummary } from "./fitment";
import { type HubFinding, checkWheelOnHub } from "./hubFit";

export interface QuoteDocumentLine {
  kind: QuoteLineKind;
  sku: string;
  description: string;
  quantity: number;
  unit: QuoteLineUnit;
  unitPriceCents: number;
  discountCents: number;
  lineTotalCents: number;
  taxable: boolean;
}

/** The wheel-on-hub findings of one wheel line (1-based line number, as the screens count). */
export interface HubCheck {
  line: number;
  description: string;
  quantity: number;
  findings: HubFinding[];
}

export interface QuoteDocument {
  version: 1;
  shop: { name: string; address: string; phone: string };
  number: number;
  createdAt: string;
  validUntil: string | null;
  /** When this version was sent; null for a draft's live document. */
  sentAt: string | null;
  preparedBy: string | null;
  customer: { name: string; phone: string; email: string };
  vehicle: { description: string; boltPattern: string; hubBoreMm: number | null };
  fitment: FitmentSummary;
  lines: QuoteDocumentLine[];
  totals: {
    subtotalCents: number;
    discountCents: number;
    taxableCents: number;
    taxRateBp: number;
    taxCents: number;
    totalCents: number;
    depositPct: number;
    depositCents: number;
    balanceCents: number;
  };
  hubChecks: HubCheck[];
  notes: string;
}

export interface DocumentQuoteRow {
  number: number;
  created_at: Date | string;
  valid_until: Date | string | null;
  vehicle_description: string;
  bolt_pattern: string;
  hub_bore_mm: number | null;
  fitment: unknown;
  subtotal_cents: number;
  discount_cents: number;
  taxable_cents: number;
  tax_rate_bp: number;
  tax_cents: number;
  total_cents: number;
  deposit_pct: number;
  deposit_cents: number;
  notes: string;
}

export interface DocumentLineRow {
  kind: QuoteLineKind;
  sku: string;
  description: string;
  quantity: number | string;
  unit: QuoteLineUnit;
  unit_price_cents: number;
  discount_cents: number;
  line_total_cents: number;
  taxable: boolean;
  wheel_bolt_pattern: string | null;
  wheel_center_bore_mm: number | null;
}

/** A line as the document shows it (numeric quantity: pg hands numeric columns over as text). */
export function documentLineDto(l: DocumentLineRow): QuoteDocumentLine {
  return {
    kind: l.kind,
    sku: l.sku,
    description: l.description,
    quantity: Number(l.quantity),
    unit: l.unit,
    unitPriceCents: l.unit_price_cents,
    discountCents: l.discount_cents,
    lineTotalCents: l.line_total_cents,
    taxable: l.taxable,
  };
}

/** The hub checks of a quote's wheel lines against the quoted vehicle. */
export function hubChecksOf(quote: Pick<DocumentQuoteRow, "bolt_pattern" | "hub_bore_mm">, lines: readonly DocumentLineRow[]): HubCheck[] {
  return lines.flatMap((l, i) =>
    l.kind === "wheel"
      ? [
          {
            line: i + 1,
            description: l.description,
            quantity: Number(l.quantity),
            findings: checkWheelOnHub(
              { boltPattern: quote.bolt_pattern, hubBoreMm: quote.hub_bore_mm },
              { boltPattern: l.wheel_bolt_pattern, centerBoreMm: l.wheel_center_bore_mm },
            ),
          },
        ]
      : [],
  );
}

/**
 * @example
 * buildQuoteDocument({ shop, quote, customer, lines, preparedBy: "Sam", sentAt: null }).totals.balanceCents; // total − deposit
 */
export function buildQuoteDocument(input: {
  shop: { name: string; address: string; phone: string };
  quote: DocumentQuoteRow;
  customer: { name: string; phone: string; email: string };
  lines: readonly DocumentLineRow[];
  preparedBy: string | null;
  sentAt: Date | string | null;
}): QuoteDocument {
  const { shop, quote: q, customer, lines } = input;
  return {
    version: 1,
    shop: { name: shop.name, address: shop.address, phone: shop.phone },
    number: q.number,
    createdAt: iso(q.created_at),
    validUntil: q.valid_until ? iso(q.valid_until) : null,
    sentAt: input.sentAt ? iso(input.sentAt) : null,
    preparedBy: input.preparedBy,
    customer: { name: customer.name, phone: customer.phone, email: customer.email },
    vehicle: { description: q.vehicle_description, boltPattern: q.bolt_pattern, hubBoreMm: q.hub_bore_mm },
    fitment: q.fitment as FitmentSummary,
    lines: lines.map(documentLineDto),
    totals: {
      subtotalCents: q.subtotal_cents,
      discountCents: q.discount_cents,
      taxableCents: q.taxable_cents,
      taxRateBp: q.tax_rate_bp,
      taxCents: q.tax_cents,
      totalCents: q.total_cents,
      depositPct: q.deposit_pct,
      depositCents: q.deposit_cents,
      balanceCents: q.total_cents - q.deposit_cents,
    },
    hubChecks: hubChecksOf(q, lines),
    notes: q.notes,
  };
}

/** Hub findings worth telling the customer and the fitter (cautions and refusals). */
export function hubCautions(doc: Pick<QuoteDocument, "hubChecks">): string[] {
  return [...new Set(doc.hubChecks.flatMap((c) => c.findings.filter((f) => f.level !== "ok").map((f) => f.message)))];
}
