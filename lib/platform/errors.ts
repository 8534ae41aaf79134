import type { ApiFailure } from "@/lib/platform/client/api";

/*
 * Domain errors: what went wrong, in the feature's own words and without HTTP. Query modules and
 * services throw these; two places turn them into answers, and only those two:
 *   - route() (lib/platform/http/route.ts) for API handlers: a status and the JSON body
 *     `{ error, fieldErrors? }` the forms read (NotFoundError 404, ConflictError 409,
 *     InvalidError 422, GoneError 410, UnknownReferenceError 400);
 *   - pageGuard() (lib/platform/http/pageGuard.ts) for server pages: NotFoundError → notFound().
 *
 * "Not found", one convention across the query modules (lib/<feature>/queries.ts, *Queries.ts):
 *   - `find*` returns `undefined` when the record is missing or is not the caller's (another
 *     owner's or shop's record is missing, never "forbidden": nobody learns that it exists);
 *   - `get*`, and every function that acts on one record named by id or token (update*,
 *     delete*, revoke*, remove*, answer*, retry* …), throws NotFoundError in that case;
 *   - lists return `[]`.
 * A page that reads through `find*` hands the result to pageGuard too: `undefined` there is
 * the same 404 as a NotFoundError.
 */

/** The message of an answer whose field errors say the rest. */
export const SOME_FIELDS = "Some fields need attention.";

/** Field errors keyed by the request's path ("lines.2.quantity"): the shape ApiError carries to the forms. */
export type FieldErrors = NonNullable<ApiFailure["fieldErrors"]>;

/** Something a caller asked for that the rules refuse; the subclasses say which kind. */
export abstract class DomainError extends Error {
  /**
   * @param details more of the answer beside the message, in API shape (e.g. the existing
   * customer a new one duplicates), sent as they are.
   */
  constructor(
    message: string,
    public readonly details?: Record<string, unknown>,
  ) {
    super(message);
    this.name = new.target.name;
  }
}

/**
 * The record is missing, or is not the caller's.
 *
 * @example
 * throw new NotFoundError("That vehicle"); // message: "That vehicle was not found."
 */
export class NotFoundError extends DomainError {
  constructor(what = "That item") {
    super(`${what} was not found.`);
  }
}

/**
 * The record is in a state that does not allow this (a quote already sent, an import already
 * confirmed, a duplicate of an existing record). `fieldErrors` put the message beside the field
 * it concerns when there is one (a booking time another booking took a moment ago).
 *
 * @example
 * throw new ConflictError("Only a draft can be edited. Take the quote back to draft first.");
 * throw ConflictError.onField("start", "Install time: that time is already taken."); // fieldErrors: { start: [that message] }
 */
export class ConflictError extends DomainError {
  constructor(
    message: string,
    details?: Record<string, unknown>,
    public readonly fieldErrors?: FieldErrors,
  ) {
    super(message, details);
  }

  /** A conflict about one field: the message is also that field's error. */
  static onField(field: string, message: string): ConflictError {
    return new ConflictError(message, undefined, { [field]: [message] });
  }
}

/**
 * The input breaks a rule the schema could not check (the vehicle is someone else's, the wheel
 * does not go on the hub). `fieldErrors` put each message beside its field on the form.
 *
 * @example
 * throw new InvalidError("The customer has no e-mail address. Add one before sending.");
 * throw InvalidError.fields({ vehicleId: ["That vehicle is not in your garage."] }); // message: SOME_FIELDS
 */
export class InvalidError extends DomainError {
  constructor(
    message: string,
    public readonly fieldErrors?: FieldErrors,
    details?: Record<string, unknown>,
  ) {
    super(message, details);
  }

  /** Field errors that say it all: the message is the general SOME_FIELDS. */
  static fields(fieldErrors: FieldErrors): InvalidError {
    return new InvalidError(SOME_FIELDS, fieldErrors);
  }
}

/** A single-use thing that existed and can no longer be used (an invitation expired, withdrawn or already used). */
export class GoneError extends DomainError {}

/**
 * The request names something Hubface never made, as a whole rather than one form field (a
 * provider's event about a checkout Hubface did not open).
 */
export class UnknownReferenceError extends DomainError {}
