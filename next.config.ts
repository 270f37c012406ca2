import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  // Packages with native code or Node-only internals stay outside the server bundle.
  serverExternalPackages: ["@node-rs/argon2", "postgres", "nodemailer", "vega", "vega-lite"],
  poweredByHeader: false,
  typedRoutes: false,
};

export default nextConfig;
