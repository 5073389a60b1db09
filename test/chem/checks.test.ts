/**
 * Plain-words checks on a solved solution (src/chem/checks.ts): weak buffering by the
 * pKa ± 1 rule (common practice) and divalent metals with multiply charged buffer anions.
 */
import { BUFFERING_HALF_WIDTH, Composition, metalComplexWarning, solutionWarnings, speciate, weakBufferingWarning } from '../../src/chem';

/** Phosphate steps at 25 °C, I = 0 (the library's values, Goldberg et al. 2002). */
const PHOSPHATE = { name: 'phosphate', chargeOfMostProtonated: 0, steps: [{ pKa: 2.148 }, { pKa: 7.198 }, { pKa: 12.35 }] };
const ACETATE = { name: 'acetate', chargeOfMostProtonated: 0, steps: [{ pKa: 4.756 }] };

describe('weak buffering', () => {
  it('is quiet for a buffer at its own pKa and warns for acetate pushed to pH 8+', () => {
    expect(weakBufferingWarning(speciate({ systems: [{ ...ACETATE, totalM: 0.1 }], strongIons: { 'Na+': 0.05 } }))).toBeUndefined();
    const pushed = speciate({ systems: [{ ...ACETATE, totalM: 0.1 }], strongIons: { 'Na+': 0.1 } });
    expect(pushed.pH).toBeGreaterThan(4.756 + BUFFERING_HALF_WIDTH);
    expect(weakBufferingWarning(pushed)?.code).toBe('weakBuffering');
    expect(weakBufferingWarning(pushed)?.message).toMatch(/^pH 8\.\d\d is more than 1 unit from every pKa′ in the solution \(acetate 4\.\d\d\)/);
  });

  it('judges the apparent pKa′ at the solution own ionic strength, not the tabled one', () => {
    // At 0.15 M NaCl (Davies) acetate's pKa′ is about 0.2 below its tabled 4.756; the rule must use that.
    const salty = speciate({ systems: [{ ...ACETATE, totalM: 0.01 }], strongIons: { 'Na+': 0.15 + 0.00926, 'Cl-': 0.15 } });
    const apparent = salty.systems[0].apparentPKa[0];
    // The pH lies within 1 of the tabled pKa but more than 1 from the apparent one: the warning must follow the apparent.
    expect(salty.pH - 4.756).toBeLessThan(BUFFERING_HALF_WIDTH);
    expect(salty.pH - apparent).toBeGreaterThan(BUFFERING_HALF_WIDTH);
    expect(weakBufferingWarning(salty)).toBeDefined();
  });

  it('says nothing about a solution with no acid–base system', () => {
    expect(weakBufferingWarning(speciate({ systems: [], strongIons: { 'Na+': 0.15, 'Cl-': 0.15 } }))).toBeUndefined();
  });
});

describe('metal complexes', () => {
  const phosphate: Composition = { systems: [{ ...PHOSPHATE, totalM: 0.05 }], strongIons: { 'Na+': 0.075 } };

  it('warns for Mg2+ or Ca2+ with phosphate, and adds the precipitation caution for calcium only', () => {
    const mg = metalComplexWarning({ ...phosphate, strongIons: { 'Na+': 0.075, 'Mg2+': 0.002, 'Cl-': 0.004 } });
    expect(mg?.code).toBe('metalComplexes');
    expect(mg?.message).toMatch(/^Mg2\+ with phosphate: metal–buffer complexes are not modelled/);
    expect(mg?.message).not.toMatch(/precipitate/);
    const ca = metalComplexWarning({ ...phosphate, strongIons: { 'Na+': 0.075, 'Ca2+': 0.002, 'Cl-': 0.004 } });
    expect(ca?.message).toMatch(/^Ca2\+ with phosphate: .*may also precipitate/);
  });

  it('is quiet without a divalent metal, and with one beside a singly charged buffer anion', () => {
    expect(metalComplexWarning(phosphate)).toBeUndefined();
    expect(metalComplexWarning({ systems: [{ ...ACETATE, totalM: 0.1 }], strongIons: { 'Na+': 0.05, 'Mg2+': 0.01, 'Cl-': 0.02 } })).toBeUndefined();
  });

  it('ignores a system present at zero amount', () => {
    expect(metalComplexWarning({ systems: [{ ...PHOSPHATE, totalM: 0 }], strongIons: { 'Mg2+': 0.01, 'Cl-': 0.02 } })).toBeUndefined();
  });
});

describe('every warning together', () => {
  it("keeps the solver warnings first, then weak buffering, then metals, then the temperature against each step's data", () => {
    // Acetate just past its equivalence point with a trace of sulfate (HSO4− pKa about 1.99, a value recalled from memory): nothing buffers near pH 8.
    const sulfate = { name: 'sulfate', chargeOfMostProtonated: -1, steps: [{ pKa: 1.99 }] };
    // A trace of a weak acid without ΔH° about two units above that pH (8.1): it does not buffer there, but lies close enough to be warned about at 70 °C.
    const trace = { name: 'trace acid', chargeOfMostProtonated: 0, steps: [{ pKa: 10.5 }] };
    const c: Composition = {
      systems: [
        { ...ACETATE, totalM: 0.05 },
        { ...sulfate, totalM: 0.001 },
        { ...trace, totalM: 0.0001 },
      ],
      strongIons: { 'Na+': 0.85001, 'Cl-': 0.8, 'Ca2+': 0.001 },
      temperatureC: 70,
    };
    const result = speciate(c);
    expect(result.pH).toBeGreaterThan(7.5);
    expect(result.pH).toBeLessThan(8.5);
    const w = solutionWarnings(c, result);
    // Default Pitzer model: at 70 °C and I ≈ 0.85 mol/kg it warns that some parameters have no temperature slope;
    // acetate and sulfate lie more than 3 units from the pH, so only the trace acid warns about its constants, last.
    expect(w.map((x) => x.code)).toEqual(['aboveFittedRange', 'pitzerTemperature', 'weakBuffering', 'metalComplexes', 'noEnthalpy']);
    expect(w[4].message).toMatch(/^trace acid has no ΔH°/);
    const davies = speciate({ ...c, activityModel: 'davies' });
    expect(solutionWarnings(c, davies).map((x) => x.code)).toEqual(['aboveFittedRange', 'beyondActivityModel', 'weakBuffering', 'metalComplexes', 'noEnthalpy']);
  });
});
