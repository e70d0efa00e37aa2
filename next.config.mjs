/** @type {import('next').NextConfig} */
const nextConfig = {
  reactStrictMode: true,
  // A separate build folder lets parallel test runs (and a running demo) build without clobbering each other.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  poweredByHeader: false,
  serverExternalPackages: ["pg", "nodemailer"],
};
export default nextConfig;
