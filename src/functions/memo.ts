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

const calls = new Lru<Outcome>(CALL_CACHE_SIZE);

/** A cache key for arguments (ranges included); blanks and omitted arguments are alike. */
export function keyOf(id: string, args: readonly unknown[]): string {
  // Built by hand for the common scalar arguments (JSON.stringify with a replacer cost
  // more than the chemistry); strings are length-prefixed so no two argument lists collide.
  let key = id;
  for (const a of args) {
    if (a === undefined || a === null) key += '|_';
    else if (typeof a === 'number') key += `|n${a}`;
    else if (typeof a === 'string') key += `|s${a.length}:${a}`;
    else if (typeof a === 'boolean') key += a ? '|t' : '|f';
    else key += `|j${JSON.stringify(a, (_k, v: unknown) => (v === undefined ? null : v))}`;
  }
  return key;
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
  const key = keyOf(id, args);
  let outcome = calls.get(key);
  if (outcome === undefined) {
    try {
      outcome = { ok: true, value: compute() };
    } catch (error) {
      outcome = { ok: false, error };
    }
    calls.set(key, outcome);
  }
  if (!outcome.ok) throw outcome.error;
  return outcome.value as T;
}

/** Forgets every remembered call (tests and benchmarks). */
export function clearCallCache(): void {
  calls.clear();
}
