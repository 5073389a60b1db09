import { CALL_CACHE_SIZE, clearCallCache, memoised } from '../../src/functions/memo';

beforeEach(() => clearCallCache());

/** memoised with a counter of how often the work ran. */
function counted(id: string, args: readonly unknown[]): { value: string; runs: number } {
  let runs = 0;
  const value = memoised(id, args, () => {
    runs++;
    return `${id}(${args.map((a) => JSON.stringify(a ?? null)).join(',')})`;
  });
  return { value, runs };
}

describe('memoised (the call cache)', () => {
  test('a call and a longer call sharing its first arguments are two calls, each remembered', () => {
    expect(counted('F', [1, 2])).toEqual({ value: 'F(1,2)', runs: 1 });
    expect(counted('F', [1, 2, 3])).toEqual({ value: 'F(1,2,3)', runs: 1 });
    expect(counted('F', [1])).toEqual({ value: 'F(1)', runs: 1 });
    expect(counted('F', [1, 2]).runs).toBe(0);
    expect(counted('F', [1, 2, 3]).runs).toBe(0);
    expect(counted('F', [1]).runs).toBe(0);
  });
  test('trailing blanks are dropped, so f(a) and f(a, , ) are one call; a blank inside is kept apart from text', () => {
    counted('G', ['a']);
    expect(counted('G', ['a', undefined, null]).runs).toBe(0);
    expect(counted('G', []).runs).toBe(1);
    expect(counted('G', [undefined]).runs).toBe(0);
    expect(counted('G', [null, 'x']).runs).toBe(1);
    expect(counted('G', ['', 'x']).runs).toBe(1);
  });
  test('ranges are keyed by their content; numbers and their text are different calls; functions are kept apart', () => {
    counted('H', [[['tris base', 50]]]);
    expect(counted('H', [[['tris base', 50]]]).runs).toBe(0);
    expect(counted('H', [[['tris base', 51]]]).runs).toBe(1);
    expect(counted('H', [7]).runs).toBe(1);
    expect(counted('H', ['7']).runs).toBe(1);
    expect(counted('K', [7]).runs).toBe(1);
  });
  test('neighbouring calls that differ in one argument, anywhere, are told apart (a grid along either axis)', () => {
    for (const a of [1, 2]) for (const b of [10, 20]) expect(counted('N', [a, 'x', b])).toEqual({ value: `N(${a},"x",${b})`, runs: 1 });
    for (const b of [10, 20]) for (const a of [1, 2]) expect(counted('N', [a, 'x', b]).runs).toBe(0);
    expect(counted('N', [1, 'y', 10]).runs).toBe(1);
    expect(counted('M', [1, 'x', 10]).runs).toBe(1);
    expect(counted('N', [1, 'x']).runs).toBe(1);
    expect(counted('N', [NaN, 'x', 10]).runs).toBe(1);
    expect(counted('N', [NaN, 'x', 10]).runs).toBe(0);
  });
  test('a call made while another is computed does not disturb where the outer call is kept', () => {
    const outer = () => memoised('O', [1, 2], () => memoised('I', [3, 4], () => 'inner') + ' outer');
    expect(outer()).toBe('inner outer');
    expect(counted('O', [1, 2])).toEqual({ value: 'inner outer', runs: 0 });
    expect(counted('I', [3, 4])).toEqual({ value: 'inner', runs: 0 });
  });
  test('an error is remembered and thrown again without running the work', () => {
    let runs = 0;
    const failing = () =>
      memoised('E', [1], () => {
        runs++;
        throw new Error('no');
      });
    expect(failing).toThrow('no');
    expect(failing).toThrow('no');
    expect(runs).toBe(1);
  });
  test(`the cache is emptied when it holds CALL_CACHE_SIZE (${CALL_CACHE_SIZE}) calls`, () => {
    for (let i = 0; i < CALL_CACHE_SIZE; i++) counted('L', [i]);
    expect(counted('L', [0]).runs).toBe(0);
    counted('L', [CALL_CACHE_SIZE]);
    expect(counted('L', [1]).runs).toBe(1);
  });
});
