import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  // The test command builds into its own folder so it never disturbs a running `scripts/start.sh`.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  poweredByHeader: false,
  reactStrictMode: true,
  // The test command runs `tsc --noEmit` as its own step; checking again inside every build only costs time.
  typescript: { ignoreBuildErrors: true },
  serverExternalPackages: ["pg-boss", "pg", "sharp"],
  experimental: {
    // forbidden() and unauthorized() give pages real 403 and 401 responses.
    authInterrupts: true,
  },
  async headers() {
    // The Content-Security-Policy needs a per-request nonce, so proxy.ts sets it; the rest are static.
    return [
      {
        source: "/:path*",
        headers: [
          { key: "X-Content-Type-Options", value: "nosniff" },
          { key: "X-Frame-Options", value: "DENY" },
          { key: "Referrer-Policy", value: "same-origin" },
          { key: "Permissions-Policy", value: "camera=(self), microphone=(), geolocation=(), payment=()" },
          { key: "Cross-Origin-Opener-Policy", value: "same-origin" },
        ],
      },
    ];
  },
};

export default nextConfig;
