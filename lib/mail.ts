import "server-only";
import nodemailer from "nodemailer";
import { env } from "./env";

export interface Mail {
  to: string;
  subject: string;
  text: string;
  html?: string;
}

/** Longest subject we send; mail clients show far less, and RFC 5322 §2.1.1 asks lines to stay under 78. */
export const MAX_SUBJECT_CHARS = 200;
/** Longest display name in an address header. */
export const MAX_NAME_CHARS = 80;

/**
 * Text bound for a header (a subject, a display name): line breaks and other control characters become
 * single spaces, so no one's words can start a header of their own, and the text is capped at `max`
 * characters (whole code points, an ellipsis marking the cut).
 */
export function headerText(s: string, max: number): string {
  const flat = s.replace(/[\u0000-\u001f\u007f-\u009f\u2028\u2029]+/gu, " ").replace(/ {2,}/g, " ").trim();
  const chars = Array.from(flat);
  return chars.length <= max ? flat : `${chars.slice(0, max - 1).join("").trimEnd()}…`;
}

/** An address header value "Name <address>" with the name made safe; an address with a break in it is refused. */
export function mailbox(name: string | null | undefined, address: string): { name: string; address: string } {
  if (/[\r\n\u0000-\u001f\u007f<>]/u.test(address)) throw new Error("A mail address contains characters that cannot appear in a header.");
  return { name: headerText(name ?? "", MAX_NAME_CHARS).replace(/["\\]/g, ""), address };
}

/** MAIL_FROM ("Name <address>" or a bare address) split and made safe for the From header. */
export function fromHeader(mailFrom: string): { name: string; address: string } {
  const m = /^\s*(.*?)\s*<([^<>]+)>\s*$/u.exec(mailFrom);
  return m ? mailbox(m[1].replace(/^"|"$/g, ""), m[2].trim()) : mailbox("", mailFrom.trim());
}

let transport: nodemailer.Transporter | null = null;

function getTransport() {
  transport ??= nodemailer.createTransport({
    host: env.smtpHost,
    port: env.smtpPort,
    secure: env.smtpTls === "implicit",
    requireTLS: env.smtpTls === "starttls",
    ignoreTLS: env.smtpTls === "none",
    ...(env.smtpAuth ? { auth: env.smtpAuth } : {}),
    connectionTimeout: 5_000,
    greetingTimeout: 5_000,
  });
  return transport;
}

/** Sends one message now. Throws if the mail server refuses or cannot be reached. */
export async function sendMail(mail: Mail): Promise<void> {
  await getTransport().sendMail({
    from: fromHeader(env.mailFrom),
    to: mailbox(null, mail.to.trim()).address,
    subject: headerText(mail.subject, MAX_SUBJECT_CHARS),
    text: mail.text,
    ...(mail.html ? { html: mail.html } : {}),
  });
}

/** Escapes text for the HTML part of a message: people's words are never markup. */
export function escapeHtml(s: string): string {
  return s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);
}
