import "server-only";

/** Settings read from the environment, with the local defaults the project's scripts use. */
export const env = {
  appUrl: (process.env.AUTH_URL ?? "http://localhost:3000").replace(/\/$/, ""),
  smtpHost: process.env.SMTP_HOST ?? "127.0.0.1",
  smtpPort: Number(process.env.SMTP_PORT ?? 1025),
  mailFrom: process.env.MAIL_FROM ?? "Placet <noreply@placet.localhost>",
  /** Magic links last ten minutes. */
  signInLinkSeconds: 10 * 60,
  /** Chair re-confirms identity before signing a decision when signed in longer ago than this. */
  freshSignInSeconds: 10 * 60,
};
