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
const KEY_CACHE = new Map<string, string>();

function computeNameKey(name: string): string {
  let s = name.normalize('NFKC').toLowerCase().trim();
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
 * @param a - first string
 * @param b - second string
 * @returns the number of edits
 * @example editDistance('hepes', 'hpees') // 1
 */
export function editDistance(a: string, b: string): number {
  const m = a.length;
  const n = b.length;
  const d: number[][] = [];
  for (let i = 0; i <= m; i++) {
    d.push(new Array<number>(n + 1).fill(0));
    d[i][0] = i;
  }
  for (let j = 0; j <= n; j++) d[0][j] = j;
  for (let i = 1; i <= m; i++) {
    for (let j = 1; j <= n; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      let best = Math.min(d[i - 1][j] + 1, d[i][j - 1] + 1, d[i - 1][j - 1] + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) best = Math.min(best, d[i - 2][j - 2] + 1);
      d[i][j] = best;
    }
  }
  return d[m][n];
}

/**
 * Up to `count` display names whose keys are closest to a query key, nearest first.
 * Only names within a third of the query's length (at least 2 edits) are offered, or
 * names that contain the query (or are contained in it) when it is at least 3 characters.
 *
 * @param queryKey - the normalised query (nameKey)
 * @param candidates - normalised key → display name
 * @param count - most suggestions to return
 * @returns display names, nearest first, without repeats
 */
export function closestNames(queryKey: string, candidates: ReadonlyMap<string, string>, count = 3): string[] {
  const limit = Math.max(2, Math.floor(queryKey.length / 3));
  const scored: { name: string; score: number }[] = [];
  for (const [key, name] of candidates) {
    let score = editDistance(queryKey, key);
    if (score > limit) {
      if (queryKey.length >= 3 && (key.includes(queryKey) || queryKey.includes(key))) score = limit + Math.abs(key.length - queryKey.length) / 100;
      else continue;
    }
    scored.push({ name, score });
  }
  scored.sort((x, y) => x.score - y.score || x.name.localeCompare(y.name));
  const out: string[] = [];
  for (const s of scored) {
    if (!out.includes(s.name)) out.push(s.name);
    if (out.length >= count) break;
  }
  return out;
}
