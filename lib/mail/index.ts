import "server-only";
import nodemailer, { type Transporter } from "nodemailer";

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

export async function sendMail(mail: OutgoingMail): Promise<void> {
  await transport().sendMail({ from: process.env.MAIL_FROM ?? "Hubface <no-reply@hubface.test>", ...mail });
}

/** The public origin used in links inside e-mails. */
export function appOrigin(): string {
  return (process.env.APP_ORIGIN ?? process.env.NEXTAUTH_URL ?? "http://127.0.0.1:3000").replace(/\/$/, "");
}
