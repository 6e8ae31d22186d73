import { defineConfig } from "vitest/config";
import path from "node:path";

const alias = { "@": path.resolve(import.meta.dirname) , "server-only": path.resolve(import.meta.dirname, "tests/server-only-stub.ts") };

export default defineConfig({
  resolve: { alias },
  test: {
    projects: [
      {
        resolve: { alias },
        test: { name: "unit", include: ["tests/unit/**/*.test.ts"], environment: "node", testTimeout: 20_000 },
      },
      {
        resolve: { alias },
        test: {
          name: "integration",
          // next-auth imports "next/server" without an extension; let vite resolve it (as Next.js does).
          server: { deps: { inline: ["next-auth"] } },
          include: ["tests/integration/**/*.test.ts"],
          environment: "node",
          fileParallelism: false,
          testTimeout: 60_000,
          hookTimeout: 60_000,
        },
      },
    ],
  },
});
