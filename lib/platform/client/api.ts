import type { FieldValues, Path, UseFormSetError } from "react-hook-form";

export interface ApiFailure {
  error: string;
  fieldErrors?: Record<string, string[]>;
}

export class ApiError extends Error {
  constructor(
    public readonly status: number,
    public readonly body: ApiFailure,
  ) {
    super(body.error);
  }
}

/**
 * A key for one user action that creates something: the create routes run a request with the
 * same key at most once (lib/platform/http/idempotency.ts), so a retry after a lost answer — the same
 * key, the same body — gets the first answer back instead of a second copy.
 */
export const newIdempotencyKey = (): string => crypto.randomUUID();

/**
 * fetch + JSON both ways; a non-2xx answer becomes an ApiError carrying the field errors. Every
 * POST carries an Idempotency-Key (`init.idempotencyKey` to reuse one on a retry of the same
 * action); routes that create nothing ignore it.
 */
export async function api<T>(url: string, init: { method?: string; body?: unknown; idempotencyKey?: string } = {}): Promise<T> {
  let res: Response;
  const method = init.method ?? (init.body === undefined ? "GET" : "POST");
  const headers: Record<string, string> = {};
  if (init.body !== undefined) headers["Content-Type"] = "application/json";
  if (method === "POST") headers["Idempotency-Key"] = init.idempotencyKey ?? newIdempotencyKey();
  try {
    res = await fetch(url, {
      method,
      headers: Object.keys(headers).length ? headers : undefined,
      body: init.body === undefined ? undefined : JSON.stringify(init.body),
    });
  } catch {
    throw new ApiError(0, { error: "Hubface could not be reached. Check your connection and try again." });
  }
  const data = (await res.json().catch(() => ({}))) as T & Partial<ApiFailure>;
  if (!res.ok)
    throw new ApiError(res.status, { error: data.error ?? `The request failed (${res.status}).`, fieldErrors: data.fieldErrors });
  return data;
}

/** Puts a server's field errors onto the matching form fields; returns what had no field. */
export function applyFieldErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fields: readonly string[],
): string | null {
  if (!(error instanceof ApiError)) return "Something went wrong. Try again.";
  let unplaced: string | null = null;
  for (const [key, messages] of Object.entries(error.body.fieldErrors ?? {})) {
    if (fields.includes(key)) setError(key as Path<T>, { type: "server", message: messages[0] });
    else unplaced = messages[0] ?? unplaced;
  }
  if (!error.body.fieldErrors || Object.keys(error.body.fieldErrors).length === 0) return error.message;
  return unplaced;
}
