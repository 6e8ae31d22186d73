// Waits until every URL given answers 2xx, or fails after the timeout (seconds, first argument).
const [timeout, ...urls] = process.argv.slice(2);
const deadline = Date.now() + Number(timeout) * 1000;
for (const url of urls) {
  for (;;) {
    try {
      if ((await fetch(url)).ok) break;
    } catch { /* not up yet */ }
    if (Date.now() > deadline) { console.error(`[placet] ${url} did not answer within ${timeout} s`); process.exit(1); }
    await new Promise((r) => setTimeout(r, 300));
  }
}
