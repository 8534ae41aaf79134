/** An error that route handlers turn into a JSON response with this status. */
export class HttpError extends Error {
  constructor(
    public readonly status: number,
    message: string,
    public readonly fieldErrors?: Record<string, string[]>,
  ) {
    super(message);
  }
}

export const unauthorized = () => new HttpError(401, "Sign in to do this.");
export const forbidden = () => new HttpError(403, "Your account's role does not allow this.");
export const notFound = (what = "That item") => new HttpError(404, `${what} was not found.`);
