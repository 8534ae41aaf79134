import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { DependencyUnavailableError, isNetworkFailure } from "@/lib/platform/http/dependency";
import { QUEUES, getBoss } from "@/lib/platform/jobs/boss";

/** The sender of every mail ("Name <address>"); calendar files name its address as organizer. */
export const mailFrom = (): string => process.env.MAIL_FROM ?? "Hubface <no-reply@hubface.test>";

const globalForMail = globalThis as unknown as { hubfaceMail?: Transporter };

function transport(): Transporter {
  const url = process.env.SMTP_URL;
  if (!url) throw new Error("SMTP_URL is not set (e.g. smtp://127.0.0.1:2525).");
  return (globalForMail.hubfaceMail ??= nodemailer.createTransport(url));
}

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
  attachments?: { filename: string; content: Buffer; contentType: string }[];
}

/**
 * Sends now, through SMTP; throws when the mail server refuses or cannot be reached (then as a
 * DependencyUnavailableError, so the answer names the mail server). The mail worker calls this.
 */
export async function sendMail(mail: OutgoingMail): Promise<void> {
  try {
    await transport().sendMail({ from: mailFrom(), ...mail });
  } catch (error) {
    throw isNetworkFailure(error) ? new DependencyUnavailableError("mail server", error) : error;
  }
}

/**
 * Attachments travel inside the job as base64, so a retry hours later sends exactly what the
 * user sent (a quote's PDF as it was at the moment of sending, even if the quote changed since).
 * The cap keeps job rows small: a quote PDF is tens of KB; anything near this size belongs in
 * the photo store with a link instead.
 */
export const MAX_QUEUED_ATTACHMENT_BYTES = 2 * 1024 * 1024;

/** A mail as stored in the job (JSON). */
export interface QueuedMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
  attachments?: { filename: string; contentBase64: string; contentType: string }[];
}

/** The mail with each attachment converted; a mail without attachments gets no `attachments` key at all. */
function withAttachments<M extends { attachments?: unknown[] }, B>(
  mail: M,
  convert: (a: NonNullable<M["attachments"]>[number]) => B,
): Omit<M, "attachments"> & { attachments?: B[] } {
  const { attachments, ...rest } = mail;
  return { ...rest, ...(attachments?.length ? { attachments: attachments.map(convert) } : {}) };
}

export function toQueued(mail: OutgoingMail): QueuedMail {
  const size = (mail.attachments ?? []).reduce((n, a) => n + a.content.length, 0);
  if (size > MAX_QUEUED_ATTACHMENT_BYTES) {
    throw new Error(
      `Attachments of ${Math.round(size / 1024)} KB exceed the ${MAX_QUEUED_ATTACHMENT_BYTES / 1024 / 1024} MB a queued mail may carry.`,
    );
  }
  return withAttachments(mail, (a) => ({ filename: a.filename, contentType: a.contentType, contentBase64: a.content.toString("base64") }));
}

export function fromQueued(mail: QueuedMail): OutgoingMail {
  return withAttachments(mail, (a) => ({
    filename: a.filename,
    contentType: a.contentType,
    content: Buffer.from(a.contentBase64, "base64"),
  }));
}

/**
 * Stores the mail as a job and returns at once; a worker sends it, retrying with exponential
 * backoff while the mail server is away (lib/platform/jobs/boss.ts QUEUES.mail). Use it wherever the
 * person does not need the mail to have left before the answer. Returns the job id.
 */
export async function queueMail(mail: OutgoingMail): Promise<string> {
  const boss = await getBoss();
  const id = await boss.send(QUEUES.mail.name, toQueued(mail) as unknown as object);
  if (!id) throw new Error("the job queue did not accept the mail");
  return id;
}

/** The public origin used in links inside e-mails. */
export function appOrigin(): string {
  return (process.env.APP_ORIGIN ?? process.env.NEXTAUTH_URL ?? "http://127.0.0.1:3000").replace(/\/$/, "");
}
