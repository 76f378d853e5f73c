import "server-only";
// Outgoing e-mail through SMTP (the local catcher in development and tests).
import nodemailer, { type Transporter } from "nodemailer";
import type Mail from "nodemailer/lib/mailer";
import { env } from "@/lib/config/env";

const globalForMail = globalThis as unknown as { fitframeMail?: Transporter };

function transport(): Transporter {
  const e = env();
  return (globalForMail.fitframeMail ??= nodemailer.createTransport({
    host: e.SMTP_HOST,
    port: e.SMTP_PORT,
    secure: e.SMTP_SECURE,
    auth: e.SMTP_USER ? { user: e.SMTP_USER, pass: e.SMTP_PASSWORD ?? "" } : undefined,
  }));
}

export type OutgoingMail = { to: string | string[]; subject: string; text: string; html?: string; attachments?: Mail.Attachment[] };

export async function sendMail(message: OutgoingMail): Promise<void> {
  await transport().sendMail({ from: env().MAIL_FROM, ...message });
}
