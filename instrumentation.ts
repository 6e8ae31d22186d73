/**
 * Runs once when a Node.js server instance starts: refuses to start on an unsafe configuration, then starts
 * the in-process worker (outbox delivery, ballot closing).
 */
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { parseEnv, refusalMessage } = await import("./lib/env-schema");
  const checked = parseEnv(process.env);
  if (!checked.ok) {
    console.error(refusalMessage(checked.problems));
    process.exit(1);
  }
  if (process.env.PLACET_WORKER === "off") return;
  const { startWorker } = await import("./lib/worker");
  startWorker();
}
