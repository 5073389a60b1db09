/**
 * The worksheet functions called as Excel calls them (plain JavaScript values, 2-D arrays
 * for ranges): typical use against direct core calls, the argument forms users type, and
 * every error path with its kind and message.
 */
import { ACTIVITY_MODELS, afterDilution, capacity, conductivityAt, idealOsmolarity, pKaAt, solvePh, speciate, titrantForPh, HYDROCHLORIC_ACID } from '../../src/chem';
import { defaultLibrary } from '../../src/chem/library';
import {
  capacityOf,
  conductivity,
  forms,
  grams,
  ionicStrengthMm,
  osmolality,
  osmolarityIdeal,
  ph,
  phAtTemperature,
  phDiluted,
  pka,
  species,
  spillShape,
  substances,
  titrantMl,
  warnings,
  SPECIES_TABLE_ROWS,
} from '../../src/functions/functions';
import { errorOf } from './errorOf';
import { pHSAt25 } from '../chem/iupacStandards';
import { clearCallCache } from '../../src/functions/memo';

/** Decimal places to which a function equals the direct core call: same core, same arguments; only mM↔M scaling rounds. */
const SAME_DIGITS = 12;
/** Decimal places for results scaled by volumes (mL) or mM, where the scaling rounds in the 10th place. */
const SCALED_DIGITS = 9;

const lib = defaultLibrary();
const TRIS_SALINE = [
  ['tris base', 50],
  ['NaCl', 150],
];
const trisSaline = (temperatureC = 25, activityModel: 'pitzer' | 'davies' | 'ideal' | 'bates-guggenheim' = 'pitzer') =>
  lib.compositionFromForms(
    [
      { form: 'tris base', concentrationM: 0.05 },
      { form: 'NaCl', concentrationM: 0.15 },
    ],
    { temperatureC, activityModel },
  );

beforeEach(() => clearCallCache());

describe('PH.OF', () => {
  test('equals the core solver for a composition range (typical use)', () => {
    expect(ph(TRIS_SALINE)).toBeCloseTo(solvePh(trisSaline()), SAME_DIGITS);
    expect(ph(TRIS_SALINE, 37, 'ideal')).toBeCloseTo(solvePh(trisSaline(37, 'ideal')), SAME_DIGITS);
  });
  test('accepts numbers as text, blank temperature and model, mixed-case names and blank rows', () => {
    const expected = solvePh(trisSaline());
    expect(
      ph(
        [
          ['TRIS BASE', '50'],
          ['', ''],
          [' nacl ', ' 150 '],
          [null, null],
        ],
        '',
        null,
      ),
    ).toBeCloseTo(expected, SAME_DIGITS);
    expect(ph(TRIS_SALINE, '25', 'Pitzer')).toBeCloseTo(expected, SAME_DIGITS);
  });
  test('a system name means the system with no counter-ions; a strong-ion name adds the ion', () => {
    const direct = solvePh({ systems: [{ ...lib.compositionFromForms([{ form: 'HEPES free acid', concentrationM: 0.02 }]).systems[0] }], strongIons: { 'Na+': 0.01 } });
    expect(
      ph([
        ['HEPES', 20],
        ['Na+', 10],
      ]),
    ).toBeCloseTo(direct, SAME_DIGITS);
  });
  test('KH2PO4 + Na2HPO4 0.025 + 0.025 mol/kg reads 6.865 at 25 °C (IUPAC 2002 primary standard, Buck et al., from the shared fixture test/chem/iupacStandards.ts; tolerance 0.02: Davies model plus molal≈molar)', () => {
    expect(
      Math.abs(
        ph([
          ['KH2PO4', 25],
          ['Na2HPO4', 25],
        ]) - pHSAt25('phosphate1to1'),
      ),
    ).toBeLessThan(0.02);
  });
  test('errors: unknown name (#N/A with did-you-mean), one-column range, empty range, bad amount, bad temperature, bad model', () => {
    const unknown = errorOf(() =>
      ph([
        ['tris base', 50],
        ['HEPSE', 10],
      ]),
    );
    expect(unknown.kind).toBe('na');
    expect(unknown.message).toMatch(/composition, row 2: .*"HEPSE".*did you mean "HEPES"/);
    expect(errorOf(() => ph([['tris base'], ['NaCl']])).message).toMatch(/composition has 1 column/);
    expect(
      errorOf(() =>
        ph([
          ['', ''],
          [null, null],
        ]),
      ).message,
    ).toMatch(/composition holds no rows/);
    expect(errorOf(() => ph([['tris base', 'fifty']])).message).toMatch(/row 1: amount \(mM\) must be a number/);
    expect(errorOf(() => ph([['tris base', '']]))).toMatchObject({ kind: 'value', code: 'missingValue', field: 'amount (mM)' });
    expect(errorOf(() => ph([['tris base', -1]])).message).toMatch(/amount \(mM\) is -1; allowed: 0 to 20000 mM/);
    expect(errorOf(() => ph([['', 5]])).message).toMatch(/row 1: name is blank/);
    const hot = errorOf(() => ph(TRIS_SALINE, 120));
    expect(hot.kind).toBe('value');
    expect(hot.message).toBe('temperatureC is 120; allowed: 0 to 100 °C.');
    expect(errorOf(() => ph(TRIS_SALINE, true)).message).toMatch(/temperatureC must be a number/);
    expect(errorOf(() => ph(TRIS_SALINE, 25, 'hückel-plus'))).toMatchObject({ kind: 'value', code: 'unknownChoice', field: 'activityModel', allowed: ACTIVITY_MODELS.join(', ') });
  });
  test('identical calls are memoised (same value, no second solve)', () => {
    const first = ph(TRIS_SALINE, 30);
    expect(ph(TRIS_SALINE, 30)).toBe(first);
  });
});

describe('TITRANT.ML', () => {
  const trisAlone = lib.compositionFromForms([{ form: 'tris base', concentrationM: 0.05 }], { temperatureC: 25 });
  test('volume = titrant concentration × final volume / stock (typical use: tris base to pH 7.4 with 1 M HCl)', () => {
    const c = titrantForPh(trisAlone, HYDROCHLORIC_ACID, 7.4).concentrationM;
    expect(titrantMl('tris base', 50, 1000, 7.4, 'HCl', 1)).toBeCloseTo((c * 1000) / 1, SCALED_DIGITS);
    expect(titrantMl('Tris Base', '50', '500', '7.4', 'hcl', '2', '', '')).toBeCloseTo((c * 500) / 2, SCALED_DIGITS);
  });
  test('a weak titrant (tris base) brings HEPES free acid up, and the volume falls as temperature rises (tris pKa falls ~0.03/°C)', () => {
    const cold = titrantMl('HEPES free acid', 20, 1000, 7.5, 'tris base', 1, 4);
    const warm = titrantMl('HEPES free acid', 20, 1000, 7.5, 'tris base', 1, 37);
    expect(cold).toBeGreaterThan(0);
    expect(warm).toBeGreaterThan(0);
    expect(warm).not.toBeCloseTo(cold, 3);
  });
  test('errors: target the titrant cannot reach (#N/A), stock too dilute (#N/A), a multi-system titrant, blanks and ranges', () => {
    const wrongWay = errorOf(() => titrantMl('tris base', 50, 1000, 11, 'HCl', 1));
    expect(wrongWay.kind).toBe('na');
    expect(wrongWay.message).toMatch(/pH 11 cannot be reached/);
    const dilute = errorOf(() => titrantMl('tris base', 50, 1000, 7.4, 'HCl', 0.001));
    expect(dilute.kind).toBe('na');
    expect(dilute.message).toMatch(/too dilute/);
    expect(errorOf(() => titrantMl('tris base', 50, 1000, 7.4, 'ammonium acetate', 1)).message).toMatch(/cannot serve as a titrant/);
    expect(errorOf(() => titrantMl('tris base', 50, 1000, 15, 'HCl', 1))).toMatchObject({ kind: 'value', code: 'outOfRange', field: 'targetPh', allowed: 'pH 0 to 14' });
    expect(errorOf(() => titrantMl('tris base', 50, 0, 7.4, 'HCl', 1))).toMatchObject({
      kind: 'value',
      code: 'outOfRange',
      field: 'finalVolumeMl',
      allowed: '0.001 to 1,000,000 mL',
    });
    expect(errorOf(() => titrantMl('tris base', 50, 1000, 7.4, '', 1)).message).toMatch(/titrant is blank/);
    expect(errorOf(() => titrantMl('tris base', 50, 1000, 7.4, 'HCl', ''))).toMatchObject({ kind: 'value', code: 'missingValue', field: 'titrantConcentrationM' });
    expect(errorOf(() => titrantMl('tris bsae', 50, 1000, 7.4, 'HCl', 1)).kind).toBe('na');
  });
});

describe('CAPACITY', () => {
  const core = capacity(trisSaline());
  test('mM strong base per +0.1 pH by default; "acid" and "beta" choose the other measures', () => {
    expect(capacityOf(TRIS_SALINE)).toBeCloseTo(core.baseMmPerTenthPh, SAME_DIGITS);
    expect(capacityOf(TRIS_SALINE, 'Acid')).toBeCloseTo(core.acidMmPerTenthPh, SAME_DIGITS);
    expect(capacityOf(TRIS_SALINE, 'beta')).toBeCloseTo(core.betaMPerPh, SAME_DIGITS);
    expect(capacityOf(TRIS_SALINE, 'M/pH')).toBeCloseTo(core.betaMPerPh, SAME_DIGITS);
  });
  test('an unknown measure lists the choices', () => {
    expect(errorOf(() => capacityOf(TRIS_SALINE, 'mol')).message).toBe('measure: "mol" is not one of the choices; allowed: "base", "acid", "beta".');
  });
});

describe('PH.DILUTED and PH.AT.TEMPERATURE', () => {
  test('match the core (afterDilution; speciate at the new temperature)', () => {
    expect(phDiluted(TRIS_SALINE, SCALED_DIGITS)).toBeCloseTo(afterDilution(trisSaline(), SCALED_DIGITS).pH, SAME_DIGITS);
    expect(phDiluted(TRIS_SALINE, 1)).toBeCloseTo(solvePh(trisSaline()), SAME_DIGITS);
    expect(phAtTemperature(TRIS_SALINE, 4)).toBeCloseTo(solvePh(trisSaline(4)), SAME_DIGITS);
  });
  test('tris moves about −0.028 pH per °C (common practice; tolerance 0.006 per °C: ΔH and ΔCp give 0.025–0.031 over 4–37 °C)', () => {
    const slope = (phAtTemperature(TRIS_SALINE, 37) - phAtTemperature(TRIS_SALINE, 4)) / 33;
    expect(Math.abs(slope + 0.028)).toBeLessThan(0.006);
  });
  test('errors: dilution factor below 1, temperature blank where required', () => {
    expect(errorOf(() => phDiluted(TRIS_SALINE, 0.5))).toMatchObject({ kind: 'value', code: 'outOfRange', field: 'dilutionFactor', allowed: '1 to 1,000,000' });
    expect(errorOf(() => phAtTemperature(TRIS_SALINE, '')).message).toMatch(/temperatureC is blank/);
  });
});

describe('PKA', () => {
  test('thermodynamic pKa at I = 0 and 25 °C: tris 8.07 (trade tables 8.06–8.08; tolerance 0.011 spans them)', () => {
    expect(Math.abs(pka('tris') - 8.07)).toBeLessThan(0.011);
  });
  test("at I = 0 equals the van 't Hoff pKa; with I the apparent pKa′ moves the way docs/science.md says (tris up, phosphate step 2 down)", () => {
    const tris = lib.findSystem('tris').steps[0];
    expect(pka('Tris HCl', '', 37)).toBeCloseTo(pKaAt(tris.pKa, tris.deltaHkJ ?? 0, tris.deltaCpJ ?? 0, 37), SAME_DIGITS);
    expect(pka('tris', 1, 25, 150)).toBeGreaterThan(pka('tris', 1, 25, 0));
    expect(pka('phosphate', 2, 25, 150)).toBeLessThan(pka('phosphate', 2, 25, 0));
    expect(pka('phosphate', 2, 25, 150, 'ideal')).toBeCloseTo(pka('phosphate', 2, 25, 0), SAME_DIGITS);
  });
  test("agrees with the solver's apparent pKa′ at the ionic strength it finds (one-number models; Pitzer needs the composition, and with an ionic strength alone takes the Bates–Guggenheim form)", () => {
    const result = speciate(
      lib.compositionFromForms(
        [
          { form: 'KH2PO4', concentrationM: 0.025 },
          { form: 'Na2HPO4', concentrationM: 0.025 },
        ],
        { activityModel: 'davies' },
      ),
    );
    expect(pka('phosphate', 2, 25, result.ionicStrengthM * 1000, 'davies')).toBeCloseTo(result.systems[0].apparentPKa[1], SCALED_DIGITS);
    expect(pka('phosphate', 2, 25, 100)).toBeCloseTo(pka('phosphate', 2, 25, 100, 'bates-guggenheim'), SAME_DIGITS);
  });
  test('errors: a step the substance lacks, a strong electrolyte, an unknown name', () => {
    expect(errorOf(() => pka('tris', 2)).message).toBe('step is 2; allowed: whole numbers 1 to 1.');
    expect(errorOf(() => pka('phosphate', 1.5)).message).toMatch(/step must be a whole number/);
    expect(errorOf(() => pka('NaCl')).kind).toBe('na');
    expect(errorOf(() => pka('')).message).toMatch(/substance is blank/);
  });
});

describe('GRAMS', () => {
  test('50 mM tris hydrochloride in 1 L is 7.88 g (molar mass 157.6 g/mol, trade fact; tolerance 0.005 g: formula vs label molar mass)', () => {
    expect(Math.abs(grams('tris hydrochloride', 50, 1000) - 7.88)).toBeLessThan(0.005);
  });
  test('purity as a fraction, a percentage or text with %, all alike; hydrate notations', () => {
    const pure = grams('Na2HPO4·7H2O', 25, 500);
    expect(pure).toBeCloseTo(0.025 * 0.5 * lib.findForm('Na2HPO4·7H2O').molarMass, SAME_DIGITS);
    for (const purity of [0.98, 98, '98%', '0.98', ' 98 % ']) expect(grams('Na2HPO4 x 7H2O', 25, 500, purity)).toBeCloseTo(pure / 0.98, SAME_DIGITS);
  });
  test('errors: purity out of range, unknown form, blank volume', () => {
    for (const bad of [0, 150, '120%', -5]) expect(errorOf(() => grams('NaCl', 150, 1000, bad))).toMatchObject({ kind: 'value', code: 'outOfRange', field: 'purity' });
    expect(errorOf(() => grams('NaCl', 150, 1000, 'pure'))).toMatchObject({ kind: 'value', code: 'notANumber', field: 'purity' });
    expect(errorOf(() => grams('sodium chlorid', 150, 1000)).message).toMatch(/did you mean/);
    expect(errorOf(() => grams('NaCl', 150, null))).toMatchObject({ kind: 'value', code: 'missingValue', field: 'volumeMl' });
  });
});

describe('IONIC.STRENGTH.MM and OSMOLARITY.IDEAL', () => {
  test('match the core in mM and mOsm/L', () => {
    const result = speciate(trisSaline());
    expect(ionicStrengthMm(TRIS_SALINE)).toBeCloseTo(result.ionicStrengthM * 1000, SCALED_DIGITS);
    expect(osmolarityIdeal(TRIS_SALINE)).toBeCloseTo(idealOsmolarity(result) * 1000, SCALED_DIGITS);
  });
  test('150 mM NaCl: I = 150 mM and ideal osmolarity 300 mOsm/L (definitions; tolerance 1e-3 for H+ and OH−)', () => {
    expect(Math.abs(ionicStrengthMm([['NaCl', 150]]) - 150)).toBeLessThan(1e-3);
    expect(Math.abs(osmolarityIdeal([['NaCl', 150]]) - 300)).toBeLessThan(1e-3);
  });
});

describe('OSMOLALITY', () => {
  test('matches the core in mOsm/kg, whatever model sets the pH', () => {
    expect(osmolality(TRIS_SALINE)).toBeCloseTo(speciate(trisSaline()).osmolalityMosmKg, SCALED_DIGITS);
    expect(osmolality(TRIS_SALINE, 25, 'davies')).toBeCloseTo(speciate(trisSaline(25, 'davies')).osmolalityMosmKg, SCALED_DIGITS);
  });
  test('0.9 % saline (154 mM NaCl) reads about 286 mOsm/kg on an osmometer (common practice), within 1 %, below its ideal osmolarity', () => {
    expect(Math.abs(osmolality([['NaCl', 154]]) - 286)).toBeLessThan(2.86);
    expect(osmolality([['NaCl', 154]])).toBeLessThan(osmolarityIdeal([['NaCl', 154]]));
  });
  test('errors as the other composition functions do', () => {
    expect(errorOf(() => osmolality([['nacll', 154]])).kind).toBe('na');
  });
});

describe('WARNINGS', () => {
  test('says "none" for a phosphate buffer near its pKa at room temperature', () => {
    expect(
      warnings([
        ['Na2HPO4', 30],
        ['NaH2PO4·H2O', 20],
      ]),
    ).toBe('none');
  });
  test('counts and numbers the warnings: weak buffering and calcium with citrate', () => {
    const text = warnings([
      ['trisodium citrate dihydrate', 10],
      ['CaCl2·2H2O', 2],
    ]);
    expect(text).toMatch(/^2 warnings: \(1\) pH \d+\.\d\d is more than 1 unit from every pKa′ .* \(2\) Ca2\+ with citrate: metal–buffer complexes are not modelled/);
  });
  test('passes on the solver warnings (temperature, ionic strength) that a PH.OF cell cannot show', () => {
    expect(warnings(TRIS_SALINE.concat([['HCl', 25]]), 80)).toMatch(
      /^2 warnings: \(1\) Temperature 80 °C is above 60 °C.* \(2\) Temperature 80 °C lies outside 0–50 °C, the temperatures the data for tris/,
    );
    expect(
      warnings(
        [
          ['NaCl', 2000],
          ['sodium acetate trihydrate', 50],
          ['acetic acid', 50],
        ],
        25,
        'davies',
      ),
    ).toMatch(/Ionic strength 2\.\d+ M is above 0\.5 M/);
    expect(
      warnings([
        ['NaCl', 5000],
        ['sodium acetate trihydrate', 50],
        ['acetic acid', 50],
      ]),
    ).toMatch(/Ionic strength 5\.\d+ mol\/kg is above 4 mol\/kg/);
  });
  test('warns when a system without ΔH° (malate) is used away from 25 ± 2 °C, not at 25 °C', () => {
    expect(
      warnings(
        [
          ['malic acid', 10],
          ['NaOH', 10],
        ],
        4,
      ),
    ).toMatch(/malate has no ΔH° for steps 1, 2: its pKa is held at the 25 °C value/);
    expect(
      warnings(
        [
          ['malic acid', 10],
          ['NaOH', 10],
        ],
        25,
      ),
    ).not.toMatch(/no ΔH°/);
  });
  test('names substances whose constants are from memory, but not the user own', () => {
    const oxalate = lib.findSystem('oxalate');
    expect(oxalate.steps.some((st) => st.checkedAgainst === 'memory')).toBe(true);
    expect(
      warnings([
        ['sodium oxalate', 20],
        ['oxalic acid', 20],
      ]),
    ).toMatch(/Constants for oxalate were written from memory/);
    const user = [
      ['name', 'charge of most protonated form', 'pKa list', 'ΔH list kJ/mol', 'ΔCp list J/(K·mol)', 'form name', 'molar mass g/mol', 'counter-ions', 'protons lost', 'formula'],
      ['Lab amine', 1, '7.85', '40', '', 'Lab amine base', 131.2, '', '', ''],
      ['lab amine', '', '', '', '', 'Lab amine HCl', 167.6, 'Cl-', '', ''],
    ];
    expect(
      warnings(
        [
          ['Lab amine base', 20],
          ['Lab amine HCl', 20],
        ],
        '',
        '',
        user,
      ),
    ).toBe('none');
  });
  test('refuses bad input as the other composition functions do', () => {
    expect(errorOf(() => warnings([['no such thing', 20]]))).toMatchObject({ kind: 'na' });
    expect(errorOf(() => warnings(TRIS_SALINE, 150))).toMatchObject({ kind: 'value' });
    const huge = Array.from({ length: 100000 }, () => ['NaCl', 1]);
    expect(errorOf(() => warnings(huge)).message).toMatch(/composition has 100000 rows; allowed: up to 1000/);
  });
});

describe('SPECIES', () => {
  test('a header and one row per species in mM, 4 columns, no blank padding (Excel sizes the spill; only the formula engine pads to 30 rows)', () => {
    const table = species(TRIS_SALINE);
    const result = speciate(trisSaline());
    expect(table).toHaveLength(result.species.length + 1);
    expect(table.every((row) => row.length === 4)).toBe(true);
    expect(table[0]).toEqual(['species', 'mM', 'activity (mM)', 'charge']);
    result.species.forEach((sp, i) => {
      expect(table[i + 1][0]).toBe(sp.name);
      expect(table[i + 1][1]).toBeCloseTo(sp.concentrationM * 1000, SAME_DIGITS);
      expect(table[i + 1][3]).toBe(sp.charge);
    });
    expect(table.some((row) => row.every((cell) => cell === ''))).toBe(false);
    expect(spillShape('SPECIES', [2])).toEqual({ rows: SPECIES_TABLE_ROWS, columns: 4 });
  });
  test('more species than rows is an error saying so', () => {
    const many = ['citrate', 'phosphate', 'carbonate', 'borate', 'histidine', 'glycine', 'sulfate', 'acetate', 'HEPES', 'MES'].map((n) => [n, 1]);
    expect(errorOf(() => species([...many, ['KCl', 1], ['NaCl', 1]])).message).toMatch(/more than the 29 rows/);
  });
});

describe('SUBSTANCES and FORMS', () => {
  test('list the library in one column, sized library + user rows', () => {
    const list = substances();
    expect(list).toHaveLength(lib.list().length);
    expect(list.map((r) => r[0])).toContain('HEPES');
    const formList = forms();
    expect(formList.map((r) => r[0])).toContain('sodium phosphate dibasic heptahydrate');
    expect(spillShape('FORMS', [0])!.rows).toBe(formList.length);
  });
});

describe('CONDUCTIVITY', () => {
  test('equals the core for a composition range, at 25 °C by default and at the temperature given', () => {
    expect(conductivity(TRIS_SALINE)).toBeCloseTo(conductivityAt(trisSaline()).conductivityMsPerCm, SAME_DIGITS);
    expect(conductivity(TRIS_SALINE, 4)).toBeCloseTo(conductivityAt(trisSaline(4)).conductivityMsPerCm, SAME_DIGITS);
  });
  test('refuses a temperature outside the conductivity model (0–60 °C) with the allowed range', () => {
    const e = errorOf(() => conductivity(TRIS_SALINE, 80));
    expect(e.message).toMatch(/temperatureC is 80; allowed: 0 to 60 °C/);
  });
});
