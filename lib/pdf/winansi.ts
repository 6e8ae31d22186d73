// The PDF's standard fonts (Helvetica, Times) can only show the Windows-1252 ("WinAnsi") characters.
// People's words can hold anything, so everything else is mapped to a close equivalent first.

/** The Unicode characters WinAnsi encodes beyond printable ASCII and Latin-1 (Windows-1252, bytes 0x80–0x9F). */
const CP1252_EXTRA = "€‚ƒ„…†‡ˆ‰Š‹ŒŽ‘’“”•–—˜™š›œžŸ";

/** True if the character (one code point) can be written in WinAnsi as it is. */
export function isWinAnsi(ch: string): boolean {
  const c = ch.codePointAt(0)!;
  if (ch.length !== 1) return false;
  return (c >= 0x20 && c <= 0x7e) || (c >= 0xa0 && c <= 0xff) || CP1252_EXTRA.includes(ch);
}

/** Close equivalents for characters WinAnsi lacks (checked before Unicode decomposition). */
const NEAR: Record<string, string> = {
  // Maths and measures
  "≤": "<=", "≥": ">=", "≠": "!=", "≈": "~", "≃": "~", "≅": "~", "∼": "~", "−": "-", "∓": "-/+", "∗": "*",
  "∞": "infinity", "√": "sqrt", "∑": "sum", "∏": "product", "∫": "integral", "∂": "d", "∆": "Delta", "∅": "empty set",
  "∈": "in", "∉": "not in", "∩": "and", "∪": "or", "⋅": "·", "∙": "·", "∘": "°", "⌀": "diameter", "∠": "angle",
  "′": "'", "″": "\"", "‴": "'''", "⁄": "/", "∕": "/", "℃": "°C", "℉": "°F", "№": "No.", "ℓ": "l",
  // Dashes, quotes, spaces
  "‐": "-", "‑": "-", "‒": "-", "―": "—", "⁃": "-", "‛": "'", "‟": "\"", "❛": "'", "❜": "'", "❝": "\"", "❞": "\"",
  "⹀": "-", "※": "*", "‸": "^", "⁎": "*", "⁏": ";", "⸺": "——", "⸻": "———",
  // Arrows and marks
  "→": "->", "←": "<-", "↔": "<->", "⇒": "=>", "⇐": "<=", "⇔": "<=>", "↑": "^", "↓": "v",
  "✓": "(yes)", "✔": "(yes)", "✗": "(no)", "✘": "(no)", "★": "*", "☆": "*", "●": "•", "○": "o", "◦": "o", "▪": "•", "■": "•", "□": "[ ]",
  // Letters that do not decompose
  "ł": "l", "Ł": "L", "đ": "d", "Đ": "D", "ħ": "h", "Ħ": "H", "ı": "i", "ŀ": "l", "Ŀ": "L", "ŧ": "t", "Ŧ": "T",
  "ĸ": "k", "ŋ": "ng", "Ŋ": "NG", "ſ": "s", "ə": "e", "Ə": "E", "ǝ": "e", "ʼ": "'", "ʻ": "'", "ʹ": "'", "ʺ": "\"",
  // Greek, by name (μ looks the same as the micro sign, which WinAnsi has)
  "α": "alpha", "β": "beta", "γ": "gamma", "δ": "delta", "ε": "epsilon", "ζ": "zeta", "η": "eta", "θ": "theta",
  "ι": "iota", "κ": "kappa", "λ": "lambda", "μ": "µ", "ν": "nu", "ξ": "xi", "ο": "o", "π": "pi", "ρ": "rho",
  "σ": "sigma", "ς": "sigma", "τ": "tau", "υ": "upsilon", "φ": "phi", "ϕ": "phi", "χ": "chi", "ψ": "psi", "ω": "omega",
  "Α": "Alpha", "Β": "Beta", "Γ": "Gamma", "Δ": "Delta", "Ε": "Epsilon", "Ζ": "Zeta", "Η": "Eta", "Θ": "Theta",
  "Ι": "Iota", "Κ": "Kappa", "Λ": "Lambda", "Μ": "Mu", "Ν": "Nu", "Ξ": "Xi", "Ο": "O", "Π": "Pi", "Ρ": "Rho",
  "Σ": "Sigma", "Τ": "Tau", "Υ": "Upsilon", "Φ": "Phi", "Χ": "Chi", "Ψ": "Psi", "Ω": "Omega",
};

/** What stands in for a character with no equivalent. */
export const UNKNOWN = "?";

const ZERO_WIDTH = /[\u00ad\u034f\u061c\u115f\u1160\u17b4\u17b5\u180b-\u180f\u200b-\u200f\u202a-\u202e\u2060-\u206f\ufe00-\ufe0f\ufeff]/;
const SPACE = /[\t\u1680\u2000-\u200a\u202f\u205f\u3000]/;
const COMBINING = /\p{M}/u;

function one(ch: string): string {
  if (ch === "\n") return "\n";
  if (ZERO_WIDTH.test(ch) || /[\u0000-\u0008\u000b-\u001f\u007f-\u009f]/.test(ch)) return "";
  if (isWinAnsi(ch)) return ch;
  if (SPACE.test(ch)) return " ";
  const near = NEAR[ch];
  if (near !== undefined) return near;
  // "ő" → "o", "ﬁ" → "fi", "⅓" → "1⁄3" → "1/3", "²" stays (it is WinAnsi), "①" → "1".
  const parts = Array.from(ch.normalize("NFKD")).filter((p) => !COMBINING.test(p));
  if (parts.length === 0) return COMBINING.test(ch) ? "" : UNKNOWN;
  if (parts.length === 1 && parts[0] === ch) return UNKNOWN;
  return parts.map((p) => (isWinAnsi(p) ? p : NEAR[p] ?? (SPACE.test(p) ? " " : UNKNOWN))).join("");
}

/**
 * Text the standard fonts can draw: WinAnsi characters are kept as they are (including “ ” ‘ ’ – — … é ß ×),
 * others become a close ASCII or WinAnsi equivalent ("≤" → "<=", "θ" → "theta", "−" → "-"), accents the
 * encoding lacks are dropped ("ő" → "o"), and anything with no equivalent becomes "?". Line breaks are kept
 * as "\n"; tabs and odd spaces become plain spaces; invisible characters (soft hyphens, zero-width spaces,
 * direction marks, controls) go.
 */
export function toWinAnsi(text: string): string {
  let out = "";
  // NFC first, so that "e" + a combining acute becomes "é", which WinAnsi has.
  for (const ch of text.replace(/\r\n?|[\u2028\u2029\u0085]/g, "\n").normalize("NFC")) out += one(ch);
  return out;
}
