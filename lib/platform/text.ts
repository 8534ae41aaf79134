/**
 * Escapes the five characters that can end an HTML text run or attribute value (`& < > " '`) as
 * numeric character references, so a name typed by a user shows as typed inside an e-mail's HTML
 * or an SVG's text, and never opens a tag.
 *
 * @example
 * escapeHtml(`Tom & "Jerry's" <Shop>`); // "Tom &#38; &#34;Jerry&#39;s&#34; &#60;Shop&#62;"
 */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

/**
 * A count with its noun, the noun in the plural unless the count is one, the count grouped in
 * thousands: what a list or a report says of how many ("1 booking", "3 bookings", "10,000 rows").
 * For nouns that add an "s" only.
 *
 * @example
 * countOf(1, "booking");  // "1 booking"
 * countOf(0, "booking");  // "0 bookings"
 * countOf(10000, "row");  // "10,000 rows"
 */
export function countOf(n: number, noun: string): string {
  return `${n.toLocaleString("en-US")} ${noun}${n === 1 ? "" : "s"}`;
}
