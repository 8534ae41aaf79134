/**
 * The counter's reading of an item's stock: what is on the shelf, what accepted quotes hold, what
 * is left to sell, and whether that is low. Pure; shared by the API mappers and the screens.
 */

export interface StockCounts {
  /** Null: the item is not counted (services, untracked items), so it is never short or low. */
  qtyOnHand: number | null;
  qtyReserved: number;
  /** Available count at or under which the item is low; null = never low. */
  lowStockAt: number | null;
}

export interface StockLevel {
  /** On hand less what accepted quotes hold; null when the item is not counted. */
  available: number | null;
  low: boolean;
}

/**
 * @example
 * stockLevel({ qtyOnHand: 8, qtyReserved: 4, lowStockAt: 4 }); // { available: 4, low: true }
 * stockLevel({ qtyOnHand: null, qtyReserved: 0, lowStockAt: 4 }); // { available: null, low: false }
 */
export function stockLevel({ qtyOnHand, qtyReserved, lowStockAt }: StockCounts): StockLevel {
  if (qtyOnHand === null) return { available: null, low: false };
  const available = qtyOnHand - qtyReserved;
  return { available, low: lowStockAt !== null && available <= lowStockAt };
}
