import { describe, expect, it } from "vitest";
import { type ShopNoticeFacts, shopNoticeMail } from "./mail";

const base: Omit<ShopNoticeFacts, "event"> = {
  to: "owner@example.test",
  shopName: "Ridge <Tires> & Co",
  quoteNumber: 1042,
  customer: { name: "Jo <b>Doe</b>", phone: "555-0142", email: "jo@example.test" },
  vehicle: "Ranch truck",
  totalCents: 430782,
  depositCents: 107696,
  link: "http://127.0.0.1:3000/shop/quotes/q1",
  timeZone: "America/Denver",
};

describe("shopNoticeMail", () => {
  it("names the quote, the customer with their contact, the vehicle and the staff link", () => {
    const m = shopNoticeMail({ ...base, event: { kind: "accepted" } });
    expect(m.to).toBe("owner@example.test");
    expect(m.subject).toBe("Accepted: quote Q-1042 by Jo <b>Doe</b>");
    const lines = [
      "accepted quote Q-1042 ($4,307.82). Deposit asked: $1,076.96.",
      "Customer: Jo <b>Doe</b> · 555-0142 · jo@example.test",
      "Vehicle: Ranch truck",
      "Open the quote: http://127.0.0.1:3000/shop/quotes/q1",
    ];
    for (const line of lines) expect(m.text).toContain(line);
    // Names typed at the counter never become markup in the HTML part.
    expect(m.html).toContain("Jo &#60;b&#62;Doe&#60;/b&#62;");
    expect(m.html).toContain("Ridge &#60;Tires&#62; &#38; Co");
    expect(m.html).not.toContain("<b>");
  });

  it("a payment names its kind and amount", () => {
    const m = shopNoticeMail({ ...base, event: { kind: "paid", payment: "balance", amountCents: 323086 } });
    expect(m.subject).toBe("Paid: $3,230.86 balance on quote Q-1042 by Jo <b>Doe</b>");
  });

  it("booking times are on the shop's clock, with who booked, moved or cancelled", () => {
    // 2026-12-15 16:00 UTC is 9:00 MST (UTC−7 in December, IANA tz database America/Denver).
    const start = new Date("2026-12-15T16:00:00Z");
    const end = new Date("2026-12-15T17:30:00Z");
    const booked = shopNoticeMail({ ...base, event: { kind: "booked", start, end, by: "customer" } });
    expect(booked.subject).toBe("Booked: quote Q-1042, Tue, Dec 15, 2026, 9:00 AM MST – 10:30 AM");
    expect(booked.text).toContain("was booked by the customer on their link for Tue, Dec 15, 2026, 9:00 AM MST – 10:30 AM.");
    const moved = shopNoticeMail({
      ...base,
      event: { kind: "moved", start, end, by: "Sam Staff", previousStart: new Date("2026-12-14T16:00:00Z") },
    });
    expect(moved.text).toContain("was moved by Sam Staff from Mon, Dec 14, 2026, 9:00 AM MST to Tue, Dec 15");
    const cancelled = shopNoticeMail({ ...base, event: { kind: "cancelled", start, end, by: "Sam Staff" } });
    expect(cancelled.subject).toMatch(/^Cancelled: quote Q-1042, Tue, Dec 15/);
    expect(cancelled.text).toContain("was cancelled by Sam Staff.");
  });

  it("a re-check's notices speak of the re-check, never of an install", () => {
    const start = new Date("2026-12-15T16:00:00Z");
    const end = new Date("2026-12-15T16:30:00Z");
    const booked = shopNoticeMail({ ...base, event: { kind: "booked", job: "recheck", start, end, by: "customer" } });
    expect(booked.subject).toBe("Booked: re-check for quote Q-1042, Tue, Dec 15, 2026, 9:00 AM MST – 9:30 AM");
    expect(booked.text).toContain("The lug and ring re-check for quote Q-1042 was booked by the customer on their link for Tue, Dec 15");
    const moved = shopNoticeMail({ ...base, event: { kind: "moved", job: "recheck", start, end, by: "Sam Staff" } });
    expect(moved.subject).toMatch(/^Moved: re-check for quote Q-1042, now Tue, Dec 15/);
    const cancelled = shopNoticeMail({ ...base, event: { kind: "cancelled", job: "recheck", start, end, by: "Sam Staff" } });
    expect(cancelled.text).toContain("The lug and ring re-check for quote Q-1042 on Tue, Dec 15");
    for (const m of [booked, moved, cancelled]) expect(m.text).not.toContain("install");
  });
});
