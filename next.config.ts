import type { NextConfig } from "next";
import { staticSecurityHeaders } from "./lib/security-headers";

const nextConfig: NextConfig = {
  poweredByHeader: false,
  // Browser tests and screenshots reach dev servers at 127.0.0.1 as well as localhost.
  allowedDevOrigins: ["127.0.0.1"],
  // Lets two servers of one checkout run side by side (a dev server while tests use the build).
  distDir: process.env.NEXT_DIST_DIR ?? ".next",
  async headers() {
    return [{ source: "/:path*", headers: staticSecurityHeaders }];
  },
  // Native and Node-only packages stay out of the bundle and load from node_modules at run time.
  serverExternalPackages: ["sharp", "@libsql/client", "smtp-server", "mailparser"],
  // `npm test` runs tsc over the same tree just before it builds (scripts/test.ts): once is enough.
  typescript: { ignoreBuildErrors: process.env.MOTTLE_TYPECHECKED === "1" },
};

export default nextConfig;
