/** Pure rules for how long a signed-in session lasts (OWASP ASVS 4.0.3 V3.3.1, V3.3.2). */

export interface SessionTimes { createdAt: Date; lastSeenAt: Date }
export interface SessionLimits { absoluteSeconds: number; idleSeconds: number }

export type SessionStatus = "active" | "idle-expired" | "absolute-expired";

export function sessionStatus(s: SessionTimes, now: Date, limits: SessionLimits): SessionStatus {
  if (now.getTime() >= s.createdAt.getTime() + limits.absoluteSeconds * 1000) return "absolute-expired";
  if (now.getTime() >= s.lastSeenAt.getTime() + limits.idleSeconds * 1000) return "idle-expired";
  return "active";
}

/** When the session ends if nothing more happens: the idle deadline, never past the absolute one. */
export function sessionExpiresAt(s: SessionTimes, limits: SessionLimits): Date {
  return new Date(Math.min(s.lastSeenAt.getTime() + limits.idleSeconds * 1000, s.createdAt.getTime() + limits.absoluteSeconds * 1000));
}

/** Last-seen is written at most this often, so reading pages does not mean a write on every request. */
export const TOUCH_EVERY_SECONDS = 60;

export function needsTouch(lastSeenAt: Date, now: Date): boolean {
  return now.getTime() - lastSeenAt.getTime() >= TOUCH_EVERY_SECONDS * 1000;
}
