import "server-only";
import nodemailer from "nodemailer";
import { env } from "./env";

export interface Mail {
  to: string;
  subject: string;
  text: string;
  html?: string;
}

let transport: nodemailer.Transporter | null = null;

function getTransport() {
  transport ??= nodemailer.createTransport({
    host: env.smtpHost,
    port: env.smtpPort,
    secure: false,
    ignoreTLS: true,
    connectionTimeout: 5_000,
    greetingTimeout: 5_000,
  });
  return transport;
}

/** Sends one message now. Throws if the mail server refuses or cannot be reached. */
export async function sendMail(mail: Mail): Promise<void> {
  await getTransport().sendMail({ from: env.mailFrom, ...mail });
}

/** Escapes text for the HTML part of a message: people's words are never markup. */
export function escapeHtml(s: string): string {
  return s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);
}
