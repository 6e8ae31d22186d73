/** Only same-site paths may follow sign-in; anything else goes to the commissions list. */
export function safeNext(next: string | null | undefined): string {
  // Browsers drop tabs and line breaks from URLs, so "/\t/evil.example" would become "//evil.example".
  if (!next || !next.startsWith("/") || next.startsWith("//") || /[\\\u0000-\u001f\u007f]/.test(next)) return "/commissions";
  return next;
}
