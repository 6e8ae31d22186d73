import "server-only";
import { deliverOutbox } from "./outbox";
import { closeDueBallots } from "./dal/ballot-core";
import { sendDigests } from "./digest";

type Job = { name: string; everyMs: number; run: () => Promise<unknown> };

const g = globalThis as unknown as { __placetWorker?: boolean };

/** Background jobs. Safe to run on several app nodes at once: each job claims its rows with row locks. */
export const JOBS: Job[] = [
  { name: "outbox", everyMs: 2_000, run: () => deliverOutbox() },
  // Ballots are also closed on every read; this closes the ones nobody is looking at, on time.
  { name: "ballots", everyMs: 15_000, run: () => closeDueBallots() },
  // Daily digests of comment notices: checked every ten minutes, each person mailed at most once a day.
  { name: "digests", everyMs: 600_000, run: () => sendDigests() },
];

export function startWorker(jobs = JOBS): void {
  if (g.__placetWorker) return;
  g.__placetWorker = true;
  for (const job of jobs) {
    let busy = false;
    const tick = async () => {
      if (busy) return;
      busy = true;
      try {
        await job.run();
      } catch (err) {
        console.error(`[worker] ${job.name} failed:`, (err as Error).message ?? err);
      } finally {
        busy = false;
      }
    };
    setInterval(tick, job.everyMs).unref();
  }
}
