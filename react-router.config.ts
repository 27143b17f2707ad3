import type { Config } from "@react-router/dev/config";

// Server rendering on; the v8 flags are set explicitly so upgrades are a deliberate choice.
export default {
  ssr: true,
  future: {
    v8_middleware: false,
    v8_splitRouteModules: false,
    v8_viteEnvironmentApi: false,
  },
} satisfies Config;
