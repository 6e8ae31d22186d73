/** Only same-site paths may follow sign-in; anything else goes to the commissions list. */
export function safeNext(next: string | null | undefined): string {
  if (!next || !next.startsWith("/") || next.startsWith("//") || next.includes("\\")) return "/commissions";
  return next;
}
