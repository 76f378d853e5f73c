/** @type {import('next').NextConfig} */
const nextConfig = {
  reactStrictMode: true,
  // Parallel test runs build into folders of their own (scripts/test.sh sets it).
  distDir: process.env.NEXT_DIST_DIR ?? ".next",
  poweredByHeader: false,
  // ffmpeg, pdfkit (reads its font files at run time) and the database driver stay on the server, loaded from node_modules at run time.
  serverExternalPackages: ["pg", "pg-boss", "fluent-ffmpeg", "pdfkit"],
};

export default nextConfig;
