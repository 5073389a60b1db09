/**
 * User substances from a worksheet range: the row layout (docs/functions.md), defaults,
 * several forms per substance, and messages that name the row at fault.
 */
import { solvePh, speciate } from '../../src/chem';
import { createLibrary } from '../../src/chem/library';
import { grams, ph, pka, substances, forms } from '../../src/functions/functions';
import { errorOf } from './errorOf';
import { clearCallCache } from '../../src/functions/memo';
import { spillShape } from '../../src/functions/functions';

/** Decimal places to which a function equals the direct core call (same core, same inputs). */
const SAME_DIGITS = 12;

const HEADER = ['name', 'charge', 'pKa', 'ΔH', 'ΔCp', 'form', 'molar mass', 'counter-ions', 'protons lost', 'formula'];
const USER = [
  HEADER,
  ['Lab amine', 1, '7.85', '40', '', 'Lab amine base', 131.2, '', '', ''],
  ['lab amine', '', '', '', '', 'Lab amine HCl', 167.6, 'Cl-', '', ''],
  [null, null, null, null, null, null, null, null, null, null],
  ['Lab diacid', 0, '3.1; 5.9', '1; 2', '0; 0', '', 95.1, '', '', ''],
  ['Lab diacid', 0, '3.1; 5.9', '', '', 'Lab diacid disodium', '', '2 Na+', '', 'C4H4Na2O4'],
];

beforeEach(() => clearCallCache());

describe('userSubstances range', () => {
  const library = createLibrary([
    {
      name: 'Lab amine',
      chargeOfMostProtonated: 1,
      pKa: [7.85],
      deltaHkJ: [40],
      forms: [
        { name: 'Lab amine base', molarMass: 131.2, protonsLost: 1 },
        { name: 'Lab amine HCl', molarMass: 167.6, protonsLost: 0, counterIons: { 'Cl-': 1 } },
      ],
    },
  ]);
  test('a user form works in PH.OF exactly as the same record given to the core', () => {
    const composition = library.compositionFromForms([
      { form: 'Lab amine base', concentrationM: 0.02 },
      { form: 'Lab amine HCl', concentrationM: 0.03 },
    ]);
    expect(
      ph(
        [
          ['lab amine base', 20],
          ['LAB AMINE HCL', 30],
        ],
        25,
        '',
        USER,
      ),
    ).toBeCloseTo(solvePh(composition), SAME_DIGITS);
    expect(
      ph(
        [
          ['Lab diacid', 10],
          ['Lab diacid disodium', 5],
        ],
        '',
        '',
        USER,
      ),
    ).toBeCloseTo(
      speciate(
        createLibrary([
          {
            name: 'Lab diacid',
            chargeOfMostProtonated: 0,
            pKa: [3.1, 5.9],
            deltaHkJ: [1, 2],
            deltaCpJ: [0, 0],
            forms: [
              { name: 'Lab diacid', molarMass: 95.1, protonsLost: 0 },
              { name: 'Lab diacid disodium', formula: 'C4H4Na2O4', protonsLost: 2, counterIons: { 'Na+': 2 } },
            ],
          },
        ]).compositionFromForms([
          { form: 'Lab diacid', concentrationM: 0.01 },
          { form: 'Lab diacid disodium', concentrationM: 0.005 },
        ]),
      ).pH,
      SAME_DIGITS,
    );
  });
  test('protons lost defaults to neutrality with the counter-ions; molar mass from the row; pKa with ΔH moves with temperature', () => {
    expect(grams('Lab amine HCl', 100, 1000, '', USER)).toBeCloseTo(16.76, SAME_DIGITS);
    expect(pka('Lab amine', 1, 25, 0, '', USER)).toBeCloseTo(7.85, SAME_DIGITS);
    expect(pka('Lab amine', 1, 37, 0, '', USER)).toBeLessThan(7.85);
  });
  test('lists: user substances after the library, one row each, within library + user rows (what the formula engine pads to)', () => {
    const list = substances(USER);
    expect(list.map((r) => r[0])).toEqual(expect.arrayContaining(['Lab amine', 'Lab diacid']));
    expect(list.length).toBeLessThanOrEqual(spillShape('SUBSTANCES', [USER.length])!.rows);
    expect(forms(USER).length).toBeLessThanOrEqual(spillShape('FORMS', [USER.length])!.rows);
    expect([...list, ...forms(USER)].every((r) => r[0] !== '')).toBe(true);
    expect(forms(USER).map((r) => r[0])).toEqual(expect.arrayContaining(['Lab amine base', 'Lab amine HCl', 'Lab diacid', 'Lab diacid disodium']));
  });
  test('a blank range is the built-in library', () => {
    expect(
      ph([['tris base', 50]], 25, '', [
        [null, null],
        ['', ''],
      ]),
    ).toBeCloseTo(ph([['tris base', 50]]), SAME_DIGITS);
  });
  test('errors name the row: bad pKa list, conflicting repeat, clash with a library name, missing molar mass, bad counter-ions', () => {
    expect(errorOf(() => ph([['tris base', 1]], 25, '', [['X', 0, '6.1; seven', '', '', '', 100]]))).toMatchObject({ kind: 'value', code: 'notANumber', field: 'pKa list' });
    expect(
      errorOf(() =>
        ph([['tris base', 1]], 25, '', [
          ['X', 0, '6', '', '', '', 100],
          ['X', 1, '6', '', '', 'X2', 100],
        ]),
      ).message,
    ).toMatch(/^userSubstances, row 2: "X" is given twice/);
    expect(
      errorOf(() =>
        ph([['tris base', 1]], 25, '', [
          ['X', 0, '6', '', '', 'X acid', 100],
          ['HEPES', 0, '7.5', '', '', 'my hepes', 238],
        ]),
      ).message,
    ).toMatch(/^userSubstances, row 2: .*"HEPES" is already a name/);
    expect(errorOf(() => ph([['tris base', 1]], 25, '', [['X', 0, '6', '', '', '', '']])).message).toMatch(/^userSubstances, row 1: .*molarMass is missing/);
    expect(errorOf(() => ph([['tris base', 1]], 25, '', [['X', 0, '6', '', '', '', 100, 'sodium two']])).message).toMatch(/^userSubstances, row 1: cannot read the counter-ions/);
    expect(errorOf(() => ph([['tris base', 1]], 25, '', [['X', 0, '', '', '', '', 100]])).message).toMatch(/^userSubstances, row 1: pKa list is blank/);
    expect(errorOf(() => ph([['tris base', 1]], 25, '', [['X', 0, '7; 6', '', '', '', 100]])).message).toMatch(/^userSubstances, row 1: .*must ascend/);
  });
});
