import { describe, expect, it } from "vitest";
import { bookingMail } from "./mail";

const facts = {
  kind: "reminder" as const,
  bookingId: "b1",
  sequence: 0,
  start: new Date("2027-03-16T15:00:00Z"),
  end: new Date("2027-03-16T15:30:00Z"),
  timeZone: "America/Denver",
  quoteNumber: 1003,
  vehicle: "Half-ton pickup",
  customer: { name: "Ada", email: "ada@example.test" },
  shop: { name: "Shop A", address: "1 Test Lane", phone: "555-0100" },
  origin: "https://hubface.test",
  organizerEmail: "shop@example.test",
};

describe("booking e-mails name what is booked", () => {
  it("an install when the booking says nothing else", () => {
    const m = bookingMail(facts);
    expect(m.subject).toBe("Reminder: your install at Shop A tomorrow, 9:00 AM");
    expect(m.attachments![0]!.filename).toBe("install-Q-1003.ics");
  });

  it("the re-check by its own words, in the subject, the text, the calendar entry and the file name", () => {
    const m = bookingMail({ ...facts, kind: "confirmed", job: "recheck" });
    expect(m.subject).toMatch(/^Booked: your lug and ring re-check at Shop A, /);
    expect(m.text).toContain("Your lug and ring re-check for quote Q-1003 (Half-ton pickup) is booked for");
    // 15:00Z is 9:00 AM MDT (UTC−6 from the second Sunday of March, 15 U.S.C. §260a), a 30-minute stay.
    expect(m.text).toContain("Plan on the truck staying 30 min.");
    expect(m.attachments![0]!.filename).toBe("recheck-Q-1003.ics");
    expect(m.attachments![0]!.content.toString()).toContain("SUMMARY:Lug and ring re-check\\, Shop A (Q-1003)");
  });

  it("an install no longer needed because the work was done: the calendar entry withdrawn, no stay asked for (common practice, no source)", () => {
    const m = bookingMail({ ...facts, kind: "released", sequence: 1 });
    expect(m.subject).toMatch(/^No longer needed: your install at Shop A, /);
    expect(m.text).toContain("The work on quote Q-1003 (Half-ton pickup) is done, so the install booked for");
    expect(m.text).not.toContain("Plan on the truck staying");
    expect(m.attachments![0]!.contentType).toBe("text/calendar; charset=utf-8; method=CANCEL");
    // RFC 5546 §3.2.5 (CANCEL): STATUS:CANCELLED cancels the whole event; the SEQUENCE is the one the booking was raised to.
    const ics = m.attachments![0]!.content.toString();
    expect(ics).toContain("METHOD:CANCEL");
    expect(ics).toContain("STATUS:CANCELLED");
    expect(ics).toContain("SEQUENCE:1");
  });
});
