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
  /** A session ends this long after sign-in, however active (OWASP ASVS 4.0.3 V3.3.2). */
  sessionAbsoluteSeconds: Number(process.env.PLACET_SESSION_ABSOLUTE_HOURS ?? 12) * 3600,
  /** A session ends after this long without a request (OWASP ASVS 4.0.3 V3.3.2). */
  sessionIdleSeconds: Number(process.env.PLACET_SESSION_IDLE_MINUTES ?? 30) * 60,
};
