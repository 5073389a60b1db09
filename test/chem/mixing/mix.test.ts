/**
 * Mixing from stock solutions (src/chem/mixing): round trips through the solver, the pH a
 * mixture really lands on against its tris stock's label, pipetting limits, stocks that
 * cannot fit, and neutral additives. Every shelf and mixture here is our own.
 */
import { ChemError, speciate } from '../../../src/chem';
import { MixInput, NEUTRAL_ADDITIVES, StockInput, mixByVolumes, osmolalityOf, planMix, printedVolume, resolveShelf } from '../../../src/chem/mixing';
import { molarMassOf } from '../../../src/chem/library/formula';
import { expectClose } from '../fixtures';

/** Our lab's shelf. */
const SHELF: StockInput[] = [
  { name: 'Tris-HCl 1 M pH 8.0', form: 'tris base', concentration: '1 M', titrant: 'HCl', ph: 8.0, phTemperatureC: 25 },
  { name: 'HEPES-NaOH 1 M pH 7.5', form: 'HEPES free acid', concentration: '1 M', titrant: 'NaOH', ph: '7,5' },
  { name: 'NaCl 5 M', form: 'NaCl', concentration: '5 M' },
  { name: 'KCl 3 M', form: 'KCl', concentration: '3 M' },
  { name: 'MgCl2 1 M', form: 'MgCl2·6H2O', concentration: '1 M' },
  { name: 'EDTA 0.5 M pH 8.0', form: 'EDTA disodium salt dihydrate', concentration: '500 mM', titrant: 'NaOH', ph: 8.0 },
  { name: 'imidazole 2 M', form: 'imidazole', concentration: '2 M' },
  { name: 'glycerol 50 %', form: 'glycerol', concentration: '50 %' },
  { name: 'sucrose 2 M', form: 'sucrose', concentration: '2 M' },
];

/** A round trip may move a concentration by the printed volumes' rounding: 4 significant figures is ≤ 0.05 %; the check allows 0.1 %. */
const CONCENTRATION_RELATIVE_TOLERANCE = 0.001;
/** pH through the round trip: the rounding of volumes moves it by far less than 0.001. */
const PH_TOLERANCE = 0.001;

/** Our working buffers, each checked by a round trip. */
const MIXES: { title: string; input: MixInput }[] = [
  {
    title: 'a lysis buffer used cold: tris, NaCl, EDTA, glycerol, imidazole at 4 °C, corrected to pH 7.9',
    input: {
      stocks: SHELF,
      volumeMl: 50,
      useTemperatureC: 4,
      targetPh: 7.9,
      targets: [
        { component: 'tris', concentrationMm: 50 },
        { component: 'NaCl', concentrationMm: 300 },
        { component: 'EDTA', concentrationMm: 1 },
        { component: 'glycerol', percent: 10 },
        { component: 'imidazole', concentrationMm: 20 },
      ],
    },
  },
  {
    title: 'a kinase buffer at 30 °C: HEPES, KCl, MgCl2, no pH target',
    input: {
      stocks: SHELF,
      volumeMl: 10,
      useTemperatureC: 30,
      targets: [
        { component: 'HEPES-NaOH 1 M pH 7.5', concentrationMm: 25 },
        { component: 'KCl', concentrationMm: 100 },
        { component: 'MgCl2', concentrationMm: 10 },
      ],
    },
  },
  {
    title: 'a gradient buffer with sucrose from a 2 M stock, raised to pH 8.5 with NaOH',
    input: {
      stocks: SHELF,
      volumeMl: 250,
      targetPh: 8.5,
      targets: [
        { component: 'Tris-HCl 1 M pH 8.0', concentrationMm: 20 },
        { component: 'sucrose', concentrationMm: 250 },
        { component: 'NaCl', concentrationMm: 100 },
      ],
    },
  },
];

describe('round trips: printed volumes mixed back through the solver', () => {
  for (const { title, input } of MIXES) {
    it(`${title}: concentrations within 0.1 %, pH within 0.001`, () => {
      const plan = planMix(input);
      // The correcting titrant goes on the shelf as a plain stock, so the round trip mixes only what is printed.
      const titrantStock = plan.correction
        ? [{ name: `${plan.correction.stockM} M ${plan.correction.titrant}`, form: plan.correction.titrant, concentration: plan.correction.stockM }]
        : [];
      const shelf = resolveShelf([...SHELF, ...titrantStock]);
      const volumes = plan.components
        .filter((c) => c.role === 'stock' || c.role === 'titrant')
        .map((c) => ({ stock: c.name, millilitres: printedVolume(c.millilitres as number) }));
      const mixed = mixByVolumes(shelf, volumes, plan.volumeMl, plan.useTemperatureC);
      // The plan lists one line per target, in the targets' order.
      input.targets.forEach((t, i) => {
        const component = plan.components[i].component as string;
        const stated = plan.finalM[component];
        if (t.concentrationMm !== undefined) expectClose(`${component} stated`, stated * 1000, Number(t.concentrationMm), 1e-9);
        expectClose(`${component} mixed / stated`, mixed.componentM[component] / stated, 1, CONCENTRATION_RELATIVE_TOLERANCE);
      });
      expectClose('pH of the printed mixture', speciate(mixed.composition).pH, plan.predictions.pHAtUse, PH_TOLERANCE);
      if (plan.targetPh !== undefined) expectClose('corrected pH against the target', plan.predictions.pHAtUse, plan.targetPh, PH_TOLERANCE);
    });
  }
});

describe('the pH after mixing is not the tris stock’s label', () => {
  /** Common practice: tris moves about −0.028 pH per °C; from 25 to 4 °C that is about +0.59. Tolerance 0.1: the figure is itself rounded and ionic strength moves with the mix. */
  const TRIS_PH_PER_C = -0.028;
  const TEMPERATURE_TOLERANCE = 0.1;

  it('lands more than 0.1 above the 8.0 label at 4 °C, and says why, step by step', () => {
    const plan = planMix({
      stocks: SHELF,
      volumeMl: 100,
      useTemperatureC: 4,
      targets: [
        { component: 'tris', concentrationMm: 20 },
        { component: 'NaCl', concentrationMm: 150 },
        { component: 'EDTA', concentrationMm: 1 },
      ],
    });
    const shift = plan.labelShifts.find((s) => s.stock === 'Tris-HCl 1 M pH 8.0');
    expect(shift).toBeDefined();
    if (!shift) return;
    expect(Math.abs(plan.predictions.pHAtUse - 8.0)).toBeGreaterThan(0.1);
    // Dilution alone lowers a tris stock's pH (its ionic strength falls; pK′ of a cation acid falls with it): by
    // a few tenths at most from 1 M (common practice: concentrated stocks read a few tenths off their dilutions).
    expect(shift.dilutedAlonePh).toBeLessThan(8.0);
    expect(8.0 - shift.dilutedAlonePh).toBeLessThan(0.3);
    // Cooling to 4 °C raises it by about 0.028 per °C.
    expectClose('pH at 4 °C − pH at 25 °C', shift.mixedAtUsePh - shift.mixedAtLabelTemperaturePh, TRIS_PH_PER_C * (4 - 25), TEMPERATURE_TOLERANCE);
    expect(plan.warnings.map((w) => w.code)).toContain('mixDiffersFromLabel');
    expect(plan.warnings.find((w) => w.code === 'mixDiffersFromLabel')?.field).toBe('Tris-HCl 1 M pH 8.0');
  });

  it('gives no such warning when the mix is used where the label was set and barely moves', () => {
    const plan = planMix({ stocks: SHELF, volumeMl: 100, targets: [{ component: 'tris', concentrationMm: 500 }] });
    expect(Math.abs(plan.predictions.pHAtUse - 8.0)).toBeLessThan(0.1);
    expect(plan.warnings.map((w) => w.code)).not.toContain('mixDiffersFromLabel');
  });
});

describe('pipetting and fitting', () => {
  it('flags a stock needed in less than the smallest accurate volume, with the dilution that fixes it', () => {
    const plan = planMix({
      stocks: SHELF,
      volumeMl: 1,
      targets: [
        { component: 'MgCl2', concentrationMm: 1 },
        { component: 'HEPES', concentrationMm: 20 },
      ],
    });
    const w = plan.warnings.find((x) => x.code === 'belowPipetteVolume');
    expect(w?.field).toBe('MgCl2 1 M');
    expect(w?.message).toContain('dilute it 10× first and take 10 µL');
  });

  it('follows the user’s own pipetting limit', () => {
    const plan = planMix({
      stocks: SHELF,
      volumeMl: 1,
      smallestVolumeUl: '0.5 µL',
      targets: [
        { component: 'MgCl2', concentrationMm: 1 },
        { component: 'HEPES', concentrationMm: 20 },
      ],
    });
    expect(plan.warnings.map((x) => x.code)).not.toContain('belowPipetteVolume');
  });

  it('refuses stocks that cannot fit in the final volume as an infeasible target', () => {
    const attempt = () =>
      planMix({
        stocks: SHELF,
        volumeMl: 10,
        targets: [
          { component: 'NaCl', concentrationMm: 3000 },
          { component: 'KCl', concentrationMm: 1500 },
        ],
      });
    expect(attempt).toThrow(ChemError);
    try {
      attempt();
    } catch (e) {
      expect((e as ChemError).kind).toBe('infeasible-target');
      expect((e as ChemError).code).toBe('stocksDoNotFit');
    }
  });

  it('asks which stock when two hold the same component, and takes the stock by name', () => {
    const shelf = [...SHELF, { name: 'Tris-HCl 1 M pH 7.0', form: 'tris base', concentration: '1 M', titrant: 'HCl', ph: 7.0 }];
    expect(() => planMix({ stocks: shelf, volumeMl: 10, targets: [{ component: 'Tris', concentrationMm: 20 }] })).toThrow(
      expect.objectContaining({ code: 'ambiguousStock', field: 'targets[0].component' }),
    );
    expect(planMix({ stocks: shelf, volumeMl: 10, targets: [{ component: 'Tris-HCl 1 M pH 7.0', concentrationMm: 20 }] }).components[0].name).toBe('Tris-HCl 1 M pH 7.0');
  });

  it('names the target field when no stock holds a component', () => {
    try {
      planMix({
        stocks: SHELF,
        volumeMl: 10,
        targets: [
          { component: 'NaCl', concentrationMm: 100 },
          { component: 'MOPS', concentrationMm: 20 },
        ],
      });
      throw new Error('expected an error');
    } catch (e) {
      expect((e as ChemError).code).toBe('noStockFor');
      expect((e as ChemError).field).toBe('targets[1].component');
    }
  });
});

describe('neutral additives', () => {
  it('measures neat glycerol by volume and weighs sucrose, counting both in the ideal osmolarity', () => {
    const plan = planMix({
      stocks: [{ name: 'NaCl 5 M', form: 'NaCl', concentration: 5 }],
      volumeMl: 50,
      targets: [
        { component: 'NaCl', concentrationMm: 100 },
        { component: 'glycerin', percent: '5 %' },
        { component: 'saccharose', concentrationMm: 100 },
      ],
    });
    const glycerol = plan.components.find((c) => c.name === 'glycerol');
    const sucrose = plan.components.find((c) => c.name === 'sucrose');
    // 5 % v/v of 50 mL is 2.5 mL of neat glycerol; 100 mM sucrose in 50 mL is 0.005 mol × 342.3 g/mol.
    expectClose('glycerol mL', glycerol?.millilitres ?? NaN, 2.5, 1e-9);
    expectClose('sucrose g', sucrose?.grams ?? NaN, 0.005 * 342.3, 1e-9);
    // Ideal osmolarity: NaCl 2 × 100 + glycerol (2.5 mL × 1.261 g/mL / 92.09 g/mol / 0.05 L) + sucrose 100 mOsm/L.
    expectClose('ideal osmolarity', plan.predictions.idealOsmolarityMosm, 200 + ((2.5 * 1.261) / 92.09 / 0.05) * 1000 + 100, 0.5);
    expect(plan.warnings.map((w) => w.code)).toContain('additiveEffectNotModelled');
  });

  it('refuses a percentage for a component that is not an additive, and a titrant on an additive stock', () => {
    expect(() => planMix({ stocks: SHELF, volumeMl: 10, targets: [{ component: 'NaCl', percent: 1 }] })).toThrow(expect.objectContaining({ code: 'percentForAdditivesOnly' }));
    expect(() => resolveShelf([{ name: 'glycerol 50 %', form: 'glycerol', concentration: '50 %', titrant: 'HCl', ph: 7 }])).toThrow(
      expect.objectContaining({ code: 'additiveNotTitrated', field: 'stocks[0].titrant' }),
    );
  });
});

describe('osmolality hook', () => {
  it('reads the activity model’s osmolality when the result carries one, adding additives per kg of water, and is undefined otherwise', () => {
    const result = speciate({ systems: [], strongIons: { 'Na+': 0.15, 'Cl-': 0.15 } });
    // The default (Pitzer) model gives osmolality: 0.15 M NaCl is about 280 mOsm/kg (φ ≈ 0.93).
    expect(osmolalityOf(result)).toBeCloseTo(result.osmolalityMosmKg, 9);
    expect(osmolalityOf(speciate({ systems: [], strongIons: { 'Na+': 0.15, 'Cl-': 0.15 }, activityModel: 'davies' }))).toBeCloseTo(result.osmolalityMosmKg, 4);
    // A stand-in for a concentrated-solution result: 280 mOsm/kg from the ions, 0.99 kg water per litre, 0.1 M glycerol.
    const withModel = { ...result, osmolalityMosmKg: 280, waterKgPerL: 0.99 };
    expectClose('osmolality with additives', osmolalityOf(withModel, 0.1) ?? NaN, 280 + (0.1 / 0.99) * 1000, 1e-9);
  });
});

describe('stocks', () => {
  it('makes a titrated EDTA stock hold its titrant: 0.5 M disodium EDTA at pH 8.0 carries about 1.5 M Na+', () => {
    const [edta] = resolveShelf([SHELF[5]]);
    expect(edta.kind).toBe('titrated');
    expect(edta.component).toBe('EDTA');
    expect(edta.titrant?.name).toBe('sodium hydroxide');
    expect(edta.composition.strongIons?.['Na+']).toBeGreaterThan(1.4);
    // 1.5 M at the bench (common practice); the default model's fallback for EDTA's anions near 3 mol/kg gives about 1.61 (see edta.test.ts).
    expect(edta.composition.strongIons?.['Na+']).toBeLessThan(1.65);
  });

  it('says when a titrated stock sits beyond the activity model (0.5 M disodium EDTA at pH 8 is near 3 M ionic strength)', () => {
    const plan = planMix({
      stocks: SHELF,
      volumeMl: 100,
      targets: [
        { component: 'EDTA', concentrationMm: 1 },
        { component: 'NaCl', concentrationMm: 150 },
      ],
    });
    expect(plan.warnings.filter((w) => w.code === 'stockBeyondActivityModel').map((w) => w.field)).toEqual(['EDTA 0.5 M pH 8.0']);
    const ideal = planMix({ stocks: SHELF, volumeMl: 100, activityModel: 'ideal', targets: [{ component: 'EDTA', concentrationMm: 1 }] });
    expect(ideal.warnings.map((w) => w.code)).not.toContain('stockBeyondActivityModel');
  });

  it('refuses two stocks of one name, naming the second', () => {
    expect(() => resolveShelf([SHELF[2], { ...SHELF[3], name: 'nacl 5 m' }])).toThrow(expect.objectContaining({ code: 'duplicateStock', field: 'stocks[1].name' }));
  });
});

describe('the neutral additive table', () => {
  /** Listed molar masses against the formula (IUPAC standard atomic weights), as for library forms. */
  const MOLAR_MASS_TOLERANCE = 0.01;
  it.each(NEUTRAL_ADDITIVES.map((a) => [a.name, a] as const))('%s: molar mass matches its formula within 0.01 g/mol', (_name, a) => {
    expectClose(`${a.name} molar mass`, a.molarMass, molarMassOf(a.formula), MOLAR_MASS_TOLERANCE);
    expect(a.state === 'solid' || a.densityGPerMl !== undefined).toBe(true);
  });
});
