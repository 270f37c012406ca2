import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  // Packages with native code or Node-only internals stay outside the server bundle.
  serverExternalPackages: ["@node-rs/argon2", "postgres", "nodemailer", "vega", "vega-lite", "@resvg/resvg-js"],
  // Separate build folders let several builds (tests, demo, work in progress) coexist.
  distDir: process.env.NEXT_DIST_DIR ?? ".next",
  poweredByHeader: false,
  typedRoutes: false,
};

export default nextConfig;
