/**
 * A server's field errors as one sentence that names each field the way the screen labels it
 * ("Shop: pick a shop."), for screens that show one message rather than an error under each
 * field (a table row, a search box, an upload). Pure: used by route handlers and components.
 */

/** Field name → the label the screen shows for it. */
export type FieldLabels = Readonly<Record<string, string>>;

/** "Pick a shop." → "pick a shop."; "SKU is taken." stays (an abbreviation keeps its capitals). */
const sentenceAfterColon = (m: string) => (/^[A-Z][a-z]/.test(m) ? m.charAt(0).toLowerCase() + m.slice(1) : m);

/**
 * The labelled fields' first messages, each after its label; null when no labelled field has one.
 *
 * @example
 * labelledMessage({ shopId: ["Pick a shop."] }, { shopId: "Shop" }); // "Shop: pick a shop."
 */
export function labelledMessage(fieldErrors: Readonly<Record<string, readonly string[]>> | undefined, labels: FieldLabels): string | null {
  const parts = Object.entries(fieldErrors ?? {}).flatMap(([field, messages]) => {
    const label = labels[field];
    const first = messages[0];
    return label && first ? [`${label}: ${sentenceAfterColon(first)}`] : [];
  });
  return parts.length ? parts.join(" ") : null;
}
