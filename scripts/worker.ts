import { JOBS } from "../lib/worker";

/** npm run worker — runs the background jobs once (or forever with --loop), outside the web server. */
async function main() {
  const loop = process.argv.includes("--loop");
  do {
    for (const job of JOBS) console.log(`[worker] ${job.name}:`, JSON.stringify(await job.run()));
    if (loop) await new Promise((r) => setTimeout(r, 2000));
  } while (loop);
  process.exit(0);
}
main().catch((err) => { console.error(err); process.exit(1); });
