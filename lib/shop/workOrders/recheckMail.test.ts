import { describe, expect, it } from "vitest";
import { recheckMail } from "./recheckMail";

const facts = {
  customer: { name: "Ada <Pond>", email: "ada@example.test" },
  shop: { name: "Shop A", address: "1 Test Lane", phone: "555-0100" },
  quoteNumber: 1003,
  vehicle: "Half-ton pickup",
  beadlock: true,
  bookUrl: "https://hubface.test/recheck/tok_en",
};

describe("the re-check e-mail", () => {
  it("gives the booking link in the text and as a link in the HTML, the phone as the other way", () => {
    const m = recheckMail(facts);
    expect(m.text).toContain(
      "Book a 30-minute slot in the next 14 days here (the link works for 30 days):\nhttps://hubface.test/recheck/tok_en\n",
    );
    expect(m.text).toContain("Or call Shop A on 555-0100.");
    expect(m.html).toContain('<a href="https://hubface.test/recheck/tok_en">https://hubface.test/recheck/tok_en</a>');
    expect(m.html).toContain("Hello Ada &#60;Pond&#62;,");
  });

  it("offers the shop's own re-check length when it is given", () => {
    expect(recheckMail({ ...facts, slotMinutes: 45 }).text).toContain("Book a 45-minute slot in the next 14 days here");
  });

  it("without a phone, says to contact the shop; without beadlocks, asks for the lug nuts only", () => {
    const m = recheckMail({ ...facts, beadlock: false, shop: { ...facts.shop, phone: "" } });
    expect(m.text).toContain("Or contact Shop A.");
    expect(m.subject).toBe("Time for your lug re-check at Shop A");
    expect(m.text).toContain("it is time to have the lug nuts re-checked");
  });
});
