/**
 * Engine codes that must never reach a reader (issue 18, item 5): each is how the engine or the
 * database spells a thing, not how the trade writes it. Returns each hit with some context.
 */
const ENGINE_CODES: readonly RegExp[] = [
  /\bmohr-coulomb\b/i,
  /\bfellenius\b/i,
  /\bbishop\b(?!'s)/,
  /\bengine case\b/i,
  /\bsubmitted\b(?! (by|for|to))/,
  /\bsteady\b(?! seepage| state| flow)/i,
  /\bgamma(Sat)?\b/i,
  /\bphi'?\b/,
  /\bsu(Gradient|Datum)\b/,
  /\w+\[\d+\]/,
  /\bdrawdown-(storage|surcharge)\b/,
  /\b(steady-seepage|end-of-construction|surcharge-pool)\b/,
  /\{"/,
  /\b1 (slices|vertices|runs|regions|circles|days|comments|points|materials|sections)\b/,
  /\b\d+ (slice|vertex|run|region|circle|day|comment|point|material|section)s?\(s\)/,
  /\d °/,
  /\d[eE][+-]?\d/,
];

export function findEngineWords(text: string): string[] {
  const out: string[] = [];
  for (const re of ENGINE_CODES) {
    const g = new RegExp(re.source, re.flags.includes("g") ? re.flags : re.flags + "g");
    for (const m of text.matchAll(g)) {
      const i = m.index ?? 0;
      out.push(`${m[0]} — “${text.slice(Math.max(0, i - 50), i + 50).replace(/\s+/g, " ")}”`);
    }
  }
  return out;
}
