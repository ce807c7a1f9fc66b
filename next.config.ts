import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  // The libSQL client loads a native module; keep it out of the server bundle.
  serverExternalPackages: ["@libsql/client", "libsql"],
  poweredByHeader: false,
  typedRoutes: false,
};

export default nextConfig;
