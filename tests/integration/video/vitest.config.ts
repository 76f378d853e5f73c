import { fileURLToPath } from "node:url";
import { defineConfig } from "vitest/config";

// The video tests need only Debian's ffmpeg/ffprobe, not the services the shared
// integration globalSetup insists on: `npx vitest run -c tests/integration/video/vitest.config.ts`.
const root = fileURLToPath(new URL("../../../", import.meta.url));

export default defineConfig({
  resolve: { alias: { "@": root } },
  test: {
    root,
    include: ["tests/integration/video/**/*.test.ts"],
    environment: "node",
    testTimeout: 60_000,
    hookTimeout: 120_000,
    fileParallelism: false,
  },
});
