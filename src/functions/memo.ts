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
 * Remembered calls, as a tree keyed by each argument in turn: numbers, strings and booleans
 * are Map keys as they are (turning a number into text for a string key cost more than a pH
 * solve); a range becomes its JSON text. A call's outcome sits in its parent's `outcomes`
 * map under its last argument, so the cells of a grid column share one map instead of one
 * map each. The whole tree is dropped when it holds CALL_CACHE_SIZE calls, so a long session
 * cannot grow it without bound.
 */
interface MemoNode {
  /** Calls with more arguments, by the next argument. */
  children: Map<unknown, MemoNode> | undefined;
  /** Calls that end with the next argument, by that argument. */
  outcomes: Map<unknown, Outcome> | undefined;
  /** The call with no arguments (after trailing blanks are dropped). */
  own: Outcome | undefined;
}
const newNode = (): MemoNode => ({ children: undefined, outcomes: undefined, own: undefined });
let root = new Map<string, MemoNode>();
let remembered = 0;
/** The previous call's function, argument count, key parts before the last argument, and the node they lead to. */
const last: { id: string; length: number; parts: unknown[]; node: MemoNode | undefined } = { id: '', length: -1, parts: [], node: undefined };

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

function run<T>(compute: () => T): Outcome {
  try {
    return { ok: true, value: compute() };
  } catch (error) {
    return { ok: false, error };
  }
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
  for (let i = 0; i < args.length; i++) {
    const a = args[i];
    if (Array.isArray(a) && a.length > UNKEYED_ROWS) return compute();
  }
  let node: MemoNode | undefined = root.get(id);
  if (!node) root.set(id, (node = newNode()));
  // Trailing blanks are dropped, so f(a) and f(a, , ) are one call.
  let n = args.length;
  while (n > 0 && (args[n - 1] === undefined || args[n - 1] === null)) n--;
  // A grid's neighbouring cells differ in their last argument only: the node above it is the previous call's when
  // every argument before it is the same (compared as they are, without a Map lookup per argument).
  let same = id === last.id && n === last.length;
  for (let i = 0; same && i < n - 1; i++) same = keyPart(args[i]) === last.parts[i];
  if (same) node = last.node!;
  else {
    for (let i = 0; i < n - 1; i++) {
      const part = keyPart(args[i]);
      last.parts[i] = part;
      const children: Map<unknown, MemoNode> = node.children ?? (node.children = new Map());
      let next: MemoNode | undefined = children.get(part);
      if (!next) children.set(part, (next = newNode()));
      node = next;
    }
    last.id = id;
    last.length = n;
    last.node = node;
  }
  const key = n > 0 ? keyPart(args[n - 1]) : BLANK;
  let outcome = n > 0 ? node.outcomes?.get(key) : node.own;
  if (outcome === undefined) {
    outcome = run(compute);
    if (remembered >= CALL_CACHE_SIZE) clearCallCache();
    else {
      if (n === 0) node.own = outcome;
      else (node.outcomes ?? (node.outcomes = new Map())).set(key, outcome);
      remembered++;
    }
  }
  if (!outcome.ok) throw outcome.error;
  return outcome.value as T;
}

/** Forgets every remembered call (tests and benchmarks). */
export function clearCallCache(): void {
  root = new Map();
  remembered = 0;
  last.id = '';
  last.node = undefined;
}
