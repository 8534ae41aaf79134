import { newIdempotencyKey } from "@/lib/platform/client/api";

/**
 * Sends one photo as multipart/form-data with XMLHttpRequest (fetch cannot report upload
 * progress), with an idempotency key so a retried send is stored once. Resolves with the route's
 * `photo`; rejects with the route's message. Browser only; every photo upload uses it.
 */
export function sendPhoto<T>(
  url: string,
  file: File,
  fields: Record<string, string | null>,
  onProgress: (pct: number) => void,
): Promise<T> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open("POST", url);
    xhr.setRequestHeader("Idempotency-Key", newIdempotencyKey());
    xhr.responseType = "json";
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable) onProgress(Math.round((e.loaded / e.total) * 100));
    };
    xhr.onload = () => {
      const body = (xhr.response ?? {}) as { photo?: T; error?: string };
      if (xhr.status === 201 && body.photo) resolve(body.photo);
      else reject(new Error(body.error ?? `The upload failed (${xhr.status}).`));
    };
    xhr.onerror = () => reject(new Error("The upload did not reach Hubface. Check your connection and try again."));
    const form = new FormData();
    form.set("file", file);
    for (const [k, v] of Object.entries(fields)) if (v) form.set(k, v);
    xhr.send(form);
  });
}
