/** Response headers that keep pages to their own scripts and their own frame. Free of framework imports. */

/** A fresh, unguessable nonce: 128 random bits, base64 (CSP Level 3 §7.1 asks for at least 128 bits). */
export function newNonce(): string {
  const bytes = crypto.getRandomValues(new Uint8Array(16));
  return btoa(String.fromCharCode(...bytes));
}

/**
 * The page's Content-Security-Policy. Scripts run only with this response's nonce, and what they load
 * ('strict-dynamic'); styles may be inline (React style attributes, the 3D viewer's labels) but never scripts.
 * blob: and data: cover the 3D viewer's textures and buffers; `dev` adds the eval React's dev build needs.
 */
export function contentSecurityPolicy(nonce: string, opts: { https: boolean; dev: boolean }): string {
  const directives = [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${opts.dev ? " 'unsafe-eval'" : ""}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' blob: data:",
    "font-src 'self'",
    "connect-src 'self' blob: data:",
    "worker-src 'self' blob:",
    "object-src 'none'",
    "base-uri 'none'",
    "form-action 'self'",
    "frame-ancestors 'none'",
    ...(opts.https ? ["upgrade-insecure-requests"] : []),
  ];
  return directives.join("; ");
}

/** No page uses the camera, microphone, location or payments, so no page (or frame in it) may. */
export const PERMISSIONS_POLICY = "camera=(), microphone=(), geolocation=(), payment=(), usb=(), browsing-topics=()";

/** Two years with subdomains: the value hstspreload.org asks for (RFC 6797 §6.1). */
export const HSTS = "max-age=63072000; includeSubDomains";

/** Headers for every response besides the CSP. */
export function staticSecurityHeaders(https: boolean): Record<string, string> {
  return {
    "Referrer-Policy": "same-origin",
    "Permissions-Policy": PERMISSIONS_POLICY,
    "X-Content-Type-Options": "nosniff",
    "X-Frame-Options": "DENY",
    ...(https ? { "Strict-Transport-Security": HSTS } : {}),
  };
}
