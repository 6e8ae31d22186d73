import { z } from "zod";

// In the browser, zod must not probe for `new Function`: the page policy forbids eval, and the caught probe
// still reports a CSP violation. Parsing without it is a little slower and otherwise the same.
z.config({ jitless: true });
