/** @type {import('next').NextConfig} */
const nextConfig = {
  reactStrictMode: true,
  poweredByHeader: false,
  // ffmpeg and the database driver stay on the server, loaded from node_modules at run time.
  serverExternalPackages: ["pg", "pg-boss", "fluent-ffmpeg"],
};

export default nextConfig;
