import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  poweredByHeader: false,
  // Lets two servers of one checkout run side by side (a dev server while tests use the build).
  distDir: process.env.NEXT_DIST_DIR ?? ".next",
  // Native and Node-only packages stay out of the bundle and load from node_modules at run time.
  serverExternalPackages: ["sharp", "@libsql/client", "smtp-server", "mailparser"],
};

export default nextConfig;
