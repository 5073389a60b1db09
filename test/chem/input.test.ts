/**
 * The one input reader (src/chem/input): numbers, decimal commas, units and lists, and the
 * field declarations every host derives its checks from. Errors are compared by code and
 * field, never by message text.
 */
import { ChemError } from '../../src/chem';
import {
  FIELDS,
  allowedOf,
  readChoiceField,
  readNumberField,
  readPurityField,
  readQuantity,
  readQuantityList,
  readSaltsField,
  recipeFieldOf,
  requireNumberField,
} from '../../src/chem/input';

function codeOf(f: () => unknown): { code: string; field?: string } {
  try {
    f();
  } catch (e) {
    if (e instanceof ChemError) return { code: e.code, field: e.field };
    throw e;
  }
  throw new Error('expected an error');
}

describe('readQuantity: numbers as people type them', () => {
  it.each([
    ['7.4', 7.4],
    ['7,4', 7.4],
    [' 7.4 ', 7.4],
    ['-0.5', -0.5],
    ['.5', 0.5],
    ['6.022E+23', 6.022e23],
    ['1e-3', 0.001],
    ['0,025', 0.025],
    ['1234,5', 1234.5],
  ])('given %j, reads %d', (text, value) => {
    expect(readQuantity('x', text, 'fraction')).toBe(value);
  });

  it.each([['1,000'], ['1,000.5'], ['1,2,3']])('given %j (decimal comma or thousands separator?), refuses it as ambiguous', (text) => {
    expect(codeOf(() => readQuantity('x', text, 'fraction'))).toEqual({ code: 'ambiguousNumber', field: 'x' });
  });

  it.each([[''], ['abc'], ['0x1F'], ['7.4.1'], ['--1'], ['1e'], [true], [{}], [NaN], [Infinity]])('given %j, says it is not a number', (value) => {
    expect(['notANumber', 'notFinite', 'wrongUnit']).toContain(codeOf(() => readQuantity('x', value, 'fraction')).code);
  });

  it('converts units of the same kind to the field’s own unit', () => {
    expect(readQuantity('c', '50 mM', 'concentration', 'mM')).toBe(50);
    expect(readQuantity('c', '0,5 M', 'concentration', 'mM')).toBe(500);
    expect(readQuantity('c', '250 µM', 'concentration', 'mM')).toBeCloseTo(0.25, 15);
    expect(readQuantity('v', '0.5 L', 'volume', 'mL')).toBe(500);
    expect(readQuantity('v', '250 ml', 'volume', 'mL')).toBe(250);
    expect(readQuantity('t', '4 °C', 'temperature')).toBe(4);
    expect(readQuantity('t', '37C', 'temperature')).toBe(37);
    expect(readQuantity('p', 'pH 7,4', 'pH')).toBe(7.4);
    expect(readQuantity('p', '99.5 %', 'percent', '%')).toBe(99.5);
  });

  it('refuses "m" and "mm" for a concentration (mM or M?) instead of guessing', () => {
    expect(codeOf(() => readQuantity('concentrationMm', '5 m', 'concentration', 'mM'))).toEqual({ code: 'ambiguousUnit', field: 'concentrationMm' });
    expect(codeOf(() => readQuantity('concentrationMm', '5 mm', 'concentration', 'mM'))).toEqual({ code: 'ambiguousUnit', field: 'concentrationMm' });
  });

  it('refuses a unit of another kind, naming the field', () => {
    expect(codeOf(() => readQuantity('volumeMl', '5 mM', 'volume', 'mL'))).toEqual({ code: 'wrongUnit', field: 'volumeMl' });
  });

  it('refuses 30,000 digits followed by a letter at once, as not a number (the reader is linear and bounded)', () => {
    const started = Date.now();
    expect(codeOf(() => readQuantity('x', `${'9'.repeat(30000)}x`, 'fraction')).code).toBe('notANumber');
    // A guard against a hang, not a speed target (that lives in bench/): a quadratic reader took seconds.
    expect(Date.now() - started).toBeLessThan(1000);
  });
});

describe('readQuantityList: lists split on ";" or line breaks only', () => {
  it('reads "7,4" as one number, as every host does', () => {
    expect(readQuantityList('targetPh', '7,4', 'pH')).toEqual([7.4]);
    expect(readQuantityList('targetPh', '7,4; 7,6', 'pH')).toEqual([7.4, 7.6]);
    expect(readQuantityList('targetPh', '6.8\n7.0\r\n7.2', 'pH')).toEqual([6.8, 7.0, 7.2]);
  });

  it('given items separated by spaces, refuses them rather than guessing', () => {
    expect(codeOf(() => readQuantityList('targetPh', '7.0 7.2', 'pH')).code).toBe('notANumber');
  });
});

describe('field declarations', () => {
  it('every number field has a unit its dimension accepts and a range with min ≤ max', () => {
    for (const f of FIELDS) {
      if (f.kind !== 'number') continue;
      expect(f.min).toBeLessThanOrEqual(f.max);
      if (f.default !== undefined) {
        expect(f.default).toBeGreaterThanOrEqual(f.min);
        expect(f.default).toBeLessThanOrEqual(f.max);
      }
    }
  });

  it('names are unique, and labels are unique among recipe options', () => {
    const names = FIELDS.map((f) => f.name);
    expect(new Set(names).size).toBe(names.length);
    const labels = FIELDS.filter((f) => f.scope === 'recipe').map((f) => f.label.toLowerCase());
    expect(new Set(labels).size).toBe(labels.length);
  });

  it('reads a field with its range and default, naming the field as the user wrote it', () => {
    expect(readNumberField('useTemperatureC', undefined)).toBe(25);
    expect(readNumberField('useTemperatureC', '4 °C')).toBe(4);
    expect(readNumberField('benchTemperatureC', '')).toBeUndefined();
    expect(codeOf(() => requireNumberField('volumeMl', ''))).toEqual({ code: 'missingValue', field: 'volumeMl' });
    expect(codeOf(() => readNumberField('volumeMl', 0))).toEqual({ code: 'outOfRange', field: 'volumeMl' });
    expect(codeOf(() => readNumberField('titrant.concentrationM', '25 M', 'Titrant stock (M)'))).toEqual({ code: 'outOfRange', field: 'Titrant stock (M)' });
    expect(allowedOf(FIELDS.find((f) => f.name === 'concentrationMm')!)).toBe('0.001 to 5000 mM');
  });

  it('reads choices whatever the case and spacing', () => {
    expect(readChoiceField('activityModel', 'Bates Guggenheim')).toBe('bates-guggenheim');
    expect(readChoiceField('route', undefined)).toBe('titrate');
    expect(codeOf(() => readChoiceField('route', 'magic'))).toEqual({ code: 'unknownChoice', field: 'route' });
  });

  it('reads purity as a percentage or a fraction up to 1', () => {
    expect(readPurityField('formPurityPercent', '99.5%')).toBe(99.5);
    expect(readPurityField('formPurityPercent', 99.5)).toBe(99.5);
    expect(readPurityField('formPurityPercent', 0.995)).toBeCloseTo(99.5, 12);
    expect(readPurityField('formPurityPercent', 1)).toBe(100);
    expect(codeOf(() => readPurityField('formPurityPercent', 120))).toEqual({ code: 'outOfRange', field: 'formPurityPercent' });
  });

  it('reads a salt list from text or from a list, with units', () => {
    expect(readSaltsField('NaCl 150 mM; KCl 2,7 mM; MgCl2·6H2O 1')).toEqual([
      { form: 'NaCl', concentrationMm: 150 },
      { form: 'KCl', concentrationMm: 2.7 },
      { form: 'MgCl2·6H2O', concentrationMm: 1 },
    ]);
    expect(readSaltsField('sodium chloride 0,15 M')).toEqual([{ form: 'sodium chloride', concentrationMm: 150 }]);
    expect(readSaltsField([{ form: 'NaCl', concentrationMm: '150 mM' }])).toEqual([{ form: 'NaCl', concentrationMm: 150 }]);
    expect(codeOf(() => readSaltsField([{ form: 'NaCl', concentrationMm: 9000 }]))).toEqual({ code: 'outOfRange', field: 'salts[0].concentrationMm' });
  });

  it('knows an option by its name or its label, and suggests the nearest for a near miss', () => {
    expect(recipeFieldOf('titrant.concentrationM').name).toBe('titrant.concentrationM');
    expect(recipeFieldOf('Titrant stock (M)').name).toBe('titrant.concentrationM');
    expect(recipeFieldOf('USETEMPERATUREC').name).toBe('useTemperatureC');
    let caught: ChemError | undefined;
    try {
      recipeFieldOf('useTemperatureF');
    } catch (e) {
      caught = e as ChemError;
    }
    expect(caught?.code).toBe('unknownField');
    expect(caught?.message).toContain('useTemperatureC');
  });
});

describe('errors report the value in the unit the user gave', () => {
  it('a concentration typed in M is named as typed, with the allowed range in the field’s unit', () => {
    let caught: ChemError | undefined;
    try {
      readNumberField('concentrationMm', '9 M');
    } catch (e) {
      caught = e as ChemError;
    }
    expect(caught?.message).toBe('concentrationMm is "9 M"; allowed: 0.001 to 5000 mM.');
  });
});
