/**
 * The Excel entry: registration from the generated metadata, and errors turned into
 * CustomFunctions.Error (#VALUE! / #N/A with the message), with a stand-in for Office.
 */
import { CATALOG } from '../../src/functions/catalog';
import { registerExcelFunctions, CustomFunctionsApi } from '../../src/functions/excel';
import metadata from '../../src/functions/metadata.json';

class FakeError {
  constructor(
    readonly code: string,
    readonly message?: string,
  ) {}
}

function fakeApi() {
  const registered = new Map<string, (...args: unknown[]) => unknown>();
  const api = {
    associate: (id: string, fn: (...args: unknown[]) => unknown) => registered.set(id, fn),
    Error: FakeError,
    ErrorCode: { invalidValue: '#VALUE!', notAvailable: '#N/A' },
  } as unknown as CustomFunctionsApi;
  return { api, registered };
}

describe('Excel registration', () => {
  test('importing the catalog and the entry outside Office registers nothing and throws nothing', () => {
    expect(typeof (globalThis as { CustomFunctions?: unknown }).CustomFunctions).toBe('undefined');
    expect(CATALOG.length).toBe(metadata.functions.length);
  });

  test('associates every id of metadata.json', () => {
    const { api, registered } = fakeApi();
    expect(registerExcelFunctions(api)).toEqual(metadata.functions.map((f) => f.id));
    expect([...registered.keys()].sort()).toEqual(metadata.functions.map((f) => f.id).sort());
  });

  test('values come back as values; failures are thrown as CustomFunctions.Error with code and message', () => {
    const { api, registered } = fakeApi();
    registerExcelFunctions(api);
    expect(registered.get('GRAMS')!('NaCl', 150, 1000)).toBeCloseTo(0.15 * 58.44, 1);
    const thrown = (call: () => unknown) => {
      try {
        call();
      } catch (e) {
        return e as FakeError;
      }
      throw new Error('expected a throw');
    };
    const bad = thrown(() => registered.get('PH.OF')!([['tris base', 50]], 'warm'));
    expect(bad).toBeInstanceOf(FakeError);
    expect(bad.code).toBe('#VALUE!');
    expect(bad.message).toMatch(/temperatureC must be a number/);
    const missing = thrown(() => registered.get('GRAMS')!('unobtainium', 1, 1));
    expect(missing.code).toBe('#N/A');
    expect(missing.message).toMatch(/not in the substance library/);
  });
});
