/**
 * The one refusal of a comma in a typed figure, for every reader of figures people torque,
 * inflate or load by (torque, pressure, load, length). A comma marks decimals in some countries
 * and thousands in others ("1,500" is 1.5 or 1500), so it is never guessed at: the figure is
 * refused and the message says the comma is why, with an example the field accepts.
 */

/**
 * True when a comma sits in the typed figure (before any unit word), e.g. "1,5", "2,2 bar",
 * "3,900 lb", ",5".
 *
 * @example
 * hasNumberComma("32,5 psi"); // true
 * hasNumberComma("32.5 psi"); // false
 */
export function hasNumberComma(text: string): boolean {
  return /^\s*[+\-\u2212]?\s*[\d.]*,/.test(String(text));
}

/**
 * Why a figure with a comma is refused; `shown` is the typed text as the caller quotes it,
 * `example` an accepted figure in the field's unit. The caller puts the field's label first.
 *
 * @example
 * commaRefusal('"18,5"', "17.5"); // '"18,5" is ambiguous — a comma can mark decimals or thousands; write decimals with a point and no thousands separator (e.g. 17.5)'
 */
export function commaRefusal(shown: string, example: string): string {
  return `${shown} is ambiguous — a comma can mark decimals or thousands; write decimals with a point and no thousands separator (e.g. ${example})`;
}
