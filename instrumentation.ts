/** Starts the in-process worker (outbox delivery, ballot closing) on each Node.js server instance. */
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs" || process.env.PLACET_WORKER === "off") return;
  const { startWorker } = await import("./lib/worker");
  startWorker();
}
