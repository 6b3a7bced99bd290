import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { env } from "../env";
import { AppError } from "../errors";
import { logError } from "../log";
import type { Message } from "../mail/layout";

const g = globalThis as unknown as { __bwMail?: Transporter };

/** One SMTP transport per process, pointed at the configured host (the local catcher by default). */
function transport(): Transporter {
  if (!g.__bwMail) {
    const e = env();
    g.__bwMail = nodemailer.createTransport({
      host: e.SMTP_HOST,
      port: e.SMTP_PORT,
      secure: e.SMTP_PORT === 465,
      // The loopback catcher speaks plain SMTP; a hosted relay upgrades with STARTTLS on its own.
      ignoreTLS: e.SMTP_HOST === "127.0.0.1" || e.SMTP_HOST === "localhost",
      ...(e.SMTP_USER ? { auth: { user: e.SMTP_USER, pass: e.SMTP_PASSWORD ?? "" } } : {}),
    });
  }
  return g.__bwMail;
}

/** Sends one message with its plain-text and HTML parts; a failed send is a 502 the caller can retry. */
export async function sendMail(to: string, m: Message): Promise<void> {
  try {
    await transport().sendMail({ from: env().MAIL_FROM, to, subject: m.subject, text: m.text, html: m.html });
  } catch (e) {
    logError("mail send failed", e);
    throw new AppError(502, "mail_failed", "The e-mail could not be sent just now. Nothing was changed; try again in a minute.");
  }
}

/** An absolute link into the app. */
export const appLink = (path: string) => new URL(path, env().APP_URL).toString();
