/**
 * What the catalog API returns (camelCase, ISO dates) and the row → API mappers; shared by
 * server and client. The shop id and the search key column stay on the server.
 */
import type { CatalogItemRow, CatalogKind, ServiceType, ServiceUnit } from "@/lib/platform/db/types";
import { isoOrNull, rowTimes } from "@/lib/platform/http/isoDates";
import { stockLevel } from "@/lib/shop/catalog/stock";
import type { Pick as FitmentPick } from "@/lib/shop/quotes/fitment";
import type { CounterVehicleForEngine } from "@/lib/shop/customers/schema";
import type { BackspacingReference } from "@/lib/setup/model";

/** The catalog's kinds as the kind filters list them (catalog page, the quote's catalog picker), in this order. */
export const CATALOG_KIND_FILTERS: readonly { kind: CatalogKind; label: string }[] = [
  { kind: "tire", label: "Tires" },
  { kind: "wheel", label: "Wheels" },
  { kind: "service", label: "Services" },
];

export interface CatalogItem {
  id: string;
  kind: CatalogKind;
  sku: string;
  description: string;
  priceCents: number;
  qtyOnHand: number | null;
  tireSize: string | null;
  tireRimIn: number | null;
  tireDiameterMm: number | null;
  wheelDiameterIn: number | null;
  wheelWidthIn: number | null;
  wheelOffsetMm: number | null;
  wheelBackspacingIn: number | null;
  wheelBackspacingReference: BackspacingReference | null;
  boltPattern: string | null;
  centerBoreMm: number | null;
  beadlock: boolean;
  serviceType: ServiceType | null;
  serviceUnit: ServiceUnit | null;
  /** Units accepted quotes hold (lib/shop/catalog/stockQueries.ts). */
  qtyReserved: number;
  /** On hand less held; null when the item is not counted. */
  qtyAvailable: number | null;
  lowStockAt: number | null;
  lowStock: boolean;
  archivedAt: string | null;
  createdAt: string;
  updatedAt: string;
}

/** One page of the catalog, as GET /api/shop/catalog answers. */
export interface CatalogPage {
  items: CatalogItem[];
  total: number;
  page: number;
  pageSize: number;
}

/** The columns the fitment finder reads of a stocked tire or wheel. */
export type StockItem = Pick<
  CatalogItem,
  | "id"
  | "sku"
  | "description"
  | "priceCents"
  | "qtyOnHand"
  | "tireSize"
  | "wheelDiameterIn"
  | "wheelWidthIn"
  | "wheelOffsetMm"
  | "boltPattern"
  | "centerBoreMm"
  | "beadlock"
>;
type StockRow = Pick<
  CatalogItemRow,
  | "id"
  | "sku"
  | "description"
  | "price_cents"
  | "qty_on_hand"
  | "tire_size"
  | "wheel_diameter_in"
  | "wheel_width_in"
  | "wheel_offset_mm"
  | "bolt_pattern"
  | "center_bore_mm"
  | "beadlock"
>;

/**
 * @example
 * stockItemDto({ id: "1", sku: "W-1", price_cents: 18900, bolt_pattern: "6x139.7", … }).priceCents; // 18900
 */
export function stockItemDto(r: StockRow): StockItem {
  return {
    id: r.id,
    sku: r.sku,
    description: r.description,
    priceCents: r.price_cents,
    qtyOnHand: r.qty_on_hand,
    tireSize: r.tire_size,
    wheelDiameterIn: r.wheel_diameter_in,
    wheelWidthIn: r.wheel_width_in,
    wheelOffsetMm: r.wheel_offset_mm,
    boltPattern: r.bolt_pattern,
    centerBoreMm: r.center_bore_mm,
    beadlock: r.beadlock,
  };
}

/** The stock fields of a row, read through stockLevel. */
function stockOf(r: Pick<CatalogItemRow, "qty_on_hand" | "qty_reserved" | "low_stock_at">) {
  const level = stockLevel({ qtyOnHand: r.qty_on_hand, qtyReserved: r.qty_reserved, lowStockAt: r.low_stock_at });
  return { qtyReserved: r.qty_reserved, qtyAvailable: level.available, lowStockAt: r.low_stock_at, lowStock: level.low };
}

/** A catalog row (with or without its search key) as the API sends it. */
export function catalogItemDto(r: CatalogItemRow): CatalogItem {
  return {
    ...stockItemDto(r),
    kind: r.kind,
    tireRimIn: r.tire_rim_in,
    tireDiameterMm: r.tire_diameter_mm,
    wheelBackspacingIn: r.wheel_backspacing_in,
    wheelBackspacingReference: r.wheel_backspacing_reference,
    serviceType: r.service_type,
    serviceUnit: r.service_unit,
    ...stockOf(r),
    archivedAt: isoOrNull(r.archived_at),
    ...rowTimes(r),
  };
}

/** POST /api/shop/fitment/candidates: the stocked tire × wheel pairs that mount, ranked, each with its two items. */
export interface FitmentCandidates {
  vehicle: CounterVehicleForEngine;
  wheelsFitting: number;
  pairs: number;
  picks: (FitmentPick & { tire: StockItem; wheel: StockItem })[];
}
