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
