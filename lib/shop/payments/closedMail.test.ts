import { describe, expect, it } from "vitest";
import { closedOnRefundMail } from "./closedMail";

// The deposit of tests/integration/shop-balance.test.ts: 25 % of 4,307.82 = 1,076.96 (worked by hand there),
// given back as $500.00 and then $576.96 (500.00 + 576.96 = 1,076.96). 15:00 UTC on Tue 16 March 2027 is 9:00 AM
// in Denver: daylight time (UTC−6) runs from the second Sunday of March, the 14th (15 U.S.C. 260a).
const facts = {
  customer: { name: "Rita <Rivera>", email: "rita@example.test" },
  shop: { name: "Shop A", address: "1 Example Road", phone: "555 0100" },
  quoteNumber: 1003,
  vehicle: "2021 Example Pickup",
  refundedCents: 107696,
  refundedNowCents: 57696,
  at: new Date("2027-03-16T15:00:00Z"),
  timeZone: "America/Denver",
};

describe("closedOnRefundMail", () => {
  it("says the quote is closed and the whole deposit refunded, with the quote number and how to reach the shop", () => {
    const m = closedOnRefundMail(facts);
    expect(m.to).toBe("rita@example.test");
    expect(m.subject).toBe("Closed: quote Q-1003 at Shop A, your deposit of $1,076.96 refunded");
    // It is the last refund's receipt too: what was refunded now, when, for which quote.
    expect(m.text).toContain(
      "Shop A has refunded $576.96 of your deposit for quote Q-1003 (2021 Example Pickup) on Tue, Mar 16, 2027, 9:00 AM MDT.",
    );
    expect(m.text).toContain(
      "Your deposit of $1,076.96 for quote Q-1003 (2021 Example Pickup) has been refunded in full, so the quote is now closed.",
    );
    expect(m.text).toContain("To have the work done after all, call Shop A on 555 0100 for a new quote.");
    expect(m.text).toMatch(/\n\nShop A · 1 Example Road · 555 0100\n$/);
    expect(m.html).toContain("Hello Rita &#60;Rivera&#62;,");
  });

  it("asks the shop by name when it has no phone on file", () => {
    const m = closedOnRefundMail({ ...facts, shop: { name: "Shop A", address: "", phone: "" } });
    expect(m.text).toContain("To have the work done after all, ask Shop A for a new quote.");
  });
});
