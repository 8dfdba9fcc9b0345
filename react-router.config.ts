import type { Config } from "@react-router/dev/config";

export default {
  ssr: true,
  // The test run builds into a folder of its own, so a demo served from build/ keeps working.
  buildDirectory: process.env.RL_BUILD_DIR ?? "build",
  future: {
    v8_middleware: true,
  },
} satisfies Config;
