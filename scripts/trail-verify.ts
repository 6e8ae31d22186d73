import { asc } from "drizzle-orm";
import { closeDb, getDb } from "../db/client";
import { commissions } from "../db/schema";
import { verifyChain } from "../models/trail/node-hash";
import { loadChainWithHead } from "../lib/dal/trail";

/**
 * npm run trail:verify — re-checks every commission's chain, and that it ends exactly at the head the
 * commission row holds (so a chain cut short or rewritten at its end is caught); exit 1 names the
 * commission and the first bad or missing seq of each failure.
 */
async function main(): Promise<number> {
  const all = await getDb().select({ id: commissions.id, title: commissions.title }).from(commissions).orderBy(asc(commissions.id));
  let bad = 0, events = 0;
  const started = performance.now();
  for (const c of all) {
    const { events: chain, head } = await loadChainWithHead(c.id);
    events += chain.length;
    const r = verifyChain(chain, { expectedCommissionId: c.id, expectedHead: head ? { ...head, exact: true } : undefined });
    if (r.ok) console.log(`ok    commission ${c.id} "${c.title}": ${r.count} events, head event ${head?.seq}, final hash ${r.finalHash}`);
    else {
      bad++;
      console.log(`FAIL  commission ${c.id} "${c.title}": at seq ${r.seq}: ${r.reason} — ${r.message}`);
    }
  }
  console.log(`${all.length - bad} of ${all.length} chains hold (${events} events, ${Math.round(performance.now() - started)} ms)`);
  return bad ? 1 : 0;
}

main()
  .then(async (code) => { await closeDb(); process.exit(code); })
  .catch(async (err) => { console.error(err); await closeDb(); process.exit(2); });
