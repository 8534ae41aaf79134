/**
 * An error of the request itself (its body, its origin, its session, its rate) that route()
 * turns into a JSON response with this status. What a feature refuses — a missing record, a
 * conflict, a rule the input breaks — is a domain error instead (lib/platform/errors.ts).
 */
export class HttpError extends Error {
  constructor(
    public readonly status: number,
    message: string,
    public readonly fieldErrors?: Record<string, string[]>,
    /** Extra response headers, e.g. Retry-After on a 429. */
    public readonly headers?: Record<string, string>,
  ) {
    super(message);
  }
}

export const unauthorized = () => new HttpError(401, "Sign in to do this.");
export const forbidden = () => new HttpError(403, "Your account's role does not allow this.");

/*
 * People never see a validator's own wording ("Invalid input: expected number, received
 * string") or a raw path ("lines.8.discountCents"). Schemas give their own messages; whatever
 * they leave out gets a message here that names the field in words, with rows counted from 1.
 * The keys of `fieldErrors` stay paths: forms use them to put a message beside its field.
 */

/** Unit suffixes of the API's field names, as a person writes them ("" = say nothing). */
const UNITS: Record<string, string> = {
  mm: "mm",
  in: "in",
  deg: "°",
  pct: "%",
  mph: "mph",
  kmh: "km/h",
  psi: "psi",
  kpa: "kPa",
  nm: "N·m",
  ftlb: "ft·lb",
  kg: "kg",
  lb: "lb",
  lbs: "lb",
  cents: "",
  bp: "",
  id: "",
  ids: "",
};
/** Envelopes that say nothing to a person. */
const ENVELOPES = new Set(["input", "body", "query", "params", "data"]);

/** "wheelWidthIn" → { words: "wheel width", unit: "in" }; "shop_id" → { words: "shop" }. */
function wordsOf(segment: string): { words: string; unit?: string } {
  const parts = segment
    .replace(/[_-]+/g, " ")
    .replace(/([a-z0-9])([A-Z])/g, "$1 $2")
    .toLowerCase()
    .split(/\s+/)
    .filter(Boolean);
  const last = parts.at(-1) ?? "";
  if (parts.length > 1 && last in UNITS) {
    parts.pop();
    return { words: parts.join(" "), unit: UNITS[last] || undefined };
  }
  return { words: parts.join(" ") };
}

const singular = (words: string) => words.replace(/(ie)s$/, "y").replace(/([^s])s$/, "$1");
const capital = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

/**
 * Where a field sits, in words: the row ("Line 9", counted from 1) and the field ("discount",
 * "current wheel width (in)").
 *
 * @example
 * fieldPlace(["lines", 8, "discountCents"]); // { row: "Line 9", field: "discount" }
 * fieldPlace(["input", "planned", "wheelWidthIn"]); // { row: null, field: "planned wheel width (in)" }
 */
export function fieldPlace(path: readonly PropertyKey[]): { row: string | null; field: string } {
  const segs = path
    .filter((s): s is string | number => typeof s !== "symbol")
    .map((s) => (typeof s === "string" && /^\d+$/.test(s) ? Number(s) : s));
  const rows: string[] = [];
  let words: string[] = [];
  let unit: string | undefined;
  segs.forEach((seg, i) => {
    if (typeof seg === "number") {
      // The row is named after its list alone ("lines.8" → "Line 9"); the words before it were context.
      rows.push(`${singular(words.at(-1) ?? "row")} ${seg + 1}`);
      words = [];
      unit = undefined;
      return;
    }
    if (i === 0 && ENVELOPES.has(seg) && segs.length > 1) return;
    const w = wordsOf(seg);
    if (w.words) words.push(w.words);
    unit = w.unit;
  });
  const field = words.length ? `${words.join(" ")}${unit ? ` (${unit})` : ""}` : rows.length ? "" : "the request";
  return { row: rows.length ? capital(rows.join(", ")) : null, field };
}

/** The parts of a zod issue the fallback reads (kept loose: raw and final issues both fit). */
export interface IssueLike {
  code: string;
  path?: readonly PropertyKey[];
  input?: unknown;
  expected?: string;
  origin?: string;
  minimum?: number | bigint;
  maximum?: number | bigint;
  inclusive?: boolean;
  format?: string;
  divisor?: number | bigint;
  values?: readonly unknown[];
}

function fallbackSentence(issue: IssueLike, field: string): string {
  const f = field || "this value";
  const n = (v: number | bigint | undefined) => String(v ?? "");
  switch (issue.code) {
    case "invalid_type":
      if (issue.input === undefined) return `Enter ${f}.`;
      if (issue.expected === "int" || issue.expected === "bigint") return `Enter ${f} as a whole number.`;
      if (issue.expected === "number") return `Enter ${f} as a number.`;
      if (issue.expected === "string") return `Enter ${f} as text.`;
      if (issue.expected === "boolean") return `Choose yes or no for ${f}.`;
      if (issue.expected === "array") return `Give ${f} as a list.`;
      if (issue.expected === "null") return `Leave ${f} empty.`;
      if (issue.expected === "date") return `Enter ${f} as a date.`;
      return `${capital(f)} is missing or incomplete.`;
    case "too_small":
      if (issue.origin === "string")
        return n(issue.minimum) === "1" ? `Enter ${f}.` : `Use at least ${n(issue.minimum)} characters for ${f}.`;
      if (issue.origin === "array" || issue.origin === "set") return `Give at least ${n(issue.minimum)} for ${f}.`;
      return `${capital(f)} must be ${issue.inclusive === false ? "more than" : "at least"} ${n(issue.minimum)}.`;
    case "too_big":
      if (issue.origin === "string") return `Use at most ${n(issue.maximum)} characters for ${f}.`;
      if (issue.origin === "array" || issue.origin === "set") return `Give at most ${n(issue.maximum)} for ${f}.`;
      return `${capital(f)} must be ${issue.inclusive === false ? "less than" : "at most"} ${n(issue.maximum)}.`;
    case "invalid_format":
      if (issue.format === "email") return `Enter an e-mail address like name@example.com for ${f}.`;
      if (issue.format === "url") return `Enter a web address for ${f}.`;
      if (issue.format === "date" || issue.format === "datetime") return `Enter ${f} as a date.`;
      if (issue.format === "uuid" || issue.format === "guid") return `${capital(f)} does not point to anything Hubface knows.`;
      return `${capital(f)} is not in the expected form.`;
    case "not_multiple_of":
      return `${capital(f)} must be a multiple of ${n(issue.divisor)}.`;
    case "invalid_value": {
      const values = (issue.values ?? []).map((v) => (typeof v === "string" ? v.replace(/_/g, " ") : String(v)));
      if (values.length === 0 || values.length > 8) return `Choose one of the offered options for ${f}.`;
      const list = values.length === 1 ? values[0] : `${values.slice(0, -1).join(", ")} or ${values.at(-1)}`;
      return `Choose ${f}: ${list}.`;
    }
    case "unrecognized_keys":
      return "The request has a field Hubface does not take; reload the page and try again.";
    default:
      return `Check ${f}.`;
  }
}

/**
 * A person's message for an issue the schema gave no message of its own: it names the field
 * in words, and its row counted from 1.
 *
 * @example
 * fallbackMessage({ code: "invalid_type", expected: "number", input: "x", path: ["lines", 8, "discountCents"] });
 * // "Line 9: enter the discount as a number."
 */
export function fallbackMessage(issue: IssueLike): string {
  const { row, field } = fieldPlace(issue.path ?? []);
  const sentence = fallbackSentence(issue, field && field !== "the request" ? `the ${field}` : field);
  return row ? `${row}: ${sentence.charAt(0).toLowerCase()}${sentence.slice(1)}` : capital(sentence);
}

/**
 * Field errors as people read them: a message about a row (a key with a list index) says which
 * row, counted from 1, unless it already does ("Line 9: Discounts cannot be negative.").
 */
export function withRows(fieldErrors: Record<string, string[]>): Record<string, string[]> {
  const out: Record<string, string[]> = {};
  for (const [key, messages] of Object.entries(fieldErrors)) {
    const { row } = fieldPlace(key.split("."));
    out[key] = row ? messages.map((m) => (new RegExp(`\\b${row}\\b`, "i").test(m) ? m : `${row}: ${m}`)) : messages;
  }
  return out;
}
