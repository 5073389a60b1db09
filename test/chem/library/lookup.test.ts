/** Looking substances up by name; user substances; forms into compositions. */
import { ChemError } from '../../../src/chem/errors';
import { compositionFromForms, createLibrary, findForm, findSystem, formAmount, listSubstances } from '../../../src/chem/library/lookup';
import { closestNames, editDistance, nameKey } from '../../../src/chem/library/names';
import { UserSubstance } from '../../../src/chem/library/userSubstances';

/** Amounts are products of exact inputs; 1e-15 mol/L covers float rounding. */
const AMOUNT_TOLERANCE = 1e-15;

function thrown(fn: () => unknown): ChemError {
  try {
    fn();
  } catch (e) {
    if (e instanceof ChemError) return e;
    throw e;
  }
  throw new Error('expected a ChemError');
}

describe('finding by name', () => {
  it('ignores case and spacing', () => {
    expect(findSystem('hepes').name).toBe('HEPES');
    expect(findSystem('  Tris ').name).toBe('tris');
    expect(findForm('TRIS HCL').name).toBe('tris hydrochloride');
  });

  it('knows abbreviations and systematic names', () => {
    expect(findSystem('4-(2-hydroxyethyl)piperazine-1-ethanesulfonic acid').name).toBe('HEPES');
    expect(findSystem('tris(hydroxymethyl)aminomethane').name).toBe('tris');
    expect(findSystem('HEPPS').name).toBe('EPPS');
    expect(findForm('KHP').name).toBe('potassium hydrogen phthalate');
    expect(findForm('borax').name).toBe('sodium tetraborate decahydrate');
  });

  it('knows "free acid", "sodium salt" and "hydrochloride" forms', () => {
    expect(findForm('HEPES free acid').adds[0].protonsLost).toBe(0);
    expect(findForm('HEPES sodium salt').counterIons).toEqual({ 'Na+': 1 });
    expect(findForm('tris hydrochloride').counterIons).toEqual({ 'Cl-': 1 });
    expect(findForm('MES').name).toBe('MES free acid');
  });

  it.each([
    'Na2HPO4·7H2O',
    'Na2HPO4*7H2O',
    'Na2HPO4 7H2O',
    'Na2HPO4x7H2O',
    'Na2HPO4 x 7H2O',
    'sodium phosphate dibasic heptahydrate',
    'disodium hydrogen phosphate heptahydrate',
    'Na2HPO4 heptahydrate',
  ])('reads the hydrate notation %p', (name) => {
    expect(findForm(name).name).toBe('sodium phosphate dibasic heptahydrate');
  });

  it('tells hydrates apart: NaH2PO4, ·H2O and ·2H2O are different forms with different molar masses', () => {
    const masses = ['NaH2PO4', 'NaH2PO4·H2O', 'NaH2PO4 dihydrate'].map((n) => findForm(n).molarMass);
    expect(new Set(masses.map((m) => m.toFixed(2))).size).toBe(3);
    expect(findForm('sodium dihydrogen phosphate monohydrate').formula).toBe('NaH2PO4·H2O');
  });

  it('finds a system through one of its forms', () => {
    expect(findSystem('Na2HPO4').name).toBe('phosphate');
    expect(findSystem('tris HCl').name).toBe('tris');
  });

  it('suggests up to three close names on a near miss ("did you mean")', () => {
    const e = thrown(() => findSystem('hepse'));
    expect(e.kind).toBe('invalid-input');
    expect(e.code).toBe('unknownSubstance');
    expect(e.message).toMatch(/did you mean/);
    expect(e.message).toMatch(/"HEPES"/);
    expect((e.allowed ?? '').split(', ').length).toBeLessThanOrEqual(3);
    expect(thrown(() => findForm('sodium acetat trihydrate')).message).toMatch(/sodium acetate trihydrate/);
  });

  it('says plainly when nothing is close', () => {
    const e = thrown(() => findSystem('qqqqqqqqqqqqqqqqqqqq'));
    expect(e.message).not.toMatch(/did you mean/);
    expect(e.field).toBe('substance');
  });

  it('refuses a missing name with a typed error', () => {
    expect(thrown(() => findForm('')).code).toBe('missingValue');
    expect(thrown(() => findSystem(undefined as unknown as string)).code).toBe('missingValue');
  });

  it('lists every substance with its forms', () => {
    const rows = listSubstances();
    expect(rows.find((r) => r.name === 'phosphate')?.pKa).toEqual([2.148, 7.198, 12.35]);
    expect(rows.every((r) => !r.userDefined)).toBe(true);
  });
});

describe('name keys and edit distance', () => {
  it('counts a swap of neighbours as one edit (Damerau)', () => {
    expect(editDistance('hepes', 'hpees')).toBe(1);
    expect(editDistance('mops', 'mpos')).toBe(1);
    expect(editDistance('', 'abc')).toBe(3);
  });

  it('maps hydrate notations to one key', () => {
    expect(nameKey('MgCl2·6H2O')).toBe(nameKey('MgCl2 hexahydrate'));
    expect(nameKey('CaCl2*2H2O')).toBe(nameKey('CaCl2 x2H2O'));
  });

  it('ranks the nearest names first', () => {
    const names = new Map([
      ['mops', 'MOPS'],
      ['mopso', 'MOPSO'],
      ['mes', 'MES'],
      ['tris', 'tris'],
    ]);
    expect(closestNames('mosp', names)[0]).toBe('MOPS');
  });
});

describe('what a form adds', () => {
  it('Na2HPO4 adds one phosphate with two protons lost and two Na+', () => {
    const a = formAmount('Na2HPO4', 0.1);
    expect(a.systems[0].chemistry.name).toBe('phosphate');
    expect(a.systems[0].totalM).toBeCloseTo(0.1, 15);
    expect(a.systems[0].protonsLostM).toBeCloseTo(0.2, 15);
    expect(a.strongIons).toEqual({ 'Na+': 0.2 });
  });

  it('borax adds four borate with two protons lost and two Na+ per mole', () => {
    const a = formAmount('borax', 0.01);
    expect(Math.abs(a.systems[0].totalM - 0.04)).toBeLessThan(AMOUNT_TOLERANCE);
    expect(Math.abs(a.systems[0].protonsLostM - 0.02)).toBeLessThan(AMOUNT_TOLERANCE);
    expect(a.strongIons).toEqual({ 'Na+': 0.02 });
  });

  it('strong acids and bases add only their counter-ion: HCl adds Cl−, NaOH adds Na+', () => {
    expect(formAmount('HCl', 0.5)).toMatchObject({ systems: [], strongIons: { 'Cl-': 0.5 }, protonsReleasedM: 0.5 });
    expect(formAmount('NaOH', 0.5)).toMatchObject({ systems: [], strongIons: { 'Na+': 0.5 }, protonsReleasedM: -0.5 });
  });

  it('ammonium sulfate adds two systems: 2 ammonia (as NH4+) and 1 sulfate (as SO42−)', () => {
    const a = formAmount('ammonium sulfate', 1);
    expect(a.systems.map((s) => [s.chemistry.name, s.totalM, s.protonsLostM])).toEqual([
      ['ammonia', 2, 0],
      ['sulfate', 1, 2],
    ]);
  });

  it('refuses a negative or absurd concentration, naming the form', () => {
    expect(thrown(() => formAmount('NaCl', -1)).field).toBe('sodium chloride.concentrationM');
    expect(thrown(() => formAmount('NaCl', 50)).code).toBe('outOfRange');
  });
});

describe('compositionFromForms', () => {
  it('adds up the same system from two forms and turns counter-ions into strong ions', () => {
    const c = compositionFromForms(
      [
        { form: 'KH2PO4', concentrationM: 0.025 },
        { form: 'Na2HPO4', concentrationM: 0.025 },
      ],
      { temperatureC: 37, activityModel: 'ideal' },
    );
    expect(c.systems).toHaveLength(1);
    expect(c.systems[0].name).toBe('phosphate');
    expect(c.systems[0].totalM).toBeCloseTo(0.05, 15);
    expect(c.strongIons).toEqual({ 'K+': 0.025, 'Na+': 0.05 });
    expect(c.temperatureC).toBe(37);
    expect(c.activityModel).toBe('ideal');
  });

  it('tris base plus HCl gives tris and Cl− only', () => {
    const c = compositionFromForms([
      { form: 'tris base', concentrationM: 0.05 },
      { form: 'hydrochloric acid', concentrationM: 0.02 },
    ]);
    expect(c.systems.map((s) => [s.name, s.chargeOfMostProtonated, s.totalM])).toEqual([['tris', 1, 0.05]]);
    expect(c.strongIons).toEqual({ 'Cl-': 0.02 });
  });

  it('accepts form records and extra strong ions by any alias', () => {
    const c = compositionFromForms([{ form: findForm('HEPES'), concentrationM: 0.02 }], { extraStrongIons: { sodium: 0.01, 'Na+': 0.005 } });
    expect(c.strongIons).toEqual({ 'Na+': 0.015 });
  });

  it('refuses an unknown form with "did you mean"', () => {
    expect(thrown(() => compositionFromForms([{ form: 'HEPEs sodum salt', concentrationM: 0.01 }])).message).toMatch(/did you mean "HEPES sodium salt"/);
  });
});

describe('user substances', () => {
  const mine: UserSubstance = {
    name: 'Lab amine X',
    aliases: ['LAX'],
    chargeOfMostProtonated: 1,
    pKa: [7.9],
    deltaHkJ: [40],
    forms: [
      { name: 'LAX base', formula: 'C5H13NO2', protonsLost: 1 },
      { name: 'LAX hydrochloride', molarMass: 155.62, protonsLost: 0, counterIons: { 'Cl-': 1 } },
    ],
  };

  it('work everywhere a library substance does: lookup, listing, compositions', () => {
    const lib = createLibrary([mine]);
    expect(lib.findSystem('lax').steps[0].pKa).toBe(7.9);
    expect(lib.findForm('LAX base').molarMass).toBeCloseTo(5 * 12.011 + 13 * 1.008 + 14.007 + 2 * 15.999, 9);
    expect(lib.findForm('lax hydrochloride').molarMass).toBe(155.62);
    expect(lib.list().find((r) => r.name === 'Lab amine X')?.userDefined).toBe(true);
    const c = lib.compositionFromForms([
      { form: 'LAX hydrochloride', concentrationM: 0.1 },
      { form: 'NaOH', concentrationM: 0.05 },
    ]);
    expect(c.systems[0]).toMatchObject({ name: 'Lab amine X', chargeOfMostProtonated: 1, totalM: 0.1, steps: [{ pKa: 7.9, deltaHkJ: 40 }] });
    expect(c.strongIons).toEqual({ 'Cl-': 0.1, 'Na+': 0.05 });
  });

  it('refuse a formula far heavier than any buffer form (C1000000000H2 is a slip: 12 tonnes per mole)', () => {
    let caught: ChemError | undefined;
    try {
      createLibrary([{ name: 'heavy', chargeOfMostProtonated: 0, pKa: [5], formula: 'C1000000000H2' }]);
    } catch (e) {
      caught = e as ChemError;
    }
    expect(caught).toMatchObject({ kind: 'invalid-input', code: 'outOfRange' });
    expect(caught?.field).toMatch(/formula$/);
  });

  it('get a default form (the neutral species) when no forms are given', () => {
    const lib = createLibrary([{ name: 'my acid', chargeOfMostProtonated: 0, pKa: [4.2], molarMass: 100 }]);
    expect(lib.findForm('My Acid')).toMatchObject({ molarMass: 100, adds: [{ system: 'my acid', moles: 1, protonsLost: 0 }] });
  });

  it('do not change the default library', () => {
    createLibrary([mine]);
    expect(() => findSystem('LAX')).toThrow(ChemError);
  });

  it('that copy a library name or alias are refused with a clear message', () => {
    for (const name of ['HEPES', 'hepes', 'trometamol', 'borax', 'Na2HPO4·7H2O']) {
      const e = thrown(() => createLibrary([{ ...mine, name }]));
      expect(e.code).toBe('duplicateSubstance');
      expect(e.message).toMatch(/already a name in the substance library/);
    }
    expect(thrown(() => createLibrary([{ ...mine, forms: [{ name: 'tris HCl', molarMass: 1, protonsLost: 0, counterIons: { 'Cl-': 1 } }] }])).code).toBe('duplicateSubstance');
    expect(thrown(() => createLibrary([mine, { ...mine, aliases: [] }])).code).toBe('duplicateSubstance');
  });

  it.each([
    [{ ...mine, name: '' }, 'userSubstances[0].name', 'missingValue'],
    [{ ...mine, pKa: [8, 7], deltaHkJ: undefined }, 'userSubstances[0].steps', 'stepsOutOfOrder'],
    [{ ...mine, pKa: 'x' }, 'userSubstances[0].pKa', 'missingValue'],
    [{ ...mine, deltaHkJ: [1, 2] }, 'userSubstances[0].deltaHkJ', 'listLengthMismatch'],
    [{ ...mine, chargeOfMostProtonated: 0.5 }, 'userSubstances[0].chargeOfMostProtonated', 'notInteger'],
    [{ ...mine, forms: [{ name: 'LAX bad', molarMass: 100, protonsLost: 0 }] }, 'userSubstances[0].forms[0].counterIons', 'formNotNeutral'],
    [{ ...mine, forms: [{ name: 'LAX odd', molarMass: 100, protonsLost: 1, counterIons: { 'Zz+': 1 } }] }, 'userSubstances[0].forms[0].counterIons', 'unknownIon'],
    [{ ...mine, forms: [{ name: 'LAX heavy', protonsLost: 1 }] }, 'userSubstances[0].forms[0].molarMass', 'missingValue'],
    [{ ...mine, forms: [{ name: 'LAX typo', formula: 'C5Q', protonsLost: 1 }] }, 'userSubstances[0].forms[0].formula', 'badFormula'],
    [{ ...mine, forms: [{ name: 'LAX many', molarMass: 1, protonsLost: 3 }] }, 'userSubstances[0].forms[0].protonsLost', 'outOfRange'],
    [{ name: 'anion only', chargeOfMostProtonated: -1, pKa: [7], molarMass: 100 }, 'userSubstances[0].forms', 'missingValue'],
  ])('are validated with a message naming the field (%#)', (record, field, code) => {
    const e = thrown(() => createLibrary([record as UserSubstance]));
    expect(e.kind).toBe('invalid-input');
    expect(e.field).toBe(field);
    expect(e.code).toBe(code);
    expect(e.message).toContain(field.split('.').slice(0, 2).join('.').replace(/\.$/, ''));
  });
});
