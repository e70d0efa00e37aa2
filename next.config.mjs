/** @type {import('next').NextConfig} */
const nextConfig = {
  reactStrictMode: true,
  // A separate build folder lets parallel test runs (and a running demo) build without clobbering each other.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  poweredByHeader: false,
  serverExternalPackages: ["pg", "nodemailer"],
  // forbidden() gives console pages a real 403 with its own page when a role lacks a permission.
  experimental: { authInterrupts: true },
};
export default nextConfig;
