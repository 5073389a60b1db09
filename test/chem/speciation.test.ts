import { ChemError, Composition, speciate, solvePh } from '../../src/chem';
import { ACETATE, BORATE, CARBONATE, PHOSPHATE, PHTHALATE, TRIS, expectClose } from './fixtures';
import { pHSAt25 } from './iupacStandards';
import { prepare } from '../../src/chem/composition';
import { solvePrepared, solvePreparedNested } from '../../src/chem/speciation';

/** Warnings are compared by code (and field), never by message text. */
const codes = (ws: readonly { code: string }[]) => ws.map((w) => w.code);

/**
 * Davies activities with Goldberg constants reproduce the IUPAC primary standards at 25 °C
 * to about 0.01; the standards themselves were assigned with Bates–Guggenheim and measured
 * cells, and Davies differs from it by about 0.01 at I = 0.1. Hence 0.015.
 */
const PRIMARY_STANDARD_TOLERANCE = 0.015;

/**
 * IUPAC 2002 primary pH standards at 25 °C (R. P. Buck et al., Pure Appl. Chem. 74 (2002)
 * 2169; values from the shared fixture test/chem/iupacStandards.ts), here built from the
 * inline systems of fixtures.ts rather than library forms. Molalities are used as
 * molarities: below 0.2 mol/kg the two differ by under 0.3 %, far below the tolerance.
 */
const PRIMARY_STANDARDS: { name: string; composition: Composition; pH: number }[] = [
  { name: 'potassium hydrogen phthalate 0.05 mol/kg', pH: pHSAt25('phthalate'), composition: { systems: [{ ...PHTHALATE, totalM: 0.05 }], strongIons: { 'K+': 0.05 } } },
  {
    name: 'KH2PO4 + Na2HPO4 0.025 + 0.025 mol/kg',
    pH: pHSAt25('phosphate1to1'),
    composition: { systems: [{ ...PHOSPHATE, totalM: 0.05 }], strongIons: { 'K+': 0.025, 'Na+': 0.05 } },
  },
  {
    name: 'KH2PO4 + Na2HPO4 0.008695 + 0.03043 mol/kg',
    pH: pHSAt25('phosphate1to3.5'),
    composition: { systems: [{ ...PHOSPHATE, totalM: 0.008695 + 0.03043 }], strongIons: { 'K+': 0.008695, 'Na+': 2 * 0.03043 } },
  },
  // Borax Na2B4O7·10H2O dissolves to 2 B(OH)3 + 2 B(OH)4− + 2 Na+ (common practice).
  { name: 'borax 0.01 mol/kg', pH: pHSAt25('borax'), composition: { systems: [{ ...BORATE, totalM: 0.04 }], strongIons: { 'Na+': 0.02 } } },
  { name: 'NaHCO3 + Na2CO3 0.025 + 0.025 mol/kg', pH: pHSAt25('carbonate'), composition: { systems: [{ ...CARBONATE, totalM: 0.05 }], strongIons: { 'Na+': 0.075 } } },
];

describe('IUPAC 2002 primary pH standards at 25 °C (Buck et al. 2002), default (Pitzer) model + Goldberg 2002 constants, ±0.015', () => {
  it.each(PRIMARY_STANDARDS)('$name → pH $pH', ({ name, composition, pH }) => {
    expectClose(name, solvePh(composition), pH, PRIMARY_STANDARD_TOLERANCE);
  });
});

describe('speciate', () => {
  const buffer: Composition = { systems: [{ ...PHOSPHATE, totalM: 0.05 }], strongIons: { 'K+': 0.025, 'Na+': 0.05 } };

  it('pure water is neutral: pH = pKw/2 at 25 °C and 37 °C (ideal)', () => {
    for (const t of [25, 37]) {
      const r = speciate({ systems: [], strongIons: { 'Na+': 0 }, temperatureC: t, activityModel: 'ideal' });
      expectClose(`water ${t}`, r.pH, r.pKw / 2, 1e-10);
    }
  });

  it('ionic strength counts every charged species: ½Σcz² from the species list', () => {
    const r = speciate(buffer);
    const fromSpecies = 0.5 * r.species.reduce((s, sp) => s + sp.concentrationM * sp.charge * sp.charge, 0);
    expectClose('I', r.ionicStrengthM, fromSpecies, 1e-12);
  });

  it("mass balance: each system's species add up to its total", () => {
    const r = speciate(buffer);
    const phos = r.species.filter((s) => s.system === 'phosphate').reduce((a, s) => a + s.concentrationM, 0);
    expectClose('phosphate total', phos, 0.05, 1e-15);
    expect(r.systems[0].fractions.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 14);
  });

  it('the combined pH/ionic-strength step takes fewer charge-balance evaluations than the nested iteration, for the same pH (Davies and Bates–Guggenheim)', () => {
    for (const activityModel of ['davies', 'bates-guggenheim'] as const) {
      const p = prepare({ ...buffer, activityModel });
      const combined = solvePrepared(p);
      const nested = solvePreparedNested(p);
      expect(combined.evaluations).toBeLessThan(nested.evaluations);
      expect(Math.abs(combined.pH - nested.pH)).toBeLessThan(1e-11);
    }
  });

  it('reports a tiny charge-balance residual and its iteration counts', () => {
    const r = speciate(buffer);
    expect(r.diagnostics.relativeResidual).toBeLessThan(1e-12);
    expect(r.diagnostics.evaluations).toBeGreaterThan(0);
    expect(r.diagnostics.ionicStrengthIterations).toBeGreaterThan(1);
  });

  it('apparent pKa′ of a −1 acid (phosphate step 2) falls with ionic strength, of tris (+1) rises (docs/science.md, Conventions)', () => {
    const low = speciate({
      systems: [
        { ...PHOSPHATE, totalM: 0.001 },
        { ...TRIS, totalM: 0.001 },
      ],
      strongIons: { 'Na+': 0.0015 },
    });
    const high = speciate({
      systems: [
        { ...PHOSPHATE, totalM: 0.001 },
        { ...TRIS, totalM: 0.001 },
      ],
      strongIons: { 'Na+': 0.2015, 'Cl-': 0.2 },
    });
    expect(high.systems[0].apparentPKa[1]).toBeLessThan(low.systems[0].apparentPKa[1] - 0.1);
    expect(high.systems[1].apparentPKa[0]).toBeGreaterThan(low.systems[1].apparentPKa[0] + 0.05);
  });

  it('acetate half-neutralised, ideal: pH = pKa within 0.002 (Henderson–Hasselbalch holds at 0.1 M)', () => {
    const r = speciate({ systems: [{ ...ACETATE, totalM: 0.1 }], strongIons: { 'Na+': 0.05 }, activityModel: 'ideal' });
    expectClose('acetate', r.pH, 4.756, 0.002);
  });

  it('strong acid alone: 0.01 M HCl, ideal, gives pH 2.000', () => {
    expectClose('HCl', solvePh({ systems: [], strongIons: { 'Cl-': 0.01 }, activityModel: 'ideal' }), 2, 1e-6);
  });

  it('warns above 60 °C, above I = 0.5 M for Davies and above 4 mol/kg for Pitzer, but still solves', () => {
    const hot = speciate({ ...buffer, temperatureC: 80 });
    expect(codes(hot.warnings)).toContain('aboveFittedRange');
    const salty = { ...buffer, strongIons: { 'K+': 0.025, 'Na+': 1.05, 'Cl-': 1 } };
    expect(codes(speciate({ ...salty, activityModel: 'davies' }).warnings)).toContain('beyondActivityModel');
    expect(speciate(salty).warnings).toEqual([]);
    const brine = speciate({ ...buffer, strongIons: { 'K+': 0.025, 'Na+': 5.05, 'Cl-': 5 } });
    expect(codes(brine.warnings)).toContain('beyondPitzerRange');
  });

  describe('bad input names the field, the value and what is allowed', () => {
    const cases: [string, unknown, RegExp][] = [
      ['an empty composition', { systems: [] }, /empty/],
      ['a negative total', { systems: [{ ...ACETATE, totalM: -0.1 }] }, /systems\[0\]\.totalM is -0\.1; allowed: 0 to 20 mol\/L/],
      ['a NaN total', { systems: [{ ...ACETATE, totalM: NaN }] }, /systems\[0\]\.totalM must be a finite number; got NaN/],
      ['an infinite strong ion', { systems: [], strongIons: { 'Na+': Infinity } }, /strongIons\.Na\+ must be a finite number/],
      ['pKa steps out of order', { systems: [{ name: 'x', chargeOfMostProtonated: 0, steps: [{ pKa: 7 }, { pKa: 3 }], totalM: 0.1 }] }, /must ascend/],
      ['a temperature of 150 °C', { systems: [{ ...ACETATE, totalM: 0.1 }], temperatureC: 150 }, /temperatureC is 150; allowed: 0 to 100 °C/],
      ['a temperature of −20 °C', { systems: [{ ...ACETATE, totalM: 0.1 }], temperatureC: -20 }, /temperatureC is -20/],
      ['an unknown ion', { systems: [], strongIons: { 'Xx+': 0.1 } }, /"Xx\+" is not a strong ion.*Na\+, K\+/],
      ['a fractional charge', { systems: [{ name: 'x', chargeOfMostProtonated: 0.5, steps: [{ pKa: 7 }], totalM: 0.1 }] }, /whole number/],
      ['no steps', { systems: [{ name: 'x', chargeOfMostProtonated: 0, steps: [], totalM: 0.1 }] }, /steps/],
    ];
    it.each(cases)('given %s', (_label, composition, message) => {
      let caught: unknown;
      try {
        speciate(composition as Composition);
      } catch (e) {
        caught = e;
      }
      expect(caught).toBeInstanceOf(ChemError);
      expect((caught as ChemError).kind).toBe('invalid-input');
      expect((caught as ChemError).message).toMatch(message);
    });

    it('given 20 M strong base with Davies (γ > 1 far outside its range) says no pH up to 16 balances, as infeasible', () => {
      expect(() => speciate({ systems: [], strongIons: { 'Na+': 20 } })).toThrow(/more basic than pH 16/);
    });

    it('given 20 M strong base with the ideal model, solves it (pH = pKw + log 20)', () => {
      const r = speciate({ systems: [], strongIons: { 'Na+': 20 }, activityModel: 'ideal' });
      expectClose('20 M Na+', r.pH, r.pKw + Math.log10(20), 1e-9);
    });
  });
});
