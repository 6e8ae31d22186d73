import { readdirSync } from "node:fs";
import { spawnSync } from "node:child_process";
import path from "node:path";

/** npm run bench — runs every benchmark in bench/ in turn, each in its own process. */
const dir = path.join(import.meta.dirname, "..", "bench");
const files = readdirSync(dir).filter((f) => f.endsWith(".ts")).sort();
let failed = 0;
for (const f of files) {
  console.log(`\n=== bench/${f} ===`);
  const r = spawnSync("npx", ["tsx", "--conditions=react-server", path.join(dir, f)], { stdio: "inherit" });
  if (r.status !== 0) failed++;
}
process.exit(failed ? 1 : 0);
