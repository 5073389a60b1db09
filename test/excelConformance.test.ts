/**
 * The closest we come to loading the add-in in Excel without Excel: the built
 * dist/functions.js runs in a fresh V8 context (node:vm) with a stand-in for the host's
 * CustomFunctions and Office globals, and is held to the host's documented rules:
 *
 * - every id of the built functions.json is associated exactly once, and nothing else is;
 * - every id and name follows Excel's naming rules (the one list, src/functions/namingRules.ts);
 * - every function, called as Excel calls it (each declared parameter passed, null for an
 *   omitted optional one, ranges as 2-D arrays), returns what the metadata declares: one value
 *   for a scalar, a rectangular array of values for a matrix, with no blank padding (Excel
 *   sizes a spill when the result comes back);
 * - bad arguments throw the host's error type (CustomFunctions.Error) with a message, and only
 *   with the codes that carry one (#VALUE!, #N/A: Microsoft, "Handle and return errors from
 *   your custom function", https://learn.microsoft.com/office/dev/add-ins/excel/custom-functions-errors);
 * - every helpUrl lands on an id of the built help page;
 *
 * and the same for a deployment build (ADDIN_ORIGIN=https://example.org, built into
 * test-artifacts/dist-deploy), whose manifest must also pass the structural checks.
 */
import { readFileSync, existsSync } from 'fs';
import { join } from 'path';
import { runInNewContext } from 'vm';
import { namingProblems } from '../src/functions/namingRules';
import { DEPLOY_DIST, DEPLOY_ORIGIN, DIST, ROOT, ensureBuild, ensureDeployBuild } from './support/build';
import { manifestProblems } from './support/manifestChecks';

interface FunctionMeta {
  id: string;
  name: string;
  helpUrl: string;
  parameters: { name: string; dimensionality?: string; optional?: boolean }[];
  result: { dimensionality?: string };
}

/** Error codes of the host; only the first two accept a message. */
const ERROR_CODES = {
  invalidValue: '#VALUE!',
  notAvailable: '#N/A',
  divisionByZero: '#DIV/0!',
  invalidNumber: '#NUM!',
  nullReference: '#NULL!',
  invalidName: '#NAME?',
  invalidReference: '#REF!',
} as const;
const CODES_WITH_MESSAGE: readonly string[] = [ERROR_CODES.invalidValue, ERROR_CODES.notAvailable];

/** The stand-in for CustomFunctions.Error: refuses a message on a code that cannot show one, as the host documents. */
class HostError extends Error {
  constructor(
    readonly code: string,
    message?: string,
  ) {
    super(message);
    if (!Object.values(ERROR_CODES).includes(code as never)) throw new Error(`unknown error code ${code}`);
    if (message !== undefined && !CODES_WITH_MESSAGE.includes(code)) throw new Error(`${code} cannot carry a message ("${message}")`);
  }
}

/** Loads a build's functions.js in a fresh context; returns every associate call and what the bundle touched of Office. */
function loadBundle(dir: string) {
  const calls: [string, (...args: unknown[]) => unknown][] = [];
  const officeUse: string[] = [];
  const office = new Proxy(
    { onReady: () => Promise.resolve({ host: 'Excel', platform: 'OfficeOnline' }) },
    { get: (target, key) => (officeUse.push(String(key)), (target as Record<string | symbol, unknown>)[key]) },
  );
  const customFunctions = { associate: (id: string, fn: (...args: unknown[]) => unknown) => void calls.push([id, fn]), Error: HostError, ErrorCode: ERROR_CODES };
  runInNewContext(readFileSync(join(dir, 'functions.js'), 'utf8'), { CustomFunctions: customFunctions, Office: office, console }, { filename: join(dir, 'functions.js') });
  return { calls, officeUse };
}

const COMPOSITION = [
  ['tris base', 50],
  ['HCl', 25],
  ['NaCl', 150],
];
/** A user-substance range with an unreadable pKa list (columns as docs/functions.md gives them). */
const BAD_USER_RANGE = [['Lab acid', 0, '6.1; seven', '', '', 'Lab acid', 100]];

/** Our lab's stock shelf, as a range (docs/stocks.md). */
const SHELF = [
  ['name', 'form', 'concentration', 'titrant', 'pH', 'pH at °C'],
  ['Tris-HCl 1 M pH 8.0', 'tris base', '1 M', 'HCl', 8, 25],
  ['NaCl 5 M', 'NaCl', 5, '', '', ''],
  ['KCl 3 M', 'KCl', '3 M', '', '', ''],
];

/** Arguments Excel would pass, by function: good ones (our own lab's values) and bad ones. */
const CALLS: Record<string, { good: unknown[]; bad: unknown[] }> = {
  'PH.OF': { good: [COMPOSITION], bad: [COMPOSITION, 'warm'] },
  'TITRANT.ML': { good: ['tris base', 50, 1000, 7.4, 'HCl', 1], bad: ['tris base', 50, 1000, 11.5, 'HCl', 1] },
  CAPACITY: { good: [COMPOSITION], bad: [COMPOSITION, 'sideways'] },
  'PH.DILUTED': { good: [COMPOSITION, 10], bad: [COMPOSITION, 0] },
  'PH.AT.TEMPERATURE': { good: [COMPOSITION, 4], bad: [COMPOSITION, null] },
  PKA: { good: ['tris'], bad: ['unobtainium'] },
  GRAMS: { good: ['NaCl', 150, 1000], bad: ['NaCl', -1, 1000] },
  'IONIC.STRENGTH.MM': { good: [COMPOSITION], bad: [[['tris base'], ['NaCl']]] },
  'OSMOLARITY.IDEAL': { good: [COMPOSITION], bad: [[['tris base', 'lots']]] },
  WARNINGS: { good: [COMPOSITION], bad: [COMPOSITION, 150] },
  SPECIES: { good: [COMPOSITION], bad: [[['tris baes', 50]]] },
  SUBSTANCES: { good: [], bad: [BAD_USER_RANGE] },
  FORMS: { good: [], bad: [BAD_USER_RANGE] },
  'RECIPE.ROW': { good: ['HEPES', 7.4, 25, 500], bad: ['HEPES', 15, 25, 500] },
  RECIPE: {
    good: [
      'HEPES',
      7.4,
      25,
      500,
      4,
      [['NaCl', 150]],
      [
        ['form', 'HEPES free acid'],
        ['titrant', 'NaOH'],
        ['benchTemperatureC', 22],
      ],
    ],
    bad: ['HEPES', 7.4, -25, 500],
  },
  CONDUCTIVITY: { good: [COMPOSITION, 20], bad: [COMPOSITION, 80] },
  OSMOLALITY: { good: [COMPOSITION], bad: [COMPOSITION, 150] },
  'MIX.VOLUMES': {
    good: [
      SHELF,
      [
        ['tris', 20],
        ['NaCl', '150 mM'],
      ],
      50,
      7.9,
      4,
    ],
    bad: [
      SHELF,
      [
        ['NaCl', 3000],
        ['KCl', 2000],
      ],
      10,
    ],
  },
  'MIX.PH': {
    good: [
      SHELF,
      [
        ['Tris-HCl 1 M pH 8.0', 1],
        ['NaCl 5 M', 1.5],
      ],
      50,
      4,
    ],
    bad: [
      SHELF,
      [
        ['Tris-HCl 1 M pH 8.0', 40],
        ['NaCl 5 M', 20],
      ],
      50,
    ],
  },
  'AS.MADE': {
    good: [
      'HEPES',
      7.4,
      25,
      500,
      [
        ['HEPES free acid', 2.979],
        ['actual.titrantMl', 4.1],
      ],
    ],
    bad: [
      'HEPES',
      7.4,
      25,
      500,
      [
        ['HEPES free acid', 2.979],
        ['actual.titrantMl', 'lots'],
      ],
    ],
  },
  'TITRANT.NEXT': { good: ['HEPES', 7.4, 25, 500, 3, 7.0], bad: ['HEPES', 7.4, 25, 500, 3, 15] },
};

/** The arguments as Excel passes them: one per declared parameter, null where the user gave none. */
function asExcelPasses(fn: FunctionMeta, given: unknown[]): unknown[] {
  return fn.parameters.map((_p, i) => (i < given.length ? given[i] : null));
}

const isCell = (v: unknown) => (typeof v === 'number' && Number.isFinite(v)) || typeof v === 'string' || typeof v === 'boolean';

/** What is wrong with a result for its declared dimensionality (empty when it conforms). */
function shapeProblems(result: unknown, dimensionality: string): string[] {
  if (dimensionality !== 'matrix') return isCell(result) ? [] : [`scalar result ${JSON.stringify(result)} is not a finite number, text or boolean`];
  if (!Array.isArray(result) || result.length === 0 || !result.every(Array.isArray)) return ['matrix result is not a non-empty array of rows'];
  const rows = result as unknown[][];
  const problems: string[] = [];
  if (new Set(rows.map((r) => r.length)).size !== 1 || rows[0].length === 0) problems.push('matrix rows differ in length');
  if (!rows.every((r) => r.every(isCell))) problems.push('a matrix cell is not a finite number, text or boolean');
  if (rows.some((r) => r.every((v) => v === ''))) problems.push('a matrix row is blank padding');
  return problems;
}

/** Ids of an HTML page. */
const idsOf = (html: string) => new Set([...html.matchAll(/\sid="([^"]+)"/g)].map((m) => m[1]));

describe.each([
  ['the development build (dist/)', DIST, 'https://localhost:3000', ensureBuild],
  ['a deployment build (ADDIN_ORIGIN=https://example.org)', DEPLOY_DIST, DEPLOY_ORIGIN, ensureDeployBuild],
])('Excel conformance of %s', (_label, dir, origin, buildIt) => {
  let functions: FunctionMeta[] = [];
  let bundle: ReturnType<typeof loadBundle>;

  beforeAll(() => {
    buildIt();
    functions = (JSON.parse(readFileSync(join(dir, 'functions.json'), 'utf8')) as { functions: FunctionMeta[] }).functions;
    bundle = loadBundle(dir);
  }, 600_000);

  const registered = (id: string) => bundle.calls.find(([i]) => i === id)![1];

  test('associates every id of functions.json exactly once, and nothing else', () => {
    const ids = functions.map((f) => f.id);
    expect(ids.length).toBe(Object.keys(CALLS).length);
    expect(bundle.calls.map(([id]) => id).sort()).toEqual([...ids].sort());
    expect(new Set(ids).size).toBe(ids.length);
  });

  test('functions.json is the generated metadata, with help links on this origin', () => {
    const source = (JSON.parse(readFileSync(join(ROOT, 'src/functions/metadata.json'), 'utf8')) as { functions: FunctionMeta[] }).functions;
    const onOrigin = (f: FunctionMeta) => ({ ...f, helpUrl: f.helpUrl.replace('https://localhost:3000', origin) });
    expect(functions).toEqual(source.map(onOrigin));
  });

  test("every id and name follows Excel's naming rules", () => {
    expect(functions.flatMap((f) => namingProblems(f.id, f.name))).toEqual([]);
  });

  test('registering touches nothing of Office but what the host provides', () => {
    expect(bundle.officeUse.filter((k) => k !== 'onReady')).toEqual([]);
  });

  test('each function with good arguments returns its declared dimensionality (matrices without blank padding)', () => {
    for (const fn of functions) {
      const result = registered(fn.id)(...asExcelPasses(fn, CALLS[fn.id].good));
      expect({ id: fn.id, problems: shapeProblems(result, fn.result.dimensionality ?? 'scalar') }).toEqual({ id: fn.id, problems: [] });
    }
  });

  test('each function with bad arguments throws CustomFunctions.Error with #VALUE! or #N/A and a message', () => {
    for (const fn of functions) {
      let thrown: unknown;
      try {
        registered(fn.id)(...asExcelPasses(fn, CALLS[fn.id].bad));
      } catch (error) {
        thrown = error;
      }
      const error = thrown as HostError;
      expect({ id: fn.id, hostError: thrown instanceof HostError }).toEqual({ id: fn.id, hostError: true });
      expect({ id: fn.id, code: CODES_WITH_MESSAGE.includes(error.code) }).toEqual({ id: fn.id, code: true });
      expect({ id: fn.id, message: error.message.length > 15 }).toEqual({ id: fn.id, message: true });
    }
  });

  test('every helpUrl is https on this origin and lands on an id of the built help page', () => {
    const ids = idsOf(readFileSync(join(dir, 'help', 'functions.html'), 'utf8'));
    for (const fn of functions) {
      const [page, anchor] = fn.helpUrl.split('#');
      expect({ id: fn.id, page, found: ids.has(anchor) }).toEqual({ id: fn.id, page: `${origin}/help/functions.html`, found: true });
    }
  });

  test('the manifest passes the structural checks against the files this build serves', () => {
    const manifest = existsSync(join(dir, 'manifest.xml')) ? join(dir, 'manifest.xml') : join(ROOT, 'manifest.xml');
    const served = (path: string) => (existsSync(join(dir, path)) ? readFileSync(join(dir, path)) : undefined);
    expect(manifestProblems(readFileSync(manifest, 'utf8'), origin, served)).toEqual([]);
  });
});

describe('the conformance checks themselves', () => {
  test('a stand-in error refuses a message on a code that cannot show one', () => {
    expect(() => new HostError('#NUM!', 'too big')).toThrow(/cannot carry a message/);
    expect(new HostError('#N/A', 'not found').message).toBe('not found');
  });

  test('shape checks catch blank padding, ragged rows and a matrix where a scalar belongs', () => {
    expect(
      shapeProblems(
        [
          ['a', 1],
          ['', ''],
        ],
        'matrix',
      ),
    ).toEqual(['a matrix row is blank padding']);
    expect(shapeProblems([['a', 1], ['b']], 'matrix')).toEqual(['matrix rows differ in length']);
    expect(shapeProblems([[1]], 'scalar')).toHaveLength(1);
    expect(shapeProblems(Number.NaN, 'scalar')).toHaveLength(1);
  });
});
