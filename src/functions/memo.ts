/**
 * A small least-recently-used cache. Spreadsheets recalculate the same call again and
 * again (a fill-down of identical formulas, a recalculation after an unrelated edit);
 * identical arguments give the answer (or the error) already computed.
 */
export class Lru<V> {
  private readonly entries = new Map<string, V>();

  constructor(private readonly capacity: number) {}

  get(key: string): V | undefined {
    const value = this.entries.get(key);
    if (value !== undefined) {
      // Re-insert so the Map's insertion order keeps the most recent last.
      this.entries.delete(key);
      this.entries.set(key, value);
    }
    return value;
  }

  set(key: string, value: V): void {
    this.entries.delete(key);
    this.entries.set(key, value);
    if (this.entries.size > this.capacity) this.entries.delete(this.entries.keys().next().value as string);
  }

  get size(): number {
    return this.entries.size;
  }

  clear(): void {
    this.entries.clear();
  }
}

/** An outcome kept in the cache: a value, or the error it raised. */
type Outcome = { readonly ok: true; readonly value: unknown } | { readonly ok: false; readonly error: unknown };

/** Calls remembered per process: a 100 × 100 what-if table recalculates from memory; a few MB at most. */
export const CALL_CACHE_SIZE = 10000;

/**
 * Remembered calls, as a tree of Maps keyed by each argument in turn: numbers, strings and
 * booleans are Map keys as they are (turning a number into text for a string key cost more
 * than a pH solve); a range becomes its JSON text. The whole tree is dropped when it holds
 * CALL_CACHE_SIZE calls, so a long session cannot grow it without bound.
 */
type Node = Map<unknown, Node | Outcome>;
let root: Node = new Map();
let remembered = 0;

/** Ranges with more rows than this are computed without being remembered. */
const UNKEYED_ROWS = 1000;

/** Where "blank" sits in the tree: omitted arguments, null and empty cells are alike. */
const BLANK = Symbol('blank');

function keyPart(a: unknown): unknown {
  if (a === undefined || a === null) return BLANK;
  // A NUL prefix keeps a range's text apart from any text a cell could hold.
  if (typeof a === 'object') return `\u0000${JSON.stringify(a, (_k, v: unknown) => (v === undefined ? null : v))}`;
  return a;
}

/**
 * Runs `compute` unless the same function was called with the same arguments before.
 * Errors are remembered too, and re-thrown.
 *
 * @param id - function id
 * @param args - the arguments as passed
 * @param compute - the work
 */
export function memoised<T>(id: string, args: readonly unknown[], compute: () => T): T {
  // A range far larger than any argument allows (a whole column passed by mistake) is not
  // worth a key: turning it into text would take longer than refusing it.
  if (args.some((a) => Array.isArray(a) && a.length > UNKEYED_ROWS)) return compute();
  let node = root.get(id) as Node | undefined;
  if (!node) root.set(id, (node = new Map()));
  // Trailing blanks are dropped, so f(a) and f(a, , ) are one call.
  let n = args.length;
  while (n > 0 && keyPart(args[n - 1]) === BLANK) n--;
  for (let i = 0; i < n; i++) {
    const part = keyPart(args[i]);
    let next = node.get(part) as Node | undefined;
    if (!next) node.set(part, (next = new Map()));
    node = next;
  }
  let outcome = node.get(OUTCOME) as Outcome | undefined;
  if (outcome === undefined) {
    try {
      outcome = { ok: true, value: compute() };
    } catch (error) {
      outcome = { ok: false, error };
    }
    if (remembered >= CALL_CACHE_SIZE) clearCallCache();
    else {
      node.set(OUTCOME, outcome);
      remembered++;
    }
  }
  if (!outcome.ok) throw outcome.error;
  return outcome.value as T;
}

/** The key under which a node keeps its call's outcome (no argument can equal it). */
const OUTCOME = Symbol('outcome');

/** Forgets every remembered call (tests and benchmarks). */
export function clearCallCache(): void {
  root = new Map();
  remembered = 0;
}
