/**
 * A name that leaves the hydration state open ("sodium phosphate dibasic", "magnesium chloride") is
 * weighed as the form the library lists under it, and the plan says so: a warning with its
 * own code naming the form and molar mass used and the other forms listed.
 */
import { planRecipe } from '../../../src/chem/planner';
import { defaultLibrary } from '../../../src/chem/library';
import { grams, recipe, warnings } from '../../../src/functions/functions';

describe('hydrate left open', () => {
  const pair = { buffer: 'phosphate', targetPh: 7.2, concentrationMm: 50, volumeMl: 1000, route: 'two-forms', acidForm: 'sodium phosphate monobasic monohydrate' } as const;

  it('the library lists the other hydrates of a name that says none, and none for an explicit one', () => {
    const lib = defaultLibrary();
    expect(lib.hydrateAlternatives('sodium phosphate dibasic').map((f) => f.name)).toEqual([
      'sodium phosphate dibasic dihydrate',
      'sodium phosphate dibasic heptahydrate',
      'sodium phosphate dibasic dodecahydrate',
    ]);
    expect(lib.hydrateAlternatives('Na2HPO4·7H2O')).toEqual([]);
    expect(lib.hydrateAlternatives('sodium phosphate dibasic anhydrous')).toEqual([]);
    // A formula states its water: Na2HPO4 is the anhydrous salt.
    expect(lib.hydrateAlternatives('Na2HPO4')).toEqual([]);
    // tris hydrochloride is another salt of tris, not a hydrate of tris base.
    expect(lib.hydrateAlternatives('tris base')).toEqual([]);
  });

  it('planRecipe weighs the default form and warns with code hydrateAssumed, naming the form and its molar mass', () => {
    const plan = planRecipe({ ...pair, baseForm: 'sodium phosphate dibasic', salts: 'magnesium chloride 1 mM' });
    const found = plan.warnings.filter((w) => w.code === 'hydrateAssumed');
    expect(found.map((w) => w.field)).toEqual(['baseForm', 'salts[0].form']);
    expect(found[0].message).toMatch(/sodium phosphate dibasic anhydrous \(141\.9\d g\/mol\) is used/);
    expect(found[0].message).toMatch(/sodium phosphate dibasic heptahydrate \(268\.0\d g\/mol\)/);
    expect(plan.components.find((c) => c.role === 'base form')!.name).toBe('sodium phosphate dibasic anhydrous');
    const explicit = planRecipe({ ...pair, baseForm: 'sodium phosphate dibasic heptahydrate' });
    expect(explicit.warnings.some((w) => w.code === 'hydrateAssumed')).toBe(false);
  });

  it('GRAMS weighs the library form under the name; WARNINGS beside it names that form and its molar mass', () => {
    // 10 mM in 1 L of the anhydrous salt, 141.96 g/mol (the library's formula mass).
    expect(grams('sodium phosphate dibasic', 10, 1000)).toBeCloseTo(1.4196, 3);
    expect(warnings([['sodium phosphate dibasic', 10]])).toMatch(
      /"sodium phosphate dibasic" does not say which form is weighed: sodium phosphate dibasic anhydrous \(141\.9\d g\/mol\)/,
    );
    expect(warnings([['Na2HPO4·7H2O', 10]])).not.toMatch(/does not say which form/);
  });

  it('RECIPE carries the warning in its rows', () => {
    const rows = recipe('phosphate', 7.2, 50, 1000, '', undefined, [['form', 'sodium phosphate monobasic monohydrate + sodium phosphate dibasic']]);
    expect(
      rows
        .filter((r) => r[0] === 'warning')
        .map((r) => r[2])
        .join(' '),
    ).toMatch(/"sodium phosphate dibasic" does not say which form is weighed/);
  });
});
