import type { NextConfig } from "next";
import { staticSecurityHeaders } from "./lib/security-headers";

/** HSTS for pages is decided at start-up (proxy.ts); for the rest, from the address the app is built for. */
const builtForHttps = (process.env.AUTH_URL ?? "").startsWith("https:");

const config: NextConfig = {
  serverExternalPackages: ["mysql2", "sharp", "nodemailer"],
  poweredByHeader: false,
  typedRoutes: false,
  experimental: {
    // Server actions carry forms: the longest is a revision's note (4,000 characters, up to 4 bytes each)
    // beside its fields, so a cap of 8 KB would refuse notes the form allows.
    serverActions: { bodySizeLimit: "20kb" },
  },
  async headers() {
    const all = Object.entries(staticSecurityHeaders(false)).map(([key, value]) => ({ key, value }));
    const hsts = Object.entries(staticSecurityHeaders(builtForHttps)).filter(([k]) => k === "Strict-Transport-Security").map(([key, value]) => ({ key, value }));
    return [
      { source: "/:path*", headers: all },
      ...(hsts.length ? [{ source: "/api/:path*", headers: hsts }] : []),
    ];
  },
};

export default config;
