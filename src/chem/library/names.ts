/**
 * Name matching for the substance library: one normal form for the many ways people
 * write a name (case, spacing, hydrate notations), and a "did you mean" ranking.
 */

const HYDRATE_WORDS: Readonly<Record<string, number>> = {
  hemi: 0.5,
  mono: 1,
  di: 2,
  tri: 3,
  tetra: 4,
  penta: 5,
  hexa: 6,
  hepta: 7,
  octa: 8,
  nona: 9,
  deca: 10,
  dodeca: 12,
};

/**
 * The key a name is matched by: lower case; hydrate dots (`·`, `•`, `*`, `x`, or a
 * space before the count) and hydrate words (`heptahydrate`) reduced to one notation
 * (`·7h2o`); spaces, hyphens, underscores, commas, brackets and quotes removed.
 *
 * @param name - a name as typed
 * @returns the matching key
 * @example nameKey('Na2HPO4 x 7H2O') // 'na2hpo4·7h2o', as for 'Na2HPO4*7H2O' and 'Na2HPO4·7H2O'
 */
export function nameKey(name: string): string {
  if (name.length > KEY_CACHE_NAME_LENGTH) return computeNameKey(name);
  const cached = KEY_CACHE.get(name);
  if (cached !== undefined) return cached;
  const key = computeNameKey(name);
  // Names repeat (every recipe looks up the same few), so keys are remembered; the cache is
  // emptied when full so that a long session cannot grow it without bound.
  if (KEY_CACHE.size >= KEY_CACHE_LIMIT) KEY_CACHE.clear();
  KEY_CACHE.set(name, key);
  return key;
}

/** Most names whose keys are remembered at once. */
const KEY_CACHE_LIMIT = 5000;
/** Longest name whose key is remembered: no name in the library comes near it, and 5000 full cells of text would hold 300 MB. */
const KEY_CACHE_NAME_LENGTH = 256;
const KEY_CACHE = new Map<string, string>();

function computeNameKey(name: string): string {
  // Runs of blanks become one first: the patterns below allow blanks between a formula and
  // its water, and on a long run of blanks they would try every split of it (a 32,767-character
  // name took 0.7 s). The blanks are all removed at the end, so the key is the same.
  let s = name.normalize('NFKC').toLowerCase().trim().replace(/\s+/g, ' ');
  s = s.replace(/[•∙⋅*×]/g, '·');
  s = s.replace(/([a-z)\]\d])\s*[x·]\s*(\d+(?:\.\d+)?)?\s*h2o\b/g, (_m, before: string, n?: string) => `${before}·${n ?? '1'}h2o`);
  s = s.replace(/([a-z)\]\d])\s+(\d+(?:\.\d+)?)\s*h2o\b/g, (_m, before: string, n: string) => `${before}·${n}h2o`);
  s = s.replace(/\b(hemi|mono|di|tri|tetra|penta|hexa|hepta|octa|nona|deca|dodeca)hydrate\b/g, (_m, w: string) => `·${HYDRATE_WORDS[w]}h2o`);
  s = s.replace(/[\s\-_,()[\]'"′‘’]/g, '');
  return s;
}

/**
 * Optimal-string-alignment (restricted Damerau–Levenshtein) distance: insertions,
 * deletions, substitutions and swaps of neighbouring characters each cost 1.
 *
 * Method: the usual dynamic programme over three rolling rows (typed arrays, nothing
 * allocated per cell). With `max`, only a band of width 2·max+1 around the diagonal is
 * filled and the search stops once two successive rows exceed max, so a bounded call
 * costs O(min(|a|,|b|)·max) instead of O(|a|·|b|).
 *
 * @param a - first string
 * @param b - second string
 * @param max - optional bound: any distance above it is returned as max + 1
 * @returns the number of edits (or max + 1 when it exceeds max)
 * @example editDistance('hepes', 'hpees') // 1
 */
export function editDistance(a: string, b: string, max = Infinity): number {
  const m = a.length;
  const n = b.length;
  const cap = Math.min(max, Math.max(m, n));
  const over = cap + 1;
  if (Math.abs(m - n) > cap) return Math.min(Math.abs(m - n), over);
  let before = new Int32Array(n + 1).fill(over);
  let prev = new Int32Array(n + 1);
  let cur = new Int32Array(n + 1);
  for (let j = 0; j <= n; j++) prev[j] = Math.min(j, over);
  let prevMin = 0;
  for (let i = 1; i <= m; i++) {
    cur.fill(over);
    const lo = Math.max(1, i - cap);
    const hi = Math.min(n, i + cap);
    if (lo === 1) cur[0] = Math.min(i, over);
    let rowMin = cur[0];
    const ai = a.charCodeAt(i - 1);
    const aPrev = i > 1 ? a.charCodeAt(i - 2) : -1;
    for (let j = lo; j <= hi; j++) {
      const bj = b.charCodeAt(j - 1);
      let best = Math.min(prev[j] + 1, cur[j - 1] + 1, prev[j - 1] + (ai === bj ? 0 : 1));
      if (j > 1 && ai === b.charCodeAt(j - 2) && aPrev === bj && before[j - 2] + 1 < best) best = before[j - 2] + 1;
      cur[j] = best > over ? over : best;
      if (cur[j] < rowMin) rowMin = cur[j];
    }
    // A later cell comes from this row or (a swap) the one before: both above the bound, so is the end.
    if (rowMin > cap && prevMin > cap) return over;
    prevMin = rowMin;
    [before, prev, cur] = [prev, cur, before];
  }
  return Math.min(prev[n], over);
}

/**
 * Longest query (after normalising) that gets a "did you mean" search: far longer than any
 * name in the library (the longest is under 40 characters), short enough that the search
 * stays well under a millisecond. A longer name is simply not in the library.
 */
export const MAX_SUGGESTION_QUERY_LENGTH = 100;

/**
 * Up to `count` display names whose keys are closest to a query key, nearest first.
 * Only names within a third of the query's length (at least 2 edits) are offered, or
 * names that contain the query (or are contained in it) when it is at least 3 characters.
 * A query longer than MAX_SUGGESTION_QUERY_LENGTH gets none. Ties go by the names' code
 * units, lower-cased (a locale-aware comparison would cost a collator's start-up, about
 * 10 ms, on the first miss of a session).
 *
 * @param queryKey - the normalised query (nameKey)
 * @param candidates - normalised key → display name
 * @param count - most suggestions to return
 * @returns display names, nearest first, without repeats
 */
export function closestNames(queryKey: string, candidates: ReadonlyMap<string, string>, count = 3): string[] {
  if (queryKey.length > MAX_SUGGESTION_QUERY_LENGTH) return [];
  const limit = Math.max(2, Math.floor(queryKey.length / 3));
  const scored: { name: string; order: string; score: number }[] = [];
  for (const [key, name] of candidates) {
    let score = editDistance(queryKey, key, limit);
    if (score > limit) {
      if (queryKey.length >= 3 && (key.includes(queryKey) || queryKey.includes(key))) score = limit + Math.abs(key.length - queryKey.length) / 100;
      else continue;
    }
    scored.push({ name, order: name.toLowerCase(), score });
  }
  scored.sort((x, y) => x.score - y.score || (x.order < y.order ? -1 : x.order > y.order ? 1 : x.name < y.name ? -1 : x.name > y.name ? 1 : 0));
  const out: string[] = [];
  for (const s of scored) {
    if (!out.includes(s.name)) out.push(s.name);
    if (out.length >= count) break;
  }
  return out;
}
