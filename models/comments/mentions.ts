/**
 * Mentions. The rule, kept simple enough to say in one breath:
 *
 *   "@" followed by a person's e-mail address, their full name, or one word of their name (a first name
 *   or a surname) mentions them — a single word only when nobody else on the commission shares it.
 *
 * Matching ignores case; the longest match wins ("@Ruth Penhallow" beats "@Ruth"); the mention must end
 * at a word boundary ("@Ruthless" mentions nobody); an "@" inside a word (an address in the text) is not
 * a mention. People are those on the commission: its committee and the studio's staff.
 */

export interface MentionablePerson {
  id: string;
  name: string;
  email: string;
}

const WORD_CHAR = /[\p{L}\p{N}_]/u;

function candidates(people: MentionablePerson[]): { text: string; id: string }[] {
  const wordOwners = new Map<string, Set<string>>();
  for (const p of people) {
    for (const w of p.name.split(/\s+/)) {
      if (w.length < 2) continue;
      const k = w.toLowerCase();
      if (!wordOwners.has(k)) wordOwners.set(k, new Set());
      wordOwners.get(k)!.add(p.id);
    }
  }
  const out: { text: string; id: string }[] = [];
  for (const p of people) {
    if (p.email) out.push({ text: p.email.toLowerCase(), id: p.id });
    const full = p.name.trim().replace(/\s+/g, " ").toLowerCase();
    if (full) out.push({ text: full, id: p.id });
  }
  for (const [w, owners] of wordOwners) if (owners.size === 1) out.push({ text: w, id: [...owners][0] });
  return out;
}

/** The ids of the people a text mentions, each once, in the order first mentioned. */
export function findMentions(text: string, people: MentionablePerson[]): string[] {
  if (!text.includes("@") || !people.length) return [];
  const all = candidates(people);
  const lower = text.toLowerCase();
  const found: string[] = [];
  for (let i = lower.indexOf("@"); i !== -1; i = lower.indexOf("@", i + 1)) {
    if (i > 0 && WORD_CHAR.test(text[i - 1])) continue;
    const rest = lower.slice(i + 1).replace(/\s+/g, " ");
    let best: { len: number; ids: Set<string> } = { len: 0, ids: new Set() };
    for (const c of all) {
      if (!rest.startsWith(c.text)) continue;
      const next = rest[c.text.length];
      if (next !== undefined && WORD_CHAR.test(next)) continue;
      if (c.text.length > best.len) best = { len: c.text.length, ids: new Set([c.id]) };
      else if (c.text.length === best.len) best.ids.add(c.id);
    }
    // Two people answering to the same full name: mention neither rather than guess.
    if (best.ids.size === 1) {
      const id = [...best.ids][0];
      if (!found.includes(id)) found.push(id);
    }
  }
  return found;
}
