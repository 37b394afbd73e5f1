import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  poweredByHeader: false,
  // Native and Node-only packages stay out of the bundle and load from node_modules at run time.
  serverExternalPackages: ["sharp", "@libsql/client", "smtp-server", "mailparser"],
};

export default nextConfig;
