/**
 * Quote totals in integer cents. Pure; the server is the only caller that stores the result.
 *
 * - line gross = quantity × unit price. Quantities are whole, or hundredths of an hour for
 *   hourly labour, so gross = hundredths × price / 100; where that is not a whole cent it is
 *   rounded half a cent up on the line (1.5 h × 145.00 = 217.50 exactly; 0.01 h × 9.99 → 0.10);
 *   line net = gross − line discount (never below 0);
 * - subtotal = Σ line net; the quote discount (≤ subtotal) is spread over the lines in proportion
 *   to their net, the leftover cents going to the largest remainders (ties: earlier line), so the
 *   shares always add up to the discount exactly;
 * - tax = taxable base × rate, rounded once on the total, half a cent up
 *   (rounding on the invoice total rather than per line is common practice, no source — some
 *   jurisdictions round per line);
 * - total = subtotal − quote discount + tax; deposit = total × deposit % (half a cent up);
 * - balance due after the deposit = total − deposit (so deposit + balance is the total, to the cent).
 */
import { MAX_QUANTITY, toHundredths } from "./quantity";

export interface TotalsLine {
  quantity: number;
  unitPriceCents: number;
  discountCents: number;
  taxable: boolean;
}

export interface TotalsInput {
  lines: readonly TotalsLine[];
  /** Discount on the whole quote, cents. */
  discountCents: number;
  /** Tax rate in basis points (8.25 % = 825). */
  taxRateBp: number;
  /** Deposit as a whole percentage of the total. */
  depositPct: number;
}

export interface Totals {
  lines: { grossCents: number; netCents: number; quoteDiscountShareCents: number }[];
  subtotalCents: number;
  discountCents: number;
  taxableCents: number;
  taxCents: number;
  totalCents: number;
  depositCents: number;
  /** What the customer still owes once the deposit is paid. */
  balanceCents: number;
}

export class TotalsError extends Error {
  constructor(
    public readonly field: string,
    message: string,
  ) {
    super(message);
  }
}

const isCount = (n: number, max: number) => Number.isSafeInteger(n) && n >= 0 && n <= max;

/** round(a / b), half up, for a ≥ 0 and b > 0, exactly in integers. */
export function divRoundHalfUp(a: number, b: number): number {
  return Math.floor((2 * a + b) / (2 * b));
}

/**
 * @example
 * computeTotals({ lines: [{ quantity: 4, unitPriceCents: 38900, discountCents: 0, taxable: true }], discountCents: 0, taxRateBp: 825, depositPct: 25 }).totalCents; // 168437
 */
export function computeTotals(input: TotalsInput): Totals {
  const { lines, discountCents, taxRateBp, depositPct } = input;
  if (!isCount(taxRateBp, 10_000)) throw new TotalsError("taxRateBp", "The tax rate must be 0–100 % in basis points.");
  if (!isCount(depositPct, 100)) throw new TotalsError("depositPct", "The deposit must be 0–100 %.");
  if (!isCount(discountCents, 1e11)) throw new TotalsError("discountCents", "The discount must be a whole number of cents, 0 or more.");
  const out = lines.map((l, i) => {
    const hundredths = Number.isFinite(l.quantity) ? toHundredths(l.quantity) : null;
    if (hundredths === null || hundredths < 1 || l.quantity > MAX_QUANTITY) {
      throw new TotalsError(`lines.${i}.quantity`, `Quantity must be more than 0 and at most ${MAX_QUANTITY}, with at most two decimals.`);
    }
    if (!isCount(l.unitPriceCents, 1e9))
      throw new TotalsError(`lines.${i}.unitPriceCents`, "The price must be a whole number of cents, 0 or more.");
    if (!isCount(l.discountCents, 1e11))
      throw new TotalsError(`lines.${i}.discountCents`, "The discount must be a whole number of cents, 0 or more.");
    const gross = Number.isInteger(l.quantity) ? l.quantity * l.unitPriceCents : divRoundHalfUp(hundredths * l.unitPriceCents, 100);
    if (l.discountCents > gross) throw new TotalsError(`lines.${i}.discountCents`, "A line's discount cannot exceed the line's amount.");
    return { grossCents: gross, netCents: gross - l.discountCents, quoteDiscountShareCents: 0 };
  });
  const subtotal = out.reduce((s, l) => s + l.netCents, 0);
  if (discountCents > subtotal) throw new TotalsError("discountCents", "The discount cannot exceed the subtotal.");

  // Largest-remainder allocation of the quote discount.
  if (discountCents > 0) {
    const shares = out.map((l, i) => {
      const exact = l.netCents * discountCents;
      return { i, floor: Math.floor(exact / subtotal), rem: exact % subtotal };
    });
    let left = discountCents - shares.reduce((s, x) => s + x.floor, 0);
    for (const s of [...shares].sort((a, b) => b.rem - a.rem || a.i - b.i)) {
      if (left <= 0) break;
      s.floor++;
      left--;
    }
    for (const s of shares) out[s.i]!.quoteDiscountShareCents = s.floor;
  }
  const taxable = out.reduce((s, l, i) => s + (lines[i]!.taxable ? l.netCents - l.quoteDiscountShareCents : 0), 0);
  const tax = divRoundHalfUp(taxable * taxRateBp, 10_000);
  const total = subtotal - discountCents + tax;
  const deposit = divRoundHalfUp(total * depositPct, 100);
  return {
    lines: out,
    subtotalCents: subtotal,
    discountCents,
    taxableCents: taxable,
    taxCents: tax,
    totalCents: total,
    depositCents: deposit,
    balanceCents: total - deposit,
  };
}
